package org.cellwright.ui;

import java.awt.Color;

import javax.swing.JLabel;

/**
 * The line under a form field that says what is wrong with it, in the look's error colour (or warning
 * colour), wrapped to the field's width; empty and taking no room when all is well.
 */
final class FieldMessage extends JLabel {

    private static final long serialVersionUID = 1L;

    /** Width the message wraps at (px, before scaling). */
    private final int wrapWidth;
    private boolean warning;

    /** @param wrapWidth width the message wraps at (px) */
    FieldMessage(int wrapWidth) {
        this.wrapWidth = wrapWidth;
        setVisible(false);
    }

    /**
     * @param text the message, or null/empty to hide the line
     * @param asWarning true to show it as a warning rather than an error
     */
    void show(String text, boolean asWarning) {
        this.warning = asWarning;
        if (text == null || text.isBlank()) {
            setText("");
            setVisible(false);
        } else {
            setText("<html><div style='width:" + wrapWidth + "px'>" + escape(text) + "</div></html>");
            setVisible(true);
        }
    }

    /** @return true when a message shows */
    boolean showing() {
        return isVisible();
    }

    @Override
    public Color getForeground() {
        return UiTheme.color(warning ? "warning.foreground" : "error.foreground");
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setFont(UiTheme.font(-1, java.awt.Font.PLAIN));
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
