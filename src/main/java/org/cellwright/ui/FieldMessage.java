package org.cellwright.ui;

import java.awt.Font;

/**
 * The line under a form field that says what is wrong with it, in the look's error colour (or warning
 * colour), wrapped to the width the form gives it; hidden, taking no room, when all is well.
 */
final class FieldMessage extends WrapText {

    private static final long serialVersionUID = 1L;

    private boolean warning;

    /** @param wrapWidth width the message wraps at before the form is laid out (px) */
    FieldMessage(int wrapWidth) {
        super("", "error.foreground", -1, Font.PLAIN, wrapWidth);
        setVisible(false);
    }

    /**
     * @param text the message, or null/empty to hide the line
     * @param asWarning true to show it as a warning rather than an error
     */
    void show(String text, boolean asWarning) {
        this.warning = asWarning;
        if (text == null || text.isBlank()) {
            setVisible(false);
            show("");
        } else {
            show(text);
            setVisible(true);
        }
        repaint();
    }

    /** @return true when a message shows */
    boolean showing() {
        return isVisible();
    }

    @Override
    protected String colourKey() {
        return warning ? "warning.foreground" : "error.foreground";
    }

    /** @return text with the characters HTML gives a meaning to escaped */
    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
