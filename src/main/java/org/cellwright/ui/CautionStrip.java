package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Cursor;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.RoundRectangle2D;
import java.util.Locale;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;

/**
 * A short strip, always in view beside the charts, naming the safety cautions the run triggers in the
 * caution colours ("Chlorine, hydrogen, acid"); a click opens the full cautions.
 */
final class CautionStrip extends JPanel {

    private static final long serialVersionUID = 1L;

    private final WrapText text = new WrapText("", "caution.foreground", 0, Font.PLAIN, 300);
    private final JLabel mark = new JLabel(new GlyphIcon(GlyphIcon.Shape.CAUTION, 18, "Cellwright.caution.mark"));

    /** @param open opens the full cautions */
    CautionStrip(Runnable open) {
        super(new BorderLayout(10, 0));
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder(8, 12, 8, 10));
        mark.setVerticalAlignment(JLabel.TOP);
        add(mark, BorderLayout.WEST);
        add(text, BorderLayout.CENTER);
        setToolTipText("Click to read the cautions in full.");
        text.setToolTipText(getToolTipText());
        setCursor(Cursor.getPredefinedCursor(Cursor.HAND_CURSOR));
        MouseAdapter click = new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                open.run();
            }
        };
        addMouseListener(click);
        text.addMouseListener(click);
        clear();
    }

    /** Says that cautions come with a run. */
    void clear() {
        text.show("The safety cautions appear here once the scenario has run.");
    }

    /** @param list the cautions to name */
    void show(CautionList list) {
        text.show(line(list));
    }

    /** @return the strip's text */
    String text() {
        return text.getText();
    }

    /**
     * @param list cautions and notes
     * @return e.g. "Safety: chlorine, hydrogen, acid. 1 note on the chemistry. Click to read."
     */
    static String line(CautionList list) {
        StringBuilder sb = new StringBuilder();
        if (list.safety().isEmpty()) {
            sb.append("No safety cautions for this run.");
        } else {
            sb.append("Safety: ");
            for (int i = 0; i < list.safety().size(); i++) {
                String t = list.safety().get(i).topic().toLowerCase(Locale.ROOT);
                sb.append(i == 0 ? Character.toUpperCase(t.charAt(0)) + t.substring(1) : ", " + t);
            }
            sb.append('.');
        }
        if (!list.notes().isEmpty()) {
            sb.append(' ').append(list.notes().size()).append(list.notes().size() == 1 ? " note" : " notes")
                    .append(" on the chemistry and data.");
        }
        return sb.append(" Follow local codes and safety data sheets; click for details.").toString();
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        RoundRectangle2D box = new RoundRectangle2D.Double(1, 1, getWidth() - 3, getHeight() - 3, 8, 8);
        Color border = UiTheme.color("caution.border");
        g.setColor(UiTheme.color("caution.background"));
        g.fill(box);
        g.setColor(border);
        g.setStroke(new BasicStroke(1.2f));
        g.draw(box);
        g.fillRect(1, 5, 4, getHeight() - 11);
        g.dispose();
        super.paintComponent(g0);
    }
}
