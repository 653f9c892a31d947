package org.cellwright.sim.deposit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The engine's tip model reduces to the published formulas in their limits, and behaves as dendrites do:
 * faster the higher the tip stands in the diffusion layer, fastest outside it, levelling far from the
 * limiting current.
 */
class TipGrowthTest {

    private static final double F = 96485.33212331001;
    private static final double VM_SN = 0.11871 / 7287;
    private static final double D = 0.75e-9;
    private static final double C0 = 200;
    private static final double DELTA = 100e-6;

    private static TipSupply supply(double surfaceRatio, double kinetic, double radius, double curvature) {
        return new TipSupply(2, VM_SN, D, C0, DELTA, surfaceRatio, kinetic, radius, curvature, 5e-6);
    }

    @Test
    void outsideTheLayerTheTipIsDiggleDespicBockrisActivationControlled() {
        // source: Diggle, Despic & Bockris (1969), reference sheet section 8 formula 3: v = (V_m/nF) i_k /
        // (1 + i_k r / (n F D c0)); the model's tip above the layer sees the bulk and no curvature here (factor 1).
        // An algebraic identity: to round-off.
        for (double ik : new double[] {10, 1e3, 1e5, 1e7}) {
            TipSupply s = supply(0.3, ik, 1e-6, 1.0);
            double v = TipGrowth.velocity(TipGrowth.tipCurrentDensity(s, 2 * DELTA), VM_SN, 2);
            double expected = TipGrowth.activationVelocity(ik, 2, 1e-6, D, C0, VM_SN);
            assertEquals(expected, v, expected * 1e-12, "i_k = " + ik);
        }
    }

    @Test
    void atTheLimitAFastTipGrowsBySphericalDiffusionInTheLinearLayer() {
        // source: Barton & Bockris's spherical diffusion to the tip (formula 2 with fast kinetics, no curvature),
        // at the concentration c0 h / delta the flat's linear Nernst layer offers at height h when the flat works
        // at its limit: dh/dt = V_m D c0 h / (delta r). Kinetics 1e30 A/m2 leave a relative error of 1e-20.
        double r = 1e-6;
        TipSupply s = supply(0, 1e30, r, 1.0);
        for (double h : new double[] {5e-6, 20e-6, 80e-6}) {
            double expected = VM_SN * D * C0 * h / (DELTA * r);
            assertEquals(expected, TipGrowth.heightRate(s, h), expected * 1e-9, "h = " + h);
        }
    }

    @Test
    void belowTheLimitAKineticTipShowsDespicPopovDeltaSquaredAmplification() {
        // source: Despic & Popov's amplification (reference sheet section 8 formula 4) generalised to a flat
        // cathode at rho = i/iL: a kinetically limited tip at height h gains dh/dt = V_m D c0 h rho^2 /
        // (delta^2 (1 - rho)) (derived in TipGrowth's documentation). The limit is that of a tip whose own
        // spherical supply is unlimited (r -> 0, no curvature): at r = 1 nm the tip current departs from it by
        // i_k r / (n F D c0) = 1e-5, which dh/dt (a difference) magnifies by local / (rho h / delta) = 11;
        // tolerance 0.1 %.
        double rho = 0.5;
        double il = 2 * F * D * C0 / DELTA;
        double ik = rho * il / (1 - rho);
        double r = 1e-9;
        TipSupply s = supply(1 - rho, ik, r, 1.0);
        double h = 10e-6;
        double expected = VM_SN * D * C0 * h * rho * rho / (DELTA * DELTA * (1 - rho));
        assertEquals(expected, TipGrowth.heightRate(s, h), expected * 1e-3);
        // delta-squared: halving the layer at the same rho speeds growth four times (h kept well inside)
        TipSupply thin = new TipSupply(2, VM_SN, D, C0, DELTA / 2, 1 - rho, 2 * ik, r, 1.0, 5e-6);
        assertEquals(4 * expected, TipGrowth.heightRate(thin, h), 4 * expected * 2e-3);
    }

    @Test
    void theTipGrowsFasterTheHigherItStandsAndFastestOnceOutOfTheLayer() {
        TipSupply s = supply(0.05, 1e4, 1e-6, TipGrowth.curvatureFactor(1.0, 2, VM_SN, 1e-6, 298.15));
        double low = TipGrowth.heightRate(s, 10e-6);
        double mid = TipGrowth.heightRate(s, 50e-6);
        double out = TipGrowth.heightRate(s, 2 * DELTA);
        assertTrue(low > 0 && mid > low && out > mid, low + " < " + mid + " < " + out);
        assertEquals(out, TipGrowth.heightRate(s, 50 * DELTA), out * 1e-12, "constant speed in the bulk");
    }

    @Test
    void farFromTheLimitAProtrusionLevelsDownToItsInitialHeight() {
        // a flat at a tenth of its limit: the tip's own spherical depletion and curvature outweigh the little
        // extra concentration it reaches, so it grows slower than the flat
        double il = 2 * F * D * C0 / DELTA;
        double rho = 0.1;
        TipSupply s = supply(1 - rho, rho * il / (1 - rho), 1e-6, TipGrowth.curvatureFactor(1.0, 2, VM_SN, 1e-6, 298.15));
        assertTrue(TipGrowth.heightRate(s, 6e-6) < 0);
        assertEquals(0, TipGrowth.heightRate(s, 5e-6), 0, "no levelling below the initial protrusion");
    }

    @Test
    void curvatureSlowsTheTipByTheGibbsThomsonShift() {
        // source: Gibbs-Thomson, dE = 2 gamma V_m / (n F r) (Barton & Bockris 1962): tin, r = 10 nm, gamma =
        // 1 J/m2: dE = 2 x 1.629e-5 / (2 F 1e-8) = 16.9 mV; with alpha_c = 1 the kinetics slow by exp(-F dE/RT)
        double shift = TipGrowth.gibbsThomsonShiftV(1.0, VM_SN, 2, 1e-8);
        assertEquals(2 * VM_SN / (2 * F * 1e-8), shift, 1e-15);
        assertEquals(0.01688, shift, 1e-5);
        assertEquals(Math.exp(-F * shift / (8.314462618153241 * 298.15)),
                TipGrowth.curvatureFactor(1.0, 2, VM_SN, 1e-8, 298.15), 1e-12);
    }
}
