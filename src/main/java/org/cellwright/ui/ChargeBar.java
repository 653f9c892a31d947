package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.util.List;

import javax.swing.Icon;
import javax.swing.JComponent;

import org.cellwright.chart.ChargeShares;

/**
 * One electrode's charge as a bar: a segment per reaction, as wide as its share. When the deposit redissolved,
 * the reactions together passed more than the supply's charge; the bar then spans their sum, a tick marks the
 * supply's charge, and a thin strip under the bar shows the part the bath's oxidants took back.
 */
final class ChargeBar extends JComponent {

    private static final long serialVersionUID = 1L;
    /** Height of the bar (px). */
    private static final int BAR = 16;
    /** Height of the strip under it for the redissolved part (px). */
    private static final int STRIP = 6;

    private final transient List<ChargeShares.Part> parts;
    private final transient List<Color> colours;

    /**
     * @param parts an electrode's parts
     * @param colours the colour of each part
     */
    ChargeBar(List<ChargeShares.Part> parts, List<Color> colours) {
        this.parts = List.copyOf(parts);
        this.colours = List.copyOf(colours);
        setToolTipText(tip());
    }

    private String tip() {
        StringBuilder sb = new StringBuilder("<html>");
        for (ChargeShares.Part p : parts) {
            sb.append(String.format(java.util.Locale.ROOT, "%s: %.1f %%<br>", p.words(), 100 * p.share()));
        }
        return sb.append("</html>").toString();
    }

    private double positiveShare() {
        return parts.stream().filter(p -> p.share() > 0).mapToDouble(ChargeShares.Part::share).sum();
    }

    private double redissolvedShare() {
        // only the deposit redissolving: a reaction run backwards by a hair (1e-12 of the charge) draws nothing
        double back = -parts.stream().filter(ChargeShares.Part::corrosion).mapToDouble(ChargeShares.Part::share).sum();
        return back >= 5e-4 ? back : 0;
    }

    @Override
    public Dimension getMinimumSize() {
        // never squeezed away when the tab is short of height: the scroll pane scrolls instead
        return getPreferredSize();
    }

    @Override
    public Dimension getPreferredSize() {
        return new Dimension(200, BAR + (redissolvedShare() > 0 ? STRIP + 2 : 0) + 2);
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        double w = getWidth() - 1;
        double total = Math.max(positiveShare(), 1e-12);
        double x = 0;
        for (int i = 0; i < parts.size(); i++) {
            ChargeShares.Part p = parts.get(i);
            if (p.share() <= 0) {
                continue;
            }
            double pw = w * p.share() / total;
            g.setColor(colours.get(i));
            g.fill(new Rectangle2D.Double(x, 0, pw, BAR));
            x += pw;
        }
        g.setColor(UiTheme.color("muted.foreground"));
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(0, 0, w, BAR));
        double back = redissolvedShare();
        if (back > 0) {
            double at = w * (total - back) / total;
            g.setColor(getForeground());
            g.setStroke(new BasicStroke(1.6f));
            g.drawLine((int) Math.round(at), 0, (int) Math.round(at), BAR + STRIP + 1);
            for (int i = 0; i < parts.size(); i++) {
                if (parts.get(i).corrosion()) {
                    g.setColor(colours.get(i));
                }
            }
            Rectangle2D strip = new Rectangle2D.Double(at, BAR + 2, w - at, STRIP);
            g.fill(strip);
        }
        g.dispose();
    }

    /** A small square in a reaction's colour, for the list under the bar (a thin strip for the redissolved part). */
    static final class Swatch implements Icon {
        private final Color colour;
        private final boolean thin;

        /**
         * @param colour the colour
         * @param thin true to draw it as a thin strip, like the redissolved part under the bar
         */
        Swatch(Color colour, boolean thin) {
            this.colour = colour;
            this.thin = thin;
        }

        @Override
        public void paintIcon(Component c, Graphics g, int x, int y) {
            g.setColor(colour);
            if (thin) {
                g.fillRect(x, y + 4, 11, 4);
            } else {
                g.fillRect(x, y, 11, 11);
            }
        }

        @Override
        public int getIconWidth() {
            return 12;
        }

        @Override
        public int getIconHeight() {
            return 11;
        }
    }
}
