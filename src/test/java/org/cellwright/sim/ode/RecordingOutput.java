package org.cellwright.sim.ode;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;

/** Records the fixed-interval output of a {@code StepNormalizer}: times and copies of the states. */
final class RecordingOutput implements FixedStepHandler {

    final List<Double> times = new ArrayList<>();
    final List<double[]> states = new ArrayList<>();

    @Override
    public void init(double t0, double[] y0, double t) {
        times.clear();
        states.clear();
    }

    @Override
    public void handleStep(double t, double[] y, double[] yDot, boolean isLast) {
        times.add(t);
        states.add(y.clone());
    }
}
