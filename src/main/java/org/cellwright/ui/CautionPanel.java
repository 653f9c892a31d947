package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.RenderingHints;
import java.awt.geom.RoundRectangle2D;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;

/**
 * The safety cautions a run triggers, framed in the caution colours so they cannot be missed, with the
 * notes on chemistry and data validity below them, and the reminder that local codes and safety data
 * sheets come first.
 */
final class CautionPanel extends JPanel {

    private static final long serialVersionUID = 1L;
    /** Wrap width of the text (px). */
    private static final int WRAP = 300;
    static final String DEFER = "Cellwright is a planning aid: follow local codes, the safety data sheets of your"
            + " chemicals and licensed practice.";

    private transient CautionList list;
    private final java.util.List<WrapText> safetyTexts = new java.util.ArrayList<>();
    private final java.util.List<WrapText> noteTexts = new java.util.ArrayList<>();

    CautionPanel() {
        super(new GridBagLayout());
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder(10, 12, 10, 12));
        render();
    }

    /** Says that cautions come with a run. */
    void clear() {
        list = null;
        render();
    }

    /** @param cautions the cautions and notes to show */
    void show(CautionList cautions) {
        if (cautions.equals(list)) {
            return;
        }
        boolean sameShape = list != null && topics(list.safety()).equals(topics(cautions.safety()))
                && list.notes().size() == cautions.notes().size();
        this.list = cautions;
        if (sameShape) {
            // only figures in the sentences changed (litres of gas, g/L): new text, same components
            for (int i = 0; i < cautions.safety().size(); i++) {
                safetyTexts.get(i).show(cautions.safety().get(i).text());
            }
            for (int i = 0; i < cautions.notes().size(); i++) {
                noteTexts.get(i).show(cautions.notes().get(i).full());
            }
            return;
        }
        render();
    }

    private static java.util.List<String> topics(java.util.List<CautionList.Caution> l) {
        return l.stream().map(CautionList.Caution::topic).toList();
    }

    /** @return what is shown */
    CautionList shown() {
        return list;
    }

    private void render() {
        removeAll();
        safetyTexts.clear();
        noteTexts.clear();
        int row = 0;
        if (list == null) {
            add(text("The safety cautions that the scenario triggers appear here once it has run.", Font.PLAIN), at(0, 0));
            revalidate();
            repaint();
            return;
        }
        JLabel head = new JLabel(list.safety().isEmpty() ? "No safety cautions for this run" : "Safety cautions") {
            private static final long serialVersionUID = 1L;

            @Override
            public Color getForeground() {
                return UiTheme.color("caution.foreground");
            }
        };
        head.setFont(UiTheme.font(0, Font.BOLD));
        head.setIcon(new GlyphIcon(GlyphIcon.Shape.CAUTION, 16, "Cellwright.caution.mark"));
        head.setIconTextGap(8);
        add(head, at(row++, 2));
        for (CautionList.Caution c : list.safety()) {
            add(text(c.topic(), Font.BOLD), at(row++, 6));
            WrapText t = text(c.text(), Font.PLAIN);
            safetyTexts.add(t);
            add(t, at(row++, 0));
        }
        if (!list.notes().isEmpty()) {
            add(text("Chemistry and data notes", Font.BOLD), at(row++, 10));
            for (CautionList.Caution c : list.notes()) {
                WrapText t = text(c.full(), Font.PLAIN);
                noteTexts.add(t);
                add(t, at(row++, 3));
            }
        }
        add(new WrapText(DEFER, "caution.foreground", -1, Font.ITALIC, WRAP), at(row, 10));
        revalidate();
        repaint();
    }

    private static GridBagConstraints at(int row, int top) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(top, 0, 0, 0);
        return c;
    }

    private static WrapText text(String text, int style) {
        return new WrapText(text, "caution.foreground", 0, style, WRAP);
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        RoundRectangle2D box = new RoundRectangle2D.Double(1, 1, getWidth() - 3, getHeight() - 3, 8, 8);
        Color bg = UiTheme.color("caution.background");
        Color border = UiTheme.color("caution.border");
        g.setColor(bg);
        g.fill(box);
        g.setColor(border);
        g.setStroke(new BasicStroke(1.2f));
        g.draw(box);
        g.fillRect(1, 5, 4, getHeight() - 11);
        g.dispose();
        super.paintComponent(g0);
    }
}
