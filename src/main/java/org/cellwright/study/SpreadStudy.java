package org.cellwright.study;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.cellwright.sim.ScenarioChemistry;
import org.cellwright.sim.TracePoint;

/**
 * A spread (Monte Carlo) study: runs the scenario many times with its uncertain inputs drawn from their
 * spreads ({@link UncertainInput}), in parallel, and gives the 5/50/95 % percentiles of each summary figure
 * and 5-95 % bands of the time series around the nominal run.
 *
 * <p>Samples are drawn in the calling thread from one seeded generator (each sample from its own split of
 * it), so a seed gives the same samples whatever the number of threads. For the window: call {@link #run}
 * on a worker thread with a progress callback and a {@link Cancellation}; the result holds the nominal run for
 * the plots and the bands to draw under it ({@code chart.SpreadBands}).
 */
public final class SpreadStudy {

    /** Most samples accepted (our own limit: about a minute of runs on two cores). */
    public static final int MAX_SAMPLES = 5000;

    private final ChemLibrary library;
    private final int threads;

    /**
     * @param library the chemistry (nominal values)
     * @param threads runs in parallel
     */
    public SpreadStudy(ChemLibrary library, int threads) {
        this.library = Objects.requireNonNull(library, "library");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        this.threads = threads;
    }

    /** What one sample leaves behind: its figures and its series on the nominal output times. */
    private record SampleRun(RunSummary summary, double[][] series, String failure) {
    }

    /**
     * @param sc the scenario
     * @param samples how many samples, 1 to {@link #MAX_SAMPLES}
     * @param seed the random seed
     * @param progress told after each sample (from worker threads)
     * @param cancel set it to stop; the result then covers the samples that ran
     * @return the percentiles and bands
     * @throws IllegalArgumentException when the nominal scenario cannot run
     */
    public SpreadResult run(Scenario sc, int samples, long seed, StudyProgress progress, Cancellation cancel) {
        if (samples < 1 || samples > MAX_SAMPLES) {
            throw new IllegalArgumentException("the number of samples must be from 1 to " + MAX_SAMPLES + ", got "
                    + samples);
        }
        long start = System.nanoTime();
        RunResult nominal = CellSimulation.withDefaults().run(sc, library, null);
        ChemLibrary chemistry = ScenarioChemistry.apply(library, sc);
        boolean pinned = sc.electrolyte().conductivitySPerM() != null;
        SplittableRandom root = new SplittableRandom(seed);
        List<InputSample> draws = new ArrayList<>(samples);
        for (int i = 0; i < samples; i++) {
            draws.add(InputSample.draw(i, root.split(), chemistry, pinned));
        }
        List<String> keys = keys(nominal);
        double[] grid = nominal.trace().stream().mapToDouble(TracePoint::timeS).toArray();
        List<SampleRun> runs = ParallelRuns.run(samples, threads, i -> runSample(sc, chemistry, draws.get(i), keys, grid),
                i -> null, progress, cancel);
        List<String> failures = new ArrayList<>();
        List<SampleRun> ok = new ArrayList<>();
        for (int i = 0; i < runs.size(); i++) {
            SampleRun r = runs.get(i);
            if (r != null && r.failure() != null) {
                failures.add("sample " + (i + 1) + ": " + r.failure());
            } else if (r != null) {
                ok.add(r);
            }
        }
        Map<SummaryFigure, Percentiles> figures = new EnumMap<>(SummaryFigure.class);
        for (SummaryFigure f : SummaryFigure.values()) {
            figures.put(f, Percentiles.of(ok.stream().mapToDouble(r -> f.si(r.summary())).toArray()));
        }
        return new SpreadResult(nominal, samples, ok.size(), seed, failures, figures, bands(keys, grid, ok),
                cancel.isCancelled(), (System.nanoTime() - start) / 1e9);
    }

    private SampleRun runSample(Scenario sc, ChemLibrary chemistry, InputSample draw, List<String> keys,
                                double[] grid) {
        try {
            InputSample.Perturbed p = draw.apply(sc, chemistry);
            RunResult r = CellSimulation.withDefaults().run(p.scenario(), p.library(), null);
            return new SampleRun(r.summary(), onGrid(r, keys, grid), null);
        } catch (RuntimeException e) {
            String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            return new SampleRun(null, null, m.replaceAll("\\s*\\R\\s*", "; "));
        }
    }

    /** @return the series keys of a run, in a fixed order */
    static List<String> keys(RunResult r) {
        List<String> keys = new ArrayList<>(SeriesBands.FIXED);
        r.speciesNames().forEach(s -> keys.add("c:" + s));
        r.metalSymbols().forEach(m -> keys.add("deposit:" + m));
        return keys;
    }

    /** A run's series interpolated onto the grid; NaN after the run ended. */
    static double[][] onGrid(RunResult r, List<String> keys, double[] grid) {
        List<TracePoint> trace = r.trace();
        double[][] out = new double[keys.size()][grid.length];
        double[] values = new double[keys.size()];
        double[] before = new double[keys.size()];
        int j = 0;
        for (int g = 0; g < grid.length; g++) {
            double t = grid[g];
            while (j < trace.size() - 1 && trace.get(j).timeS() < t) {
                j++;
            }
            TracePoint hi = trace.get(j);
            if (t > hi.timeS() + 1e-9 * Math.max(1, t)) {
                for (double[] row : out) {
                    row[g] = Double.NaN;
                }
                continue;
            }
            TracePoint lo = j > 0 ? trace.get(j - 1) : hi;
            values(r, hi, keys, values);
            values(r, lo, keys, before);
            double w = hi.timeS() == lo.timeS() ? 1 : (t - lo.timeS()) / (hi.timeS() - lo.timeS());
            for (int k = 0; k < keys.size(); k++) {
                out[k][g] = before[k] + w * (values[k] - before[k]);
            }
        }
        return out;
    }

    private static void values(RunResult r, TracePoint p, List<String> keys, double[] into) {
        InstantState s = p.state();
        into[0] = s.cellVoltageV();
        into[1] = s.currentA();
        into[2] = s.targetEfficiency();
        into[3] = p.cumulativeEfficiency();
        into[4] = s.temperatureK();
        into[5] = s.dendriteHeightM();
        int k = SeriesBands.FIXED.size();
        for (int i = 0; i < r.speciesNames().size() && k < keys.size(); i++) {
            into[k++] = s.concentrationsMolPerM3()[i];
        }
        for (int m = 0; m < r.metalSymbols().size() && k < keys.size(); m++) {
            into[k++] = p.depositKg()[m];
        }
    }

    private static SeriesBands bands(List<String> keys, double[] grid, List<SampleRun> ok) {
        Map<String, SeriesBands.Band> bands = new LinkedHashMap<>();
        int need = Math.max(Percentiles.MIN_COUNT, (ok.size() + 1) / 2);
        double[] column = new double[ok.size()];
        for (int k = 0; k < keys.size(); k++) {
            double[] p5 = new double[grid.length];
            double[] p50 = new double[grid.length];
            double[] p95 = new double[grid.length];
            for (int g = 0; g < grid.length; g++) {
                for (int s = 0; s < ok.size(); s++) {
                    column[s] = ok.get(s).series()[k][g];
                }
                Percentiles p = Percentiles.of(column);
                boolean enough = p.count() >= need;
                p5[g] = enough ? p.p5() : Double.NaN;
                p50[g] = enough ? p.p50() : Double.NaN;
                p95[g] = enough ? p.p95() : Double.NaN;
            }
            bands.put(keys.get(k), new SeriesBands.Band(p5, p50, p95));
        }
        return new SeriesBands(grid, bands);
    }
}
