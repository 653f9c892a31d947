package org.cellwright.ui;

import java.awt.Color;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;

import org.cellwright.study.Percentiles;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SpreadStudy;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.UncertainInput;

/**
 * The uncertainty section under the run summary: how many samples, the progress and Cancel while the spread
 * study runs, then each figure's nominal value with its 5-95 % range and median, and a note when the bands
 * were cleared because the scenario changed. Event thread only.
 */
final class RangesPanel extends JPanel {

    private static final long serialVersionUID = 1L;
    /** Samples proposed: enough for the 5th and 95th percentiles to settle to a few per cent (our own choice). */
    static final int DEFAULT_SAMPLES = 40;

    private final JLabel title = new JLabel("Uncertainty ranges (5-95 %)");
    private final JSpinner samples = new JSpinner(new SpinnerNumberModel(DEFAULT_SAMPLES, 5, SpreadStudy.MAX_SAMPLES, 5));
    private final JButton compute = new JButton("Compute");
    private final JButton cancel = new JButton("Cancel");
    private final JProgressBar bar = new JProgressBar();
    private final WrapText note = new WrapText("", "muted.foreground", 0, Font.PLAIN, 330);
    private final JPanel rows = new JPanel(new GridBagLayout());
    private final List<String> shown = new ArrayList<>();

    /**
     * @param onCompute pressed Compute (or Recompute)
     * @param onCancel pressed Cancel
     */
    RangesPanel(Runnable onCompute, Runnable onCancel) {
        super(new GridBagLayout());
        setOpaque(false);
        title.setFont(UiTheme.font(0, Font.BOLD));
        StringBuilder tip = new StringBuilder("<html>The scenario run again with the uncertain inputs drawn from their"
                + " spreads:");
        for (UncertainInput in : UncertainInput.values()) {
            tip.append("<br>").append(in.description()).append(": ").append(in.distribution());
        }
        tip.append("<br>Sources in docs/studies.md. Percentiles: Hyndman and Fan (1996), definition 7.</html>");
        title.setToolTipText(tip.toString());
        samples.setToolTipText("How many samples of the uncertain inputs (same seed, same samples)");
        compute.addActionListener(e -> onCompute.run());
        compute.setToolTipText("Run the spread study for the scenario shown and shade the 5-95 % bands on the charts");
        cancel.addActionListener(e -> onCancel.run());
        cancel.setVisible(false);
        bar.setVisible(false);
        rows.setOpaque(false);
        JPanel controls = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        controls.setOpaque(false);
        controls.add(new JLabel("Samples"));
        controls.add(samples);
        controls.add(compute);
        controls.add(cancel);
        add(title, at(0));
        add(controls, at(1));
        add(bar, at(2));
        add(note, at(3));
        add(rows, at(4));
        note.show("Shade the charts with the range the uncertain inputs give (Studies > Uncertainty bands).");
    }

    /** @return how many samples to draw */
    int samples() {
        return (Integer) samples.getValue();
    }

    /** @param n how many samples to draw next time */
    void setSamples(int n) {
        samples.setValue(n);
    }

    /** @return the progress bar the study reports to */
    JProgressBar bar() {
        return bar;
    }

    /** @param on true while the study runs */
    void running(boolean on) {
        compute.setEnabled(!on);
        cancel.setVisible(on);
        if (on) {
            note.show("Running the scenario with its uncertain inputs varied...");
            clearRows();
        }
    }

    /**
     * Shows a study's ranges.
     *
     * @param r the study
     * @param elapsedS how long it took (s)
     */
    void show(SpreadResult r, double elapsedS) {
        compute.setText("Recompute");
        note.show(String.format(Locale.ROOT, "%d of %d samples ran (seed %d) in %.1f s%s; shaded on the charts.",
                r.ran(), r.samples(), r.seed(), elapsedS, r.cancelled() ? ", cancelled" : "")
                + (r.failures().isEmpty() ? "" : " " + r.failures().size() + " failed: " + r.failures().get(0)));
        clearRows();
        int row = 0;
        rows.add(head("figure"), cell(row, 0));
        rows.add(head("nominal"), cell(row, 1));
        rows.add(head("5-95 % (median)"), cell(row++, 2));
        for (SummaryFigure f : SummaryFigure.values()) {
            Percentiles p = r.figures().get(f);
            if (p == null || !Double.isFinite(p.p50())) {
                continue;
            }
            String nominal = num(f.display(r.nominal().summary()));
            String range = num(f.toDisplay(p.p5())) + " to " + num(f.toDisplay(p.p95())) + " ("
                    + num(f.toDisplay(p.p50())) + ")";
            JLabel name = new JLabel(f.description() + ", " + f.displayUnit());
            name.setForeground(UiTheme.color("muted.foreground"));
            name.setToolTipText(f.label());
            rows.add(name, cell(row, 0));
            rows.add(new JLabel(nominal), cell(row, 1));
            rows.add(new JLabel(range), cell(row++, 2));
            shown.add(f.description() + ": " + nominal + "; " + range);
        }
        revalidate();
        repaint();
        // bring the ranges into view in the summary's scroll pane
        javax.swing.SwingUtilities.invokeLater(() -> scrollRectToVisible(new java.awt.Rectangle(0, 0, getWidth(),
                getHeight())));
    }

    /**
     * Says that the bands are gone (the scenario changed, or they were switched off).
     *
     * @param why in plain words
     */
    void cleared(String why) {
        compute.setText("Compute");
        note.show(why);
        clearRows();
    }

    /** @param text a failure to show */
    void failed(String text) {
        note.show(text);
    }

    /** @return the rows shown, "figure: nominal; range" (for tests) */
    List<String> shownRows() {
        return List.copyOf(shown);
    }

    /** @return the note shown */
    String noteText() {
        return note.getText();
    }

    private void clearRows() {
        rows.removeAll();
        shown.clear();
        revalidate();
        repaint();
    }

    private static JLabel head(String text) {
        JLabel l = new JLabel(text);
        l.setFont(UiTheme.font(-1, Font.BOLD));
        Color c = UiTheme.color("section.foreground");
        l.setForeground(c);
        return l;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3g", v) : "-";
    }

    private static GridBagConstraints at(int row) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = 0;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.anchor = GridBagConstraints.NORTHWEST;
        c.insets = new Insets(row == 0 ? 0 : 4, 0, 0, 0);
        return c;
    }

    private static GridBagConstraints cell(int row, int col) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = col;
        c.weightx = col == 0 ? 1 : 0;
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(2, 0, 0, 8);
        return c;
    }
}
