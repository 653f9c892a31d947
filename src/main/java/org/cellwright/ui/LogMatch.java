package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.FitText;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.study.ColumnFit;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.LogFit;
import org.cellwright.study.LogSeries;
import org.cellwright.study.MeasuredLog;
import org.cellwright.study.ScenarioFamily;

/**
 * How far the run shown lies from the measured log, column by column: the root mean square of measured minus
 * model at the log's times, through {@link LogFit#compare} (the same comparison the fit minimises). A run
 * that stops before the log ends (a stop condition) is compared over the rows it covers.
 *
 * @param note a line saying what was compared, or why nothing could be
 * @param columns each column beside the run (empty when nothing could be compared)
 */
record LogMatch(String note, List<ColumnFit> columns) {

    LogMatch {
        columns = List.copyOf(columns);
    }

    /**
     * @param log the measured log
     * @param run the run shown
     * @param library the chemistry library
     * @return the comparison
     */
    static LogMatch of(MeasuredLog log, RunResult run, ChemLibrary library) {
        double end = run.trace().isEmpty() ? 0 : run.trace().get(run.trace().size() - 1).timeS();
        MeasuredLog covered = upTo(log, end);
        if (covered.timesS().length == 0 || covered.valueCount() == 0 || !(covered.endS() > 0)) {
            return new LogMatch("The run ends at " + RunClock.format(end) + ", before the log's first values.",
                    List.of());
        }
        ScenarioFamily fixed = new ScenarioFamily() {
            @Override
            public List<FreeParameter> parameters() {
                return List.of();
            }

            @Override
            public Scenario at(double[] values) {
                return run.scenario();
            }
        };
        try {
            List<ColumnFit> cols = new LogFit(fixed, library, covered, Map.of()).compare(run);
            String note = covered.timesS().length == log.timesS().length ? "Root mean square at the log's "
                    + log.timesS().length + " rows. Move a slider and watch it fall."
                    : "Over the log's first " + covered.timesS().length + " of " + log.timesS().length
                    + " rows: the run stops at " + RunClock.format(end) + ", the log goes on to "
                    + RunClock.format(log.endS()) + ".";
            return new LogMatch(note, cols);
        } catch (IllegalArgumentException e) {
            return new LogMatch("Cannot compare: " + e.getMessage(), List.of());
        }
    }

    /** @return per column: name, measured minus model (rms) and typical value, with units */
    List<String[]> rows() {
        List<String[]> out = new ArrayList<>();
        for (ColumnFit c : columns) {
            out.add(new String[] {c.series().column(), FitText.quantity(c.rmse(), c.series()),
                    FitText.quantity(c.scale(), c.series())});
        }
        return out;
    }

    /** The rows of a log up to a time (inclusive). */
    static MeasuredLog upTo(MeasuredLog log, double endS) {
        double slack = 1e-9 * Math.max(1, endS);
        int n = 0;
        while (n < log.timesS().length && log.timesS()[n] <= endS + slack) {
            n++;
        }
        if (n == log.timesS().length) {
            return log;
        }
        double[] t = java.util.Arrays.copyOf(log.timesS(), n);
        List<LogSeries> series = new ArrayList<>();
        for (LogSeries s : log.series()) {
            series.add(new LogSeries(s.column(), s.quantity(), s.species(), java.util.Arrays.copyOf(s.values(), n)));
        }
        return new MeasuredLog(log.source(), t, series);
    }
}
