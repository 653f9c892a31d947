package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutionException;

import javax.swing.SwingWorker;

import org.cellwright.cell.Compartments;
import org.cellwright.cell.Scenario;
import org.cellwright.chart.FitText;
import org.cellwright.chart.ParameterUnit;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.Problem;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioTemplate;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.PlainWords;
import org.cellwright.sim.RunLayout;
import org.cellwright.study.Cancellation;
import org.cellwright.study.ColumnFit;
import org.cellwright.study.FitCancelledException;
import org.cellwright.study.FitMonitor;
import org.cellwright.study.FitProgress;
import org.cellwright.study.FittedParameter;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.InsensitiveParameterException;
import org.cellwright.study.LeastSquaresFit;
import org.cellwright.study.LogFit;
import org.cellwright.study.LogFitResult;
import org.cellwright.study.MeasuredLog;

/**
 * Fits the scenario shown in the window to the measured log, off the event thread: the scenario's text as the
 * form holds it is read as a {@link ScenarioTemplate} with the chosen keys free, {@link LogFit} fits it
 * (Levenberg-Marquardt, the same options as {@code cellwright fit}), progress reaches the event thread after
 * every iteration and Cancel stops the fit before its next engine run. The outcome carries the fitted scenario
 * (the scenario's own run settings, the fitted values) as TOML, ready to load into the window and to save.
 */
final class FitController {

    /**
     * A key the fit dialog offers.
     *
     * @param key the scenario key (dotted path)
     * @param label what it is, in words
     * @param preselected true when ticked at first
     */
    record Candidate(String key, String label, boolean preselected) {
    }

    /**
     * What to fit.
     *
     * @param scenarioText the scenario's TOML as the window holds it
     * @param name the scenario's name, for messages
     * @param keys the free keys
     * @param weights weight per log column (columns not named weigh 1)
     * @param log the measured log
     */
    record Request(String scenarioText, String name, List<String> keys, Map<String, Double> weights,
                   MeasuredLog log) {
        Request {
            keys = List.copyOf(keys);
            weights = Map.copyOf(weights);
        }
    }

    /**
     * A finished fit.
     *
     * @param result the fit (values, intervals, columns beside the fitted model, fitted run over the log)
     * @param starts the free parameters with their starting values
     * @param fittedScenario the scenario at the fitted values, with its own run settings
     * @param fittedText that scenario as TOML
     */
    record Outcome(LogFitResult result, List<FreeParameter> starts, Scenario fittedScenario, String fittedText) {
    }

    /** Hears of a fit on the event thread. */
    interface Listener {
        /** @param p where the fit stands (after each iteration) */
        void progress(FitProgress p);

        /** @param o the finished fit */
        void finished(Outcome o);

        /** @param problems what is wrong with the request, in words (the fit did not start or could not go on) */
        void failed(List<String> problems);

        /** The user cancelled. */
        void cancelled();
    }

    private final ChemLibrary library;
    private Cancellation cancel;
    private SwingWorker<Outcome, FitProgress> worker;

    /** @param library the chemistry library */
    FitController(ChemLibrary library) {
        this.library = library;
    }

    /**
     * The keys worth offering for a scenario: the diffusion layer (what agitation sets), the contact
     * resistance, the zone exchange of a zoned cell, and each electrode reaction's exchange current density.
     *
     * @param s the scenario
     * @param library the chemistry library
     * @return the candidates, the first two ticked
     */
    static List<Candidate> candidates(Scenario s, ChemLibrary library) {
        List<Candidate> out = new ArrayList<>();
        out.add(new Candidate("cell.diffusion_layer", "diffusion layer (how hard the bath is agitated)", true));
        out.add(new Candidate("cell.contact_resistance", "contact and lead resistance", true));
        if (s.cell().compartments().kind() == Compartments.Kind.ZONES) {
            out.add(new Candidate("cell.zone_exchange", "exchange between the anode and cathode zones", false));
        }
        RunLayout layout = CellSimulation.layout(s, library);
        List<String> seen = new ArrayList<>();
        for (int side = 0; side < 2; side++) {
            List<String> couples = side == 0 ? layout.cathodeReactions() : layout.anodeReactions();
            for (String couple : couples) {
                if (!seen.contains(couple)) {
                    seen.add(couple);
                    out.add(new Candidate("reaction." + couple + ".i0", "exchange current density of " + couple
                            + " (" + PlainWords.of(couple, side == 0) + ")", false));
                }
            }
        }
        return out;
    }

    /**
     * Fits on the calling thread (the worker calls this; tests call it directly).
     *
     * @param r what to fit
     * @param library the chemistry library
     * @param monitor receives progress and may cancel
     * @return the outcome
     * @throws ScenarioException when the scenario or a free key is not accepted
     * @throws IllegalArgumentException when the log does not fit the scenario, a weight is bad, or a free key
     *     moves none of the logged values
     * @throws FitCancelledException when the monitor cancelled
     */
    static Outcome fit(Request r, ChemLibrary library, FitMonitor monitor) throws ScenarioException {
        ScenarioTemplate template = ScenarioTemplate.parse(r.scenarioText(), r.name(), List.of(), r.keys(), library);
        LogFit fit = new LogFit(template, library, r.log(), r.weights());
        LogFitResult result = fit.fit(LeastSquaresFit.Options.forEngine(), monitor);
        Scenario fitted = template.at(rounded(result.outcome().parameters()));
        return new Outcome(result, template.parameters(), fitted, ScenarioWriter.write(fitted, library));
    }

    /**
     * The fitted values with no more digits than the log supports, so that the form and the saved file read
     * "44.95 um", not "44.94858853653737 um": four significant digits, more only while rounding would move a
     * value by more than a twentieth of its 95 % interval's width (six for a value the log does not bound).
     *
     * @param ps the fitted parameters
     * @return their values, rounded (SI)
     */
    static double[] rounded(List<FittedParameter> ps) {
        double[] out = new double[ps.size()];
        for (int j = 0; j < out.length; j++) {
            FittedParameter p = ps.get(j);
            double v = p.value();
            double r = v;
            for (int digits = 4; digits <= 17; digits++) {
                r = new java.math.BigDecimal(v).round(new java.math.MathContext(digits)).doubleValue();
                boolean close = p.bounded() ? Math.abs(r - v) <= (p.high() - p.low()) / 20 : digits >= 6;
                if (close) {
                    break;
                }
            }
            out[j] = r;
        }
        return out;
    }

    /**
     * Starts a fit on a worker thread; the listener hears of it on the event thread.
     *
     * @param r what to fit
     * @param listener who hears of it
     */
    void start(Request r, Listener listener) {
        cancel();
        Cancellation flag = Cancellation.none();
        cancel = flag;
        worker = new SwingWorker<>() {
            @Override
            protected Outcome doInBackground() throws ScenarioException {
                return fit(r, library, new FitMonitor() {
                    @Override
                    public void progress(FitProgress p) {
                        publish(p);
                    }

                    @Override
                    public boolean cancelled() {
                        return flag.isCancelled();
                    }
                });
            }

            @Override
            protected void process(List<FitProgress> chunks) {
                if (!flag.isCancelled()) {
                    listener.progress(chunks.get(chunks.size() - 1));
                }
            }

            @Override
            protected void done() {
                try {
                    listener.finished(get());
                } catch (ExecutionException e) {
                    Throwable c = e.getCause();
                    if (c instanceof FitCancelledException) {
                        listener.cancelled();
                    } else {
                        listener.failed(problems(c));
                    }
                } catch (java.util.concurrent.CancellationException e) {
                    listener.cancelled();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        worker.execute();
    }

    /** Asks a running fit to stop (it stops before its next engine run). */
    void cancel() {
        if (cancel != null) {
            cancel.cancel();
        }
    }

    /** @return true while a fit runs */
    boolean running() {
        return worker != null && !worker.isDone();
    }

    /**
     * @param failure why a fit did not run or finish
     * @return what to tell the user, one line per problem, no stack trace
     */
    static List<String> problems(Throwable failure) {
        List<String> out = new ArrayList<>();
        if (failure instanceof ScenarioException e) {
            for (Problem p : e.problems()) {
                if (p.isError()) {
                    out.add(ScenarioTemplate.FROM_FREE.equals(p.file()) ? "free key " + p.key() + ": " + p.message()
                            : p.format());
                }
            }
        } else if (failure instanceof InsensitiveParameterException e) {
            out.add(e.getMessage());
            if (e.keys().stream().anyMatch(k -> k.startsWith("reaction."))) {
                out.add("A reaction's kinetics belong to an electrode material; without material = \"...\" in its"
                        + " [reaction] table the key changes only the default set. Name the material it runs on"
                        + " (e.g. hydrogen on a copper deposit: material = \"copper\").");
            }
        } else if (failure instanceof IllegalArgumentException e) {
            out.add(e.getMessage());
        } else {
            out.add("Internal failure in the fit: " + failure);
        }
        return out;
    }

    /**
     * The fitted values as table rows, in the key's usual unit.
     *
     * @param o a finished fit
     * @return per parameter: key, fitted value, 95 % interval, start
     */
    static List<String[]> parameterRows(Outcome o) {
        List<String[]> rows = new ArrayList<>();
        List<FittedParameter> ps = o.result().outcome().parameters();
        for (int j = 0; j < ps.size(); j++) {
            FittedParameter p = ps.get(j);
            ParameterUnit u = ParameterUnit.of(p.key());
            rows.add(new String[] {p.key(), u.format(p.value()),
                    p.bounded() ? u.format(p.low()) + " to " + u.format(p.high()) : "not bounded by the log",
                    u.format(o.starts().get(j).start())});
        }
        return rows;
    }

    /**
     * How closely each column is matched.
     *
     * @param o a finished fit
     * @return per column: what it is, root mean square of measured minus fitted, its typical value, its weight
     */
    static List<String[]> residualRows(Outcome o) {
        List<String[]> rows = new ArrayList<>();
        for (ColumnFit c : o.result().columns()) {
            rows.add(new String[] {c.series().column(), FitText.quantity(c.rmse(), c.series()),
                    FitText.quantity(c.scale(), c.series()), String.format(Locale.ROOT, "%.3g", c.weight())});
        }
        return rows;
    }
}
