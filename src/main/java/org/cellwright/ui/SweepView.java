package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;

import javax.swing.BorderFactory;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingConstants;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.SweepCharts;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioVariants;
import org.cellwright.io.SweepCsvWriter;
import org.cellwright.study.ScenarioRunner;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.jfree.chart.ChartMouseEvent;
import org.jfree.chart.ChartMouseListener;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYShapeAnnotation;
import org.jfree.chart.entity.XYItemEntity;
import org.jfree.chart.plot.XYPlot;

/**
 * The sweep view: one or two scenario keys (the common ones offered with ranges around the scenario's values,
 * or any key typed with units), N values each and a figure; the grid runs on worker threads with a progress
 * bar and Cancel, then shows as a heat map (two keys) or a line (one key). A click on a cell or a point loads
 * that run's scenario into the main window and plays it, so the user can see why that corner is what it is.
 * The table exports as CSV, as the command line's {@code sweep --out} writes it.
 */
final class SweepView extends JDialog {

    private static final long serialVersionUID = 1L;
    /** Outline of the chosen cell: a rose that stands out on both ends of the heat scale (our own choice). */
    private static final java.awt.Color MARK = new java.awt.Color(0xD0, 0x2F, 0x6A);

    private final transient StudyHost host;
    private final SweepAxisRow across;
    private final SweepAxisRow up;
    private final JComboBox<SummaryFigure> figure = new JComboBox<>(SummaryFigure.values());
    private final JButton runButton = new JButton("Run sweep");
    private final JButton cancelButton = new JButton("Cancel");
    private final JButton exportButton = new JButton("Export CSV...");
    private final JProgressBar bar = new JProgressBar();
    private final JLabel message = new JLabel(" ");
    private final JPanel chartHolder = new JPanel(new BorderLayout());
    private transient StudyTask<SweepResult> task;
    private transient SweepResult result;
    private transient ScenarioDraft base;
    private String baseName;
    private ChartPanel chartPanel;

    /** @param host the main window */
    SweepView(StudyHost host) {
        super(host.frame(), "Sweep", false);
        this.host = host;
        across = new SweepAxisRow(false);
        up = new SweepAxisRow(true);
        figure.setRenderer(new DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public java.awt.Component getListCellRendererComponent(JList<?> list, Object value, int index,
                                                                   boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof SummaryFigure f ? f.label() : value,
                        index, selected, focus);
            }
        });
        figure.setToolTipText("The run figure the chart shows; the CSV holds them all");
        figure.addActionListener(e -> redraw());
        runButton.addActionListener(e -> runSweep());
        runButton.setToolTipText("Run every point of the grid on all cores");
        cancelButton.addActionListener(e -> {
            if (task != null) {
                task.stop();
            }
        });
        cancelButton.setEnabled(false);
        exportButton.setEnabled(false);
        exportButton.addActionListener(e -> exportCsv());
        exportButton.setToolTipText("The whole table: every point's values (as given and SI), status and figures");
        bar.setVisible(false);

        JPanel controls = new JPanel(new GridBagLayout());
        controls.setBorder(BorderFactory.createEmptyBorder(10, 10, 4, 10));
        String[] heads = {"", "key", "from", "to", "values", "log"};
        for (int c = 0; c < heads.length; c++) {
            JLabel h = new JLabel(heads[c]);
            h.setFont(UiTheme.font(-1, Font.BOLD));
            controls.add(h, at(0, c));
        }
        across.addTo(controls, 1, "Across");
        up.addTo(controls, 2, "Up");
        controls.add(new JLabel("Figure"), at(3, 0));
        GridBagConstraints fc = at(3, 1);
        controls.add(figure, fc);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        buttons.add(runButton);
        buttons.add(cancelButton);
        buttons.add(exportButton);
        buttons.add(bar);
        GridBagConstraints bc = at(3, 2);
        bc.gridwidth = 4;
        controls.add(buttons, bc);
        GridBagConstraints mc = at(4, 0);
        mc.gridwidth = 6;
        controls.add(message, mc);

        JLabel hint = new JLabel("Click a cell (or a point) to load that run into the main window and play it.");
        hint.setBorder(BorderFactory.createEmptyBorder(2, 12, 8, 12));
        hint.setForeground(UiTheme.color("muted.foreground"));
        chartHolder.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        JLabel empty = new JLabel("Choose one or two keys and press Run sweep.", SwingConstants.CENTER);
        empty.setForeground(UiTheme.color("muted.foreground"));
        chartHolder.add(empty, BorderLayout.CENTER);
        getContentPane().add(controls, BorderLayout.NORTH);
        getContentPane().add(chartHolder, BorderLayout.CENTER);
        getContentPane().add(hint, BorderLayout.SOUTH);
        setSize(new Dimension(980, 760));
        setLocationRelativeTo(host.frame());
    }

    /** Offers the keys of the form's scenario; keeps what the user typed when the keys stay. */
    void refreshKeys() {
        Scenario s = host.scenario();
        setTitle("Sweep \u2014 " + host.scenarioName());
        if (s == null) {
            return;
        }
        List<SweepKeys.Choice> keys = SweepKeys.of(s, host.library());
        across.offer(keys, 0);
        up.offer(keys, 2);
    }

    /** @return the axes as typed, one or two */
    List<SweepAxis> axes() {
        List<SweepAxis> axes = new ArrayList<>();
        axes.add(across.axis());
        if (!up.off()) {
            axes.add(up.axis());
        }
        return axes;
    }

    /** Starts the sweep of the form's scenario over the axes typed. */
    void runSweep() {
        if (task != null) {
            return;
        }
        List<SweepAxis> axes;
        ScenarioVariants variants;
        base = host.draftCopy();
        baseName = host.scenarioName();
        DraftCheck.Outcome o = DraftCheck.draft(base, host.library(), baseName);
        if (!o.ok()) {
            fail("The scenario has problems (marked in the form); fix them to sweep it.");
            return;
        }
        Sweep sweep;
        try {
            axes = axes();
            variants = ScenarioVariants.ofText(host.library(), o.text(), baseName, List.of(), axes);
            sweep = new Sweep(axes, variants, ScenarioRunner.engine(host.library()));
        } catch (IllegalArgumentException e) {
            fail(e.getMessage());
            return;
        } catch (ScenarioException e) {
            fail("The scenario does not read: " + e.getMessage());
            return;
        }
        int points = sweep.grid().size();
        say("Running " + points + " points on " + Sweep.allCores() + " threads...");
        runButton.setEnabled(false);
        cancelButton.setEnabled(true);
        task = new StudyTask<>((p, c) -> sweep.run(Sweep.allCores(), p, c), bar, this::show, this::failed);
        task.start();
    }

    private void show(SweepResult r) {
        task = null;
        result = r;
        runButton.setEnabled(true);
        cancelButton.setEnabled(false);
        exportButton.setEnabled(true);
        redraw();
        String failures = r.failures().isEmpty() ? "" : "; " + r.failures().size() + " failed (grey)";
        say(String.format(Locale.ROOT, "%d of %d points ran in %.1f s on %d threads%s%s.", r.okCount(),
                r.points().size(), r.elapsedS(), r.threads(), failures, r.cancelled() ? " (cancelled)" : ""));
    }

    private void failed(Throwable t) {
        task = null;
        runButton.setEnabled(true);
        cancelButton.setEnabled(false);
        fail(t instanceof CancellationException ? "Cancelled." : t instanceof IllegalArgumentException
                ? t.getMessage() : "Internal failure in the sweep: " + t);
    }

    /** Draws the result again (a new figure, or the look switched). */
    void redraw() {
        if (result == null) {
            return;
        }
        SummaryFigure f = (SummaryFigure) figure.getSelectedItem();
        JFreeChart chart = SweepCharts.of(result, f, host.scenarioName(), ChartStyle.of(host.dark()));
        XYPlot plot = chart.getXYPlot();
        plot.getRenderer().setDefaultToolTipGenerator((data, series, item) ->
                SweepPick.tooltip(result, f, SweepPick.at(result, data, series, item)));
        chartHolder.removeAll();
        chartPanel = new ChartPanel(chart, 600, 450, 200, 150, 4096, 4096, true, false, true, false, false, true, true);
        chartPanel.setMouseWheelEnabled(false);
        chartPanel.setDomainZoomable(false);
        chartPanel.setRangeZoomable(false);
        chartPanel.setInitialDelay(150);
        chartPanel.addChartMouseListener(new ChartMouseListener() {
            @Override
            public void chartMouseClicked(ChartMouseEvent e) {
                if (e.getEntity() instanceof XYItemEntity ie) {
                    pick(SweepPick.at(result, ie.getDataset(), ie.getSeriesIndex(), ie.getItem()));
                }
            }

            @Override
            public void chartMouseMoved(ChartMouseEvent e) {
            }
        });
        chartHolder.add(chartPanel, BorderLayout.CENTER);
        chartHolder.revalidate();
        chartHolder.repaint();
    }

    /**
     * Loads a point's scenario into the main window and marks its cell.
     *
     * @param p the point, or null
     */
    void pick(SweepPoint p) {
        if (p == null) {
            return;
        }
        String words = SweepPick.describe(p, result.axes());
        if (p.scenario() == null) {
            fail("This point did not run: " + p.message());
            return;
        }
        mark(p);
        ScenarioDraft d = SweepPick.draftOf(base, p, result.axes(), host.library(), baseName);
        if (host.load(d, "the sweep point " + words)) {
            say("Loaded " + words + " into the main window.");
        }
    }

    /** Outlines the chosen cell of the heat map (or rings the chosen point of the line). */
    private void mark(SweepPoint p) {
        XYPlot plot = chartPanel.getChart().getXYPlot();
        plot.clearAnnotations();
        plot.addAnnotation(new XYShapeAnnotation(SweepPick.outline(plot, result, p), new BasicStroke(2.5f), MARK, null));
    }

    private void exportCsv() {
        if (result == null) {
            return;
        }
        JFileChooser fc = new JFileChooser();
        fc.setDialogTitle("Export the sweep table");
        fc.setFileFilter(new FileNameExtensionFilter("CSV table (*.csv)", "csv"));
        fc.setSelectedFile(new File("sweep.csv"));
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = fc.getSelectedFile().toPath();
        Path target = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv") ? file
                : file.resolveSibling(file.getFileName() + ".csv");
        exportTo(target);
    }

    /**
     * Writes the sweep table off the event thread.
     *
     * @param target the CSV file
     * @return the worker (done when written)
     */
    SwingWorker<Void, Void> exportTo(Path target) {
        SweepResult r = result;
        SwingWorker<Void, Void> w = new SwingWorker<>() {
            @Override
            protected Void doInBackground() throws IOException {
                AtomicFile.write(target, out -> SweepCsvWriter.write(r, out));
                return null;
            }

            @Override
            protected void done() {
                try {
                    get();
                    say("Wrote " + target + ".");
                } catch (java.util.concurrent.ExecutionException e) {
                    fail("Cannot write " + target + ": " + e.getCause().getMessage());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        w.execute();
        return w;
    }

    private void say(String text) {
        message.setForeground(null);
        message.setText(text);
    }

    private void fail(String text) {
        message.setForeground(UiTheme.color("error.foreground"));
        message.setText(text);
    }

    /** @return the sweep shown, or null (for tests) */
    SweepResult result() {
        return result;
    }

    /** @return true while a sweep runs */
    boolean running() {
        return task != null;
    }

    /** @return the message line (for tests) */
    String messageText() {
        return message.getText();
    }

    /** @param f the figure to show */
    void setFigure(SummaryFigure f) {
        figure.setSelectedItem(f);
    }

    /** @return the first axis row (for tests and screenshots) */
    SweepAxisRow across() {
        return across;
    }

    /** @return the second axis row */
    SweepAxisRow up() {
        return up;
    }

    /** @return the grid cell of a control in the controls' layout */
    static GridBagConstraints at(int row, int col) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = col;
        c.anchor = GridBagConstraints.WEST;
        c.fill = col == 1 ? GridBagConstraints.HORIZONTAL : GridBagConstraints.NONE;
        c.weightx = col == 1 ? 1 : 0;
        c.insets = new Insets(2, 0, 2, 8);
        return c;
    }
}
