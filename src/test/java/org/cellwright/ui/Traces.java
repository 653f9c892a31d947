package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunEvent;
import org.cellwright.sim.TracePoint;

/** Made-up traces for the playback tests: points every {@code stepS} seconds, values that name their time. */
final class Traces {

    private Traces() {
    }

    /**
     * @param n number of points
     * @param stepS spacing (s)
     * @return points at 0, stepS, 2 stepS ...; the current (A) equals the point's index
     */
    static List<TracePoint> every(int n, double stepS) {
        List<TracePoint> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(point(i * stepS, i));
        }
        return out;
    }

    static TracePoint point(double t, double currentA) {
        InstantState s = new InstantState(t, currentA, 2.0, -0.2, 1.8, 1.5, 0.2, -0.1, 0.15, 0.02, 0.03,
                new double[] {-currentA}, new double[] {currentA}, new double[] {100 - t / 100, 50}, 298.15, 20.0,
                0.0, 0.9, 0.3, false, 0.0);
        return new TracePoint(s, new double[] {t * 1e-6}, currentA * t, 2.0 * currentA * t, 0.9);
    }

    static RunEvent event(double t) {
        return new RunEvent(t, RunEvent.Kind.SCHEDULE_STEP, "At " + t + " s something happens.");
    }
}
