package org.cellwright.study;

import java.util.Arrays;

/**
 * The 5th, 50th and 95th percentiles of a sample, by linear interpolation between order statistics
 * (definition 7 of Hyndman &amp; Fan, Am. Stat. 50 (1996) 361: {@code h = (n - 1) p}, the default of R and
 * NumPy and Excel's PERCENTILE.INC). NaN values are left out; all NaN when nothing is left.
 *
 * @param p5 5th percentile
 * @param p50 median
 * @param p95 95th percentile
 * @param count how many values they were taken from
 */
public record Percentiles(double p5, double p50, double p95, int count) {

    /** Fewest values for which percentiles are given (our own choice: three make a spread). */
    public static final int MIN_COUNT = 3;

    /**
     * @param values a sample (not changed)
     * @return its percentiles, NaN when fewer than {@link #MIN_COUNT} values are finite
     */
    public static Percentiles of(double[] values) {
        double[] v = Arrays.stream(values).filter(Double::isFinite).sorted().toArray();
        if (v.length < MIN_COUNT) {
            return new Percentiles(Double.NaN, Double.NaN, Double.NaN, v.length);
        }
        return new Percentiles(at(v, 0.05), at(v, 0.50), at(v, 0.95), v.length);
    }

    /**
     * @param sorted finite values in ascending order, at least one
     * @param p the probability, 0 to 1
     * @return the percentile by definition 7
     */
    static double at(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
