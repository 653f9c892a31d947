package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/**
 * The cathode's hydrogen kinetics are the substrate's while it is bare and the deposit metal's once the
 * deposit covers it: a stainless sheet in a tin bath evolves hydrogen on the iron line of the Tafel table
 * first, on the tin line once tinned.
 */
class CathodeCoverageTest {

    /** 10 L of bath, so that the acid stays within 1 % of 1 mol/L over the hour. */
    private static Scenario tinBath(double snGPerL, double amps) {
        return DepositScenarios.cell(DepositScenarios.tinChloride(snGPerL, 1.0, Map.of()), 0.01, "stainless",
                "graphite", 0.01, 0.03, 100e-6, amps, 3600, 10, "Sn");
    }

    /** The hydrogen overpotential (V, positive) at 500 A/m2 of hydrogen on a cathode with the given coverage. */
    static double hydrogenOverpotential(double coverage) {
        return hydrogenOverpotential("stainless", coverage);
    }

    /** The same on a bare ({@code coverage} 0) or tinned sheet of the given substrate material. */
    static double hydrogenOverpotential(String substrate, double coverage) {
        Scenario sc = DepositScenarios.cell(DepositScenarios.tinChloride(25, 1.0, Map.of()), 0.01, substrate,
                "graphite", 0.01, 0.03, 100e-6, 1.0, 3600, 10, "Sn");
        ReactionNetwork net = ReactionNetwork.of(DepositScenarios.LIB, sc);
        ReactionSlot hydrogen = net.cathodeSlots().stream().filter(s -> s.reaction().name().equals("H+/H2"))
                .findFirst().orElseThrow();
        ElectrodeKinetics k = new ElectrodeKinetics(List.of(hydrogen), -0.5);
        double[] c = new CellRates(sc, net).initialState();
        double[] km = new double[net.species().size()];
        Arrays.fill(km, 1e3);
        k.prepare(c, c, km, 298.15, coverage, null);
        double e = k.potentialFor(-500);
        return k.eEq[0] - e;
    }

    @Test
    void hydrogenFollowsTheSubstrateWhenBareAndTheDepositWhenCovered() {
        // source: Tafel constants for hydrogen in 1 N acid, eta = a + b log10(i / (1 A/cm2)) (Antropov,
        // Theoretical Electrochemistry, 1972; physics reference section 3a, from memory): iron (stainless)
        // a = 0.70 V, b = 0.12 V -> 0.544 V at 500 A/m2; tin a = 1.20 V, b = 0.13 V -> 1.031 V. In 1 mol/L H+
        // (unit activity) and with mass transfer removed; tolerance 1 mV, the rounding of a and b in the library.
        double bare = hydrogenOverpotential(0);
        double tinned = hydrogenOverpotential(1);
        assertEquals(0.70 + 0.12 * Math.log10(0.05), bare, 1e-3);
        assertEquals(1.20 + 0.13 * Math.log10(0.05), tinned, 1e-3);
        // half covered: half the area on each line, at one potential (rates add by area)
        double half = hydrogenOverpotential(0.5);
        assertTrue(half > bare && half < tinned);
        assertEquals(bare + 0.12 * Math.log10(2), half, 3e-3, "the iron half carries nearly all of it");
    }

    /**
     * Hydrogen current density (A/m2) of a sheet at potential {@code e} (V vs SHE) with the tinned share
     * {@code theta}, on the Tafel lines eta = a + b log10(i / (1 A/cm2)) of iron (a 0.70, b 0.12) and tin (a 1.20,
     * b 0.13), first order in the H+ activity {@code aH}.
     */
    private static double hydrogen(double e, double theta, double aH) {
        double iron = Math.pow(10, (-e - 0.70) / 0.12);
        double tin = Math.pow(10, (-e - 1.20) / 0.13);
        return aH * 1e4 * ((1 - theta) * iron + theta * tin);
    }

    @Test
    void aTinnedSheetPushesTheCathodeDownTowardTinsHydrogenLine() {
        // a dilute tin bath above its limiting current: hydrogen takes the rest of the current. Early the sheet
        // is bare stainless, after an hour it is tinned (coverage 1 - exp(-h / 1 um), h the mean thickness)
        RunResult r = DepositScenarios.run(tinBath(3, 2.0));
        int h = r.cathodeReactions().indexOf("H+/H2");
        int hPlus = r.speciesNames().indexOf("H+");
        InstantState early = DepositScenarios.at(r, 10).state();
        InstantState late = DepositScenarios.at(r, 3600).state();
        assertTrue(early.depositThicknessM() < 0.1e-6, "nearly bare at 10 s: " + early.depositThicknessM());
        assertTrue(late.depositThicknessM() > 5e-6, "covered at 1 h: " + late.depositThicknessM());
        for (InstantState s : List.of(early, late)) {
            double theta = 1 - Math.exp(-s.depositThicknessM() / 1e-6);
            double aH = s.concentrationsMolPerM3()[hPlus] / 1000;
            // source: the Tafel lines above (Antropov, Theoretical Electrochemistry, 1972; physics reference
            // section 3a, from memory), each on its share of the sheet at the one cathode potential. Tolerance
            // 2 % of the current (under 1 mV): the library rounds i0 to three digits, and its reaction order in
            // H+ is 1.5 rather than 1 (0.4 % here).
            // with H+'s own mass transfer through the 100 um layer, iL = F D c / delta (n = 2, 2 H+): 8.9 kA/m2
            double kinetic = hydrogen(s.cathodePotentialV(), theta, aH);
            double limit = 96485.33212331001 * 9.311e-9 / 100e-6 * s.concentrationsMolPerM3()[hPlus];
            double expected = kinetic / (1 + kinetic / limit);
            assertEquals(expected, -s.cathodeCurrentsA()[h] / 0.01, expected * 0.02, "at " + s.timeS());
        }
        // tinned, the cathode must go some 0.25 V lower for the same hydrogen current than bare stainless would:
        // even a tenth of a percent of bare steel left (6.8 um of tin) carries most of the hydrogen
        double iLate = -late.cathodeCurrentsA()[h] / 0.01;
        double bareLine = -(0.70 + 0.12 * Math.log10(iLate / 1e4));
        assertTrue(late.cathodePotentialV() < bareLine - 0.2, late.cathodePotentialV() + " vs " + bareLine);
    }
}
