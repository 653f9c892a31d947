package org.cellwright.io;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * One TOML table of a data file with the checks every chemistry table shares: known keys only, typed values,
 * a unit on each quantity and a {@code <key>_source} beside every number. Errors carry file, line and column.
 */
final class DataTable {

    static final String SOURCE_SUFFIX = "_source";

    private final String sourceName;
    private final TomlTable table;
    private final String path;
    private final TomlPosition position;

    DataTable(String sourceName, TomlTable table, String path, TomlPosition position) {
        this.sourceName = sourceName;
        this.table = table;
        this.path = path;
        this.position = position;
    }

    String path() {
        return path;
    }

    /** @return the keys of this table in file order */
    List<String> keys() {
        List<String> keys = new ArrayList<>(table.keySet());
        keys.sort(Comparator.comparingInt((String k) -> lineOf(k)).thenComparingInt(k -> columnOf(k)));
        return keys;
    }

    boolean has(String key) {
        return table.contains(List.of(key));
    }

    /** Fails on a key that is not one of {@code allowed} (or its {@code _source}). */
    void allowOnly(Set<String> allowed, Set<String> numbered) throws LibraryFormatException {
        for (String key : keys()) {
            boolean ok = allowed.contains(key)
                    || key.endsWith(SOURCE_SUFFIX) && numbered.contains(key.substring(0, key.length() - SOURCE_SUFFIX.length()));
            if (!ok) {
                Set<String> expected = new TreeSet<>(allowed);
                numbered.forEach(n -> expected.add(n + SOURCE_SUFFIX));
                throw error(key, "unknown key (expected one of: " + String.join(", ", expected) + ")");
            }
        }
    }

    DataTable table(String key) throws LibraryFormatException {
        Object v = table.get(List.of(key));
        if (!(v instanceof TomlTable t)) {
            throw error(key, "must be a table");
        }
        return new DataTable(sourceName, t, path.isEmpty() ? quote(key) : path + "." + quote(key),
                table.inputPositionOf(List.of(key)));
    }

    String string(String key) throws LibraryFormatException {
        Object v = table.get(List.of(key));
        if (v == null) {
            throw missing(key);
        }
        if (!(v instanceof String s) || s.isBlank()) {
            throw error(key, "must be a non-empty string");
        }
        return s.strip();
    }

    String optionalString(String key) throws LibraryFormatException {
        return has(key) ? string(key) : null;
    }

    long integer(String key) throws LibraryFormatException {
        Object v = table.get(List.of(key));
        if (v == null) {
            throw missing(key);
        }
        if (!(v instanceof Long l)) {
            throw error(key, "must be a whole number");
        }
        return l;
    }

    List<String> strings(String key) throws LibraryFormatException {
        if (!has(key)) {
            return List.of();
        }
        Object v = table.get(List.of(key));
        if (!(v instanceof org.tomlj.TomlArray a)) {
            throw error(key, "must be an array of strings");
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            if (!(a.get(i) instanceof String s) || s.isBlank()) {
                throw error(key, "must be an array of non-empty strings");
            }
            out.add(s.strip());
        }
        return out;
    }

    /**
     * A quantity with a unit (a bare number is SI), which must have a source.
     *
     * @return the value in SI units
     */
    double quantity(String key, LibraryUnits.Dimension dimension, String example) throws LibraryFormatException {
        Object v = table.get(List.of(key));
        if (v == null) {
            throw missing(key);
        }
        double value;
        if (v instanceof Double || v instanceof Long) {
            value = ((Number) v).doubleValue();
        } else if (v instanceof String s) {
            try {
                value = LibraryUnits.parse(s, dimension, example);
            } catch (IllegalArgumentException e) {
                throw error(key, e.getMessage());
            }
        } else {
            throw error(key, "must be a number or a string with a unit, e.g. \"1.5 " + example + "\"");
        }
        source(key);
        return value;
    }

    /** A plain number whose source is given elsewhere (e.g. reaction orders, sourced as a whole). */
    double plainNumber(String key) throws LibraryFormatException {
        Object v = table.get(List.of(key));
        if (v == null) {
            throw missing(key);
        }
        if (!(v instanceof Double || v instanceof Long)) {
            throw error(key, "must be a number");
        }
        return ((Number) v).doubleValue();
    }

    /** @return the mandatory {@code <key>_source} text of a number */
    String source(String key) throws LibraryFormatException {
        String sourceKey = key + SOURCE_SUFFIX;
        Object s = table.get(List.of(sourceKey));
        if (!(s instanceof String text) || text.isBlank()) {
            throw error(key, "has no source: add " + sourceKey + " = \"<handbook table, paper, 'from memory' or"
                    + " 'common practice'>\"");
        }
        return text.strip();
    }

    LibraryFormatException error(String key, String problem) {
        TomlPosition p = key == null ? position : table.inputPositionOf(List.of(key));
        if (p == null) {
            p = position;
        }
        return new LibraryFormatException(sourceName, p == null ? 0 : p.line(), p == null ? 0 : p.column(),
                key == null ? path : path.isEmpty() ? quote(key) : path + "." + quote(key), problem);
    }

    LibraryFormatException missing(String key) {
        TomlPosition p = position;
        return new LibraryFormatException(sourceName, p == null ? 0 : p.line(), p == null ? 0 : p.column(),
                path + "." + quote(key), "missing (required in [" + path + "])");
    }

    private int lineOf(String key) {
        TomlPosition p = table.inputPositionOf(List.of(key));
        return p == null ? Integer.MAX_VALUE : p.line();
    }

    private int columnOf(String key) {
        TomlPosition p = table.inputPositionOf(List.of(key));
        return p == null ? Integer.MAX_VALUE : p.column();
    }

    static String quote(String key) {
        return key.matches("[A-Za-z0-9_-]+") ? key : "\"" + key + "\"";
    }
}
