package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.sim.ode.Ros34Pw2Integrator;
import org.junit.jupiter.api.Test;

/**
 * A stiff case: a graphite anode in a stannous chloride bath makes dissolved chlorine, which oxidises Sn2+ at
 * 1e6 L/mol/s (about 1e5 1/s beside depletion over hours). The default run must match a reference integrated
 * with tolerances ten thousand times tighter.
 */
class StiffChemistryTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    static Scenario tinChloride() {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Sn2+", 150.0);
        comp.put("Fe2+", 20.0);
        comp.put("H+", 1000.0);
        comp.put("Cl-", 1340.0);
        return new Scenario("stiff", "", new Electrolyte(0.001, 298.15, comp, null),
                new Electrode("stainless", 0.01), new Electrode("graphite", 0.01),
                new CellSetup(0.03, Agitation.of(AgitationPreset.GENTLE), 295.15, 0, null),
                PowerSupply.constantCurrent(1.5), new RunSettings(4 * 3600, 600, List.of(), "Sn"), List.of(), List.of());
    }

    @Test
    void defaultToleranceMatchesATightReference() {
        Scenario sc = tinChloride();
        RunResult run = CellSimulation.withDefaults().run(sc, LIB, null);
        RunResult ref = new CellSimulation((rates, abs, rel, max) -> {
            double[] a = abs.clone();
            for (int i = 0; i < a.length; i++) {
                a[i] *= 1e-4;
            }
            double[] r = new double[abs.length];
            java.util.Arrays.fill(r, rel * 1e-4);
            Ros34Pw2Integrator in = new Ros34Pw2Integrator(1e-14, max, a, r);
            in.setNonNegative(rates.nonNegativeComponents());
            in.setClipWithinTolerance(false);
            return in;
        }).run(sc, LIB, null);
        assertTrue(run.summary().reactionChargeC().getOrDefault("anode:Cl2(aq)/Cl-", 0.0) > 1,
                "the case must make dissolved chlorine (it is what makes it stiff)");
        int sn2 = run.speciesNames().indexOf("Sn2+");
        int sn4 = run.speciesNames().indexOf("Sn4+");
        for (int i = 0; i < run.trace().size(); i++) {
            double[] c = run.trace().get(i).state().concentrationsMolPerM3();
            double[] cr = ref.trace().get(i).state().concentrationsMolPerM3();
            assertEquals(cr[sn2], c[sn2], 1e-4 * cr[sn2] + 1e-6, "Sn2+ at " + run.trace().get(i).timeS());
            assertEquals(cr[sn4], c[sn4], 1e-4 * Math.max(cr[sn4], 1) , "Sn4+ at " + run.trace().get(i).timeS());
        }
        assertEquals(ref.summary().currentEfficiency(), run.summary().currentEfficiency(), 1e-4);
        assertTrue(run.rhsEvaluations() * 3 < ref.rhsEvaluations(), "the default run must be much cheaper: "
                + run.rhsEvaluations() + " vs " + ref.rhsEvaluations());
    }
}
