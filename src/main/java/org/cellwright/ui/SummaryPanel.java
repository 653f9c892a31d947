package org.cellwright.ui;

import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.util.ArrayList;
import java.util.List;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;

import org.cellwright.sim.RunResult;

/**
 * A run's summary beside the charts: the key figures (each with a tooltip saying how it is reckoned) and
 * where the charge went at each electrode, in plain words. Its rows are made once and then only get new text,
 * so that a replot after every slider move costs next to nothing here.
 */
final class SummaryPanel extends ColumnPanel {

    private static final long serialVersionUID = 1L;
    /** Most figure rows (see {@link SummaryFigures#of}). */
    private static final int FIGURE_ROWS = 14;
    /** Most "where the charge went" lines: one per electrode. */
    private static final int SHARE_ROWS = 2;

    private final WrapText head = new WrapText("", null, 0, Font.BOLD, 330);
    private final List<JLabel> labels = new ArrayList<>();
    private final List<WrapText> values = new ArrayList<>();
    private final JLabel where = new JLabel("Where the charge went");
    private final List<WrapText> shares = new ArrayList<>();
    private final JPanel sections = new JPanel();
    private final WrapText empty = new WrapText("Run the scenario (F5) or move a slider: the deposit, current"
            + " efficiency, specific energy, time to short and the deposit's form appear here.", "muted.foreground",
            0, Font.PLAIN, 330);

    SummaryPanel() {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        int row = 0;
        add(empty, GridPlace.pairCell(row++, 0, 2, 0));
        add(head, GridPlace.pairCell(row++, 0, 2, 0));
        for (int i = 0; i < FIGURE_ROWS; i++) {
            JLabel l = new JLabel() {
                private static final long serialVersionUID = 1L;

                @Override
                public java.awt.Color getForeground() {
                    return UiTheme.color("muted.foreground");
                }
            };
            WrapText v = new WrapText("", null, 0, Font.PLAIN, 200);
            labels.add(l);
            values.add(v);
            add(l, GridPlace.pairCell(row, 0, 1, 4));
            add(v, GridPlace.pairCell(row++, 1, 1, 4));
        }
        where.setFont(UiTheme.font(0, Font.BOLD));
        where.setToolTipText("Each electrode reaction's share of the charge passed, largest first.");
        add(where, GridPlace.pairCell(row++, 0, 2, 12));
        for (int i = 0; i < SHARE_ROWS; i++) {
            WrapText s = new WrapText("", null, 0, Font.PLAIN, 330);
            shares.add(s);
            add(s, GridPlace.pairCell(row++, 0, 2, 3));
        }
        sections.setOpaque(false);
        sections.setLayout(new javax.swing.BoxLayout(sections, javax.swing.BoxLayout.Y_AXIS));
        add(sections, GridPlace.pairCell(row++, 0, 2, 12));
        GridBagConstraints c = GridPlace.pairCell(row, 0, 2, 0);
        c.weighty = 1;
        add(new JLabel(), c);
        clear();
    }

    /**
     * Adds a section under the summary (the uncertainty ranges), shown whatever the run.
     *
     * @param section the section
     */
    void addSection(javax.swing.JComponent section) {
        section.setAlignmentX(LEFT_ALIGNMENT);
        sections.add(section);
        revalidate();
    }

    /** Shows that nothing has run yet. */
    void clear() {
        empty.setVisible(true);
        head.setVisible(false);
        labels.forEach(l -> l.setVisible(false));
        values.forEach(v -> v.setVisible(false));
        where.setVisible(false);
        shares.forEach(s -> s.setVisible(false));
        revalidate();
        repaint();
    }

    /**
     * @param title the run's label
     * @param r the run
     */
    void show(String title, RunResult r) {
        empty.setVisible(false);
        head.setVisible(true);
        head.show("Whole run: " + title);
        List<SummaryFigures.Figure> figures = SummaryFigures.of(r);
        for (int i = 0; i < FIGURE_ROWS; i++) {
            boolean on = i < figures.size();
            labels.get(i).setVisible(on);
            values.get(i).setVisible(on);
            if (on) {
                SummaryFigures.Figure f = figures.get(i);
                labels.get(i).setText(f.label());
                labels.get(i).setToolTipText(f.tooltip());
                values.get(i).show(f.value());
                values.get(i).setToolTipText(f.tooltip());
            }
        }
        where.setVisible(true);
        List<String> lines = SummaryFigures.chargeShares(r);
        for (int i = 0; i < SHARE_ROWS; i++) {
            shares.get(i).setVisible(i < lines.size());
            if (i < lines.size()) {
                shares.get(i).show(lines.get(i));
            }
        }
        revalidate();
        repaint();
    }

    /** @return the figure texts shown, "label: value" (for tests) */
    List<String> shownFigures() {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < FIGURE_ROWS; i++) {
            if (labels.get(i).isVisible()) {
                out.add(labels.get(i).getText() + ": " + values.get(i).getText());
            }
        }
        return out;
    }
}
