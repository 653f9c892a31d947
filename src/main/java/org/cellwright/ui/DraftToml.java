package org.cellwright.ui;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Writes a {@link ScenarioDraft} as scenario text (TOML), every field's text as typed, and remembers which
 * field each line holds and where its value starts, so that a problem the scenario reader finds at a line
 * and column can be shown beside the field, at the column within the field's own text.
 */
final class DraftToml {

    private static final Pattern BARE_KEY = Pattern.compile("[A-Za-z0-9_-]+");

    /**
     * The written text and where each field went.
     *
     * @param text the scenario text
     * @param keyOfLine field key of each line that holds a field (1-based lines)
     * @param valueColumnOfLine 1-based column where that line's value text starts (after the opening quote)
     */
    record Text(String text, Map<Integer, String> keyOfLine, Map<Integer, Integer> valueColumnOfLine) {
    }

    private final StringBuilder out = new StringBuilder();
    private final Map<Integer, String> keyOfLine = new HashMap<>();
    private final Map<Integer, Integer> columnOfLine = new HashMap<>();
    private int line = 1;

    private DraftToml() {
    }

    /**
     * @param d the draft
     * @return its scenario text, empty fields left out (so that their defaults apply)
     */
    static Text write(ScenarioDraft d) {
        DraftToml w = new DraftToml();
        w.all(d);
        return new Text(w.out.toString(), Map.copyOf(w.keyOfLine), Map.copyOf(w.columnOfLine));
    }

    private void all(ScenarioDraft d) {
        raw("# Cellwright scenario (values with units; see docs/scenario-format.md)");
        field(d, "title", "title");
        notes(d.get(FormFields.NOTES));
        extrasOf(d, List.of());
        header("electrolyte");
        field(d, "electrolyte.volume", "volume");
        field(d, "electrolyte.temperature", "temperature");
        field(d, "electrolyte.conductivity", "conductivity");
        extrasOf(d, List.of("electrolyte"));
        header("electrolyte.composition");
        List<ScenarioDraft.Row> rows = d.composition();
        for (int i = 0; i < rows.size(); i++) {
            ScenarioDraft.Row r = rows.get(i);
            if (!r.species().isBlank()) {
                entry(key(r.species().strip()), quote(r.concentration().strip()), FormFields.COMPOSITION + i);
            }
        }
        for (String electrode : List.of("cathode", "anode")) {
            header(electrode);
            field(d, electrode + ".material", "material");
            field(d, electrode + ".area", "area");
            extrasOf(d, List.of(electrode));
        }
        header("cell");
        field(d, "cell.gap", "gap");
        field(d, FormFields.AGITATION, "agitation");
        field(d, FormFields.DIFFUSION_LAYER, "diffusion_layer");
        field(d, "cell.ambient", "ambient");
        field(d, "cell.contact_resistance", "contact_resistance");
        field(d, "cell.heat_loss", "heat_loss");
        extrasOf(d, List.of("cell"));
        header("supply");
        if (d.supplyKind() != SupplyKind.SCHEDULE) {
            field(d, FormFields.SUPPLY_VALUE, d.supplyKind().key());
        }
        field(d, "supply.voltage_limit", "voltage_limit");
        field(d, "supply.current_limit", "current_limit");
        extrasOf(d, List.of("supply"));
        header("run");
        field(d, "run.duration", "duration");
        field(d, "run.output_interval", "output_interval");
        stops(d.get(FormFields.STOPS));
        field(d, "run.target", "target");
        extrasOf(d, List.of("run"));
        List<String> formTables = List.of("electrolyte", "cathode", "anode", "cell", "supply", "run");
        d.extras().forEach((path, entries) -> {
            if (!path.isEmpty() && !(path.size() == 1 && formTables.contains(path.get(0))) && !entries.isEmpty()) {
                header(tablePath(path));
                entries.forEach((k, v) -> entry(key(k), v, null));
            }
        });
    }

    private void field(ScenarioDraft d, String fieldKey, String tomlKey) {
        String text = d.get(fieldKey).strip();
        if (!text.isEmpty()) {
            entry(tomlKey, quote(text), fieldKey);
        }
    }

    private void extrasOf(ScenarioDraft d, List<String> table) {
        d.extras().getOrDefault(table, Map.of()).forEach((k, v) -> {
            if (!(table.equals(List.of("supply")) && k.equals(SupplyKind.SCHEDULE.key())
                    && d.supplyKind() != SupplyKind.SCHEDULE)) {
                entry(key(k), v, null);
            }
        });
    }

    private void notes(String notes) {
        String text = notes.strip();
        if (text.isEmpty()) {
            return;
        }
        if (!text.contains("\n")) {
            entry("notes", quote(text), FormFields.NOTES);
            return;
        }
        keyOfLine.put(line, FormFields.NOTES);
        raw("notes = \"\"\"");
        for (String l : text.split("\n", -1)) {
            keyOfLine.put(line, FormFields.NOTES);
            raw(l.replace("\\", "\\\\").replace("\"\"\"", "\"\"\\\""));
        }
        raw("\"\"\"");
    }

    private void stops(String text) {
        List<String> items = new ArrayList<>();
        for (String s : text.split(";")) {
            if (!s.isBlank()) {
                items.add(quote(s.strip()));
            }
        }
        if (!items.isEmpty()) {
            keyOfLine.put(line, FormFields.STOPS);
            columnOfLine.put(line, "stop = [".length() + 2);
            raw("stop = [" + String.join(", ", items) + "]");
        }
    }

    private void header(String name) {
        raw("");
        raw("[" + name + "]");
    }

    private void entry(String key, String valueText, String fieldKey) {
        if (fieldKey != null) {
            keyOfLine.put(line, fieldKey);
            columnOfLine.put(line, key.length() + 5);
        }
        raw(key + " = " + valueText);
    }

    private void raw(String text) {
        out.append(text).append('\n');
        line++;
    }

    /**
     * @param v a value as tomlj reads it
     * @return the same value as TOML text
     */
    static String value(Object v) {
        if (v instanceof String s) {
            return quote(s);
        }
        if (v instanceof Double x) {
            if (x.isNaN()) {
                return "nan";
            }
            if (x.isInfinite()) {
                return x > 0 ? "inf" : "-inf";
            }
            return x.toString();
        }
        if (v instanceof TomlArray a) {
            List<String> items = new ArrayList<>();
            a.toList().forEach(o -> items.add(value(o)));
            return "[" + String.join(", ", items) + "]";
        }
        if (v instanceof TomlTable t) {
            Map<String, String> entries = new LinkedHashMap<>();
            ScenarioDraft.ordered(t).forEach(k -> entries.put(key(k), value(t.get(List.of(k)))));
            List<String> parts = new ArrayList<>();
            entries.forEach((k, x) -> parts.add(k + " = " + x));
            return "{ " + String.join(", ", parts) + " }";
        }
        return String.valueOf(v);
    }

    /** @return a TOML basic string */
    static String quote(String s) {
        return "\"" + Toml.tomlEscape(s) + "\"";
    }

    /** @return a key as TOML writes it: bare when it can be, else quoted */
    static String key(String k) {
        return BARE_KEY.matcher(k).matches() ? k : quote(k);
    }

    private static String tablePath(List<String> path) {
        List<String> parts = new ArrayList<>();
        path.forEach(p -> parts.add(key(p)));
        return String.join(".", parts);
    }
}
