package org.cellwright.sim.ode;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * Invented stiff mass-action case of the engine's kind: a trace oxidant A in a bath is scavenged by a reductant
 * B dosed at a constant rate, A + B -&gt; C with k = 1e6 L/(mol s) = 1e3 m3/(mol s), while A is also lost slowly by
 * a first-order path A -&gt; D with k2 = 1e-4 1/s (time constant 2.8 h). State (mol/m3): A, B, C, D.
 *
 * <p>The fast reaction keeps B in a quasi-steady state B ~ F/(k A) of order 1e-7 mol/m3 while A decays over
 * hours: the Jacobian has an eigenvalue near -k A (about -50 to -14 1/s) beside -k2 = -1e-4 1/s, a stiffness ratio
 * above 1e5. Exact invariants: A + C + D and B + C - F t are constant. From A - B, which obeys
 * d(A - B)/dt = -k2 (A - B) - F - k2 B, a closed form follows when the small term k2 B is dropped (see
 * {@link #approximateAMinusB(double)}).
 */
class ScavengerBath implements FirstOrderDifferentialEquations {

    /** Rate constant of A + B -> C (m3/(mol s)) = 1e6 L/(mol s). */
    static final double K = 1.0e3;
    /** First-order loss of A (1/s). */
    static final double K2 = 1.0e-4;
    /** Dosing rate of B (mol/(m3 s)). */
    static final double FEED = 2.0e-6;
    /** Initial state (mol/m3): 0.1 mmol/L of A, 0.05 mmol/L of B. */
    static final double[] INITIAL = {0.1, 0.05, 0.0, 0.0};

    int calls;

    @Override
    public int getDimension() {
        return 4;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        calls++;
        double fast = K * y[0] * y[1];
        double slow = K2 * y[0];
        yDot[0] = -fast - slow;
        yDot[1] = FEED - fast;
        yDot[2] = fast;
        yDot[3] = slow;
    }

    /**
     * Closed-form solution of d(A - B)/dt = -k2 (A - B) - F, i.e. with the term -k2 B dropped. Its error is at
     * most k2 times the integral of B over the run: the initial second-order transient contributes
     * ln(A0 / (A0 - B0)) / k = 6.9e-4 mol s/m3, the quasi-steady B (at most 1.5e-7 mol/m3) over 7200 s at most
     * 1.1e-3, so the error stays below 1e-4 * 1.8e-3 = 1.8e-7 mol/m3, i.e. 1.3e-5 of A - B at two hours.
     */
    static double approximateAMinusB(double t) {
        double u0 = INITIAL[0] - INITIAL[1];
        double q = FEED / K2;
        return (u0 + q) * Math.exp(-K2 * t) - q;
    }
}
