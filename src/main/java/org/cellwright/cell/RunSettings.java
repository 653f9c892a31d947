package org.cellwright.cell;

import java.util.List;

/**
 * How long to run and what to record.
 *
 * @param durationS run duration (s), > 0
 * @param outputIntervalS interval of the recorded time series (s), > 0
 * @param stops conditions that end the run early
 * @param targetMetal the metal the run is for (symbol), or null for the default: the depositable metal
 *     whose ion is most concentrated
 */
public record RunSettings(double durationS, double outputIntervalS, List<StopCondition> stops,
                          String targetMetal) {

    public RunSettings {
        Checks.positive("run.duration", durationS, "s");
        Checks.positive("run.output_interval", outputIntervalS, "s");
        stops = List.copyOf(stops);
    }

    /** @return true when a dendrite short should end the run */
    public boolean stopsOnShort() {
        return stops.stream().anyMatch(s -> s instanceof StopCondition.ShortCircuit);
    }

    /** @return a copy with another duration (s) */
    public RunSettings withDuration(double s) {
        return new RunSettings(s, outputIntervalS, stops, targetMetal);
    }
}
