package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Font;
import java.awt.GridBagLayout;
import java.awt.event.HierarchyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;

import org.cellwright.chart.ChargeShares;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.FitText;
import org.cellwright.chart.RunReport;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.RunResult;

/**
 * "Where the charge went": each electrode's charge over the run split by what it did (the target metal,
 * hydrogen, shuttles of a redox couple, the deposit redissolving), as a bar and as a list with shares and
 * ampere-hours, a sentence in plain words, and the current efficiency and the cathode's current at the start
 * and the end. Built from {@link ChargeShares#parts} and {@link FitText#chargeRows}. A run shown while the tab
 * is hidden is drawn when the tab is opened.
 */
final class ChargePanel extends ColumnPanel {

    private static final long serialVersionUID = 1L;
    /** Seconds per hour, for ampere-hours. */
    private static final double S_PER_H = 3600;

    private final transient ChemLibrary library;
    private transient RunResult run;
    private String label;
    private transient RunResult drawn;

    /** @param library the chemistry library the runs use */
    ChargePanel(ChemLibrary library) {
        super(new GridBagLayout());
        this.library = library;
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        addHierarchyListener(e -> {
            if ((e.getChangeFlags() & HierarchyEvent.SHOWING_CHANGED) != 0 && isShowing()) {
                render();
            }
        });
        render();
    }

    /**
     * @param title a few words naming the run
     * @param r the run, or null to clear
     */
    void show(String title, RunResult r) {
        run = r;
        label = title;
        if (isShowing()) {
            render();
        }
    }

    /** @return the run shown (or to be shown when the tab opens) */
    RunResult run() {
        return run;
    }

    /** Draws the panel for the run now held (does nothing when it is drawn already). */
    void render() {
        if (drawn == run && getComponentCount() > 0) {
            return;
        }
        drawn = run;
        removeAll();
        int row = 0;
        if (run == null) {
            add(new WrapText("Run the scenario (F5) or move a slider: how the charge divides between the metal,"
                    + " hydrogen, redox shuttles and the deposit redissolving appears here.", "muted.foreground",
                    0, Font.PLAIN, 330), GridPlace.listCell(row, 0, 3, 0));
            closeColumn(row + 1, 3);
            return;
        }
        ChartStyle style = ChartStyle.of(UiTheme.isDark());
        List<ChargeShares.Part> parts = ChargeShares.parts(run, library);
        double q = run.summary().chargeC();
        add(new WrapText("Whole run: " + label, null, 0, Font.BOLD, 330), GridPlace.listCell(row++, 0, 3, 0));
        add(new WrapText(sentence(parts, q), null, 0, Font.PLAIN, 330),
                GridPlace.listCell(row++, 0, 3, 6));
        for (String electrode : List.of("cathode", "anode")) {
            List<ChargeShares.Part> mine = parts.stream().filter(p -> p.electrode().equals(electrode)).toList();
            JLabel head = new JLabel(electrode.substring(0, 1).toUpperCase(Locale.ROOT) + electrode.substring(1)
                    + String.format(Locale.ROOT, "  (%.3g A h)", q / S_PER_H));
            head.setFont(UiTheme.font(0, Font.BOLD));
            add(head, GridPlace.listCell(row++, 0, 3, 12));
            List<Color> colours = new ArrayList<>();
            for (ChargeShares.Part p : mine) {
                colours.add(colourOf(p, run.summary().targetMetal(), style));
            }
            add(new ChargeBar(mine, colours), GridPlace.listCell(row++, 0, 3, 4));
            for (int i = 0; i < mine.size(); i++) {
                ChargeShares.Part p = mine.get(i);
                if (Math.abs(p.share()) < 5e-4) {
                    continue;
                }
                JLabel words = new JLabel(p.words(), new ChargeBar.Swatch(colours.get(i), p.corrosion()), JLabel.LEFT);
                words.setToolTipText(p.corrosion() ? "Charge the bath's oxidants took back from the deposit"
                        + " (corrosion): the cathode had to pass it again"
                        : p.words().equals(ChargeShares.SHORT) ? "After the short the current passes through the"
                        + " dendrite from cathode to anode and drives no reaction" : null);
                add(words, GridPlace.listCell(row, 0, 1, 2));
                add(GridPlace.number(String.format(Locale.ROOT, "%+.1f %%", 100 * p.share()).replace("+", ""), 8),
                        GridPlace.listCell(row, 1, 1, 2));
                add(GridPlace.number(String.format(Locale.ROOT, "%.3g A h", p.chargeC() / S_PER_H), 8),
                        GridPlace.listCell(row++, 2, 1, 2));
            }
        }
        JLabel when = new JLabel("Start and end");
        when.setFont(UiTheme.font(0, Font.BOLD));
        add(when, GridPlace.listCell(row++, 0, 3, 14));
        for (RunReport.Row r : FitText.chargeRows(run)) {
            if (r.label().endsWith("whole run")) {
                continue;
            }
            JLabel l = new JLabel(r.label()) {
                private static final long serialVersionUID = 1L;

                @Override
                public Color getForeground() {
                    return UiTheme.color("muted.foreground");
                }
            };
            add(l, GridPlace.listCell(row++, 0, 3, 6));
            String value = r.value().equals("-") && run.summary().shortCircuitS() != null
                    ? "none: the current passes through the dendrite short" : r.value();
            add(new WrapText(value, null, 0, Font.PLAIN, 330), GridPlace.listCell(row++, 0, 3, 1));
        }
        closeColumn(row, 3);
    }

    /**
     * @param parts an electrode's parts (cathode first)
     * @param q the charge passed (C)
     * @return the cathode's split in plain words
     */
    static String sentence(List<ChargeShares.Part> parts, double q) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "Of the %.3g A h passed, the cathode spent",
                q / S_PER_H));
        List<String> bits = new ArrayList<>();
        String corrosion = null;
        String shorted = null;
        for (ChargeShares.Part p : parts) {
            if (!p.electrode().equals("cathode") || Math.abs(p.share()) < 5e-3) {
                continue;
            }
            if (p.words().equals(ChargeShares.SHORT)) {
                shorted = String.format(Locale.ROOT, "%.1f %% passed through the dendrite short and drove no"
                        + " reaction", 100 * p.share());
            } else if (p.corrosion()) {
                corrosion = String.format(Locale.ROOT, "%.1f %% of the charge went to %s, which the bath's oxidants"
                        + " took back", -100 * p.share(), p.words().replace("redissolving the ", "replacing the "));
            } else {
                bits.add(String.format(Locale.ROOT, "%.1f %% %s", 100 * p.share(), p.words()));
            }
        }
        if (bits.isEmpty()) {
            return "No charge passed.";
        }
        for (int i = 0; i < bits.size(); i++) {
            sb.append(i == 0 ? " " : i == bits.size() - 1 ? " and " : ", ").append(bits.get(i));
        }
        sb.append('.');
        for (String extra : new String[] {shorted, corrosion}) {
            if (extra != null) {
                sb.append(' ').append(Character.toUpperCase(extra.charAt(0))).append(extra.substring(1)).append('.');
            }
        }
        return sb.toString();
    }

    /**
     * A reaction's colour, from the chart palette: the target metal blue, hydrogen vermillion, oxygen olive,
     * chlorine green, other metals sky, either half of a redox shuttle pink, the deposit redissolving
     * plum, the charge through a dendrite short graphite.
     */
    static Color colourOf(ChargeShares.Part p, String target, ChartStyle style) {
        String w = p.words();
        int hue;
        if (p.corrosion()) {
            hue = 6;
        } else if (w.equals(ChargeShares.SHORT)) {
            hue = 7;
        } else if (w.equals("hydrogen")) {
            hue = 1;
        } else if (w.equals("oxygen")) {
            hue = 4;
        } else if (w.contains("chlorine")) {
            hue = 2;
        } else if (target != null && w.equals("depositing " + target)) {
            hue = 0;
        } else if (w.startsWith("depositing") || w.startsWith("dissolving")) {
            hue = 5;
        } else {
            hue = 3;
        }
        return style.series(hue);
    }

    /** A wrapper that puts the panel in a scroll pane (for the tab). */
    static JPanel scrolled(ChargePanel p) {
        JPanel box = new JPanel(new BorderLayout());
        javax.swing.JScrollPane s = new javax.swing.JScrollPane(p);
        s.setBorder(BorderFactory.createEmptyBorder());
        s.getVerticalScrollBar().setUnitIncrement(16);
        box.add(s, BorderLayout.CENTER);
        return box;
    }
}
