package org.cellwright.study;

import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunResult;

/**
 * What a spread study gives: the nominal run, the 5/50/95 % percentiles of each summary figure over the
 * samples, and bands of the time series.
 *
 * @param nominal the run with every input at its nominal value
 * @param samples how many samples were drawn
 * @param ran how many of them ran to a result
 * @param seed the seed they were drawn with (the same seed gives the same samples)
 * @param failures why samples failed, one line each (the engine refused or failed on their inputs)
 * @param figures percentiles of each summary figure, SI units, over the samples that ran
 * @param bands bands of the time series
 * @param cancelled true when the study was cancelled (the figures then cover the samples that ran)
 * @param elapsedS wall-clock time (s)
 */
public record SpreadResult(RunResult nominal, int samples, int ran, long seed, List<String> failures,
                           Map<SummaryFigure, Percentiles> figures, SeriesBands bands, boolean cancelled,
                           double elapsedS) {

    public SpreadResult {
        failures = List.copyOf(failures);
        figures = Map.copyOf(figures);
    }
}
