package org.cellwright.sim.ode;

/** Evaluation of f(t, y) on the complete state, counted by the integrator that supplies it. */
@FunctionalInterface
interface RightHandSide {

    /** Writes f(t, y) into yDot; y is not modified. */
    void evaluate(double t, double[] y, double[] yDot);
}
