package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.RunResult;

/**
 * A measured run log made from a run with known parameters, as a logger and an operator would have written
 * it: rows at irregular times (gaps drawn uniformly between half and one and a half times the mean), every
 * value with seeded Gaussian noise, some columns sampled only now and then (blank cells between), and a few
 * cells left blank at random. Written as CSV text with the time in minutes.
 */
final class SyntheticLog {

    /**
     * A column to write.
     *
     * @param series what to measure: its name, quantity and species (values unused)
     * @param sigma standard deviation of the noise added, in the column's unit
     * @param sampleEveryS the column holds a value only in the first row after each multiple of this time
     *     (s); 0 for every row
     * @param blankFraction share of its cells left blank at random
     */
    record Column(LogSeries series, double sigma, double sampleEveryS, double blankFraction) {
    }

    private SyntheticLog() {
    }

    static Column column(String name, LoggedQuantity q, String species, double sigma, double everyS, double blanks) {
        return new Column(new LogSeries(name, q, species, new double[0]), sigma, everyS, blanks);
    }

    /**
     * @param truth a run with the true parameters and a fine output interval
     * @param library the chemistry
     * @param columns the columns to write
     * @param meanGapS mean time between rows (s)
     * @param seed the random seed
     * @return the CSV text
     */
    static String csv(RunResult truth, ChemLibrary library, List<Column> columns, double meanGapS, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double end = truth.trace().get(truth.trace().size() - 1).timeS();
        List<Double> times = new ArrayList<>();
        double t = rnd.nextDouble() * meanGapS;
        while (t <= end) {
            times.add(t);
            t += meanGapS * (0.5 + rnd.nextDouble());
        }
        StringBuilder sb = new StringBuilder("time_min");
        List<ModelCurve> curves = new ArrayList<>();
        for (Column c : columns) {
            sb.append(',').append(c.series().column());
            curves.add(ModelCurve.of(truth, c.series(), library));
        }
        sb.append('\n');
        long[] lastSlot = new long[columns.size()];
        java.util.Arrays.fill(lastSlot, -1);
        for (double time : times) {
            sb.append(String.format(Locale.ROOT, "%.4f", time / 60));
            for (int k = 0; k < columns.size(); k++) {
                Column c = columns.get(k);
                sb.append(',');
                boolean due = true;
                if (c.sampleEveryS() > 0) {
                    long slot = (long) Math.floor(time / c.sampleEveryS());
                    due = slot != lastSlot[k];
                    lastSlot[k] = slot;
                }
                double noise = rnd.nextGaussian() * c.sigma();
                boolean blank = rnd.nextDouble() < c.blankFraction();
                if (due && !blank) {
                    double v = Math.max(0, curves.get(k).at(time) + noise);
                    sb.append(String.format(Locale.ROOT, "%.6g", v));
                }
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
