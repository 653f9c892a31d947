package org.cellwright.sim;

import java.util.Map;

import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.ReactionEquation;
import org.cellwright.chem.Species;

/** Applies a scenario's species and reaction overrides to a chemistry library. */
public final class ScenarioChemistry {

    private ScenarioChemistry() {
    }

    /**
     * @param lib the base library
     * @param sc the scenario
     * @return the library with the scenario's overrides and additions
     * @throws IllegalArgumentException when an override cannot be applied
     */
    public static ChemLibrary apply(ChemLibrary lib, Scenario sc) {
        ChemLibrary out = lib;
        for (SpeciesOverride o : sc.speciesOverrides()) {
            out = out.withSpecies(species(out, o));
        }
        for (ReactionOverride o : sc.reactionOverrides()) {
            out = out.withReaction(reaction(out, o));
        }
        return out;
    }

    private static Species species(ChemLibrary lib, SpeciesOverride o) {
        Species base = lib.findSpecies(o.name()).orElse(null);
        if (base == null) {
            if (o.charge() == null || o.molarMassKgPerMol() == null || o.diffusionM2PerS() == null) {
                throw new IllegalArgumentException("species." + o.name()
                        + ": a new species needs charge, molar_mass and diffusion");
            }
            double lambda = o.conductivitySM2PerMol() != null ? o.conductivitySM2PerMol() : 0;
            return new Species(o.name(), o.charge(), o.molarMassKgPerMol(), o.diffusionM2PerS(), lambda,
                    Map.of(), Map.of("all", "scenario file"));
        }
        return new Species(base.name(), o.charge() != null ? o.charge() : base.charge(),
                o.molarMassKgPerMol() != null ? o.molarMassKgPerMol() : base.molarMassKgPerMol(),
                o.diffusionM2PerS() != null ? o.diffusionM2PerS() : base.diffusionM2PerS(),
                o.conductivitySM2PerMol() != null ? o.conductivitySM2PerMol() : base.conductivitySM2PerMol(),
                base.elements(), base.sources());
    }

    private static ElectrodeReaction newReaction(ChemLibrary lib, ReactionOverride o) {
        if (o.equation() == null || o.e0V() == null || o.i0APerM2() == null) {
            throw new IllegalArgumentException("reaction." + o.name()
                    + ": a reaction not in the library needs equation, e0 and i0");
        }
        ReactionEquation eq = ReactionEquation.parseElectrode(o.equation(), lib);
        double alphaA = o.alphaA() != null ? o.alphaA() : eq.electrons() / 2.0;
        double alphaC = o.alphaC() != null ? o.alphaC() : eq.electrons() - alphaA;
        Kinetics k = new Kinetics(o.i0APerM2(), alphaA, alphaC, "scenario file");
        return new ElectrodeReaction(o.name(), o.equation(), eq.electrons(), eq.participants(), o.e0V(), 0, k,
                o.material() == null ? Map.of() : Map.of(o.material(), k), Map.of("all", "scenario file"));
    }

    private static ElectrodeReaction reaction(ChemLibrary lib, ReactionOverride o) {
        ElectrodeReaction base = lib.findReaction(o.name()).orElse(null);
        if (base == null) {
            return newReaction(lib, o);
        }
        ElectrodeReaction r = o.e0V() != null ? base.withE0(o.e0V()) : base;
        if (o.i0APerM2() != null || o.alphaA() != null || o.alphaC() != null) {
            Kinetics k = r.kineticsOn(o.material());
            Kinetics changed = new Kinetics(o.i0APerM2() != null ? o.i0APerM2() : k.i0APerM2(),
                    o.alphaA() != null ? o.alphaA() : k.alphaA(), o.alphaC() != null ? o.alphaC() : k.alphaC(),
                    "scenario file");
            r = r.withKinetics(o.material(), changed);
        }
        return r;
    }
}
