package org.cellwright.ui;

import java.awt.event.ActionEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.ExecutionException;
import java.util.function.Supplier;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.SwingWorker;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.RunReport;
import org.cellwright.chem.ChemLibrary;

/**
 * The report entries of the export menu: "Report (HTML)..." and "Report (PDF)..." write the report of the
 * scenario shown through {@link ReportExport} (the code of {@code cellwright report}) on a worker thread, and
 * say in the status bar how it went.
 */
final class ReportCommands {

    final Action html;
    final Action pdf;

    private final StatusBar status;
    private final Supplier<ScenarioSession> sessions;
    private final FileChoice files;
    private ChemLibrary lib;

    /**
     * @param status the status bar
     * @param sessions the scenario session (null until the library is loaded)
     * @param files the window's file choosers
     */
    ReportCommands(StatusBar status, Supplier<ScenarioSession> sessions, FileChoice files) {
        this.status = status;
        this.sessions = sessions;
        this.files = files;
        html = action("Report (HTML)...", "Run the scenario shown and write its report as one HTML file",
                ReportExport.Format.HTML);
        pdf = action("Report (PDF)...", "Run the scenario shown and write its report as PDF", ReportExport.Format.PDF);
        refresh(null);
    }

    private Action action(String name, String tip, ReportExport.Format format) {
        Action a = new AbstractAction(name) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                exportReport(format);
            }
        };
        a.putValue(Action.SHORT_DESCRIPTION, tip);
        return a;
    }

    /** @param library the chemistry library once loaded (null before); enables the entries with a scenario */
    void refresh(ChemLibrary library) {
        lib = library;
        ScenarioSession s = sessions.get();
        boolean on = lib != null && s != null && s.scenario() != null;
        html.setEnabled(on);
        pdf.setEnabled(on);
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
        Path p = files.save(null, "Write the run report", format.toString(), format.extension(), base);
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
        if (library == null) {
            throw new IllegalStateException("the chemistry library is not loaded yet");
        }
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

}
