package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The shipped plating-bath scenario (scenarios/copper-plating-rundown.toml, read as a user's file) shows what
 * its notes promise: with inert anodes the copper leaves the bath and the acid rises by the electrode
 * reactions' stoichiometry; the share of the limiting current climbs as the bath runs down, so the deposit
 * goes compact, rough, dendritic; near 6 h copper reaches its limit and hydrogen takes the current.
 */
class PlatingRundownScenarioTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();
    // source: IUPAC (CIAAW 2021) standard atomic weight of copper
    private static final double CU_G_PER_MOL = 63.546;
    // source: CODATA 2018, Faraday constant (exact)
    private static final double F = 96485.33212;
    // source: CODATA 2018, molar volume of an ideal gas at 0 C and 1 atm
    private static final double STP_L_PER_MOL = 22.41396954;
    private static final double VOLUME_L = 3;
    private static final double CATHODE_M2 = 0.03;

    private static RunResult run;

    @BeforeAll
    static void runTheScenario() throws Exception {
        var sc = new ScenarioReader(LIB).read(Path.of("scenarios", "copper-plating-rundown.toml"));
        run = CellSimulation.withDefaults().run(sc, LIB, null);
    }

    private static double charge(String label) {
        return run.summary().reactionChargeC().getOrDefault(label, 0.0);
    }

    private static InstantState at(double hours) {
        return run.trace().stream().filter(p -> p.timeS() >= hours * 3600).findFirst().orElseThrow().state();
    }

    @Test
    void copperLeavesTheBathAndTheAcidRises() {
        RunSummary s = run.summary();
        assertEquals("end", s.stopReason());
        // source: conservation of mass: copper in the bath at the start (25 g/L in 3 L) = bath at the end
        // (Cu2+ and Cu+) + the deposit; no anode dissolves. Tolerance: the integrator's relative tolerance.
        double startMol = 25.0 / CU_G_PER_MOL * VOLUME_L;
        double endMol = (s.finalConcentrationMolPerM3().get("Cu2+")
                + s.finalConcentrationMolPerM3().getOrDefault("Cu+", 0.0)) / 1000 * VOLUME_L;
        double depositMol = s.depositKg().get("Cu") * 1000 / CU_G_PER_MOL;
        assertEquals(startMol, endMol + depositMol, 1e-4 * startMol);
        // the notes: Cu2+ from 25 to about 3 g/L
        double endGPerL = s.finalConcentrationMolPerM3().get("Cu2+") / 1000 * CU_G_PER_MOL;
        assertTrue(endGPerL > 2 && endGPerL < 4.5, endGPerL + " g/L");
        // source: stoichiometry of the electrode reactions: 2 H2O = O2 + 4 H+ + 4 e- makes 4 H+ per O2,
        // 2 H+ + 2 e- = H2 takes 2 H+ per H2. Tolerance: the gas volumes' rounding-free SI values, 0.5 %.
        double o2 = s.gasMol().get("O2");
        double h2 = s.gasMol().get("H2");
        double acidEnd = 0.8 + (4 * o2 - 2 * h2) / VOLUME_L;
        assertEquals(acidEnd, s.finalConcentrationMolPerM3().get("H+") / 1000, 0.005 * acidEnd);
        assertTrue(acidEnd > 1.7 * 0.8, "the acid nearly doubles: " + acidEnd);
        // source: Faraday's law, the oxygen from the anode's charge: n(O2) = Q / (4 F)
        assertEquals(charge("anode:O2/H2O") / (4 * F), o2, 1e-3 * o2);
        assertTrue(o2 * STP_L_PER_MOL > 10, "litres of oxygen over the shift");
    }

    /**
     * The share of copper's limiting current follows the Nernst diffusion layer: i_L = n F D c / delta, with
     * delta 70 um (the "sparged" preset) and D of Cu2+ 0.714e-9 m2/s at 25 C raised with the warming bath by
     * Stokes-Einstein (D proportional to T / viscosity).
     */
    @Test
    void theLimitRatioClimbsAsTheBathRunsDown() {
        int cu = run.speciesNames().indexOf("Cu2+");
        for (double h : new double[] {1, 3, 5}) {
            InstantState s = at(h);
            double tC = s.temperatureK() - 273.15;
            // source: CRC Handbook, 'Viscosity of water' (from memory): 0.8900 mPa s at 25 C, 0.7972 at 30 C;
            // linear between them (the bath stays within 25 to 31 C)
            double viscosity = 0.8900 + (tC - 25) / 5 * (0.7972 - 0.8900);
            // source: CRC Handbook, 92nd ed., ionic diffusion at infinite dilution: Cu2+ 0.714e-9 m2/s
            double d = 0.714e-9 * (s.temperatureK() / 298.15) * (0.8900 / viscosity);
            // source: Bard and Faulkner, Electrochemical Methods, 2nd ed., eq. 1.4.10 (limiting current)
            double limit = 2 * F * d * s.concentrationsMolPerM3()[cu] / 70e-6;
            double copperCurrent = s.currentA() * s.targetEfficiency() / CATHODE_M2;
            // tolerance: the viscosity read linearly between two table rows (under 1 %) and the limit ratio
            // counted from the net deposition
            assertEquals(copperCurrent / limit, s.targetLimitRatio(), 0.04 * s.targetLimitRatio(), h + " h");
        }
        assertTrue(at(1).targetLimitRatio() < at(3).targetLimitRatio());
        assertTrue(at(3).targetLimitRatio() < at(5).targetLimitRatio());
    }

    /**
     * Copper is of Winand's "intermediate" class: compact below 0.35 of its limit, rough to 0.6, dendritic to
     * 0.95, powdery at the limit.
     */
    @Test
    void theDepositGoesCompactRoughDendriticPowdery() {
        // source: Winand, Hydrometallurgy 29 (1992) 567 (from memory), the bands of docs/deposit-model.md
        assertEquals("compact", at(0.5).morphology());
        assertEquals("rough", at(2).morphology());
        assertEquals("dendritic", at(5).morphology());
        assertEquals("powdery", at(7).morphology());
        List<String> order = List.of("compact", "rough", "dendritic", "powdery");
        int worst = 0;
        for (TracePoint p : run.trace().subList(1, run.trace().size())) {
            int k = order.indexOf(p.state().morphology());
            assertTrue(k >= worst, "the deposit never improves as the bath runs down, at " + p.timeS());
            worst = k;
        }
        assertEquals("powdery", run.summary().morphologyFinal());
    }

    @Test
    void efficiencyHoldsUntilTheLimitThenHydrogenTakesOver() {
        // common practice: acid copper sulfate baths plate at 95 to 100 % cathode efficiency (from memory,
        // Schlesinger and Paunovic, Modern Electroplating, 5th ed.)
        for (double h : new double[] {0.5, 2, 4, 5.5}) {
            assertTrue(at(h).targetEfficiency() > 0.94, h + " h: " + at(h).targetEfficiency());
        }
        RunEvent limit = run.events().stream().filter(e -> e.message().contains("reaches 90 % of its limit"))
                .findFirst().orElseThrow();
        assertTrue(limit.timeS() > 5 * 3600 && limit.timeS() < 6.5 * 3600, "limit at " + limit.timeS());
        InstantState end = run.trace().get(run.trace().size() - 1).state();
        assertTrue(end.targetEfficiency() < 0.5, "under half by the end: " + end.targetEfficiency());
        assertTrue(-charge("cathode:H+/H2") > 0.05 * run.summary().chargeC(), "hydrogen takes the rest");
        assertTrue(end.cellVoltageV() > at(5).cellVoltageV() + 0.3, "the cell voltage jumps");
        assertTrue(run.summary().currentEfficiency() > 0.85 && run.summary().currentEfficiency() < 0.95);
    }
}
