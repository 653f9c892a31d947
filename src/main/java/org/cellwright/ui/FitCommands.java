package org.cellwright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import javax.swing.JFrame;
import javax.swing.JOptionPane;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.FitText;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.study.MeasuredLog;

/**
 * The window's side of a fit: opens the {@link FitDialog} for the scenario shown and the log drawn, starts
 * the {@link FitController} with the scenario as the window holds it (written back to TOML), loads the fitted
 * scenario into the window and replots it, shows the values in the Log tab, and saves the fitted scenario.
 * Event thread only.
 */
final class FitCommands implements FitDialog.Host {

    private final JFrame frame;
    private final StatusBar status;
    private final Supplier<ScenarioSession> sessions;
    private final Supplier<RunDirector> directors;
    private final FileChoice files;
    private final ChemLibrary lib;
    private final Supplier<MeasuredLog> logs;
    private final LogPanel logPanel;
    private final Runnable refresh;
    private final FitController fits;
    private FitDialog dialog;

    /**
     * @param frame the window
     * @param status the status bar
     * @param sessions the scenario session
     * @param directors the run director
     * @param files the window's file choosers
     * @param lib the chemistry library
     * @param logs the log drawn now, or null
     * @param logPanel the Log tab
     * @param refresh called when the commands' state changes
     */
    FitCommands(JFrame frame, StatusBar status, Supplier<ScenarioSession> sessions, Supplier<RunDirector> directors,
                FileChoice files, ChemLibrary lib, Supplier<MeasuredLog> logs, LogPanel logPanel, Runnable refresh) {
        this.frame = frame;
        this.status = status;
        this.sessions = sessions;
        this.directors = directors;
        this.files = files;
        this.lib = lib;
        this.logs = logs;
        this.logPanel = logPanel;
        this.refresh = refresh;
        this.fits = new FitController(lib);
    }

    /** @return true while a fit runs */
    boolean running() {
        return fits.running();
    }

    /** Cancels a running fit and closes the dialog (the log was removed). */
    void close() {
        cancelFit();
        if (dialog != null) {
            dialog.dispose();
            dialog = null;
        }
    }

    /** @return the dialog, or null */
    FitDialog dialog() {
        return dialog;
    }

    /** Opens the fit dialog (or brings it forward). */
    void open() {
        ScenarioSession s = sessions.get();
        MeasuredLog log = logs.get();
        if (log == null || s == null || s.scenario() == null) {
            return;
        }
        if (dialog != null && dialog.isDisplayable()) {
            dialog.toFront();
            return;
        }
        List<FitController.Candidate> c;
        try {
            c = FitController.candidates(s.scenario(), lib);
        } catch (IllegalArgumentException e) {
            status.fail("The engine cannot run this scenario: " + e.getMessage());
            return;
        }
        dialog = new FitDialog(frame, s.name(), log, c, this);
        dialog.setVisible(true);
    }

    @Override
    public void startFit(List<String> keys, Map<String, Double> weights, FitController.Listener listener) {
        ScenarioSession s = sessions.get();
        Scenario sc = s.scenario();
        String name = s.name();
        String text = ScenarioWriter.write(sc, lib);
        MeasuredLog log = logs.get();
        status.busy(true);
        status.say("Fitting " + String.join(", ", keys) + " to " + log.source() + "...");
        fits.start(new FitController.Request(text, name, keys, weights, log), new FitController.Listener() {
            @Override
            public void progress(org.cellwright.study.FitProgress p) {
                listener.progress(p);
            }

            @Override
            public void finished(FitController.Outcome o) {
                status.busy(false);
                if (logs.get() != log) {
                    // the log was removed or replaced while the fit ran
                    refresh.run();
                    return;
                }
                adopt(o, name);
                listener.finished(o);
                refresh.run();
            }

            @Override
            public void failed(List<String> problems) {
                status.busy(false);
                status.fail("The fit did not run: " + problems.get(0));
                listener.failed(problems);
                refresh.run();
            }

            @Override
            public void cancelled() {
                status.busy(false);
                status.say("Fit cancelled.");
                listener.cancelled();
                refresh.run();
            }
        });
        refresh.run();
    }

    /** Loads the fitted scenario into the window and replots it at once; the log stays on the charts. */
    private void adopt(FitController.Outcome o, String name) {
        String base = name.replaceAll("\\.toml$", "").replaceAll(" \\(fitted\\)$", "");
        try {
            sessions.get().openDerived(o.fittedText(), base + " (fitted)");
        } catch (ScenarioException e) {
            status.fail("The fitted scenario does not read back: " + e.getMessage());
            return;
        }
        ScenarioSession s = sessions.get();
        if (s.scenario() != null) {
            directors.get().replot(s.scenario(), s.label(), System.nanoTime());
        }
        var out = o.result().outcome();
        logPanel.showFit(String.format(java.util.Locale.ROOT, "%s after %d iterations (%d engine runs, %.1f s);"
                + " the fitted scenario is loaded (not saved yet).", out.converged() ? "Converged" : "Stopped at the"
                + " iteration limit", out.iterations(), out.evaluations(), o.result().elapsedS()),
                FitText.parameterPhrases(out));
        status.say("Fitted: " + String.join("; ", FitText.parameterPhrases(out)));
    }

    @Override
    public void cancelFit() {
        fits.cancel();
    }

    @Override
    public void saveFitted() {
        ScenarioSession s = sessions.get();
        String base = s.name().replaceAll("\\.toml$", "").replace(" (fitted)", "-fitted")
                .replaceAll("[^A-Za-z0-9._-]+", "-");
        Path p = files.save(dialog != null && dialog.isShowing() ? dialog : frame, "Save the fitted scenario",
                "Scenario files (*.toml)", "toml", base);
        if (p == null) {
            return;
        }
        String why;
        try {
            why = s.saveTo(p);
        } catch (IOException e) {
            why = "Cannot write " + p + ": " + e.getMessage();
        }
        if (why != null) {
            JOptionPane.showMessageDialog(dialog != null ? dialog : frame, why, "Cellwright", JOptionPane.ERROR_MESSAGE);
        }
    }

}
