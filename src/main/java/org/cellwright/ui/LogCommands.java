package org.cellwright.ui;

import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.function.Supplier;

import javax.swing.Action;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.UIManager;

import org.cellwright.chart.RunCharts;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.Problem;
import org.cellwright.io.RunLogException;
import org.cellwright.io.RunLogReader;
import org.cellwright.sim.RunResult;

/**
 * The window's measured-log commands: load a log (drawn over the charts), remove it, fit the scenario to it;
 * with the report commands ({@link ReportCommands}) in the export menu. Owns the "Log" menu and the "Charge"
 * and "Log" tabs. Slow work (reading, fitting, writing) runs off
 * the event thread; everything else runs on it.
 */
final class LogCommands {

    private static final int CTRL = InputEvent.CTRL_DOWN_MASK;

    final Action loadLog;
    final Action fitLog;
    final Action removeLog;

    private final JFrame frame;
    private final StatusBar status;
    private final Supplier<ScenarioSession> sessions;
    private final Supplier<RunDirector> directors;
    private ChemLibrary lib;
    private LogPanel logPanel;
    private ChargePanel chargePanel;
    private FitCommands fitting;
    private LogOverlay overlay;
    private List<String> logWarnings = List.of();
    private RunCharts charts;
    private RunResult lastRun;
    private final FileChoice files;
    private final ReportCommands reports;

    /**
     * @param frame the window
     * @param status the status bar
     * @param sessions the scenario session (null until the library is loaded)
     * @param directors the run director (null until the library is loaded)
     */
    LogCommands(JFrame frame, StatusBar status, Supplier<ScenarioSession> sessions, Supplier<RunDirector> directors) {
        this.frame = frame;
        this.status = status;
        this.sessions = sessions;
        this.directors = directors;
        files = new FileChoice(frame);
        reports = new ReportCommands(status, sessions, files);
        loadLog = action("Load measured log...", "Draw a measured log (CSV) over the charts",
                KeyStroke.getKeyStroke(KeyEvent.VK_L, CTRL), this::loadLog);
        fitLog = action("Fit to the log...", "Fit chosen scenario values to the measured log, with 95 % intervals",
                KeyStroke.getKeyStroke(KeyEvent.VK_F, CTRL), () -> {
                    if (fitting != null) {
                        fitting.open();
                    }
                });
        removeLog = action("Remove the log", "Take the measured log off the charts", null, this::removeLog);
        UIManager.addPropertyChangeListener(e -> {
            if ("lookAndFeel".equals(e.getPropertyName())) {
                SwingUtilities.invokeLater(this::restyle);
            }
        });
        refresh();
    }

    /**
     * Puts the commands into the menu bar: a "Log" menu after "Run", the reports at the end of the export menu.
     *
     * @param bar the window's menu bar
     * @param exports the export menu, or null
     */
    void install(JMenuBar bar, JMenu exports) {
        JMenu menu = new JMenu("Log");
        menu.setMnemonic(KeyEvent.VK_L);
        menu.add(loadLog);
        menu.add(fitLog);
        menu.addSeparator();
        menu.add(removeLog);
        int at = Math.min(2, bar.getMenuCount());
        bar.add(menu, at);
        if (exports != null) {
            exports.addSeparator();
            exports.add(reports.html);
            exports.add(reports.pdf);
        }
    }

    /**
     * Makes the tabs once the library is loaded.
     *
     * @param library the chemistry library
     * @param tabs the window's tabs (the "Charge" and "Log" tabs go at the end)
     */
    void ready(ChemLibrary library, JTabbedPane tabs) {
        this.lib = library;
        chargePanel = new ChargePanel(library);
        logPanel = new LogPanel(loadLog, fitLog, removeLog);
        fitting = new FitCommands(frame, status, sessions, directors, files, library, () -> overlay == null ? null
                : overlay.log(), logPanel, this::refresh);
        tabs.addTab("Charge", ChargePanel.scrolled(chargePanel));
        tabs.setToolTipTextAt(tabs.getTabCount() - 1, "Where the charge went: metal, hydrogen, shuttles, corrosion");
        JScrollPane s = new JScrollPane(logPanel);
        s.setBorder(javax.swing.BorderFactory.createEmptyBorder());
        tabs.addTab("Log", s);
        tabs.setToolTipTextAt(tabs.getTabCount() - 1, "The measured log over the charts, and the fit to it");
        refresh();
    }

    /** @param c the charts now shown (the log's markers move onto them) */
    void chartsChanged(RunCharts c) {
        charts = c;
        if (overlay != null) {
            overlay.attach(c);
        }
    }

    /**
     * Called whenever the window's state may have changed; shows a new run's charge split and its distance
     * from the log (after the charts have drawn).
     */
    void refresh() {
        RunDirector d = directors.get();
        ScenarioSession s = sessions.get();
        boolean loaded = lib != null;
        loadLog.setEnabled(loaded);
        fitLog.setEnabled(loaded && overlay != null && s != null && s.scenario() != null
                && (fitting == null || !fitting.running()));
        removeLog.setEnabled(overlay != null);
        reports.refresh(lib);
        RunResult r = d == null ? null : d.result();
        if (r != lastRun) {
            lastRun = r;
            String label = s == null ? "" : s.label();
            SwingUtilities.invokeLater(() -> {
                if (lastRun == r && chargePanel != null) {
                    chargePanel.show(label, r);
                    showMatch();
                }
            });
        }
    }

    /** Asks for a CSV log and reads it off the event thread. */
    void loadLog() {
        Path p = files.open("Load a measured log", "Run logs (*.csv)", "csv");
        if (p != null) {
            loadLog(p);
        }
    }

    /**
     * Reads a log off the event thread; a log with errors is listed in a dialog and changes nothing.
     *
     * @param file the CSV file
     */
    void loadLog(Path file) {
        if (lib == null) {
            return;
        }
        status.busy(true);
        status.say("Reading " + file.getFileName() + "...");
        ChemLibrary library = lib;
        new SwingWorker<RunLogReader.Result, Void>() {
            @Override
            protected RunLogReader.Result doInBackground() throws RunLogException {
                return new RunLogReader(library).read(file);
            }

            @Override
            protected void done() {
                status.busy(false);
                try {
                    show(file, get());
                } catch (ExecutionException e) {
                    if (e.getCause() instanceof RunLogException bad) {
                        status.fail(file.getFileName() + " cannot be read; the charts are unchanged.");
                        LogPanel.showProblems(frame, file, bad.problems());
                    } else {
                        status.fail("Internal failure while reading " + file.getFileName() + ": " + e.getCause());
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    private void show(Path file, RunLogReader.Result read) {
        if (overlay != null) {
            overlay.detach();
        }
        overlay = new LogOverlay(read.log(), sp -> lib.findSpecies(sp).map(Species::molarMassKgPerMol)
                .orElse(Double.NaN));
        overlay.attach(charts);
        logWarnings = read.warnings().stream().map(Problem::format).toList();
        logPanel.showLog(file.getFileName().toString(), overlay.describe(), logWarnings);
        showMatch();
        status.say("Loaded " + file.getFileName() + ": open dots on the charts"
                + (logWarnings.isEmpty() ? "." : " (" + logWarnings.size() + " warning"
                + (logWarnings.size() == 1 ? "" : "s") + ", see the Log tab)."));
        refresh();
    }

    /** Takes the log off the charts. */
    void removeLog() {
        if (overlay == null) {
            return;
        }
        if (fitting != null) {
            fitting.close();
        }
        overlay.detach();
        overlay = null;
        logPanel.showLog(null, null, List.of());
        status.say("The measured log is off the charts.");
        refresh();
    }

    private void showMatch() {
        RunResult r = lastRun;
        if (overlay == null || logPanel == null) {
            return;
        }
        if (r == null) {
            logPanel.showMatch("Run the scenario (F5) or move a slider to compare it with the log.", List.of());
            return;
        }
        LogMatch m = LogMatch.of(overlay.log(), r, lib);
        logPanel.showMatch(m.note(), m.rows());
    }

    private void restyle() {
        if (overlay != null) {
            overlay.restyle();
        }
        if (chargePanel != null) {
            RunResult r = chargePanel.run();
            chargePanel.show("", null);
            chargePanel.show(lastLabel(), r);
        }
    }

    private String lastLabel() {
        ScenarioSession s = sessions.get();
        return s == null ? "" : s.label();
    }

    /** @return the report commands (for tests) */
    ReportCommands reports() {
        return reports;
    }

    /** @return the overlay drawn, or null (for tests) */
    LogOverlay overlay() {
        return overlay;
    }

    /** @return the log tab (for tests) */
    LogPanel logPanel() {
        return logPanel;
    }

    /** @return the charge tab (for tests) */
    ChargePanel chargePanel() {
        return chargePanel;
    }

    /** @return the fit dialog, or null (for tests) */
    FitDialog fitDialog() {
        return fitting == null ? null : fitting.dialog();
    }

    private static Action action(String name, String tip, KeyStroke key, Runnable r) {
        return WindowActions.action(name, tip, key, null, r);
    }
}
