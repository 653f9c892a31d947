package org.cellwright.ui;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.chem.SpeciesName;
import org.cellwright.io.Problem;
import org.cellwright.io.ScenarioException;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * The scenario as the form holds it: the text of every field exactly as typed ("2 A/dm2", "25 g/L"), how
 * the supply is set, the composition rows, and whatever the file holds that the form has no field for
 * (species and reaction changes, a supply schedule, unknown keys), kept as TOML value text so that it is
 * written back unchanged. {@link DraftToml} turns a draft into scenario text; {@link DraftCheck} reads that
 * text with the scenario reader and places each problem beside its field.
 *
 * <p>Mutable, for the event thread only.
 */
final class ScenarioDraft {

    /**
     * One composition row.
     *
     * @param species the species as written ("Sn2+", "Cu++")
     * @param concentration its start concentration as written ("25 g/L")
     */
    record Row(String species, String concentration) {
    }

    /** Tables whose keys the form shows (their other keys become extras of the same table). */
    private static final List<String> FORM_TABLES = List.of("electrolyte", "cathode", "anode", "cell", "supply", "run");

    private final Map<String, String> fields = new LinkedHashMap<>();
    private final List<Row> composition = new ArrayList<>();
    private final Map<List<String>, Map<String, String>> extras = new LinkedHashMap<>();
    private SupplyKind supplyKind = SupplyKind.CURRENT_DENSITY;

    /** @return an empty draft (every field empty) */
    static ScenarioDraft empty() {
        return new ScenarioDraft();
    }

    /**
     * Reads scenario text into a draft. Only TOML syntax is checked here; values are checked by
     * {@link DraftCheck}.
     *
     * @param text the scenario file's text
     * @param fileName the name used in problem locations
     * @return the draft
     * @throws ScenarioException when the text is not valid TOML (each syntax error with line and column)
     */
    static ScenarioDraft parse(String text, String fileName) throws ScenarioException {
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        TomlParseResult toml = Toml.parse(body);
        if (toml.hasErrors()) {
            List<Problem> problems = new ArrayList<>();
            for (TomlParseError e : toml.errors()) {
                TomlPosition p = e.position();
                problems.add(new Problem(fileName, p == null ? 0 : p.line(), p == null ? 0 : p.column(), "",
                        "TOML syntax: " + e.getMessage(), Problem.Severity.ERROR));
            }
            throw new ScenarioException(problems);
        }
        ScenarioDraft d = new ScenarioDraft();
        d.read(toml);
        return d;
    }

    private void read(TomlTable root) {
        for (String key : ordered(root)) {
            Object v = root.get(List.of(key));
            if ((key.equals("title") || key.equals(FormFields.NOTES)) && v instanceof String s) {
                fields.put(key, s);
            } else if (FORM_TABLES.contains(key) && v instanceof TomlTable t) {
                readTable(key, t);
            } else {
                extra(List.of(), key, v);
            }
        }
    }

    private void readTable(String table, TomlTable t) {
        for (String key : ordered(t)) {
            Object v = t.get(List.of(key));
            String dotted = table + "." + key;
            SupplyKind kind = table.equals("supply") ? SupplyKind.ofKey(key) : null;
            if (dotted.equals("electrolyte.composition") && v instanceof TomlTable c) {
                for (String species : ordered(c)) {
                    composition.add(new Row(species, plain(c.get(List.of(species)))));
                }
            } else if (kind == SupplyKind.SCHEDULE) {
                supplyKind = kind;
                extra(List.of("supply"), key, v);
            } else if (kind != null && !(v instanceof TomlTable) && !(v instanceof TomlArray)) {
                supplyKind = kind;
                fields.put(FormFields.SUPPLY_VALUE, plain(v));
            } else if (dotted.equals(FormFields.STOPS) && v instanceof TomlArray a) {
                List<String> stops = new ArrayList<>();
                a.toList().forEach(o -> stops.add(plain(o)));
                fields.put(dotted, String.join("; ", stops));
            } else if (FormFields.find(dotted).isPresent() && !(v instanceof TomlTable) && !(v instanceof TomlArray)) {
                fields.put(dotted, plain(v));
            } else {
                extra(List.of(table), key, v);
            }
        }
    }

    /** Keeps a key the form has no field for; nested tables keep their own header. */
    private void extra(List<String> table, String key, Object v) {
        if (v instanceof TomlTable t && !t.isEmpty()) {
            List<String> path = new ArrayList<>(table);
            path.add(key);
            extras.computeIfAbsent(List.copyOf(path), p -> new LinkedHashMap<>());
            for (String k : ordered(t)) {
                extra(path, k, t.get(List.of(k)));
            }
            return;
        }
        extras.computeIfAbsent(List.copyOf(table), p -> new LinkedHashMap<>()).put(key, DraftToml.value(v));
    }

    /** @return the keys of a table in the order they were written */
    static List<String> ordered(TomlTable t) {
        List<String> keys = new ArrayList<>(t.keySet());
        keys.sort(Comparator.comparing((String k) -> position(t, k, true)).thenComparing(k -> position(t, k, false)));
        return keys;
    }

    private static int position(TomlTable t, String key, boolean line) {
        TomlPosition p = t.inputPositionOf(List.of(key));
        if (p == null) {
            return Integer.MAX_VALUE;
        }
        return line ? p.line() : p.column();
    }

    /** @return a value as the form shows it: strings as they are, numbers and booleans as written */
    private static String plain(Object v) {
        return v instanceof String s ? s : DraftToml.value(v);
    }

    /**
     * @param key a field key
     * @return its text, "" when empty
     */
    String get(String key) {
        return fields.getOrDefault(key, "");
    }

    /**
     * @param key a field key
     * @param text its new text ("" to leave the value to its default)
     */
    void set(String key, String text) {
        fields.put(key, text == null ? "" : text);
    }

    /** @return how the supply is set */
    SupplyKind supplyKind() {
        return supplyKind;
    }

    /** @param kind how the supply is set; a schedule is only kept when the file gave one */
    void setSupplyKind(SupplyKind kind) {
        if (kind == SupplyKind.SCHEDULE && !hasSchedule()) {
            throw new IllegalArgumentException("this scenario has no schedule to keep");
        }
        this.supplyKind = kind;
    }

    /** @return true when the file gave a supply schedule (kept as written) */
    boolean hasSchedule() {
        return extras.getOrDefault(List.of("supply"), Map.of()).containsKey(SupplyKind.SCHEDULE.key());
    }

    /** @return the composition rows, in order (unmodifiable) */
    List<Row> composition() {
        return Collections.unmodifiableList(composition);
    }

    /** @param rows the new composition rows */
    void setComposition(List<Row> rows) {
        composition.clear();
        composition.addAll(rows);
    }

    /**
     * Sets one species' concentration: the row naming it in any notation ("Cu++" for "Cu2+") gets the new
     * text, or a row is added.
     *
     * @param species the species (canonical or any accepted notation)
     * @param text the concentration as written
     */
    void setConcentration(String species, String text) {
        for (int i = 0; i < composition.size(); i++) {
            if (!Collections.disjoint(SpeciesName.candidates(composition.get(i).species()),
                    SpeciesName.candidates(species))) {
                composition.set(i, new Row(composition.get(i).species(), text));
                return;
            }
        }
        composition.add(new Row(species, text));
    }

    /** @return the kept keys the form has no field for: table path to key to TOML value text */
    Map<List<String>, Map<String, String>> extras() {
        return Collections.unmodifiableMap(extras);
    }

    /** @return an independent copy */
    ScenarioDraft copy() {
        ScenarioDraft d = new ScenarioDraft();
        d.fields.putAll(fields);
        d.composition.addAll(composition);
        extras.forEach((k, v) -> d.extras.put(k, new LinkedHashMap<>(v)));
        d.supplyKind = supplyKind;
        return d;
    }
}
