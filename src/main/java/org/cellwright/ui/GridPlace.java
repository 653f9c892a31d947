package org.cellwright.ui;

import java.awt.GridBagConstraints;
import java.awt.Insets;

import javax.swing.BorderFactory;
import javax.swing.JLabel;

/**
 * Where a piece goes in the side panels' {@link java.awt.GridBagLayout} grids, in the two shapes they use: a
 * list whose first column (a name) takes the spare width beside right-aligned numbers, and caption-value
 * pairs whose value takes it.
 */
final class GridPlace {

    private GridPlace() {
    }

    /**
     * A cell of a list: the first column grows, the number columns keep their width.
     *
     * @param row grid row
     * @param col grid column
     * @param width columns spanned
     * @param top space above (px)
     * @return the constraints
     */
    static GridBagConstraints listCell(int row, int col, int width, int top) {
        GridBagConstraints c = base(row, col, width);
        c.weightx = col == 0 ? 1 : 0;
        c.insets = new Insets(top, 0, 0, 0);
        return c;
    }

    /**
     * A cell of caption-value pairs: the value (or a line spanning both) grows; a caption keeps 10 px from
     * its value.
     *
     * @param row grid row
     * @param col grid column (0 caption, 1 value)
     * @param width columns spanned
     * @param top space above (px)
     * @return the constraints
     */
    static GridBagConstraints pairCell(int row, int col, int width, int top) {
        GridBagConstraints c = base(row, col, width);
        c.weightx = col == 1 || width == 2 ? 1 : 0;
        c.insets = new Insets(top, 0, 0, col == 0 && width == 1 ? 10 : 0);
        return c;
    }

    /**
     * @param text a number with its unit
     * @param gap space on its left (px)
     * @return a right-aligned label for a number column
     */
    static JLabel number(String text, int gap) {
        JLabel l = new JLabel(text, JLabel.RIGHT);
        l.setBorder(BorderFactory.createEmptyBorder(0, gap, 0, 0));
        return l;
    }

    private static GridBagConstraints base(int row, int col, int width) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = col;
        c.gridwidth = width;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.anchor = GridBagConstraints.NORTHWEST;
        return c;
    }
}
