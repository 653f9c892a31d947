package org.cellwright.sim;

import java.util.function.BiConsumer;

import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Samples the integrator's steps at a fixed output interval, independent of the internal step, using the
 * integrator's dense output. Works across several integration segments (schedule breakpoints) without
 * duplicating points.
 */
final class OutputSampler implements StepHandler {

    private final double interval;
    private final BiConsumer<Double, double[]> sink;
    private long next;

    /**
     * @param intervalS output interval (s)
     * @param sink receives (time, state) at 0, intervalS, 2 intervalS, ...
     */
    OutputSampler(double intervalS, BiConsumer<Double, double[]> sink) {
        this.interval = intervalS;
        this.sink = sink;
    }

    /** @return the time of the last point sent (s), or -1 when none */
    double lastSentS() {
        return next == 0 ? -1 : (next - 1) * interval;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        if (next == 0 && t0 <= 0) {
            sink.accept(0.0, y0.clone());
            next = 1;
        }
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
        double t1 = interpolator.getCurrentTime();
        while (next * interval <= t1 * (1 + 1e-12)) {
            double t = next * interval;
            interpolator.setInterpolatedTime(Math.min(t, t1));
            sink.accept(t, interpolator.getInterpolatedState().clone());
            next++;
        }
    }
}
