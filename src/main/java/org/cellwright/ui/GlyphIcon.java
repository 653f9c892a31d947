package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

import javax.swing.Icon;
import javax.swing.UIManager;

/**
 * Small vector icons drawn in the component's text colour (so they follow light and dark and stay sharp at
 * any scale): play, pause, jump to end, pin, and the caution mark.
 */
final class GlyphIcon implements Icon {

    /** The shapes. */
    enum Shape { PLAY, PAUSE, TO_END, PIN, CAUTION, RESTART }

    private final Shape shape;
    private final int size;
    private final String colourKey;

    /**
     * @param shape the shape
     * @param size width and height (px)
     * @param colourKey a UIManager colour key, or null for the component's foreground
     */
    GlyphIcon(Shape shape, int size, String colourKey) {
        this.shape = shape;
        this.size = size;
        this.colourKey = colourKey;
    }

    @Override
    public void paintIcon(Component c, Graphics g0, int x, int y) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.translate(x, y);
        Color fg = colourKey != null ? UIManager.getColor(colourKey) : null;
        if (fg == null) {
            fg = c.isEnabled() ? c.getForeground() : UIManager.getColor("Label.disabledForeground");
        }
        g.setColor(fg);
        double s = size;
        switch (shape) {
            case PLAY -> g.fill(triangle(s * 0.22, s * 0.15, s * 0.82, s * 0.5, s * 0.22, s * 0.85));
            case PAUSE -> {
                g.fill(new Rectangle2D.Double(s * 0.22, s * 0.16, s * 0.2, s * 0.68));
                g.fill(new Rectangle2D.Double(s * 0.58, s * 0.16, s * 0.2, s * 0.68));
            }
            case TO_END -> {
                g.fill(triangle(s * 0.12, s * 0.18, s * 0.62, s * 0.5, s * 0.12, s * 0.82));
                g.fill(new Rectangle2D.Double(s * 0.66, s * 0.18, s * 0.16, s * 0.64));
            }
            case RESTART -> {
                g.fill(new Rectangle2D.Double(s * 0.16, s * 0.18, s * 0.16, s * 0.64));
                g.fill(triangle(s * 0.86, s * 0.18, s * 0.36, s * 0.5, s * 0.86, s * 0.82));
            }
            case PIN -> {
                g.setStroke(new BasicStroke((float) (s * 0.11), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                g.drawLine((int) (s * 0.5), (int) (s * 0.55), (int) (s * 0.5), (int) (s * 0.92));
                g.fill(new java.awt.geom.Ellipse2D.Double(s * 0.26, s * 0.08, s * 0.48, s * 0.48));
            }
            case CAUTION -> {
                g.fill(triangle(s * 0.5, s * 0.04, s * 0.97, s * 0.92, s * 0.03, s * 0.92));
                Color bg = UIManager.getColor("Cellwright.caution.background");
                g.setColor(bg != null ? bg : Color.WHITE);
                g.fill(new Rectangle2D.Double(s * 0.45, s * 0.32, s * 0.1, s * 0.33));
                g.fill(new Rectangle2D.Double(s * 0.45, s * 0.72, s * 0.1, s * 0.1));
            }
        }
        g.dispose();
    }

    private static Path2D triangle(double x1, double y1, double x2, double y2, double x3, double y3) {
        Path2D p = new Path2D.Double();
        p.moveTo(x1, y1);
        p.lineTo(x2, y2);
        p.lineTo(x3, y3);
        p.closePath();
        return p;
    }

    @Override
    public int getIconWidth() {
        return size;
    }

    @Override
    public int getIconHeight() {
        return size;
    }
}
