package org.cellwright.sim;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Compartments;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;

/**
 * Scenarios for the deposit tests with the built-in library: a bath, an undivided cell held at 25 C (a large
 * heat-loss conductance), parallel plates of one area, SI units throughout.
 */
final class DepositScenarios {

    static final ChemLibrary LIB = LibraryReader.builtIn();
    static final double SN_G_PER_MOL = 118.71;

    private DepositScenarios() {
    }

    /** A stannous chloride bath: Sn2+ (g/L), HCl (mol/L), balanced with Cl-, plus other species (mol/m3). */
    static Map<String, Double> tinChloride(double snGPerL, double hclMolPerL, Map<String, Double> extra) {
        Map<String, Double> c = new LinkedHashMap<>();
        double sn = snGPerL / SN_G_PER_MOL * 1000;
        c.put("Sn2+", sn);
        c.put("H+", hclMolPerL * 1000);
        c.putAll(extra);
        double positive = 0;
        for (var e : c.entrySet()) {
            positive += e.getValue() * LIB.findSpecies(e.getKey()).orElseThrow().charge();
        }
        c.put("Cl-", positive);
        return c;
    }

    /**
     * An undivided, isothermal cell at constant current.
     *
     * @param composition the bath (mol/m3)
     * @param volumeM3 bath volume
     * @param cathode cathode material
     * @param anode anode material
     * @param areaM2 area of each electrode
     * @param gapM gap
     * @param layerM steady diffusion-layer thickness
     * @param amps current
     * @param durationS run duration
     * @param outputS output interval
     * @param target target metal
     */
    static Scenario cell(Map<String, Double> composition, double volumeM3, String cathode, String anode, double areaM2,
                         double gapM, double layerM, double amps, double durationS, double outputS, String target) {
        return new Scenario("deposit test", "", new Electrolyte(volumeM3, 298.15, composition, null),
                new Electrode(cathode, areaM2), new Electrode(anode, areaM2),
                new CellSetup(gapM, Agitation.ofLayer(layerM), 298.15, 0, 1e5 * volumeM3),
                PowerSupply.constantCurrent(amps), new RunSettings(durationS, outputS, List.of(), target),
                List.of(), List.of(), DepositSettings.defaults());
    }

    /** @return the scenario with other compartments */
    static Scenario with(Scenario sc, Compartments c) {
        return sc.withCell(sc.cell().withCompartments(c));
    }

    /** @return the scenario stopping at a short */
    static Scenario stoppingAtShort(Scenario sc) {
        RunSettings r = sc.run();
        return sc.withRun(new RunSettings(r.durationS(), r.outputIntervalS(), List.of(new StopCondition.ShortCircuit()),
                r.targetMetal()));
    }

    /** @return the run */
    static RunResult run(Scenario sc) {
        return CellSimulation.withDefaults().run(sc, LIB, null);
    }

    /** @return the trace point at time {@code t} (on the output grid) */
    static TracePoint at(RunResult r, double t) {
        return r.trace().stream().filter(p -> Math.abs(p.timeS() - t) < 1e-6).findFirst()
                .orElseThrow(() -> new AssertionError("no output at " + t));
    }

    /** @return the charge (C) passed by an electrode reaction, "cathode:Sn2+/Sn" */
    static double charge(RunResult r, String label) {
        return r.summary().reactionChargeC().getOrDefault(label, 0.0);
    }
}
