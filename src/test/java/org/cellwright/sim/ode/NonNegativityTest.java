package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

/** Components flagged non-negative never go below zero, at step ends or in the dense output. */
class NonNegativityTest {

    /**
     * Transport-limited consumption of a dissolved species c at an electrode: rate V c / (K + c) with a small
     * saturation constant K, i.e. a constant (limiting) rate until c is nearly exhausted, then a sudden stop;
     * the product p collects what is consumed. V = 1e-3 mol/(m3 s), K = 1e-6 mol/m3, c(0) = 1 mol/m3, so c is gone
     * after 1000 s. The rate uses max(c, 0), as an engine RHS must.
     */
    static final class LimitingConsumption implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return 2;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            double c = Math.max(y[0], 0.0);
            yDot[0] = -1.0e-3 * c / (1.0e-6 + c);
            yDot[1] = -yDot[0];
        }
    }

    /** Smallest value of one component seen at step ends and at ten points inside every step. */
    static final class Minimum implements StepHandler {
        private final int component;
        double value = Double.POSITIVE_INFINITY;

        Minimum(int component) {
            this.component = component;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            double t0 = interpolator.getPreviousTime();
            double t1 = interpolator.getCurrentTime();
            for (int k = 1; k <= 10; k++) {
                interpolator.setInterpolatedTime(t0 + (t1 - t0) * k / 10.0);
                value = Math.min(value, interpolator.getInterpolatedState()[component]);
            }
        }
    }

    private static final double ABS_TOL = 1.0e-6;

    private static Ros34Pw2Integrator integrator(boolean flagged, Minimum minimum) {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0e4, ABS_TOL, 1.0e-3);
        integrator.setAutonomous(true);
        if (flagged) {
            integrator.setNonNegative(0);
        }
        integrator.addStepHandler(minimum);
        return integrator;
    }

    @Test
    void withoutTheFlagTheDepletedSpeciesOvershootsBelowZero() {
        Minimum minimum = new Minimum(0);
        double[] y = {1.0, 0.0};
        integrator(false, minimum).integrate(new LimitingConsumption(), 0.0, y, 3000.0, y);
        // the error estimate cannot see this overshoot (the rate is constant until the kink), which is why the
        // flag exists: observed about -1.2e-5, twelve absolute tolerances
        assertTrue(minimum.value < -ABS_TOL, "minimum " + minimum.value);
    }

    @Test
    void withTheFlagTheSpeciesStaysNonNegativeAndMassIsKept() {
        Minimum minimum = new Minimum(0);
        Ros34Pw2Integrator integrator = integrator(true, minimum);
        double[] y = {1.0, 0.0};
        integrator.integrate(new LimitingConsumption(), 0.0, y, 3000.0, y);
        assertTrue(minimum.value >= 0.0, "minimum " + minimum.value);
        assertTrue(integrator.getStatistics().negativityRejections() > 0, integrator.getStatistics().toString());
        // source: analytic, all of c (1 mol/m3) ends in the product; the projection of small negatives to zero may
        // add at most one absolute tolerance
        assertEquals(0.0, y[0], 0.0);
        assertEquals(1.0, y[1], ABS_TOL);
    }

    @Test
    void fastDepletedReactantInTheBathStaysNonNegative() {
        // B of ScavengerBath falls from 0.05 to 1e-7 mol/m3 within 0.02 s, then sits at its quasi-steady level;
        // with these loose tolerances and no flag, B dips to about -1e-7 (observed)
        Minimum minimum = new Minimum(1);
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 7200.0, 1.0e-6, 1.0e-3);
        integrator.setAutonomous(true);
        integrator.setNonNegative(0, 1, 2, 3);
        integrator.addStepHandler(minimum);
        double[] y = ScavengerBath.INITIAL.clone();
        integrator.integrate(new ScavengerBath(), 0.0, y, 7200.0, y);
        assertTrue(minimum.value >= 0.0, "minimum of B " + minimum.value);
    }
}
