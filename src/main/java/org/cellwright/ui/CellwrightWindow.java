package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.concurrent.ExecutionException;

import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JTabbedPane;
import javax.swing.SwingConstants;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.WindowConstants;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioException;

/**
 * Cellwright's desktop window: the scenario form on the left, the run's six charts with the playback bar and
 * the event log in the middle, the what-if sliders, the cautions, the summary and the comparison on the
 * right. Opens on the shipped tin scenario. The chemistry library loads off the event thread at start-up;
 * runs and exports run off it too.
 */
public final class CellwrightWindow implements WindowActions.Commands {

    private final JFrame frame = new JFrame("Cellwright");
    private final WindowDialogs dialogs = new WindowDialogs(frame);
    private final WindowActions actions = new WindowActions(this);
    private final StatusBar status = new StatusBar();
    private final FileCommands files = new FileCommands(dialogs, status, () -> this.session, () -> this.director,
            () -> this.dark);
    private final LogCommands logs = new LogCommands(frame, status, () -> this.session, () -> this.director);
    private final Studies studies = new Studies(frame, () -> this.session);
    private final boolean exitOnClose;
    private RunDirector director;
    private ScenarioSession session;
    private ScenarioForm form;
    private KnobPanel knobs;
    private PlaybackBar bar;
    private ComparisonPanel comparisonPanel;
    private boolean dark;
    private volatile boolean ready;

    private CellwrightWindow(boolean exitOnClose) {
        this.exitOnClose = exitOnClose;
    }

    /**
     * Opens the window (from any thread) and returns once it is on screen; the library and the default
     * scenario load in the background. Closing the window ends the program.
     */
    public static void launch() {
        open(true);
    }

    /**
     * @param exitOnClose true to end the program when the window closes
     * @return the window, shown, still loading (see {@link #isReady()})
     */
    static CellwrightWindow open(boolean exitOnClose) {
        CellwrightWindow[] w = new CellwrightWindow[1];
        Runnable make = () -> {
            UiTheme.install(false);
            w[0] = new CellwrightWindow(exitOnClose);
            w[0].show();
        };
        try {
            if (SwingUtilities.isEventDispatchThread()) {
                make.run();
            } else {
                SwingUtilities.invokeAndWait(make);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while opening the window", e);
        } catch (java.lang.reflect.InvocationTargetException e) {
            throw new IllegalStateException("cannot open the window: " + e.getCause(), e.getCause());
        }
        return w[0];
    }

    private void show() {
        frame.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        javax.swing.JMenuBar menus = actions.menuBar();
        menus.add(studies.menu(), menus.getMenuCount() - 1);
        logs.install(menus, actions.exports);
        frame.setJMenuBar(menus);
        actions.bind(frame.getRootPane());
        actions.refresh(null, false);
        JPanel loading = new JPanel(new BorderLayout(0, 10));
        loading.setBorder(BorderFactory.createEmptyBorder(300, 400, 300, 400));
        JLabel text = new JLabel("Reading the chemistry library...", SwingConstants.CENTER);
        text.setFont(UiTheme.font(2, Font.PLAIN));
        loading.add(text, BorderLayout.CENTER);
        JProgressBar p = new JProgressBar();
        p.setIndeterminate(true);
        loading.add(p, BorderLayout.SOUTH);
        frame.getContentPane().add(loading, BorderLayout.CENTER);
        frame.getContentPane().add(status, BorderLayout.SOUTH);
        frame.setMinimumSize(new Dimension(1100, 700));
        frame.setSize(1600, 1000);
        frame.setLocationRelativeTo(null);
        frame.setVisible(true);
        new SwingWorker<ChemLibrary, Void>() {
            @Override
            protected ChemLibrary doInBackground() {
                return LibraryReader.builtIn();
            }

            @Override
            protected void done() {
                try {
                    build(get());
                } catch (ExecutionException e) {
                    status.fail("The chemistry library cannot be read: " + e.getCause().getMessage());
                    text.setText("The chemistry library cannot be read.");
                    p.setVisible(false);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    private void build(ChemLibrary lib) {
        EventLogPanel events = new EventLogPanel(t -> director.scrubTo(t));
        SummaryPanel summary = new SummaryPanel();
        CautionPanel cautions = new CautionPanel();
        JTabbedPane tabs = new JTabbedPane();
        CautionStrip strip = new CautionStrip(() -> tabs.setSelectedIndex(1));
        RunComparison comparison = new RunComparison();
        ChartGrid grid = new ChartGrid(() -> director == null ? List.of() : director.shown(),
                () -> director.chartDrawn());
        bar = new PlaybackBar(actions.run, actions.pause, actions.toEnd, s -> director.setSpeed(s), t -> director.scrubTo(t));
        director = new RunDirector(lib, new RunPanels(grid, bar, events, summary, cautions, strip, comparison, status),
                this::refreshActions);
        form = new ScenarioForm(lib, () -> session.formEdited());
        knobs = new KnobPanel(new KnobPanel.Listener() {
            @Override
            public void moved(Knob knob, String value, long atNanos) {
                session.knobMoved(knob, value, atNanos);
            }

            @Override
            public void speciesChosen(String species) {
                session.speciesChosen(species);
            }
        });
        session = new ScenarioSession(lib, form, knobs, director, status, this::titleChanged);
        studies.attach(lib, director, form, summary, status);
        comparisonPanel = new ComparisonPanel(comparison, actions.pin, e -> director.setReference(e));

        grid.onNewCharts(logs::chartsChanged);
        JComponent all = WindowLayout.arrange(form, knobs, bar, grid, events, strip, tabs, summary, cautions,
                comparisonPanel);

        logs.ready(lib, tabs);
        frame.getContentPane().removeAll();
        frame.getContentPane().add(all, BorderLayout.CENTER);
        frame.getContentPane().add(status, BorderLayout.SOUTH);
        frame.getContentPane().revalidate();
        frame.repaint();
        ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
        try {
            session.open(t.text(), t.fileName(), null);
        } catch (ScenarioException e) {
            status.fail("The default scenario does not read: " + e.getMessage());
        }
        refreshActions();
        // start with the keyboard on the charts, not in the first form field: Space then plays the run and
        // the title field is not selected whole (and scrolled to its end) by the look and feel
        grid.setFocusable(true);
        javax.swing.SwingUtilities.invokeLater(grid::requestFocusInWindow);
        ready = true;
    }

    private void refreshActions() {
        actions.refresh(director == null ? null : director.state(), session != null && session.scenario() != null);
        logs.refresh();
    }

    private void titleChanged(String name, boolean changed) {
        frame.setTitle("Cellwright \u2014 " + name + (changed ? "  \u2022 changed" : ""));
        refreshActions();
    }

    /** @return true once the library and the default scenario are loaded */
    boolean isReady() {
        return ready;
    }

    /** @return the frame */
    JFrame frame() {
        return frame;
    }

    /** @return the run director (for the smoke test) */
    RunDirector director() {
        return director;
    }

    /** @return the scenario session (for the smoke test) */
    ScenarioSession session() {
        return session;
    }

    /** @return the sliders (for the smoke test) */
    KnobPanel knobs() {
        return knobs;
    }

    /** @return the studies: sweep, plan, bands (for the smoke test) */
    Studies studies() {
        return studies;
    }

    /** @return the status bar (for the smoke test) */
    StatusBar status() {
        return status;
    }

    /** @return the form (for the smoke test) */
    ScenarioForm form() {
        return form;
    }

    /** @return the measured-log and report commands (for the smoke test) */
    LogCommands logs() {
        return logs;
    }

    /** @return the window's actions (for the smoke test) */
    WindowActions actions() {
        return actions;
    }

    /** @return the window painted into an image (call on the event thread) */
    BufferedImage snapshot() {
        JComponent root = frame.getRootPane();
        BufferedImage img = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        root.paint(g);
        g.dispose();
        return img;
    }

    /** Closes the window without asking (for the smoke test). */
    void dispose() {
        frame.dispose();
    }

    @Override
    public void newFromTemplate() {
        files.newFromTemplate();
    }

    @Override
    public void open() {
        files.open();
    }

    @Override
    public void save() {
        files.save();
    }

    @Override
    public void saveAs() {
        files.saveAs();
    }

    @Override
    public void export(RunExport.Kind kind) {
        files.export(kind);
    }

    @Override
    public void quit() {
        if (!files.discardOrSave()) {
            return;
        }
        frame.dispose();
        if (exitOnClose) {
            System.exit(0);
        }
    }

    @Override
    public void run() {
        if (session != null) {
            session.run();
        }
    }

    @Override
    public void togglePause() {
        if (director != null) {
            director.togglePause();
        }
    }

    @Override
    public void jumpToEnd() {
        if (director != null) {
            director.jumpToEnd();
        }
    }

    @Override
    public void pin() {
        if (director != null && director.result() != null) {
            comparisonPanel.pinAndSelect();
            status.say("Pinned. It is drawn dashed: move a slider or edit the form to compare.");
        }
    }

    @Override
    public void clearReference() {
        if (comparisonPanel != null) {
            comparisonPanel.table().clearSelection();
            director.setReference(null);
        }
    }

    @Override
    public void toggleDark() {
        dark = !dark;
        UiTheme.switchTo(dark);
        actions.dark.putValue(Action.SELECTED_KEY, dark);
        if (director != null) {
            director.setDark(dark);
        }
    }

    /** @return true when the dark look is on */
    boolean isDark() {
        return dark;
    }

    @Override
    public void showShortcuts() {
        dialogs.showShortcuts();
    }

    @Override
    public void showAbout() {
        dialogs.showAbout();
    }
}
