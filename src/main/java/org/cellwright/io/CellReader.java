package org.cellwright.io;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Electrode;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;

/**
 * Reads {@code [cathode]}, {@code [anode]} (material and area, both required) and {@code [cell]}: gap
 * (required), agitation preset or diffusion-layer thickness (default the "still" preset), ambient
 * temperature (default the bath temperature), contact resistance (default 0 ohm), heat-loss
 * conductance (default: estimated by the engine) and the compartments ({@link CompartmentReader}).
 */
final class CellReader {

    static final Set<String> ELECTRODE_KEYS = Set.of("material", "area");
    static final Set<String> CELL_KEYS;

    static {
        Set<String> keys = new java.util.HashSet<>(Set.of("gap", "agitation", "diffusion_layer", "ambient",
                "contact_resistance", "heat_loss"));
        keys.addAll(CompartmentReader.KEYS);
        CELL_KEYS = Set.copyOf(keys);
    }
    /** Default agitation: a still bath, the thickest layer and so the most cautious limiting current. */
    static final AgitationPreset DEFAULT_AGITATION = AgitationPreset.STILL;

    private final ChemLibrary library;

    CellReader(ChemLibrary library) {
        this.library = library;
    }

    /** @return the electrode of section "cathode" or "anode", or empty when missing or wrong (reported) */
    Optional<Electrode> electrode(SectionReader root, String which) {
        Optional<SectionReader> section = root.table(which);
        if (section.isEmpty()) {
            if (!root.has(which)) {
                root.missing(which + ".material", which.equals("anode") ? "\"graphite\"" : "\"stainless\"");
                root.missing(which + ".area", "\"1.2 dm2\"");
            }
            return Optional.empty();
        }
        SectionReader s = section.get();
        s.allowOnly(ELECTRODE_KEYS);
        Optional<String> material = s.string("material").flatMap(raw -> {
            Optional<ElectrodeMaterial> m = library.findMaterial(raw);
            if (m.isEmpty()) {
                s.log().error(valueAt(s, "material"), s.key("material"), OverrideReader.unknownMaterial(library, raw));
            }
            return m.map(ElectrodeMaterial::name);
        });
        Optional<Double> area = s.quantity("area", Dimension.AREA, Range.POSITIVE);
        if (!s.has("material")) {
            s.missing("material", "\"" + (which.equals("anode") ? "graphite" : "stainless") + "\"");
        }
        if (!s.has("area")) {
            s.missing("area", "\"1.2 dm2\"");
        }
        if (material.isEmpty() || area.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Electrode(material.get(), area.get()));
    }

    /**
     * @param bathTemperatureK the electrolyte's start temperature (K), NaN when it could not be read
     * @param volumeM3 the electrolyte's volume (m3), NaN when it could not be read
     * @param anolyte the anolyte's composition, when {@code [electrolyte.anolyte]} is given and valid
     * @return the cell setup, or empty when missing or wrong (reported)
     */
    Optional<CellSetup> cell(SectionReader root, double bathTemperatureK, double volumeM3,
                             Optional<java.util.Map<String, Double>> anolyte) {
        Optional<SectionReader> section = root.table("cell");
        if (section.isEmpty()) {
            if (!root.has("cell")) {
                root.missing("cell.gap", "\"35 mm\"");
            }
            return Optional.empty();
        }
        SectionReader c = section.get();
        c.allowOnly(CELL_KEYS);
        Optional<Double> gap = c.quantity("gap", Dimension.LENGTH, Range.POSITIVE);
        if (!c.has("gap")) {
            c.missing("gap", "\"35 mm\"");
        }
        Optional<Agitation> agitation = agitation(c);
        double ambient = ambient(c, bathTemperatureK);
        double contact = c.has("contact_resistance")
                ? c.quantity("contact_resistance", Dimension.RESISTANCE, Range.NON_NEGATIVE).orElse(Double.NaN)
                : 0.0;
        Double heatLoss = c.quantity("heat_loss", Dimension.HEAT_CONDUCTANCE, Range.POSITIVE).orElse(null);
        boolean heatLossBad = c.has("heat_loss") && heatLoss == null;
        var compartments = CompartmentReader.read(c, root, gap.orElse(Double.NaN), volumeM3, anolyte);
        if (gap.isEmpty() || agitation.isEmpty() || Double.isNaN(ambient) || Double.isNaN(contact) || heatLossBad
                || compartments.isEmpty()) {
            return Optional.empty();
        }
        if (gap.get() > 1.0) {
            c.log().warning(c.at("gap"), c.key("gap"), "a gap of more than 1 m is unusual; check the unit");
        }
        return Optional.of(new CellSetup(gap.get(), agitation.get(), ambient, contact, heatLoss, compartments.get()));
    }

    private Optional<Agitation> agitation(SectionReader c) {
        if (c.has("agitation") && c.has("diffusion_layer")) {
            c.log().error(c.at("diffusion_layer"), c.key("diffusion_layer"),
                    "give either agitation (a preset) or diffusion_layer (a thickness), not both");
            return Optional.empty();
        }
        if (c.has("diffusion_layer")) {
            Optional<Double> delta = c.quantity("diffusion_layer", Dimension.LENGTH, Range.POSITIVE);
            delta.filter(d -> d < 1.0e-6 || d > 2.0e-3).ifPresent(d -> c.log().warning(c.at("diffusion_layer"),
                    c.key("diffusion_layer"), "a diffusion layer outside 1 um to 2 mm is unusual; check the unit"));
            return delta.map(Agitation::ofLayer);
        }
        if (!c.has("agitation")) {
            return Optional.of(Agitation.of(DEFAULT_AGITATION));
        }
        return c.string("agitation").flatMap(name -> {
            Optional<AgitationPreset> p = AgitationPreset.find(name);
            if (p.isEmpty()) {
                var names = Arrays.stream(AgitationPreset.values()).map(AgitationPreset::key).toList();
                c.log().error(valueAt(c, "agitation"), c.key("agitation"), "unknown agitation '" + name + "'"
                        + Spelling.closest(name, names).map(s -> "; did you mean '" + s + "'?")
                        .orElse("; use one of " + String.join(", ", names)
                                + ", or give diffusion_layer = \"150 um\" instead"));
            }
            return p.map(Agitation::of);
        });
    }

    private static double ambient(SectionReader c, double bathK) {
        if (c.has("ambient")) {
            return c.quantity("ambient", Dimension.TEMPERATURE, Range.AMBIENT).orElse(Double.NaN);
        }
        if (Double.isNaN(bathK) || Range.AMBIENT.contains(bathK)) {
            return bathK;
        }
        double clamped = Math.max(Range.AMBIENT.lo(), Math.min(Range.AMBIENT.hi(), bathK));
        c.log().warning(c.table().at(), c.key("ambient"), String.format(Locale.ROOT,
                "not given, and the bath temperature is outside -50 C to 60 C; %.0f C is used, give cell.ambient",
                clamped - 273.15));
        return clamped;
    }

    static SourceLocation valueAt(SectionReader s, String name) {
        return s.table().get(name) instanceof TomlNode.Leaf l ? l.valueAt() : s.at(name);
    }
}
