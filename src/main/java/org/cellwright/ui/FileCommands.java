package org.cellwright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.ExecutionException;
import java.util.function.BooleanSupplier;
import java.util.function.Supplier;

import javax.swing.JOptionPane;
import javax.swing.SwingWorker;

import org.cellwright.io.ScenarioException;
import org.cellwright.sim.RunResult;

/**
 * The window's file commands: new from a template, open, save, save as (asking before changes are lost),
 * and export (written off the event thread).
 */
final class FileCommands {

    private final WindowDialogs dialogs;
    private final StatusBar status;
    private final Supplier<ScenarioSession> sessions;
    private final Supplier<RunDirector> directors;
    private final BooleanSupplier dark;

    /**
     * @param dialogs the window's dialogs
     * @param status the status bar
     * @param sessions the scenario session (null until the library is loaded)
     * @param directors the run director (null until the library is loaded)
     * @param dark whether the dark look is on (chart sheets follow it)
     */
    FileCommands(WindowDialogs dialogs, StatusBar status, Supplier<ScenarioSession> sessions,
                 Supplier<RunDirector> directors, BooleanSupplier dark) {
        this.dialogs = dialogs;
        this.status = status;
        this.sessions = sessions;
        this.directors = directors;
        this.dark = dark;
    }

    /** @return true when there are no unsaved changes, or the user saved or dropped them */
    boolean discardOrSave() {
        if (sessions.get() == null || !sessions.get().changed()) {
            return true;
        }
        int answer = dialogs.confirmDiscard(sessions.get().name());
        if (answer == JOptionPane.YES_OPTION) {
            save();
            return !sessions.get().changed();
        }
        return answer == JOptionPane.NO_OPTION;
    }

    /** Starts a new scenario from a shipped one. */
    void newFromTemplate() {
        if (sessions.get() != null && discardOrSave()) {
            ScenarioTemplate t = dialogs.chooseTemplate();
            if (t != null) {
                sessions.get().newFrom(t);
            }
        }
    }

    /** Opens a scenario file; a file that does not read leaves everything as it was. */
    void open() {
        if (sessions.get() == null || !discardOrSave()) {
            return;
        }
        Path p = dialogs.chooseScenarioToOpen();
        if (p == null) {
            return;
        }
        try {
            sessions.get().openFile(p);
        } catch (ScenarioException e) {
            dialogs.showProblems(p.getFileName().toString(), e.problems());
        } catch (IOException e) {
            dialogs.showError("Cannot read " + p + ": " + e.getMessage());
        }
    }

    /** Saves to the scenario's file, or asks for one. */
    void save() {
        if (sessions.get() == null) {
            return;
        }
        if (sessions.get().file() == null) {
            saveAs();
            return;
        }
        saveTo(sessions.get().file());
    }

    /** Saves to a file the user chooses. */
    void saveAs() {
        if (sessions.get() != null) {
            String base = sessions.get().file() != null ? sessions.get().file().getFileName().toString() : "scenario.toml";
            Path p = dialogs.chooseScenarioToSave(base);
            if (p != null) {
                saveTo(p);
            }
        }
    }

    private void saveTo(Path p) {
        try {
            String why = sessions.get().saveTo(p);
            if (why != null) {
                dialogs.showError(why);
            }
        } catch (IOException e) {
            dialogs.showError("Cannot write " + p + ": " + e.getMessage());
        }
    }

    /** @param kind what to export, or null to let the user choose by file type */
    void export(RunExport.Kind kind) {
        RunResult run = directors.get() == null ? null : directors.get().result();
        if (run == null) {
            return;
        }
        String base = sessions.get().name().replaceAll("\\.toml$", "").replaceAll("[^A-Za-z0-9._-]+", "-");
        Path p = dialogs.chooseExport(base, kind);
        if (p == null) {
            return;
        }
        RunComparison.Entry ref = directors.get().reference();
        String label = sessions.get().name();
        boolean darkSheet = dark.getAsBoolean();
        status.busy(true);
        status.say("Exporting " + p.getFileName() + "...");
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws IOException {
                RunExport.write(run, label, ref == null ? null : ref.run(), ref == null ? null : ref.name(), darkSheet, p);
                return null;
            }

            @Override
            protected void done() {
                status.busy(false);
                try {
                    get();
                    status.say("Exported " + p + ".");
                } catch (ExecutionException e) {
                    status.fail("Cannot export " + p.getFileName() + ": " + e.getCause().getMessage());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }
}
