package org.cellwright.io;

import java.util.Collection;
import java.util.Optional;

/**
 * Typed, checked access to one table of a scenario. Every getter reports what is wrong (wrong type, bad
 * unit, out of range, missing) to the problem log, at the key's or value's position, and returns empty
 * instead of throwing, so that reading goes on and every problem is reported together.
 */
final class SectionReader {

    private final TomlNode.Table table;
    private final String path;
    private final ProblemLog log;

    /**
     * @param table the table
     * @param path its dotted path ("" for the document root), for messages and keys
     * @param log where problems go
     */
    SectionReader(TomlNode.Table table, String path, ProblemLog log) {
        this.table = table;
        this.path = path;
        this.log = log;
    }

    TomlNode.Table table() {
        return table;
    }

    String path() {
        return path;
    }

    ProblemLog log() {
        return log;
    }

    /** @return the dotted key of an entry of this table */
    String key(String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    boolean has(String name) {
        return table.get(name) != null;
    }

    /** @return where the entry is, or where the table is when the entry is missing */
    SourceLocation at(String name) {
        TomlNode n = table.get(name);
        return n == null ? table.at() : n.at();
    }

    /** Reports every key not in {@code known}, with the closest known key as a suggestion. */
    void allowOnly(Collection<String> known) {
        for (var e : table.entries().entrySet()) {
            if (!known.contains(e.getKey())) {
                String where = path.isEmpty() ? "" : " in [" + path + "]";
                log.error(e.getValue().at(), key(e.getKey()), "unknown key '" + e.getKey() + "'" + where
                        + Spelling.suggestion(e.getKey(), known));
            }
        }
    }

    /**
     * Reports a missing required entry, with an example of what to write.
     *
     * @param name the entry's name in this table, or "section.name" when its whole section is missing
     * @param example the value to show
     */
    void missing(String name, String example) {
        int dot = name.indexOf('.');
        String advice = !path.isEmpty() ? name + " = " + example + " under [" + path + "]"
                : dot > 0 ? "a [" + name.substring(0, dot) + "] section with " + name.substring(dot + 1) + " = " + example
                : name + " = " + example;
        log.error(table.at(), key(name), "missing required value; add e.g. " + advice);
    }

    /** @return a sub-table, or empty (reported when present but not a table) */
    Optional<SectionReader> table(String name) {
        TomlNode n = table.get(name);
        if (n == null) {
            return Optional.empty();
        }
        if (n instanceof TomlNode.Table t) {
            return Optional.of(new SectionReader(t, key(name), log));
        }
        wrongType(name, n, "a table");
        return Optional.empty();
    }

    /** @return an array, or empty (reported when present but not an array) */
    Optional<TomlNode.Array> array(String name) {
        TomlNode n = table.get(name);
        if (n == null) {
            return Optional.empty();
        }
        if (n instanceof TomlNode.Array a) {
            return Optional.of(a);
        }
        wrongType(name, n, "an array");
        return Optional.empty();
    }

    /** @return a string value, or empty (reported when present but not a string) */
    Optional<String> string(String name) {
        return leaf(name, String.class, "a string");
    }

    /** @return a boolean value, or empty (reported when present but not true/false) */
    Optional<Boolean> bool(String name) {
        return leaf(name, Boolean.class, "true or false");
    }

    /** @return an integer value, or empty (reported when present but not an integer) */
    Optional<Long> integer(String name) {
        return leaf(name, Long.class, "an integer");
    }

    /** @return a plain number (integer or float), checked against a range */
    Optional<Double> number(String name, Range range) {
        TomlNode n = table.get(name);
        if (n == null) {
            return Optional.empty();
        }
        if (n instanceof TomlNode.Leaf leaf && leaf.value() instanceof Number num) {
            return checked(name, leaf, num.doubleValue(), range);
        }
        wrongType(name, n, "a number");
        return Optional.empty();
    }

    /**
     * Reads a physical value: a string with a unit, or a bare number in the SI unit.
     *
     * @param name the key
     * @param dimension the dimension it must have
     * @param range the SI values accepted
     * @return the SI value, or empty when missing or wrong (wrong is reported)
     */
    Optional<Double> quantity(String name, Dimension dimension, Range range) {
        TomlNode n = table.get(name);
        if (n == null) {
            return Optional.empty();
        }
        return quantity(key(name), n, dimension, range);
    }

    /** Reads a physical value from any node (also array elements and inline-table entries). */
    Optional<Double> quantity(String key, TomlNode n, Dimension dimension, Range range) {
        if (!(n instanceof TomlNode.Leaf leaf) || !(leaf.value() instanceof String || leaf.value() instanceof Number)) {
            log.error(n.at(), key, "expected " + dimension.description() + " as a string with a unit (e.g. \""
                    + dimension.example() + "\") or a number in " + dimension.siUnit() + ", got " + n.kind());
            return Optional.empty();
        }
        double si;
        if (leaf.value() instanceof Number num) {
            si = num.doubleValue();
        } else {
            try {
                si = UnitParser.parse((String) leaf.value(), dimension).si();
            } catch (UnitException e) {
                log.error(leaf.valueAt().shifted(e.column() - 1), key, e.getMessage());
                return Optional.empty();
            }
        }
        return checkedKey(key, leaf, si, range);
    }

    private Optional<Double> checked(String name, TomlNode.Leaf leaf, double si, Range range) {
        return checkedKey(key(name), leaf, si, range);
    }

    /** Checks a value against a range, reporting it at the value's position. */
    Optional<Double> checkedKey(String key, TomlNode.Leaf leaf, double si, Range range) {
        if (Double.isNaN(si) || Double.isInfinite(si)) {
            log.error(leaf.valueAt(), key, "must be a finite number, got " + leaf.text());
            return Optional.empty();
        }
        if (!range.contains(si)) {
            log.error(leaf.valueAt(), key, range.words() + ", got '" + leaf.text() + "'");
            return Optional.empty();
        }
        return Optional.of(si);
    }

    private <T> Optional<T> leaf(String name, Class<T> type, String expected) {
        TomlNode n = table.get(name);
        if (n == null) {
            return Optional.empty();
        }
        if (n instanceof TomlNode.Leaf leaf && type.isInstance(leaf.value())) {
            return Optional.of(type.cast(leaf.value()));
        }
        wrongType(name, n, expected);
        return Optional.empty();
    }

    /** Reports an entry of the wrong type. */
    void wrongType(String name, TomlNode n, String expected) {
        log.error(n.at(), key(name), "expected " + expected + ", got " + n.kind());
    }
}
