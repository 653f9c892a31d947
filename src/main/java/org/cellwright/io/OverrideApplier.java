package org.cellwright.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;

import org.cellwright.chem.SpeciesName;
import org.tomlj.Toml;
import org.tomlj.TomlParseResult;

/**
 * Applies {@code --set key=value} options to a scenario's TOML tree before it is resolved, so that a set
 * value goes through the same checks as one written in the file.
 *
 * <p>The key is a dotted path of the TOML ({@code supply.current}, {@code electrolyte.composition."Sn2+"},
 * {@code reaction.H+/H2.i0}); segments may be quoted. The value is read as a TOML value when it is one
 * ({@code 3}, {@code "3 A"}, {@code ["short"]}, {@code true}), otherwise as a string ({@code 20mm},
 * {@code 3 A} after the shell removed the quotes). Setting one of a group of alternatives drops the others
 * given in the file: current, current_density, voltage and schedule under [supply]; agitation and
 * diffusion_layer under [cell]. A composition entry replaces the file's entry for the same species in any
 * notation ({@code Cu++} replaces {@code Cu2+}).
 *
 * <p>Problems are located with file "(from --set)", line = the number of the option, column within its
 * text.
 */
final class OverrideApplier {

    private static final Map<String, List<String>> ALTERNATIVES = Map.of(
            "supply", SupplyReader.SET_VALUES,
            "cell", List.of("agitation", "diffusion_layer"));

    private OverrideApplier() {
    }

    /**
     * @param root the document tree, changed in place
     * @param sets the options' texts, "key=value", in order
     * @param log where problems go
     */
    static void apply(TomlNode.Table root, List<String> sets, ProblemLog log) {
        for (int i = 0; i < sets.size(); i++) {
            applyOne(root, sets.get(i), i + 1, log);
        }
    }

    private static void applyOne(TomlNode.Table root, String arg, int n, ProblemLog log) {
        SourceLocation argAt = new SourceLocation(SourceLocation.FROM_SET, n, 1);
        int eq = indexOutsideQuotes(arg, '=');
        if (eq <= 0) {
            log.error(argAt, arg.strip(), "expected key=value, e.g. --set supply.current=\"3 A\"");
            return;
        }
        List<String> path = path(arg.substring(0, eq));
        if (path.isEmpty()) {
            log.error(argAt, arg.substring(0, eq).strip(), "cannot read the key; write a dotted path such as "
                    + "cell.gap or electrolyte.composition.\"Sn2+\"");
            return;
        }
        String key = String.join(".", path);
        String valueText = arg.substring(eq + 1);
        int lead = 0;
        while (lead < valueText.length() && Character.isWhitespace(valueText.charAt(lead))) {
            lead++;
        }
        int valueColumn = eq + 2 + lead;
        TomlNode value = value(valueText.strip(), argAt, valueColumn);
        TomlNode.Table table = root;
        for (int i = 0; i < path.size() - 1; i++) {
            TomlNode child = table.get(path.get(i));
            if (child == null) {
                child = new TomlNode.Table(argAt);
                table.put(path.get(i), child);
            }
            if (!(child instanceof TomlNode.Table t)) {
                log.error(argAt, key, "'" + String.join(".", path.subList(0, i + 1)) + "' is a value, not a table");
                return;
            }
            table = t;
        }
        String parent = String.join(".", path.subList(0, path.size() - 1));
        String last = path.get(path.size() - 1);
        for (String other : ALTERNATIVES.getOrDefault(parent, List.of())) {
            TomlNode old = table.get(other);
            if (!other.equals(last) && old != null && !SourceLocation.FROM_SET.equals(old.at().file())
                    && ALTERNATIVES.get(parent).contains(last)) {
                table.remove(other);
            }
        }
        if (parent.equals("electrolyte.composition")) {
            for (String existing : new ArrayList<>(table.entries().keySet())) {
                if (!existing.equals(last) && !Collections.disjoint(SpeciesName.candidates(existing),
                        SpeciesName.candidates(last))) {
                    table.remove(existing);
                }
            }
        }
        table.put(last, value);
    }

    /** Reads the value as TOML when it is one, else as a plain string. */
    private static TomlNode value(String text, SourceLocation argAt, int valueColumn) {
        String snippet = "v = " + text;
        TomlParseResult parsed = Toml.parse(snippet);
        if (!parsed.hasErrors() && parsed.contains("v")) {
            SourceText src = new SourceText(SourceLocation.FROM_SET, snippet, argAt.line(), valueColumn - 5);
            TomlNode node = TomlNode.of(parsed, argAt, src).get("v");
            if (node instanceof TomlNode.Leaf leaf) {
                return new TomlNode.Leaf(leaf.value(), argAt, leaf.valueAt());
            }
            if (node instanceof TomlNode.Array array) {
                return new TomlNode.Array(array.items(), argAt);
            }
            TomlNode.Table copy = new TomlNode.Table(argAt);
            ((TomlNode.Table) node).entries().forEach(copy::put);
            return copy;
        }
        return new TomlNode.Leaf(text, argAt, new SourceLocation(SourceLocation.FROM_SET, argAt.line(), valueColumn));
    }

    /** Splits a dotted key into segments; quoted segments may hold dots. Empty on a malformed key. */
    static List<String> path(String dotted) {
        List<String> out = new ArrayList<>();
        StringBuilder seg = new StringBuilder();
        boolean quotedSegment = false;
        int i = 0;
        String s = dotted.strip();
        while (i <= s.length()) {
            char c = i < s.length() ? s.charAt(i) : '.';
            if (c == '"' || c == '\'') {
                int close = s.indexOf(c, i + 1);
                if (close < 0 || !seg.toString().isBlank()) {
                    return List.of();
                }
                seg.append(s, i + 1, close);
                quotedSegment = true;
                i = close + 1;
                continue;
            }
            if (c == '.') {
                String part = quotedSegment ? seg.toString() : seg.toString().strip();
                if (part.isEmpty()) {
                    return List.of();
                }
                out.add(part);
                seg.setLength(0);
                quotedSegment = false;
            } else if (!(quotedSegment && Character.isWhitespace(c))) {
                if (quotedSegment) {
                    return List.of();
                }
                seg.append(c);
            }
            i++;
        }
        return out;
    }

    private static int indexOutsideQuotes(String s, char target) {
        char quote = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == target) {
                return i;
            }
        }
        return -1;
    }
}
