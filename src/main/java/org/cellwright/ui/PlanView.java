package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;
import javax.swing.SwingConstants;
import javax.swing.filechooser.FileNameExtensionFilter;
import javax.swing.table.DefaultTableModel;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.ChartStyle;
import org.cellwright.io.Quantity;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.io.UnitException;
import org.cellwright.io.UnitParser;
import org.cellwright.sim.RunClock;
import org.cellwright.study.SchedulePlan;
import org.cellwright.study.SchedulePlanner;
import org.cellwright.study.ScenarioRunner;
import org.cellwright.study.Sweep;
import org.cellwright.study.TargetIon;
import org.jfree.chart.ChartPanel;

/**
 * "Plan a schedule": a deposit goal with its unit, the highest share of the limiting current and the most
 * steps; the planner runs on worker threads (progress, Cancel), then the view shows the planned current steps
 * over the run against the limiting current, the time to the goal and the constant current it beats, the
 * steps as a table, and offers to apply the schedule to the form (and run it) or save it as a scenario.
 */
final class PlanView extends JDialog {

    private static final long serialVersionUID = 1L;

    private final transient StudyHost host;
    private final JTextField mass = new JTextField(8);
    private final JSpinner fraction = new JSpinner(new SpinnerNumberModel(SchedulePlanner.DEFAULT_MAX_FRACTION,
            0.05, 0.95, 0.05));
    private final JSpinner steps = new JSpinner(new SpinnerNumberModel(SchedulePlanner.DEFAULT_MAX_STEPS, 1, 20, 1));
    private final JButton planButton = new JButton("Plan");
    private final JButton cancelButton = new JButton("Cancel");
    private final JButton applyButton = new JButton("Apply to the form and run");
    private final JButton saveButton = new JButton("Save as scenario...");
    private final JProgressBar bar = new JProgressBar();
    private String messageKey = "muted.foreground";
    private final WrapText message = new WrapText(" ", null, 0, java.awt.Font.PLAIN, 940) {
        private static final long serialVersionUID = 1L;

        @Override
        protected String colourKey() {
            return messageKey;
        }
    };
    private final JPanel chartHolder = new JPanel(new BorderLayout());
    private final DefaultTableModel table = new DefaultTableModel(new Object[] {"step", "from", "to", "current",
        "share of i_L at end", "deposit at end"}, 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private transient StudyTask<SchedulePlan> task;
    private transient SchedulePlan plan;

    /** @param host the main window */
    PlanView(StudyHost host) {
        super(host.frame(), "Plan a schedule", false);
        this.host = host;
        mass.setToolTipText("Mass of the target metal to deposit, with its unit (g, kg, mg, lb, oz)");
        fraction.setToolTipText("<html>Highest share of the target's limiting current. 0.5 stays below the dendritic"
                + " band<br>(from about 0.6: Winand 1992); 0.3 for a compact deposit. See docs/studies.md.</html>");
        steps.setToolTipText("Most current steps: few enough to set by hand on a bench supply");
        planButton.addActionListener(e -> startPlan());
        cancelButton.addActionListener(e -> {
            if (task != null) {
                task.stop();
            }
        });
        cancelButton.setEnabled(false);
        applyButton.setEnabled(false);
        applyButton.setToolTipText("Put the schedule, the goal as a stop and the run time into the form, and run it");
        applyButton.addActionListener(e -> apply());
        saveButton.setEnabled(false);
        saveButton.addActionListener(e -> save());
        bar.setVisible(false);

        JPanel inputs = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 4));
        inputs.add(new JLabel("Deposit"));
        inputs.add(mass);
        inputs.add(new JLabel("at most"));
        inputs.add(fraction);
        inputs.add(new JLabel("of the limiting current, in at most"));
        inputs.add(steps);
        inputs.add(new JLabel("steps"));
        inputs.add(planButton);
        inputs.add(cancelButton);
        inputs.add(bar);
        JPanel actions = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 4));
        actions.add(applyButton);
        actions.add(saveButton);
        JPanel north = new JPanel(new BorderLayout());
        north.setBorder(BorderFactory.createEmptyBorder(6, 6, 0, 6));
        north.add(inputs, BorderLayout.NORTH);
        message.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        message.setOpaque(false);
        north.add(message, BorderLayout.CENTER);
        north.add(actions, BorderLayout.SOUTH);

        JLabel empty = new JLabel("Give the deposit to win and press Plan.", SwingConstants.CENTER);
        empty.setForeground(UiTheme.color("muted.foreground"));
        chartHolder.add(empty, BorderLayout.CENTER);
        chartHolder.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        JTable t = new JTable(table);
        t.setFillsViewportHeight(true);
        JScrollPane tableScroll = new JScrollPane(t);
        tableScroll.setPreferredSize(new Dimension(600, 150));
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, chartHolder, tableScroll);
        split.setResizeWeight(0.75);
        split.setBorder(null);
        getContentPane().add(north, BorderLayout.NORTH);
        getContentPane().add(split, BorderLayout.CENTER);
        setSize(new Dimension(980, 780));
        setLocationRelativeTo(host.frame());
    }

    /** Proposes a goal: half the target metal the bath holds (when the field is empty). */
    void refreshGoal() {
        setTitle("Plan a schedule \u2014 " + host.scenarioName());
        Scenario s = host.scenario();
        if (s == null || !mass.getText().isBlank()) {
            return;
        }
        try {
            TargetIon t = TargetIon.of(s, host.library());
            mass.setText(SweepKeys.num(t.dissolvedKg(s.electrolyte().volumeM3()) * 1000 / 2) + " g");
        } catch (IllegalArgumentException e) {
            fail(e.getMessage());
        }
    }

    /** @param text the deposit goal as typed */
    void setGoal(String text) {
        mass.setText(text);
    }

    /** Plans for the form's scenario, off the event thread. */
    void startPlan() {
        if (task != null) {
            return;
        }
        Scenario s = host.scenario();
        if (s == null) {
            fail("The scenario has problems (marked in the form); fix them to plan.");
            return;
        }
        double kg;
        try {
            Quantity q = UnitParser.parse(mass.getText(), org.cellwright.io.Dimension.MASS);
            if (q.unit().isEmpty()) {
                fail("Give the deposit with its unit, e.g. 30 g.");
                return;
            }
            kg = q.si();
        } catch (UnitException e) {
            fail("Deposit: " + e.getMessage());
            return;
        }
        double f = (Double) fraction.getValue();
        int n = (Integer) steps.getValue();
        planButton.setEnabled(false);
        cancelButton.setEnabled(true);
        say("Planning...");
        task = new StudyTask<>((p, c) -> new SchedulePlanner(host.library(), ScenarioRunner.engine(host.library()),
                Sweep.allCores()).plan(s, kg, f, n, p, c), bar, this::show, this::failed);
        task.start();
    }

    private void show(SchedulePlan p) {
        double took = task.elapsedS();
        task = null;
        plan = p;
        planButton.setEnabled(true);
        cancelButton.setEnabled(false);
        applyButton.setEnabled(true);
        saveButton.setEnabled(true);
        drawChart();
        table.setRowCount(0);
        int k = 1;
        for (SchedulePlan.Step st : p.table()) {
            table.addRow(new Object[] {k++, st.startS() == 0 ? "0" : RunClock.format(st.startS()),
                RunClock.format(st.endS()), SweepKeys.num(st.currentA()) + " A",
                String.format(Locale.ROOT, "%.3f", st.ratioAtEnd()), SweepKeys.num(st.depositKgAtEnd() * 1000) + " g"});
        }
        List<String> notes = new ArrayList<>(p.notes());
        if (Double.isFinite(p.adaptiveS())) {
            notes.add("following the falling limit in 40 small steps would take " + RunClock.format(p.adaptiveS()));
        }
        say(String.format(Locale.ROOT, "%s. Planned with %d runs in %.1f s.%s", PlanChart.summary(p), p.runs(), took,
                notes.isEmpty() ? "" : " Note: " + String.join("; ", notes) + "."));
    }

    /** Draws the plan's chart (again, after the look switched). */
    void drawChart() {
        if (plan == null) {
            return;
        }
        chartHolder.removeAll();
        ChartPanel cp = new ChartPanel(PlanChart.of(plan, ChartStyle.of(host.dark())), 600, 400, 200, 150, 4096, 4096,
                true, false, true, false, false, true, true);
        cp.setMouseWheelEnabled(false);
        cp.setDomainZoomable(false);
        cp.setRangeZoomable(false);
        chartHolder.add(cp, BorderLayout.CENTER);
        chartHolder.revalidate();
        chartHolder.repaint();
    }

    private void failed(Throwable t) {
        task = null;
        planButton.setEnabled(true);
        cancelButton.setEnabled(false);
        fail(t instanceof CancellationException ? "Cancelled." : t instanceof IllegalArgumentException
                ? "No plan: " + t.getMessage() : "Internal failure in the planner: " + t);
    }

    /** Puts the plan's scenario into the form and runs it. */
    void apply() {
        if (plan == null) {
            return;
        }
        try {
            ScenarioDraft d = ScenarioDraft.parse(ScenarioWriter.write(plan.scenario(), host.library()),
                    host.scenarioName());
            if (host.load(d, "the planned schedule")) {
                say("Applied: the form holds the schedule, the goal as a stop and the run time; it is running.");
            }
        } catch (ScenarioException e) {
            fail("The planned scenario does not read back: " + e.getMessage());
        }
    }

    private void save() {
        if (plan == null) {
            return;
        }
        JFileChooser fc = new JFileChooser();
        fc.setDialogTitle("Save the planned scenario");
        fc.setFileFilter(new FileNameExtensionFilter("Scenario files (*.toml)", "toml"));
        fc.setSelectedFile(new File("planned.toml"));
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = fc.getSelectedFile().toPath();
        if (!file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".toml")) {
            file = file.resolveSibling(file.getFileName() + ".toml");
        }
        try {
            // a few hundred bytes: written here, through a temporary file renamed into place
            ScenarioWriter.write(plan.scenario(), host.library(), file);
            say("Saved the planned scenario to " + file + ".");
        } catch (IOException e) {
            fail("Cannot write " + file + ": " + e.getMessage());
        }
    }

    private void say(String text) {
        messageKey = "muted.foreground";
        message.show(text);
        message.repaint();
    }

    private void fail(String text) {
        messageKey = "error.foreground";
        message.show(text);
        message.repaint();
    }

    /** @return the plan shown, or null */
    SchedulePlan shownPlan() {
        return plan;
    }

    /** @return true while planning */
    boolean running() {
        return task != null;
    }

    /** @return the message line */
    String messageText() {
        return message.getText();
    }
}
