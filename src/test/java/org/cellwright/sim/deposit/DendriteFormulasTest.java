package org.cellwright.sim.deposit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The published dendrite formulas against the worked numbers of the physics reference sheet (section 14,
 * reserve cases R4 to R6, derived there from section 8). Each tolerance is the rounding of the printed figure.
 */
class DendriteFormulasTest {

    private static final double F = 96485.33212331001;
    /** Copper, the reference sheet's example: V_m = 63.546 / 8.96 cm3/mol = 7.09e-6 m3/mol. */
    private static final double VM_CU = 7.09e-6;
    private static final double D_CU = 7.14e-10;

    @Test
    void bartonBockrisFastestTipMatchesTheWorkedExample() {
        // source: physics reference R6 (Barton & Bockris, Proc. R. Soc. A 268 (1962) 485, linearised): Cu,
        // c0 = 0.1 M, D = 7.14e-10 m2/s, gamma = 1 J/m2, eta = 10 mV -> v_max = 1.34e-5 m/s, r_opt = 14.7 nm.
        // Tolerance: the printed three digits (0.4 %).
        assertEquals(1.34e-5, TipGrowth.maxVelocity(2, D_CU, 100, 0.010, 1.0, 298.15), 1.34e-5 * 0.004);
        assertEquals(14.7e-9, TipGrowth.optimumRadiusM(1.0, VM_CU, 2, 0.010), 14.7e-9 * 0.004);
    }

    @Test
    void linearisedOptimumIsTheSmallOverpotentialLimitOfTheFullTipFormula() {
        // source: Barton & Bockris's tip current (reference sheet section 8, formula 2); its linearisation
        // holds while n F eta / R T << 1. At eta = 0.1 mV that is 0.008, so the numerical optimum of the full
        // formula must agree with r_opt and v_max to about that relative size (1 % allowed).
        double eta = 1e-4;
        double best = 0;
        double bestR = 0;
        for (double r = 1e-8; r < 1e-5; r *= 1.001) {
            double v = TipGrowth.velocity(TipGrowth.bartonBockrisCurrent(2, D_CU, 100, r, eta, 1.0, VM_CU, 298.15),
                    VM_CU, 2);
            if (v > best) {
                best = v;
                bestR = r;
            }
        }
        assertEquals(TipGrowth.optimumRadiusM(1.0, VM_CU, 2, eta), bestR, bestR * 0.01);
        assertEquals(TipGrowth.maxVelocity(2, D_CU, 100, eta, 1.0, 298.15), best, best * 0.01);
        // below the critical radius 2 gamma V_m / (n F eta) the tip dissolves (curvature wins)
        double critical = TipGrowth.optimumRadiusM(1.0, VM_CU, 2, eta) / 2;
        assertTrue(TipGrowth.bartonBockrisCurrent(2, D_CU, 100, critical * 0.9, eta, 1.0, VM_CU, 298.15) < 0);
        assertTrue(TipGrowth.bartonBockrisCurrent(2, D_CU, 100, critical * 1.1, eta, 1.0, VM_CU, 298.15) > 0);
    }

    @Test
    void despicPopovInductionTimeMatchesTheWorkedExample() {
        // source: physics reference R5 (Despic-Popov amplification, section 8 formula 4): delta 100 um,
        // h0 0.1 um, V_m 7.09e-6 m3/mol, D 7.14e-10 m2/s, c0 100 mol/m3 -> t_i = 1.365e5 s; with
        // delta = 50 um, 8.5 h. Tolerance: the printed digits (0.05 %; 0.6 % for 8.5 h).
        assertEquals(1.365e5, ProtrusionAmplification.inductionTimeS(100e-6, 0.1e-6, VM_CU, D_CU, 100), 1.365e5 * 5e-4);
        assertEquals(8.5 * 3600, ProtrusionAmplification.inductionTimeS(50e-6, 0.1e-6, VM_CU, D_CU, 100), 8.5 * 3600 * 0.006);
        // the growth law it integrates: V_m D c0 [1/(delta - h) - 1/delta] -> V_m D c0 h / delta^2 for small h
        double small = ProtrusionAmplification.growthRate(100e-6, 1e-9, VM_CU, D_CU, 100);
        assertEquals(VM_CU * D_CU * 100 * 1e-9 / 1e-8, small, small * 1e-4);
    }

    @Test
    void chazalvielFrontMatchesTheWorkedExample() {
        // source: physics reference R4 (Chazalviel, Phys. Rev. A 42 (1990) 7355; section 8 formula 5): 0.05 M
        // CuSO4 unsupported, J = 100 A/m2, t_a = 0.6, D_s = 0.855e-9 m2/s -> tau_s = 17.4 s, v = 6.22 um/s,
        // a 10 mm gap shorts at 17 s + 1608 s (formula 6), J*(10 mm) = 2.75 A/m2. Tolerance: printed digits.
        double tau = SpaceChargeFront.sandTimeS(0.855e-9, 2, 50, 100, 0.6);
        double v = SpaceChargeFront.frontVelocity(100, 0.6, 2, 50);
        assertEquals(17.4, tau, 17.4 * 0.004);
        assertEquals(6.22e-6, v, 6.22e-6 * 0.002);
        assertEquals(2.75, SpaceChargeFront.criticalCurrentDensity(2, 50, 0.855e-9, 0.6, 0.010), 2.75 * 0.002);
        assertEquals(17.4 + 1608, ShortForecast.shortCircuitTimeS(tau, 0.010, 0, v), 2);
    }

    @Test
    void faradaicSpeedOfAFlatDeposit() {
        // source: formula 1, v = i V_m / (n F): copper at 100 A/m2 grows 100 x 7.09e-6 / (2 F) = 3.674 nm/s
        // (Faraday's law with the CRC density of copper, 8.96 g/cm3)
        assertEquals(100 * VM_CU / (2 * F), TipGrowth.velocity(100, VM_CU, 2), 1e-20);
        assertEquals(3.674e-9, TipGrowth.velocity(100, VM_CU, 2), 1e-12);
    }
}
