package org.cellwright.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/**
 * Fits free scenario values to a measured run log: each evaluation runs the engine over the log's span and
 * compares every logged column with the model interpolated at the log's times.
 *
 * <p>The residual of a value is {@code w (model - measured) / scale}: the column's weight (1 unless given)
 * and its typical magnitude (the root mean square of its values), so that columns in volts, amperes and
 * grams count alike and a weight says how much more (or less) one column is trusted, e.g. the inverse of its
 * relative noise. The intervals assume that the weighted residuals of all columns share one variance.
 *
 * <p>The model run goes to the log's last time with no stop conditions (the log records what happened, so
 * the run must cover it even where the scenario would have stopped), and records at least
 * {@value #MIN_POINTS} points over the span so that linear interpolation between them stays far below the
 * measurement noise.
 *
 * <p>For the window: build it off the event thread, call {@link #fit} there with a {@link FitMonitor} that
 * forwards progress to the event thread and answers a cancel button; the result holds the fitted run for the
 * plots and each column beside its model for an overlay.
 */
public final class LogFit {

    /** Fewest output points of a model run over the log's span (common practice: below 0.3 % of the span). */
    static final int MIN_POINTS = 400;

    private final ScenarioFamily family;
    private final ChemLibrary library;
    private final MeasuredLog log;
    private final List<LogSeries> series;
    private final double[] weights;
    private final double[] scales;
    private final CellSimulation engine = CellSimulation.withDefaults();

    /**
     * @param family the scenario with its free values
     * @param library the chemistry library
     * @param log the measured log
     * @param weights weight per column name (> 0); columns not named weigh 1
     * @throws IllegalArgumentException when a weight names no column of the log or is not > 0, or the log has
     *     no values or spans no time
     */
    public LogFit(ScenarioFamily family, ChemLibrary library, MeasuredLog log, Map<String, Double> weights) {
        this.family = Objects.requireNonNull(family, "family");
        this.library = Objects.requireNonNull(library, "library");
        this.log = Objects.requireNonNull(log, "log");
        this.series = log.series().stream().filter(s -> s.count() > 0).toList();
        if (series.isEmpty()) {
            throw new IllegalArgumentException(log.source() + ": the log holds no measured values");
        }
        if (!(log.endS() > 0)) {
            throw new IllegalArgumentException(log.source() + ": the log spans no time (its last row is at 0 s)");
        }
        for (Map.Entry<String, Double> w : weights.entrySet()) {
            if (log.column(w.getKey()) == null) {
                throw new IllegalArgumentException("weight for '" + w.getKey() + "': the log has no such column (it has "
                        + String.join(", ", log.series().stream().map(LogSeries::column).toList()) + ")");
            }
            if (!(w.getValue() > 0) || !Double.isFinite(w.getValue())) {
                throw new IllegalArgumentException("weight for '" + w.getKey() + "' must be a number > 0, got "
                        + w.getValue());
            }
        }
        this.weights = new double[series.size()];
        this.scales = new double[series.size()];
        for (int k = 0; k < series.size(); k++) {
            LogSeries s = series.get(k);
            this.weights[k] = weights.getOrDefault(s.column(), 1.0);
            double rms = s.rootMeanSquare();
            this.scales[k] = rms > 0 ? rms : 1.0;
        }
    }

    /** @return the log being fitted */
    public MeasuredLog log() {
        return log;
    }

    /**
     * @param sc a scenario
     * @return the same scenario set up to run over the log's span: to its last time, no stop conditions, at
     *     least {@value #MIN_POINTS} output points
     */
    public Scenario overLog(Scenario sc) {
        double span = log.endS();
        double interval = Math.min(sc.run().outputIntervalS(), span / MIN_POINTS);
        return sc.withRun(new RunSettings(span, interval, List.of(), sc.run().targetMetal()));
    }

    /**
     * Runs the model at given values over the log's span.
     *
     * @param values the free parameters' values (SI)
     * @return the run
     * @throws IllegalArgumentException when the scenario or the engine rejects the values
     */
    public RunResult run(double[] values) {
        Scenario sc = overLog(family.at(values));
        try {
            return engine.run(sc, library, null);
        } catch (IllegalArgumentException | FitCancelledException e) {
            throw e;
        } catch (RuntimeException e) {
            // the integrator gave up at these values (e.g. its step fell below its minimum): a point to avoid
            throw new IllegalArgumentException("the engine could not run at these values: " + e.getMessage(), e);
        }
    }

    /**
     * @param values the free parameters' values (SI)
     * @return the weighted residuals of every measured value, column by column in log order
     */
    double[] residuals(double[] values) {
        RunResult r = run(values);
        double[] out = new double[series.stream().mapToInt(LogSeries::count).sum()];
        int i = 0;
        double[] t = log.timesS();
        for (int k = 0; k < series.size(); k++) {
            LogSeries s = series.get(k);
            ModelCurve curve = ModelCurve.of(r, s, library);
            double f = weights[k] / scales[k];
            double[] y = s.values();
            for (int row = 0; row < y.length; row++) {
                if (!Double.isNaN(y[row])) {
                    out[i++] = f * (curve.at(t[row]) - y[row]);
                }
            }
        }
        return out;
    }

    /**
     * Fits the free values.
     *
     * @param options how the optimiser proceeds ({@link LeastSquaresFit.Options#forEngine()})
     * @param monitor receives progress and may cancel
     * @return the fitted values, the columns beside the fitted model, and the fitted run
     * @throws IllegalArgumentException when the model cannot run at the start, a free value moves none of the
     *     measured values ({@link InsensitiveParameterException}), or there are too few values
     * @throws FitCancelledException when the monitor cancelled
     */
    public LogFitResult fit(LeastSquaresFit.Options options, FitMonitor monitor) {
        long t0 = System.nanoTime();
        FitOutcome outcome = new LeastSquaresFit(family.parameters(), this::residuals, options, monitor).fit();
        double[] best = outcome.values();
        Scenario fittedScenario = overLog(family.at(best));
        RunResult fitted = run(best);
        List<ColumnFit> columns = new ArrayList<>();
        for (int k = 0; k < series.size(); k++) {
            columns.add(column(series.get(k), weights[k], scales[k], fitted));
        }
        return new LogFitResult(log, outcome, columns, fittedScenario, fitted, (System.nanoTime() - t0) / 1e9);
    }

    /**
     * Compares a run with the log without fitting (for an overlay before a fit, or to judge a scenario).
     *
     * @param run a run over the log's span (see {@link #overLog})
     * @return each measured column beside the run, in log order
     */
    public List<ColumnFit> compare(RunResult run) {
        List<ColumnFit> columns = new ArrayList<>();
        for (int k = 0; k < series.size(); k++) {
            columns.add(column(series.get(k), weights[k], scales[k], run));
        }
        return columns;
    }

    private ColumnFit column(LogSeries s, double weight, double scale, RunResult run) {
        ModelCurve curve = ModelCurve.of(run, s, library);
        int n = s.count();
        double[] t = new double[n];
        double[] y = new double[n];
        double[] m = new double[n];
        double ss = 0;
        int i = 0;
        for (int row = 0; row < s.values().length; row++) {
            double v = s.values()[row];
            if (!Double.isNaN(v)) {
                t[i] = log.timesS()[row];
                y[i] = v;
                m[i] = curve.at(t[i]);
                ss += (m[i] - y[i]) * (m[i] - y[i]);
                i++;
            }
        }
        return new ColumnFit(s, weight, scale, t, y, m, curve, Math.sqrt(ss / n));
    }

    /** @return the weight of each fitted column, by name */
    public Map<String, Double> weights() {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int k = 0; k < series.size(); k++) {
            m.put(series.get(k).column(), weights[k]);
        }
        return m;
    }
}
