package org.cellwright.ui;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Insets;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;
import javax.swing.UIManager;
import javax.swing.text.DefaultCaret;
import javax.swing.text.View;

/**
 * Read-only text that wraps at word boundaries to the width its layout gives it, in the label font. Much
 * cheaper to update than an HTML label (which parses its text on every change), so the panels that change
 * with every slider move use it. Its preferred height is that of the text wrapped at its current width;
 * when the width changes it asks its parents to lay out again.
 */
class WrapText extends JTextArea {

    private static final long serialVersionUID = 1L;

    private final String colourKey;
    private final float sizeDelta;
    private final int style;
    private final int wrapWidth;
    private int laidOutWidth = -1;

    /**
     * @param text the text
     * @param colourKey one of our colour keys ("muted.foreground"), or null for the label colour
     * @param sizeDelta font size change from the label font (pt)
     * @param style Font.PLAIN, Font.BOLD, Font.ITALIC
     * @param wrapWidth width to wrap at before the layout has given one (px)
     */
    WrapText(String text, String colourKey, float sizeDelta, int style, int wrapWidth) {
        super(text);
        this.colourKey = colourKey;
        this.sizeDelta = sizeDelta;
        this.style = style;
        this.wrapWidth = wrapWidth;
        setEditable(false);
        setFocusable(false);
        setLineWrap(true);
        setWrapStyleWord(true);
        setHighlighter(null);
        restyle();
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                if (getWidth() != laidOutWidth) {
                    laidOutWidth = getWidth();
                    revalidate();
                }
            }
        });
    }

    /** @param text the text (nothing happens when it is the same) */
    void show(String text) {
        if (!text.equals(getText())) {
            setText(text);
            revalidate();
        }
    }

    @Override
    public Dimension getPreferredSize() {
        Insets in = getInsets();
        // measured 2 px narrower than drawn: a word that just fits when measured may wrap when drawn
        int w = (getWidth() > 0 ? getWidth() : wrapWidth) - in.left - in.right - 2;
        View root = getUI().getRootView(this);
        root.setSize(Math.max(1, w), Integer.MAX_VALUE);
        int h = (int) Math.ceil(root.getPreferredSpan(View.Y_AXIS));
        return new Dimension(Math.min(wrapWidth, getWidth() > 0 ? getWidth() : wrapWidth), h + in.top + in.bottom);
    }

    @Override
    public Dimension getMinimumSize() {
        return new Dimension(40, getPreferredSize().height);
    }

    /** @return the colour key the text is drawn in, or null for the label colour */
    protected String colourKey() {
        return colourKey;
    }

    @Override
    public Color getForeground() {
        String colourKey = colourKey();
        if (colourKey == null) {
            Color c = UIManager.getColor("Label.foreground");
            return c != null ? c : super.getForeground();
        }
        return UiTheme.color(colourKey);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        restyle();
    }

    private void restyle() {
        Font f = UIManager.getFont("Label.font");
        if (f != null) {
            setFont(f.deriveFont(style, f.getSize2D() + sizeDelta));
        }
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder());
        // new text must not move the caret and scroll the panel around it to the end (the Cautions tab
        // would open on its last note instead of its first caution); a new look brings a new caret
        if (getCaret() instanceof DefaultCaret caret) {
            caret.setUpdatePolicy(DefaultCaret.NEVER_UPDATE);
        }
    }
}
