package org.cellwright.ui;

import java.awt.Color;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.Insets;
import java.util.Locale;

import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSeparator;

/**
 * Lays out a two-column form in a {@link java.awt.GridBagLayout} panel, row after row: captions on the left,
 * fields on the right, a message line under a field, and section headings with a rule.
 */
final class FormGrid {

    private final JPanel panel;
    private int row;

    /** @param panel a panel with a GridBagLayout */
    FormGrid(JPanel panel) {
        this.panel = panel;
    }

    /**
     * @param caption the caption
     * @param comp the field
     */
    void labelled(String caption, JComponent comp) {
        JLabel l = new JLabel(caption);
        l.setLabelFor(comp);
        l.setToolTipText(comp.getToolTipText());
        GridBagConstraints c = at(0, 1);
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(2, 0, 2, 8);
        panel.add(l, c);
        c = at(1, 1);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(2, 0, 2, 0);
        panel.add(comp, c);
        row++;
    }

    /** @param m a message line, under the field of the row before */
    void message(JComponent m) {
        GridBagConstraints c = at(1, 1);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(0, 2, 3, 0);
        panel.add(m, c);
        row++;
    }

    /** @param comp a component across both columns */
    void span(JComponent comp) {
        GridBagConstraints c = at(0, 2);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(2, 0, 2, 0);
        panel.add(comp, c);
        row++;
    }

    /** @param title a section heading, in the look's section colour, with a rule under it */
    void section(String title) {
        JLabel l = new JLabel(title.toUpperCase(Locale.ROOT)) {
            private static final long serialVersionUID = 1L;

            @Override
            public Color getForeground() {
                return UiTheme.color("section.foreground");
            }
        };
        l.setFont(UiTheme.font(-1, Font.BOLD));
        GridBagConstraints c = at(0, 2);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(row > 3 ? 12 : 4, 0, 1, 0);
        panel.add(l, c);
        row++;
        c = at(0, 2);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(0, 0, 4, 0);
        panel.add(new JSeparator(), c);
        row++;
    }

    /** Ends the form: the space below the last row stays empty. */
    void end() {
        GridBagConstraints c = at(0, 1);
        c.weighty = 1;
        panel.add(new JLabel(), c);
        row++;
    }

    private GridBagConstraints at(int col, int width) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = col;
        c.gridwidth = width;
        return c;
    }
}
