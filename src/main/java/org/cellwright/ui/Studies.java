package org.cellwright.ui;

import java.awt.event.KeyEvent;
import java.beans.PropertyChangeListener;
import java.util.function.Supplier;

import javax.swing.JCheckBoxMenuItem;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuItem;
import javax.swing.UIManager;
import javax.swing.event.MenuEvent;
import javax.swing.event.MenuListener;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;

/**
 * The window's studies: the "Studies" menu (sweep, plan a schedule, uncertainty bands), the views it opens
 * and the bands on the main charts. The window hands it its parts once the library has loaded
 * ({@link #attach}); it serves the views as their {@link StudyHost}. Event thread only.
 */
final class Studies implements StudyHost {

    private final JFrame frame;
    private final Supplier<ScenarioSession> session;
    private final JMenuItem sweepItem = new JMenuItem("Sweep...");
    private final JMenuItem planItem = new JMenuItem("Plan a schedule...");
    private final JCheckBoxMenuItem bandsItem = new JCheckBoxMenuItem("Uncertainty bands");
    private ChemLibrary lib;
    private ScenarioForm form;
    private StatusBar status;
    private BandsOverlay bands;
    private RangesPanel ranges;
    private SweepView sweep;
    private PlanView plan;

    /**
     * @param frame the main window
     * @param session the scenario session (null until the library has loaded)
     */
    Studies(JFrame frame, Supplier<ScenarioSession> session) {
        this.frame = frame;
        this.session = session;
        sweepItem.setToolTipText("Run the scenario over a grid of one or two keys; heat map or line of a figure");
        sweepItem.setMnemonic(KeyEvent.VK_S);
        sweepItem.addActionListener(e -> openSweep());
        planItem.setToolTipText("The current steps that win a deposit in the least time within a share of the"
                + " limiting current");
        planItem.setMnemonic(KeyEvent.VK_P);
        planItem.addActionListener(e -> openPlan());
        bandsItem.setToolTipText("Shade the 5-95 % range the uncertain inputs give on the charts; ranges under the"
                + " summary");
        bandsItem.setMnemonic(KeyEvent.VK_U);
        bandsItem.addActionListener(e -> toggleBands(bandsItem.isSelected()));
        PropertyChangeListener restyle = e -> {
            if ("lookAndFeel".equals(e.getPropertyName())) {
                if (sweep != null) {
                    sweep.redraw();
                }
                if (plan != null) {
                    plan.drawChart();
                }
            }
        };
        UIManager.addPropertyChangeListener(restyle);
    }

    /** @return the menu, its items enabled once a scenario checks out */
    JMenu menu() {
        JMenu m = new JMenu("Studies");
        m.setMnemonic(KeyEvent.VK_S);
        m.add(sweepItem);
        m.add(planItem);
        m.addSeparator();
        m.add(bandsItem);
        m.addMenuListener(new MenuListener() {
            @Override
            public void menuSelected(MenuEvent e) {
                boolean on = scenario() != null;
                sweepItem.setEnabled(on);
                planItem.setEnabled(on);
                bandsItem.setEnabled(on || bandsItem.isSelected());
            }

            @Override
            public void menuDeselected(MenuEvent e) {
            }

            @Override
            public void menuCanceled(MenuEvent e) {
            }
        });
        return m;
    }

    /**
     * Takes the window's parts once the library has loaded.
     *
     * @param library the chemistry
     * @param director shows runs; the bands follow its charts
     * @param scenarioForm the form
     * @param summary the summary panel (the ranges go under it)
     * @param statusBar the status bar
     */
    void attach(ChemLibrary library, RunDirector director, ScenarioForm scenarioForm, SummaryPanel summary,
                StatusBar statusBar) {
        this.lib = library;
        this.form = scenarioForm;
        this.status = statusBar;
        ranges = new RangesPanel(() -> toggleBands(true), () -> bands.cancel());
        summary.addSection(ranges);
        bands = new BandsOverlay(this, director, ranges, on -> bandsItem.setSelected(on));
        director.onChartsChanged(bands::chartsChanged);
    }

    /** Opens (or brings up) the sweep view. */
    void openSweep() {
        if (lib == null) {
            return;
        }
        if (sweep == null) {
            sweep = new SweepView(this);
        }
        sweep.refreshKeys();
        sweep.setVisible(true);
        sweep.toFront();
    }

    /** Opens (or brings up) the plan view. */
    void openPlan() {
        if (lib == null) {
            return;
        }
        if (plan == null) {
            plan = new PlanView(this);
        }
        plan.refreshGoal();
        plan.setVisible(true);
        plan.toFront();
    }

    /** @param on true to compute and show the bands, false to take them off */
    void toggleBands(boolean on) {
        if (bands == null) {
            bandsItem.setSelected(false);
            return;
        }
        if (on) {
            bands.compute();
        } else {
            bands.off();
        }
    }

    /** @return the sweep view, or null before it was opened */
    SweepView sweepView() {
        return sweep;
    }

    /** @return the plan view, or null before it was opened */
    PlanView planView() {
        return plan;
    }

    /** @return the bands on the charts */
    BandsOverlay bands() {
        return bands;
    }

    /** @return the ranges section under the summary */
    RangesPanel ranges() {
        return ranges;
    }

    @Override
    public ChemLibrary library() {
        return lib;
    }

    @Override
    public Scenario scenario() {
        ScenarioSession s = session.get();
        return s == null ? null : s.scenario();
    }

    @Override
    public ScenarioDraft draftCopy() {
        return form.draft().copy();
    }

    @Override
    public String scenarioName() {
        ScenarioSession s = session.get();
        return s == null ? "untitled" : s.name();
    }

    @Override
    public boolean dark() {
        return UiTheme.isDark();
    }

    @Override
    public JFrame frame() {
        return frame;
    }

    @Override
    public boolean load(ScenarioDraft d, String what) {
        ScenarioSession s = session.get();
        return s != null && s.showVariant(d, what);
    }

    @Override
    public void say(String text) {
        if (status != null) {
            status.say(text);
        }
    }
}
