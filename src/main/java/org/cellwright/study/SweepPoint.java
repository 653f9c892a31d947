package org.cellwright.study;

import java.util.Objects;

import org.cellwright.cell.Scenario;
import org.cellwright.sim.RunSummary;

/**
 * The outcome of one sweep point.
 *
 * @param point the grid point
 * @param status how it went
 * @param scenario the point's scenario (to run it again with its trace, e.g. when the user clicks its cell),
 *     or null when the values made it invalid or it was not run
 * @param summary the run's figures, or null unless the status is {@link Status#OK}
 * @param message why the point failed, in plain words, or null when it ran
 */
public record SweepPoint(GridPoint point, Status status, Scenario scenario, RunSummary summary, String message) {

    /** How a point went. */
    public enum Status {
        /** The run finished; the summary holds its figures. */
        OK,
        /** The point's values make the scenario invalid, or the engine refused it (bad input). */
        INVALID,
        /** The engine failed on this point (an internal failure; the other points are unaffected). */
        FAILED,
        /** The sweep was cancelled before this point ran. */
        NOT_RUN
    }

    public SweepPoint {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(status, "status");
        if ((status == Status.OK) != (summary != null)) {
            throw new IllegalArgumentException("a point has a summary exactly when it ran: " + status);
        }
    }

    /**
     * @param figure a summary figure
     * @return its value at this point in SI, NaN when the point did not run or has no such value
     */
    public double si(SummaryFigure figure) {
        return summary == null ? Double.NaN : figure.si(summary);
    }
}
