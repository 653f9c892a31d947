package org.cellwright.study;

import java.util.List;
import java.util.Map;

/**
 * 5-95 % bands of a spread study's time series on the nominal run's output times, SI units: for each series
 * and time, the percentiles over the samples that were still running then. Where fewer than half of the
 * samples (or fewer than {@link Percentiles#MIN_COUNT}) reach a time, the band has NaN there.
 *
 * <p>Series keys: {@code cell_voltage} (V), {@code current} (A), {@code efficiency} (instantaneous, fraction),
 * {@code efficiency_cumulative} (fraction), {@code temperature} (K), {@code dendrite} (m), {@code c:<species>}
 * (mol/m3), {@code deposit:<metal>} (kg).
 *
 * @param timeS the output times (s)
 * @param series the bands by key
 */
public record SeriesBands(double[] timeS, Map<String, Band> series) {

    /** The series every spread study gives, besides one per species and per metal. */
    public static final List<String> FIXED = List.of("cell_voltage", "current", "efficiency", "efficiency_cumulative",
            "temperature", "dendrite");

    public SeriesBands {
        timeS = timeS.clone();
        series = Map.copyOf(series);
    }

    /**
     * One series' band.
     *
     * @param p5 5th percentile at each time
     * @param p50 median at each time
     * @param p95 95th percentile at each time
     */
    public record Band(double[] p5, double[] p50, double[] p95) {
    }

    /** @return the band of a series, or null when the study has no such series */
    public Band band(String key) {
        return series.get(key);
    }
}
