package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Species;
import org.cellwright.chem.SpeciesName;

/**
 * Reads the {@code [species."X"]} and {@code [reaction."Ox/Red"]} tables: a scenario's changes to, or
 * additions to, the chemistry library. A new species must give charge, molar_mass and diffusion; a new
 * reaction must give equation, e0 and i0 (its chemistry is not checked here).
 */
final class OverrideReader {

    static final Set<String> SPECIES_KEYS = Set.of("charge", "molar_mass", "diffusion", "conductivity");
    static final Set<String> REACTION_KEYS = Set.of("equation", "e0", "i0", "alpha_a", "alpha_c", "material");

    private final ChemLibrary library;

    OverrideReader(ChemLibrary library) {
        this.library = library;
    }

    List<SpeciesOverride> species(SectionReader root) {
        List<SpeciesOverride> out = new ArrayList<>();
        Optional<SectionReader> section = root.table("species");
        if (section.isEmpty()) {
            return out;
        }
        for (var e : section.get().table().entries().entrySet()) {
            String raw = e.getKey();
            Optional<SectionReader> t = section.get().table(raw);
            if (t.isEmpty()) {
                continue;
            }
            SectionReader s = t.get();
            s.allowOnly(SPECIES_KEYS);
            Optional<Species> known = library.findSpecies(raw);
            String name = known.map(Species::name)
                    .orElseGet(() -> SpeciesName.candidates(raw).stream().findFirst().orElse(raw.strip()));
            Integer charge = s.integer("charge").filter(z -> checkCharge(s, z)).map(Long::intValue).orElse(null);
            Double molarMass = s.quantity("molar_mass", Dimension.MOLAR_MASS, Range.POSITIVE).orElse(null);
            Double diffusion = s.quantity("diffusion", Dimension.DIFFUSIVITY, Range.POSITIVE).orElse(null);
            Double conductivity = s.quantity("conductivity", Dimension.MOLAR_CONDUCTIVITY, Range.NON_NEGATIVE)
                    .orElse(null);
            if (known.isEmpty()) {
                List<String> absent = List.of("charge", "molar_mass", "diffusion").stream().filter(k -> !s.has(k))
                        .toList();
                if (!absent.isEmpty()) {
                    s.log().error(s.table().at(), s.path(), "'" + raw + "' is not in the library"
                            + Spelling.suggestion(raw, library.species().stream().map(Species::name).toList())
                            + "; a new species needs charge, molar_mass and diffusion (missing: "
                            + String.join(", ", absent) + ")");
                }
            }
            if (s.table().entries().isEmpty()) {
                s.log().warning(s.table().at(), s.path(), "this species table changes nothing");
            }
            out.add(new SpeciesOverride(name, charge, molarMass, diffusion, conductivity));
        }
        return out;
    }

    private static boolean checkCharge(SectionReader s, long z) {
        if (Math.abs(z) > 6) {
            s.log().error(s.at("charge"), s.key("charge"), "charge number must lie between -6 and 6, got " + z);
            return false;
        }
        return true;
    }

    List<ReactionOverride> reactions(SectionReader root) {
        List<ReactionOverride> out = new ArrayList<>();
        Optional<SectionReader> section = root.table("reaction");
        if (section.isEmpty()) {
            return out;
        }
        for (var e : section.get().table().entries().entrySet()) {
            String raw = e.getKey();
            Optional<SectionReader> t = section.get().table(raw);
            if (t.isEmpty()) {
                continue;
            }
            SectionReader r = t.get();
            r.allowOnly(REACTION_KEYS);
            if (raw.indexOf('/') <= 0 || raw.endsWith("/")) {
                r.log().error(r.table().at(), r.path(), "a reaction is named by its couple 'Ox/Red', e.g. "
                        + "[reaction.\"Cu2+/Cu\"], got '" + raw + "'");
                continue;
            }
            Optional<ElectrodeReaction> known = library.findReaction(raw);
            String name = known.map(ElectrodeReaction::name).orElseGet(() -> library.canonicalCouple(raw).orElse(raw));
            String equation = r.string("equation").orElse(null);
            Double e0 = r.quantity("e0", Dimension.VOLTAGE, Range.ANY).orElse(null);
            Double i0 = r.quantity("i0", Dimension.CURRENT_DENSITY, Range.POSITIVE).orElse(null);
            Double alphaA = r.number("alpha_a", Range.TRANSFER_COEFFICIENT).orElse(null);
            Double alphaC = r.number("alpha_c", Range.TRANSFER_COEFFICIENT).orElse(null);
            String material = r.string("material").flatMap(m -> material(r, m)).orElse(null);
            if (known.isEmpty()) {
                List<String> absent = List.of("equation", "e0", "i0").stream().filter(k -> !r.has(k)).toList();
                if (!absent.isEmpty()) {
                    r.log().error(r.table().at(), r.path(), "unknown reaction '" + raw + "'"
                            + Spelling.suggestion(raw, library.reactions().stream().map(ElectrodeReaction::name).toList())
                            + "; a new reaction must give equation, e0 and i0 (missing: " + String.join(", ", absent)
                            + ")");
                }
            }
            if (r.table().entries().isEmpty()) {
                r.log().warning(r.table().at(), r.path(), "this reaction table changes nothing");
            }
            out.add(new ReactionOverride(name, equation, e0, i0, alphaA, alphaC, material));
        }
        return out;
    }

    private Optional<String> material(SectionReader r, String raw) {
        Optional<ElectrodeMaterial> m = library.findMaterial(raw);
        if (m.isEmpty()) {
            r.log().error(r.table().get("material") instanceof TomlNode.Leaf l ? l.valueAt() : r.at("material"),
                    r.key("material"), unknownMaterial(library, raw));
        }
        return m.map(ElectrodeMaterial::name);
    }

    /** @return "unknown electrode material 'x'; did you mean 'y'?" listing the known names otherwise */
    static String unknownMaterial(ChemLibrary library, String raw) {
        List<String> names = new ArrayList<>();
        library.materials().forEach(m -> {
            names.add(m.name());
            names.addAll(m.aliases());
        });
        String hint = Spelling.closest(raw, names).map(s -> "; did you mean '" + s + "'?")
                .orElse("; known materials: " + String.join(", ",
                        library.materials().stream().map(ElectrodeMaterial::name).toList()));
        return "unknown electrode material '" + raw + "'" + hint;
    }
}
