package org.cellwright.ui;

import java.awt.Color;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridBagLayout;
import java.util.ArrayList;
import java.util.List;

import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;

/**
 * The "Log" tab: which measured log is drawn over the charts, how far the run shown lies from it column by
 * column (so a slider moved by hand shows whether it brings the model closer), and the last fit's values with
 * their 95 % intervals; with buttons to load a log, fit and remove it. Also the dialog that lists why a log
 * cannot be read.
 */
final class LogPanel extends ColumnPanel {

    private static final long serialVersionUID = 1L;

    private final transient Action load;
    private final transient Action fit;
    private final transient Action remove;
    private String source;
    private String contents;
    private List<String> warnings = List.of();
    private String matchNote;
    private List<String[]> match = List.of();
    private List<String> fitted = List.of();
    private String fitNote;

    /**
     * @param load loads a log
     * @param fit opens the fit dialog
     * @param remove removes the log
     */
    LogPanel(Action load, Action fit, Action remove) {
        super(new GridBagLayout());
        this.load = load;
        this.fit = fit;
        this.remove = remove;
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        render();
    }

    /**
     * @param file the log's file name, or null when none is loaded
     * @param describe what it holds
     * @param logWarnings warnings found while reading it
     */
    void showLog(String file, String describe, List<String> logWarnings) {
        source = file;
        contents = describe;
        warnings = List.copyOf(logWarnings);
        match = List.of();
        matchNote = null;
        fitted = List.of();
        fitNote = null;
        render();
    }

    /**
     * @param note a line above the rows ("this run against the log"), or null
     * @param rows per column: name, measured minus model (rms), typical value
     */
    void showMatch(String note, List<String[]> rows) {
        matchNote = note;
        match = List.copyOf(rows);
        render();
    }

    /**
     * @param note how the fit went
     * @param phrases each fitted value with its interval
     */
    void showFit(String note, List<String> phrases) {
        fitNote = note;
        fitted = List.copyOf(phrases);
        render();
    }

    /** @return the texts shown (for tests) */
    List<String> shownTexts() {
        List<String> out = new ArrayList<>();
        for (java.awt.Component c : getComponents()) {
            if (c instanceof JLabel l) {
                out.add(l.getText());
            } else if (c instanceof WrapText w) {
                out.add(w.getText());
            }
        }
        return out;
    }

    private void render() {
        removeAll();
        int row = 0;
        if (source == null) {
            add(new WrapText("No measured log is loaded. Load a CSV log of a real run (time_s, time_min or time_h,"
                    + " and any of current_A, cell_voltage_V, deposit_g, c_<species>_g_per_L): its points are drawn"
                    + " over the charts as open dots, and the scenario can be fitted to it.", "muted.foreground",
                    0, Font.PLAIN, 330), GridPlace.listCell(row++, 0, 3, 0));
            add(buttons(load), GridPlace.listCell(row++, 0, 3, 8));
            closeColumn(row, 3);
            return;
        }
        add(new WrapText(source, null, 0, Font.BOLD, 330), GridPlace.listCell(row++, 0, 3, 0));
        add(new WrapText(contents + ". Open dots on the charts.", "muted.foreground", 0, Font.PLAIN, 330),
                GridPlace.listCell(row++, 0, 3, 2));
        for (String w : warnings) {
            add(new WrapText(w, "muted.foreground", -1, Font.ITALIC, 330), GridPlace.listCell(row++, 0, 3, 2));
        }
        add(buttons(fit, load, remove), GridPlace.listCell(row++, 0, 3, 6));
        add(bold("Measured minus the run shown"), GridPlace.listCell(row++, 0, 3, 12));
        if (matchNote != null) {
            add(new WrapText(matchNote, "muted.foreground", 0, Font.PLAIN, 330), GridPlace.listCell(row++, 0, 3, 2));
        }
        if (!match.isEmpty()) {
            add(muted("column"), GridPlace.listCell(row, 0, 1, 4));
            add(muted("rms"), GridPlace.listCell(row, 1, 1, 4));
            add(muted("typical"), GridPlace.listCell(row++, 2, 1, 4));
            for (String[] r : match) {
                add(new JLabel(r[0]), GridPlace.listCell(row, 0, 1, 2));
                add(GridPlace.number(r[1], 10), GridPlace.listCell(row, 1, 1, 2));
                add(GridPlace.number(r[2], 10), GridPlace.listCell(row++, 2, 1, 2));
            }
        }
        if (fitNote != null) {
            add(bold("Last fit"), GridPlace.listCell(row++, 0, 3, 12));
            add(new WrapText(fitNote, "muted.foreground", 0, Font.PLAIN, 330), GridPlace.listCell(row++, 0, 3, 2));
            for (String p : fitted) {
                add(new WrapText(p, null, 0, Font.PLAIN, 330), GridPlace.listCell(row++, 0, 3, 3));
            }
        }
        closeColumn(row, 3);
    }

    private static JComponent buttons(Action... actions) {
        JPanel p = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        p.setOpaque(false);
        for (int i = 0; i < actions.length; i++) {
            JButton b = new JButton(actions[i]);
            b.setIcon(null);
            p.add(b);
            if (i < actions.length - 1) {
                p.add(javax.swing.Box.createHorizontalStrut(6));
            }
        }
        return p;
    }

    private static JLabel bold(String text) {
        JLabel l = new JLabel(text);
        l.setFont(UiTheme.font(0, Font.BOLD));
        return l;
    }

    private static JLabel muted(String text) {
        JLabel l = new JLabel(text, text.equals("column") ? JLabel.LEFT : JLabel.RIGHT) {
            private static final long serialVersionUID = 1L;

            @Override
            public Color getForeground() {
                return UiTheme.color("muted.foreground");
            }
        };
        return l;
    }

    /**
     * Lists why a log cannot be read, one problem a line ({@code file:line:column: column: what is wrong}).
     *
     * @param owner the window
     * @param file the log
     * @param problems its problems
     */
    static void showProblems(java.awt.Component owner, java.nio.file.Path file,
                             List<org.cellwright.io.Problem> problems) {
        StringBuilder sb = new StringBuilder();
        problems.forEach(p -> sb.append(p.format()).append('\n'));
        javax.swing.JTextArea area = new javax.swing.JTextArea(sb.toString(), Math.min(14, problems.size() + 1), 80);
        area.setEditable(false);
        JPanel p = new JPanel(new java.awt.BorderLayout(0, 8));
        p.add(new JLabel(file.getFileName() + " cannot be read as a run log; nothing was changed."
                + " Each line gives file:line:column: column name: what is wrong."), java.awt.BorderLayout.NORTH);
        p.add(new javax.swing.JScrollPane(area), java.awt.BorderLayout.CENTER);
        javax.swing.JOptionPane.showMessageDialog(owner, p, "Log problems", javax.swing.JOptionPane.ERROR_MESSAGE);
    }
}
