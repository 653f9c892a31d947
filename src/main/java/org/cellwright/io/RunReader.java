package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Metal;

/**
 * Reads {@code [run]}: duration (required), output_interval (default 1 min), stop conditions (default
 * none) and the target metal (default: chosen by the engine, the depositable metal whose ion is most
 * concentrated).
 */
final class RunReader {

    static final Set<String> KEYS = Set.of("duration", "output_interval", "stop", "target");
    /** Default interval of the recorded time series (s): one minute. */
    static final double DEFAULT_OUTPUT_INTERVAL_S = 60;

    private final ChemLibrary library;
    private final StopConditionParser stops;
    private final SpeciesResolver species;

    RunReader(ChemLibrary library, SpeciesResolver species) {
        this.library = library;
        this.species = species;
        this.stops = new StopConditionParser(library, species);
    }

    /**
     * @param electrolyte the bath, when it could be read (to check the target metal is in it)
     * @return the run settings, or empty when missing or wrong (reported)
     */
    Optional<RunSettings> read(SectionReader root, Optional<Electrolyte> electrolyte) {
        Optional<SectionReader> section = root.table("run");
        if (section.isEmpty()) {
            if (!root.has("run")) {
                root.missing("run.duration", "\"4 h\"");
            }
            return Optional.empty();
        }
        SectionReader r = section.get();
        r.allowOnly(KEYS);
        Optional<Double> duration = r.quantity("duration", Dimension.TIME, Range.POSITIVE);
        if (!r.has("duration")) {
            r.missing("duration", "\"4 h\"");
        }
        double interval = r.has("output_interval")
                ? r.quantity("output_interval", Dimension.TIME, Range.POSITIVE).orElse(Double.NaN)
                : DEFAULT_OUTPUT_INTERVAL_S;
        Optional<List<StopCondition>> stopList = stopConditions(r);
        String target = null;
        boolean targetBad = false;
        if (r.has("target")) {
            Optional<String> t = r.string("target").flatMap(raw -> metal(r, raw));
            target = t.orElse(null);
            targetBad = t.isEmpty();
        }
        if (duration.isEmpty() || Double.isNaN(interval) || stopList.isEmpty() || targetBad) {
            return Optional.empty();
        }
        if (interval > duration.get()) {
            r.log().warning(r.at("output_interval"), r.key("output_interval"),
                    "is longer than run.duration; only the start and end are recorded");
        }
        if (target != null && electrolyte.isPresent()) {
            String metal = target;
            boolean present = electrolyte.get().compositionMolPerM3().entrySet().stream()
                    .anyMatch(e -> e.getValue() > 0 && species.contains(e.getKey(), metal));
            if (!present) {
                r.log().warning(r.at("target"), r.key("target"), "no dissolved species of " + metal
                        + " in the electrolyte; nothing of it can deposit unless an anode dissolves it");
            }
        }
        return Optional.of(new RunSettings(duration.get(), interval, stopList.get(), target));
    }

    private Optional<String> metal(SectionReader r, String raw) {
        Optional<Metal> m = library.findMetal(raw.strip());
        if (m.isEmpty()) {
            List<String> symbols = library.metals().stream().map(Metal::symbol).toList();
            r.log().error(CellReader.valueAt(r, "target"), r.key("target"), "unknown metal '" + raw + "'"
                    + Spelling.closest(raw, symbols).map(s -> "; did you mean '" + s + "'?")
                    .orElse("; known metals: " + String.join(", ", symbols)));
        }
        return m.map(Metal::symbol);
    }

    private Optional<List<StopCondition>> stopConditions(SectionReader r) {
        if (!r.has("stop")) {
            return Optional.of(List.of());
        }
        Optional<TomlNode.Array> array = r.array("stop");
        if (array.isEmpty()) {
            return Optional.empty();
        }
        List<StopCondition> out = new ArrayList<>();
        boolean ok = true;
        List<TomlNode> items = array.get().items();
        for (int i = 0; i < items.size(); i++) {
            String key = r.key("stop") + "[" + (i + 1) + "]";
            if (!(items.get(i) instanceof TomlNode.Leaf leaf) || !(leaf.value() instanceof String text)) {
                r.log().error(items.get(i).at(), key, "expected a stop condition as a string, e.g. \"short\" or "
                        + "\"Sn2+ < 2 g/L\", got " + items.get(i).kind());
                ok = false;
                continue;
            }
            try {
                StopCondition c = stops.parse(text);
                if (out.contains(c)) {
                    r.log().warning(leaf.valueAt(), key, "the same stop condition is given twice");
                } else {
                    out.add(c);
                }
            } catch (UnitException e) {
                r.log().error(leaf.valueAt().shifted(e.column() - 1), key, e.getMessage());
                ok = false;
            }
        }
        return ok ? Optional.of(out) : Optional.empty();
    }
}
