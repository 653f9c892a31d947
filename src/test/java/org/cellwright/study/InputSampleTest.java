package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Conductivity;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.sim.ScenarioChemistry;
import org.junit.jupiter.api.Test;

/** The spreads of the uncertain inputs and how a sample changes the scenario and the chemistry. */
class InputSampleTest {

    private static final int N = 20_000;

    private static double[] draws(UncertainInput in, boolean pinned, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double[] v = new double[N];
        for (int i = 0; i < N; i++) {
            v[i] = in.draw(r, pinned);
        }
        return v;
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    private static double sd(double[] v) {
        double m = mean(v);
        double s = 0;
        for (double x : v) {
            s += (x - m) * (x - m);
        }
        return Math.sqrt(s / (v.length - 1));
    }

    @Test
    void eachInputHasItsDocumentedSpread() {
        double[] layer = draws(UncertainInput.DIFFUSION_LAYER, false, 11);
        double[] logLayer = java.util.Arrays.stream(layer).map(Math::log).toArray();
        // log-normal with geometric sd 1.3: ln factor ~ N(0, ln 1.3 = 0.262). Tolerances: 4 standard errors of
        // 20000 draws (se of the mean 0.0019, of the sd 0.0013)
        assertEquals(0, mean(logLayer), 0.008);
        assertEquals(Math.log(1.3), sd(logLayer), 0.006);
        double[] exchange = draws(UncertainInput.EXCHANGE_CURRENT, false, 12);
        double[] decades = java.util.Arrays.stream(exchange).map(Math::log10).toArray();
        // log-uniform on one decade either way: log10 factor ~ U(-1, 1), mean 0, sd 1/sqrt(3) = 0.577
        assertTrue(java.util.Arrays.stream(decades).allMatch(d -> d >= -1 && d <= 1));
        assertEquals(0, mean(decades), 0.017);
        assertEquals(1 / Math.sqrt(3), sd(decades), 0.012);
        // normal, sd 4 % (computed conductivity) and 2 % (pinned, measured)
        assertEquals(1, mean(draws(UncertainInput.CONDUCTIVITY, false, 13)), 0.0012);
        assertEquals(0.04, sd(draws(UncertainInput.CONDUCTIVITY, false, 13)), 0.0012);
        assertEquals(0.02, sd(draws(UncertainInput.CONDUCTIVITY, true, 14)), 0.0006);
        assertEquals(0.05, sd(draws(UncertainInput.DIFFUSION_COEFFICIENT, false, 15)), 0.0015);
    }

    @Test
    void theSameSeedGivesTheSameSample() {
        ChemLibrary lib = StudyScenarios.library();
        InputSample a = InputSample.draw(0, new SplittableRandom(42), lib, false);
        InputSample b = InputSample.draw(0, new SplittableRandom(42), lib, false);
        assertEquals(a, b);
        assertEquals(lib.species().size(), a.diffusionFactors().size());
    }

    @Test
    void aSampleScalesTheLayerTheConductivityTheDiffusionAndTheExchangeCurrentsOverTheScenariosOwnValues() {
        Scenario base = StudyScenarios.copperBatch(1e-3, 0.01, 50e-6, 100, 1.0, 3600, 60);
        // the scenario's own override of the Cu2+/Cu exchange current density (A/m2)
        Scenario sc = new Scenario(base.title(), base.notes(), base.electrolyte(), base.cathode(), base.anode(),
                base.cell(), base.supply(), base.run(), List.of(),
                List.of(new ReactionOverride("Cu2+/Cu", null, null, 3.0, null, null, null)));
        ChemLibrary chemistry = ScenarioChemistry.apply(StudyScenarios.library(), sc);
        InputSample s = new InputSample(0, 1.5, 1.1, Map.of("Cu2+", 0.9), Map.of("Cu2+/Cu", 10.0));
        InputSample.Perturbed p = s.apply(sc, chemistry);
        assertEquals(75e-6, p.scenario().cell().agitation().diffusionLayerM(), 1e-18);
        assertTrue(p.scenario().reactionOverrides().isEmpty(), "overrides live in the chemistry now");
        ElectrodeReaction cu = p.library().findReaction("Cu2+/Cu").orElseThrow();
        assertEquals(30.0, cu.kinetics().i0APerM2(), 1e-12);
        double d0 = chemistry.findSpecies("Cu2+").orElseThrow().diffusionM2PerS();
        assertEquals(0.9 * d0, p.library().findSpecies("Cu2+").orElseThrow().diffusionM2PerS(), 1e-24);
        // the conductivity model is linear in the limiting ionic conductivities (docs/conductivity.md), so a
        // common factor on them is the same factor on the bath's conductivity
        Map<String, Double> comp = sc.electrolyte().compositionMolPerM3();
        double k0 = Conductivity.of(chemistry, comp, 298.15);
        assertEquals(1.1 * k0, Conductivity.of(p.library(), comp, 298.15), 1e-12 * k0);
    }

    @Test
    void aPinnedConductivityIsScaledInsteadOfTheIons() {
        Scenario base = StudyScenarios.copperBatch(1e-3, 0.01, 50e-6, 100, 1.0, 3600, 60);
        var e = base.electrolyte();
        Scenario sc = base.withElectrolyte(new org.cellwright.cell.Electrolyte(e.volumeM3(), e.temperatureK(),
                e.compositionMolPerM3(), 20.0));
        ChemLibrary chemistry = ScenarioChemistry.apply(StudyScenarios.library(), sc);
        InputSample.Perturbed p = new InputSample(0, 1, 0.97, Map.of(), Map.of()).apply(sc, chemistry);
        assertEquals(19.4, p.scenario().electrolyte().conductivitySPerM(), 1e-12);
        assertEquals(chemistry.findSpecies("H+").orElseThrow().conductivitySM2PerMol(),
                p.library().findSpecies("H+").orElseThrow().conductivitySM2PerMol(), 0.0);
    }
}
