package org.cellwright.study;

import java.util.Map;
import java.util.Objects;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.Species;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.ScenarioChemistry;

/**
 * The metal a run is for and the dissolved ion it is won from, as the engine picks them (the target
 * metal's deposition reaction whose ion is most concentrated), with what a planner needs to estimate the
 * bath's depletion: the ion's start concentration, its charge-transfer count, its diffusion coefficient,
 * and whether a soluble anode of the same metal replaces what the cathode takes.
 *
 * @param metal the target metal
 * @param ion the ion it deposits from (canonical name)
 * @param electrons electrons per metal atom of the deposition reaction
 * @param startMolPerM3 the ion's concentration at the start (mol/m3)
 * @param diffusionM2PerS the ion's diffusion coefficient at 25 C (m2/s)
 * @param replenished true when the anode dissolves the target metal (refining: the bath does not deplete)
 */
public record TargetIon(Metal metal, String ion, int electrons, double startMolPerM3, double diffusionM2PerS,
                        boolean replenished) {

    public TargetIon {
        Objects.requireNonNull(metal, "metal");
        Objects.requireNonNull(ion, "ion");
    }

    /**
     * @param sc a scenario
     * @param library the chemistry
     * @return its target metal and ion
     * @throws IllegalArgumentException when the bath has no depositable metal
     */
    public static TargetIon of(Scenario sc, ChemLibrary library) {
        ChemLibrary chem = ScenarioChemistry.apply(library, sc);
        String symbol = sc.run().targetMetal() != null ? sc.run().targetMetal()
                : CellSimulation.layout(sc, library).targetMetal();
        if (symbol == null) {
            throw new IllegalArgumentException("the bath holds no ion of a metal that can deposit on the cathode");
        }
        Metal metal = chem.findMetal(symbol).orElseThrow(
                () -> new IllegalArgumentException("no metal data for " + symbol));
        String bestIon = null;
        int bestN = 0;
        double best = -1;
        for (ElectrodeReaction r : chem.reactions()) {
            if (!r.depositedMetal().map(m -> m.equalsIgnoreCase(metal.symbol())).orElse(false)) {
                continue;
            }
            for (Participant p : r.participants()) {
                if (p.coefficient() < 0 && p.phase() == Phase.DISSOLVED) {
                    double c = startOf(sc, chem, p.name());
                    if (c > best) {
                        best = c;
                        bestIon = p.name();
                        bestN = r.n();
                    }
                }
            }
        }
        if (bestIon == null || !(best > 0)) {
            throw new IllegalArgumentException("the bath holds no ion of the target metal " + metal.symbol());
        }
        Species ion = chem.findSpecies(bestIon).orElseThrow();
        boolean soluble = chem.findMaterial(sc.anode().material()).map(ElectrodeMaterial::solubleMetal)
                .map(m -> m.equalsIgnoreCase(metal.symbol())).orElse(false);
        return new TargetIon(metal, ion.name(), bestN, best, ion.diffusionM2PerS(), soluble);
    }

    private static double startOf(Scenario sc, ChemLibrary chem, String species) {
        for (Map.Entry<String, Double> e : sc.electrolyte().compositionMolPerM3().entrySet()) {
            if (chem.findSpecies(e.getKey()).map(Species::name).orElse("").equals(species)) {
                return e.getValue();
            }
        }
        return 0;
    }

    /**
     * @param volumeM3 the bath volume (m3)
     * @return the mass of the target metal dissolved as this ion at the start (kg)
     */
    public double dissolvedKg(double volumeM3) {
        return startMolPerM3 * volumeM3 * metal.molarMassKgPerMol();
    }
}
