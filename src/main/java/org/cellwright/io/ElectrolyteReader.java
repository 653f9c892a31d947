package org.cellwright.io;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.Electrolyte;
import org.cellwright.chem.PhysicalConstants;

/**
 * Reads {@code [electrolyte]} and {@code [electrolyte.composition]}: volume (required), temperature
 * (default 25 C), an optional pinned conductivity, and the concentration of each species (required, at
 * least one), resolved to canonical names and mol/m3. Warns when the composition is far from
 * electroneutral. {@code [electrolyte.anolyte]}, read the same way, is the starting anolyte of a
 * two-compartment cell (see {@link CellReader}).
 */
final class ElectrolyteReader {

    static final Set<String> KEYS = Set.of("volume", "temperature", "conductivity", "composition", "anolyte");
    /** Default bath temperature (K): 25 C, the reference temperature of the data library. */
    static final double DEFAULT_TEMPERATURE_K = PhysicalConstants.REFERENCE_TEMPERATURE_K;

    private final SpeciesResolver species;

    ElectrolyteReader(SpeciesResolver species) {
        this.species = species;
    }

    /** @return the electrolyte, or empty when a required part is missing or wrong (reported) */
    Optional<Electrolyte> read(SectionReader root) {
        Optional<SectionReader> section = root.table("electrolyte");
        if (section.isEmpty()) {
            if (!root.has("electrolyte")) {
                root.missing("electrolyte.volume", "\"0.8 L\"");
                root.missing("electrolyte.composition", "{ \"Cu2+\" = \"40 g/L\" }");
            }
            return Optional.empty();
        }
        SectionReader e = section.get();
        e.allowOnly(KEYS);
        Optional<Double> volume = e.quantity("volume", Dimension.VOLUME, Range.POSITIVE);
        if (!e.has("volume")) {
            e.missing("volume", "\"0.8 L\"");
        }
        double temperature = e.has("temperature")
                ? e.quantity("temperature", Dimension.TEMPERATURE, Range.LIQUID_WATER).orElse(Double.NaN)
                : DEFAULT_TEMPERATURE_K;
        Double conductivity = e.quantity("conductivity", Dimension.CONDUCTIVITY, Range.POSITIVE).orElse(null);
        boolean conductivityBad = e.has("conductivity") && conductivity == null;
        Optional<Map<String, Double>> composition = composition(e);
        if (volume.isEmpty() || Double.isNaN(temperature) || conductivityBad || composition.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Electrolyte(volume.get(), temperature, composition.get(), conductivity));
    }

    /**
     * @return the anolyte's starting composition when {@code [electrolyte.anolyte]} is given (empty when it is
     *     not; a wrong one is reported and gives an empty map's absence too, see {@link #anolyteGiven})
     */
    Optional<Map<String, Double>> anolyte(SectionReader root) {
        if (!anolyteGiven(root)) {
            return Optional.empty();
        }
        return root.table("electrolyte").flatMap(e -> composition(e, "anolyte"));
    }

    /** @return true when the file gives {@code [electrolyte.anolyte]} */
    static boolean anolyteGiven(SectionReader root) {
        return root.table().get("electrolyte") instanceof TomlNode.Table t && t.get("anolyte") != null;
    }

    private Optional<Map<String, Double>> composition(SectionReader e) {
        if (!e.has("composition")) {
            e.missing("composition", "{ \"Cu2+\" = \"40 g/L\" } (or a [electrolyte.composition] table)");
            return Optional.empty();
        }
        return composition(e, "composition");
    }

    private Optional<Map<String, Double>> composition(SectionReader e, String tableName) {
        Optional<SectionReader> table = e.table(tableName);
        if (table.isEmpty()) {
            return Optional.empty();
        }
        SectionReader c = table.get();
        if (c.table().entries().isEmpty()) {
            c.log().error(c.table().at(), c.path(), "the composition is empty; give at least one species, e.g. "
                    + "\"Cu2+\" = \"40 g/L\"");
            return Optional.empty();
        }
        Map<String, Double> out = new LinkedHashMap<>();
        Map<String, String> writtenAs = new HashMap<>();
        boolean ok = true;
        for (var entry : c.table().entries().entrySet()) {
            String raw = entry.getKey();
            TomlNode node = entry.getValue();
            String key = c.key(raw);
            Optional<String> name = species.canonical(raw);
            if (name.isEmpty()) {
                c.log().error(node.at(), key, species.unknown(raw));
                ok = false;
                continue;
            }
            if (writtenAs.containsKey(name.get())) {
                c.log().error(node.at(), key, "'" + raw + "' is the same species as '" + writtenAs.get(name.get())
                        + "', given already");
                ok = false;
                continue;
            }
            writtenAs.put(name.get(), raw);
            Optional<Double> conc = concentration(c, key, node, name.get());
            conc.ifPresent(v -> out.put(name.get(), v));
            ok &= conc.isPresent();
        }
        if (!ok) {
            return Optional.empty();
        }
        Electroneutrality.check(out, species).ifPresent(msg -> c.log().warning(c.table().at(), c.path(), msg));
        return Optional.of(out);
    }

    private Optional<Double> concentration(SectionReader c, String key, TomlNode node, String name) {
        if (!(node instanceof TomlNode.Leaf leaf)
                || !(leaf.value() instanceof String || leaf.value() instanceof Number)) {
            c.log().error(node.at(), key, "expected a concentration as a string with a unit (e.g. \"40 g/L\" or "
                    + "\"0.5 mol/L\") or a number in mol/m3, got " + node.kind());
            return Optional.empty();
        }
        double si;
        if (leaf.value() instanceof Number n) {
            si = n.doubleValue();
        } else {
            try {
                si = UnitParser.concentration((String) leaf.value(), species.molarMassKgPerMol(name));
            } catch (UnitException ex) {
                c.log().error(leaf.valueAt().shifted(ex.column() - 1), key, ex.getMessage());
                return Optional.empty();
            }
        }
        return c.checkedKey(key, leaf, si, Range.NON_NEGATIVE);
    }
}
