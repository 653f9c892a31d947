package org.cellwright.chart;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.sim.InstantState;
import org.cellwright.sim.PlainWords;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;
import org.cellwright.study.ColumnFit;
import org.cellwright.study.FitOutcome;
import org.cellwright.study.FittedParameter;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.LogFitResult;
import org.cellwright.study.LogSeries;

/**
 * A fit to a measured log as plain text for people: the fitted values with their 95 % intervals in the
 * trade's units, how closely each column is matched, which parameters the data barely tell apart, and where
 * the charge went in the fitted run, start against end, which answers "why did my efficiency fall?".
 */
public final class FitText {

    /** Correlation above which two parameters are reported as hard to tell apart (common practice: 0.95). */
    static final double STRONG_CORRELATION = 0.95;

    private FitText() {
    }

    /**
     * @param label the scenario's name (file)
     * @param r the fit
     * @param starts the free parameters with their starting values
     * @return the report, one item per line
     */
    public static List<String> lines(String label, LogFitResult r, List<FreeParameter> starts) {
        FitOutcome o = r.outcome();
        List<String> out = new ArrayList<>();
        out.add("Fit of " + label + " to " + r.log().source());
        StringBuilder cols = new StringBuilder();
        for (ColumnFit c : r.columns()) {
            cols.append(cols.length() == 0 ? "" : ", ").append(c.series().column()).append(' ').append(c.timesS().length);
        }
        out.add(String.format(Locale.ROOT, "  log          %d rows over %s; values: %s", r.log().timesS().length,
                RunClock.format(r.log().endS()), cols));
        out.add("  model        runs to the log's last time, without the scenario's stop conditions");
        out.add(String.format(Locale.ROOT, "  fit          %s after %d iterations, %d engine runs, %.1f s",
                o.converged() ? "converged" : "NOT converged (iteration limit; best point shown)", o.iterations(),
                o.evaluations(), r.elapsedS()));
        out.add("");
        out.add(String.format(Locale.ROOT, "  %-30s %-16s %-30s %s", "parameter", "fitted", "95 % interval", "from"));
        for (int j = 0; j < o.parameters().size(); j++) {
            FittedParameter p = o.parameters().get(j);
            ParameterUnit u = ParameterUnit.of(p.key());
            String interval = p.bounded() ? u.format(p.low()) + " to " + u.format(p.high())
                    : "not bounded by the data";
            out.add(String.format(Locale.ROOT, "  %-30s %-16s %-30s %s", p.key(), u.format(p.value()), interval,
                    u.format(starts.get(j).start())));
        }
        out.add("");
        out.add("  measured minus fitted (root mean square)");
        for (ColumnFit c : r.columns()) {
            out.add(String.format(Locale.ROOT, "    %-22s %-12s (typical %s, weight %.3g)", c.series().column(),
                    quantity(c.rmse(), c.series()), quantity(c.scale(), c.series()), c.weight()));
        }
        out.add(String.format(Locale.ROOT, "  residual standard deviation %.3g (weighted; %d values, %d degrees of"
                + " freedom)", o.residualSd(), o.observations(), o.degreesOfFreedom()));
        for (int i = 0; i < o.parameters().size(); i++) {
            for (int j = i + 1; j < o.parameters().size(); j++) {
                double rho = o.correlation()[i][j];
                if (Math.abs(rho) > STRONG_CORRELATION) {
                    out.add(String.format(Locale.ROOT, "  ! %s and %s are strongly correlated (r = %+.3f): the log"
                            + " barely tells them apart; fix one, or log a quantity that moves them differently",
                            o.parameters().get(i).key(), o.parameters().get(j).key(), rho));
                }
            }
        }
        out.add("");
        out.addAll(chargeLines(r.fittedRun(), "  where the charge went in the fitted run"));
        return out;
    }

    /**
     * Where the charge went in a run, over the whole run and at its start and end: the answer to "why did my
     * efficiency fall?".
     *
     * @param run a (fitted) run
     * @param heading a first line, or null for none
     * @return the lines
     */
    public static List<String> chargeLines(RunResult run, String heading) {
        List<String> out = new ArrayList<>();
        if (heading != null) {
            out.add(heading);
        }
        for (RunReport.Row r : chargeRows(run)) {
            out.add(String.format(Locale.ROOT, "    %-30s %s", r.label(), r.value()));
        }
        return out;
    }

    /**
     * @param run a run
     * @return where the charge went, as labelled rows: each electrode over the whole run, the current
     *     efficiency at the start, the end and over the run, and the cathode's current at the start and the end
     */
    public static List<RunReport.Row> chargeRows(RunResult run) {
        List<RunReport.Row> rows = new ArrayList<>();
        for (String line : ChargeShares.lines(run)) {
            String s = line.strip();
            int gap = s.indexOf(' ');
            rows.add(new RunReport.Row(s.substring(0, gap) + ", whole run", s.substring(gap).strip()));
        }
        List<TracePoint> trace = run.trace();
        String target = run.summary().targetMetal();
        if (target != null && trace.size() > 1) {
            rows.add(new RunReport.Row("current efficiency for " + target, String.format(Locale.ROOT,
                    "%.1f %% at the start, %.1f %% at the end (instantaneous); %.1f %% over the run by deposit mass",
                    100 * trace.get(0).state().targetEfficiency(),
                    100 * trace.get(trace.size() - 1).state().targetEfficiency(), 100 * run.summary().currentEfficiency())));
        }
        if (!trace.isEmpty()) {
            rows.add(new RunReport.Row("cathode current at the start", cathodeShares(run, trace.get(0).state())));
            rows.add(new RunReport.Row("cathode current at the end",
                    cathodeShares(run, trace.get(trace.size() - 1).state())));
        }
        return rows;
    }

    /** The cathode's partial currents as shares of its total, one per plain-words reaction, largest first. */
    private static String cathodeShares(RunResult run, InstantState s) {
        double total = 0;
        for (double i : s.cathodeCurrentsA()) {
            total += Math.max(0, -i);
        }
        Map<String, Double> byWords = new LinkedHashMap<>();
        for (int k = 0; k < s.cathodeCurrentsA().length; k++) {
            double share = total > 0 ? Math.max(0, -s.cathodeCurrentsA()[k]) / total : 0;
            byWords.merge(PlainWords.of(run.cathodeReactions().get(k), true), share, Double::sum);
        }
        List<Map.Entry<String, Double>> parts = new ArrayList<>(byWords.entrySet());
        parts.sort((a, b) -> Double.compare(b.getValue(), a.getValue()));
        List<String> words = new ArrayList<>();
        for (Map.Entry<String, Double> p : parts) {
            if (p.getValue() >= 0.005) {
                words.add(String.format(Locale.ROOT, "%s %.1f %%", p.getKey(), 100 * p.getValue()));
            }
        }
        return words.isEmpty() ? "-" : String.join(", ", words);
    }

    /**
     * @param o a fit's outcome
     * @return "key = value (low to high)" for each parameter, for headings
     */
    public static List<String> parameterPhrases(FitOutcome o) {
        List<String> out = new ArrayList<>();
        for (FittedParameter p : o.parameters()) {
            ParameterUnit u = ParameterUnit.of(p.key());
            out.add(p.key() + " = " + u.format(p.value()) + (p.bounded() ? " (95 %: " + u.format(p.low()) + " to "
                    + u.format(p.high()) + ")" : " (not bounded)"));
        }
        return out;
    }

    /**
     * @param s a logged column
     * @return what it measures, in words ("Cell voltage", "Cu2+ in the bath")
     */
    public static String columnLabel(LogSeries s) {
        return switch (s.quantity()) {
            case CURRENT -> "Current";
            case CELL_VOLTAGE -> "Cell voltage";
            case DEPOSIT -> "Deposit";
            case CONCENTRATION_G_PER_L, CONCENTRATION_MOL_PER_L -> s.species() + " in the bath";
            case TEMPERATURE -> "Bath temperature";
        };
    }

    /**
     * @param s a logged column
     * @return its unit as printed ("V", "g/L", "\u00b0C")
     */
    public static String unitLabel(LogSeries s) {
        return s.quantity().unit().equals("C") ? "\u00b0C" : s.quantity().unit();
    }

    /**
     * @param v a value in the column's unit
     * @param s the column
     * @return the value with its unit, millivolts and milliamperes for small voltages and currents
     */
    public static String quantity(double v, LogSeries s) {
        String unit = unitLabel(s);
        if ((unit.equals("V") || unit.equals("A") || unit.equals("g")) && Math.abs(v) < 0.1 && v != 0) {
            return String.format(Locale.ROOT, "%.3g m%s", v * 1000, unit);
        }
        return String.format(Locale.ROOT, "%.3g %s", v, unit);
    }
}
