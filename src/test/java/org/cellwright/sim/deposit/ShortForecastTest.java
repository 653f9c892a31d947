package org.cellwright.sim.deposit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The forecast of a short integrates the tip model exactly where it has a closed form. */
class ShortForecastTest {

    private static final double VM = 0.11871 / 7287;
    private static final double D = 0.75e-9;
    private static final double C0 = 200;
    private static final double DELTA = 100e-6;
    private static final double R = 1e-6;

    @Test
    void atTheLimitTheTipGrowsExponentiallyInTheLayerThenSteadily() {
        // fast kinetics, flat at its limit (surface ratio 0, no flat growth): dh/dt = V_m D c0 h / (delta r) inside
        // the layer, V_m D c0 / r outside (spherical diffusion at the bulk concentration). Closed form:
        // t = (delta r / (V_m D c0)) ln(delta / h0) + (gap - delta) r / (V_m D c0).
        TipSupply s = new TipSupply(2, VM, D, C0, DELTA, 0, 1e30, R, 1.0, 5e-6);
        double k = VM * D * C0 / (DELTA * R);
        double h0 = 5e-6;
        double gap = 0.010;
        double expected = Math.log(DELTA / h0) / k + (gap - DELTA) * R / (VM * D * C0);
        // source: the closed form above; the 1 % midpoint steps in h integrate an exponential to 1e-5 relative
        assertEquals(expected, ShortForecast.timeToShortS(s, h0, 0, gap), expected * 1e-4);
    }

    @Test
    void aTipThatDoesNotGrowForecastsNoShort() {
        TipSupply s = new TipSupply(2, VM, D, C0, DELTA, 0.95, 100, R, 1.0, 5e-6);
        assertTrue(Double.isInfinite(ShortForecast.timeToShortS(s, 5e-6, 0, 0.01)));
        assertEquals(0, ShortForecast.timeToShortS(s, 0.02, 0, 0.01), 0, "already across");
    }

    @Test
    void theFlatDepositClosesTheGapToo() {
        // outside the layer both advance steadily: t = (gap - T - h) / (v_tip + v_flat)
        TipSupply s = new TipSupply(2, VM, D, C0, DELTA, 0.2, 500, R, 1.0, 5e-6);
        double h = 2 * DELTA;
        double vTip = TipGrowth.heightRate(s, h);
        double vFlat = TipGrowth.velocity(TipGrowth.flatCurrentDensity(s), VM, 2);
        double expected = (0.005 - 1e-4 - h) / (vTip + vFlat);
        assertEquals(expected, ShortForecast.timeToShortS(s, h, 1e-4, 0.005), expected * 1e-12);
    }
}
