package org.cellwright.ui;

import java.awt.Dimension;
import java.awt.GridBagConstraints;
import java.awt.LayoutManager;
import java.awt.Rectangle;

import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.Scrollable;

/**
 * A panel laid out as one column that fills the width of its scroll pane and scrolls only up and down (the
 * form, the summary, the charge and log tabs): text wraps to the side panel's width instead of running off it.
 */
abstract class ColumnPanel extends JPanel implements Scrollable {

    /** @param layout the panel's layout */
    ColumnPanel(LayoutManager layout) {
        super(layout);
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(Rectangle visibleRect, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(Rectangle visibleRect, int orientation, int direction) {
        return Math.max(16, visibleRect.height - 32);
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return false;
    }

    /**
     * Ends a column laid out in a grid: an empty filler below the last row takes the spare height, so the
     * rows stay at the top; then lays the panel out again.
     *
     * @param row the first free grid row
     * @param width the grid's columns
     */
    protected void closeColumn(int row, int width) {
        GridBagConstraints c = GridPlace.listCell(row, 0, width, 0);
        c.weighty = 1;
        add(new JLabel(), c);
        revalidate();
        repaint();
    }
}
