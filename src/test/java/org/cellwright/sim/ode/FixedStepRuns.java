package org.cellwright.sim.ode;

import java.util.function.DoubleFunction;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Runs the integrator with a constant step (tolerances so loose that every step passes, maximum step = h) and
 * measures the error at the end and at the middle of every step against an exact solution.
 */
final class FixedStepRuns {

    /** Largest absolute errors of one run. */
    record Errors(double atEnd, double atMidSteps) {
    }

    private FixedStepRuns() {
    }

    static Errors run(FirstOrderDifferentialEquations equations, double[] y0, double end, int steps,
                      DoubleFunction<double[]> exact) {
        double h = end / steps;
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, h, 1.0e10, 1.0e10);
        integrator.setInitialStepSize(h);
        double[] midError = {0.0};
        integrator.addStepHandler(new StepHandler() {
            @Override
            public void init(double t0, double[] y, double t) {
            }

            @Override
            public void handleStep(StepInterpolator interpolator, boolean isLast) {
                double tm = 0.5 * (interpolator.getPreviousTime() + interpolator.getCurrentTime());
                interpolator.setInterpolatedTime(tm);
                double[] y = interpolator.getInterpolatedState();
                double[] expected = exact.apply(tm);
                for (int i = 0; i < y.length; i++) {
                    midError[0] = Math.max(midError[0], Math.abs(y[i] - expected[i]));
                }
            }
        });
        double[] y = y0.clone();
        integrator.integrate(equations, 0.0, y, end, y);
        double[] expected = exact.apply(end);
        double endError = 0.0;
        for (int i = 0; i < y.length; i++) {
            endError = Math.max(endError, Math.abs(y[i] - expected[i]));
        }
        return new Errors(endError, midError[0]);
    }

    /** Observed order log2(e(h) / e(h/2)). */
    static double order(double coarse, double fine) {
        return Math.log(coarse / fine) / Math.log(2.0);
    }
}
