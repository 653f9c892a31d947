package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.function.Supplier;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.UIManager;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.FitText;
import org.cellwright.chart.RunCharts;
import org.cellwright.chart.RunReport;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.Problem;
import org.cellwright.io.RunLogException;
import org.cellwright.io.RunLogReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.sim.RunResult;

/**
 * The window's measured-log and report commands: load a log (drawn over the charts), remove it, fit the
 * scenario to it, and write the report of the scenario shown as HTML or PDF. Owns the "Log" menu, the report
 * entries of the export menu, and the "Charge" and "Log" tabs. Slow work (reading, fitting, writing) runs off
 * the event thread; everything else runs on it.
 */
final class LogCommands implements FitDialog.Host {

    private static final int CTRL = InputEvent.CTRL_DOWN_MASK;

    final Action loadLog;
    final Action fitLog;
    final Action removeLog;
    final Action reportHtml;
    final Action reportPdf;

    private final JFrame frame;
    private final StatusBar status;
    private final Supplier<ScenarioSession> sessions;
    private final Supplier<RunDirector> directors;
    private ChemLibrary lib;
    private LogPanel logPanel;
    private ChargePanel chargePanel;
    private FitController fits;
    private FitDialog dialog;
    private LogOverlay overlay;
    private List<String> logWarnings = List.of();
    private RunCharts charts;
    private RunResult lastRun;
    private File folder;

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
        Path scenarios = Path.of("scenarios");
        folder = Files.isDirectory(scenarios) ? scenarios.toAbsolutePath().toFile() : null;
        loadLog = action("Load measured log...", "Draw a measured log (CSV) over the charts",
                KeyStroke.getKeyStroke(KeyEvent.VK_L, CTRL), this::loadLog);
        fitLog = action("Fit to the log...", "Fit chosen scenario values to the measured log, with 95 % intervals",
                KeyStroke.getKeyStroke(KeyEvent.VK_F, CTRL), this::openFit);
        removeLog = action("Remove the log", "Take the measured log off the charts", null, this::removeLog);
        reportHtml = action("Report (HTML)...", "Run the scenario shown and write its report as one HTML file", null,
                () -> exportReport(ReportExport.Format.HTML));
        reportPdf = action("Report (PDF)...", "Run the scenario shown and write its report as PDF", null,
                () -> exportReport(ReportExport.Format.PDF));
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
            exports.add(reportHtml);
            exports.add(reportPdf);
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
        this.fits = new FitController(library);
        chargePanel = new ChargePanel(library);
        logPanel = new LogPanel(loadLog, fitLog, removeLog);
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
                && (fits == null || !fits.running()));
        removeLog.setEnabled(overlay != null);
        boolean scenario = loaded && s != null && s.scenario() != null;
        reportHtml.setEnabled(scenario);
        reportPdf.setEnabled(scenario);
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
        JFileChooser fc = new JFileChooser(folder);
        fc.setDialogTitle("Load a measured log");
        fc.setFileFilter(new FileNameExtensionFilter("Run logs (*.csv)", "csv"));
        if (fc.showOpenDialog(frame) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        folder = fc.getCurrentDirectory();
        loadLog(fc.getSelectedFile().toPath());
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
                        showProblems(file, bad.problems());
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

    private void showProblems(Path file, List<Problem> problems) {
        StringBuilder sb = new StringBuilder();
        problems.forEach(p -> sb.append(p.format()).append('\n'));
        JTextArea area = new JTextArea(sb.toString(), Math.min(14, problems.size() + 1), 80);
        area.setEditable(false);
        JPanel p = new JPanel(new BorderLayout(0, 8));
        p.add(new JLabel(file.getFileName() + " cannot be read as a run log; nothing was changed."
                + " Each line gives file:line:column: column name: what is wrong."), BorderLayout.NORTH);
        p.add(new JScrollPane(area), BorderLayout.CENTER);
        JOptionPane.showMessageDialog(frame, p, "Log problems", JOptionPane.ERROR_MESSAGE);
    }

    /** Takes the log off the charts. */
    void removeLog() {
        if (overlay == null) {
            return;
        }
        if (dialog != null) {
            dialog.dispose();
            dialog = null;
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

    /** Opens the fit dialog (or brings it forward). */
    void openFit() {
        ScenarioSession s = sessions.get();
        if (overlay == null || s == null || s.scenario() == null) {
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
        dialog = new FitDialog(frame, s.name(), overlay.log(), c, this);
        dialog.setVisible(true);
    }

    @Override
    public void startFit(List<String> keys, Map<String, Double> weights, FitController.Listener listener) {
        ScenarioSession s = sessions.get();
        Scenario sc = s.scenario();
        String name = s.name();
        String text = ScenarioWriter.write(sc, lib);
        status.busy(true);
        status.say("Fitting " + String.join(", ", keys) + " to " + overlay.log().source() + "...");
        fits.start(new FitController.Request(text, name, keys, weights, overlay.log()), new FitController.Listener() {
            @Override
            public void progress(org.cellwright.study.FitProgress p) {
                listener.progress(p);
            }

            @Override
            public void finished(FitController.Outcome o) {
                status.busy(false);
                adopt(o, name);
                listener.finished(o);
                refresh();
            }

            @Override
            public void failed(List<String> problems) {
                status.busy(false);
                status.fail("The fit did not run: " + problems.get(0));
                listener.failed(problems);
                refresh();
            }

            @Override
            public void cancelled() {
                status.busy(false);
                status.say("Fit cancelled.");
                listener.cancelled();
                refresh();
            }
        });
        refresh();
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
        if (fits != null) {
            fits.cancel();
        }
    }

    @Override
    public void saveFitted() {
        ScenarioSession s = sessions.get();
        String base = s.name().replaceAll("\\.toml$", "").replace(" (fitted)", "-fitted")
                .replaceAll("[^A-Za-z0-9._-]+", "-");
        Path p = choose("Save the fitted scenario", "Scenario files (*.toml)", "toml", base);
        if (p == null) {
            return;
        }
        try {
            String why = s.saveTo(p);
            if (why != null) {
                JOptionPane.showMessageDialog(dialog != null ? dialog : frame, why, "Cellwright", JOptionPane.ERROR_MESSAGE);
            }
        } catch (IOException e) {
            JOptionPane.showMessageDialog(dialog != null ? dialog : frame, "Cannot write " + p + ": " + e.getMessage(),
                    "Cellwright", JOptionPane.ERROR_MESSAGE);
        }
    }

    /**
     * Asks for a file and writes the report of the scenario shown, off the event thread.
     *
     * @param format HTML or PDF
     */
    void exportReport(ReportExport.Format format) {
        ScenarioSession s = sessions.get();
        if (lib == null || s == null || s.scenario() == null) {
            return;
        }
        String base = s.name().replaceAll("\\.toml$", "").replaceAll("[^A-Za-z0-9._-]+", "-") + "-report";
        Path p = choose("Write the run report", format.toString(), format.extension(), base);
        if (p != null) {
            writeReport(s.scenario(), s.name(), format, p);
        }
    }

    /**
     * Writes a report off the event thread, saying in the status bar how it went.
     *
     * @param sc the scenario
     * @param source its name
     * @param format HTML or PDF
     * @param p the file
     * @return the worker (for tests)
     */
    SwingWorker<RunReport, Void> writeReport(Scenario sc, String source, ReportExport.Format format, Path p) {
        ChemLibrary library = lib;
        status.busy(true);
        status.say("Running the scenario and writing " + p.getFileName() + "...");
        SwingWorker<RunReport, Void> w = new SwingWorker<>() {
            @Override
            protected RunReport doInBackground() throws IOException {
                return ReportExport.write(sc, source, library, format, p);
            }

            @Override
            protected void done() {
                status.busy(false);
                try {
                    RunReport r = get();
                    status.say("Wrote " + p + " (" + r.cautions().size() + " safety caution"
                            + (r.cautions().size() == 1 ? "" : "s") + ").");
                } catch (ExecutionException e) {
                    Throwable c = e.getCause();
                    status.fail("Cannot write " + p.getFileName() + ": " + (c instanceof IOException
                            || c instanceof IllegalArgumentException ? c.getMessage() : "internal failure: " + c));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        w.execute();
        return w;
    }

    private Path choose(String title, String description, String ext, String base) {
        JFileChooser fc = new JFileChooser(folder);
        fc.setDialogTitle(title);
        fc.setAcceptAllFileFilterUsed(false);
        fc.setFileFilter(new FileNameExtensionFilter(description, ext));
        fc.setSelectedFile(new File(folder, base + "." + ext));
        if (fc.showSaveDialog(dialog != null && dialog.isShowing() ? dialog : frame) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        folder = fc.getCurrentDirectory();
        Path p = fc.getSelectedFile().toPath();
        String name = p.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (!name.endsWith("." + ext) && !(ext.equals("html") && name.endsWith(".htm"))) {
            p = p.resolveSibling(p.getFileName() + "." + ext);
        }
        boolean replace = !Files.exists(p) || JOptionPane.showConfirmDialog(frame, p.getFileName() + " exists. Replace"
                + " it?", "Replace file", JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE)
                == JOptionPane.OK_OPTION;
        return replace ? p : null;
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
        return dialog;
    }

    private static Action action(String name, String tip, KeyStroke key, Runnable r) {
        Action a = new AbstractAction(name) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                r.run();
            }
        };
        a.putValue(Action.SHORT_DESCRIPTION, tip);
        if (key != null) {
            a.putValue(Action.ACCELERATOR_KEY, key);
        }
        return a;
    }
}
