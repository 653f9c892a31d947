package org.cellwright.ui;

import java.awt.Font;

import javax.swing.UIManager;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

/**
 * Makes the greyed hint of an empty field (FlatLaf's placeholder text: "300 um (still)", "computed") read as
 * a hint, not as a value: while the field is empty its font is italic, and the theme files give hints a
 * colour dimmer than disabled text, in the light and the dark look. Typed text is upright again.
 */
final class HintStyle {

    private HintStyle() {
    }

    /**
     * Keeps the field's font italic while it is empty (call once, on the event thread).
     *
     * @param field a field with a placeholder text
     */
    static void install(JTextComponent field) {
        field.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                apply(field);
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                apply(field);
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                apply(field);
            }
        });
        // a switch of light and dark puts the look's font back: set the hint's again
        field.addPropertyChangeListener("UI", e -> apply(field));
        apply(field);
    }

    /** @return true when the field shows its hint in the hint's font */
    static boolean showsHint(JTextComponent field) {
        return field.getDocument().getLength() == 0 && field.getFont().isItalic();
    }

    private static void apply(JTextComponent field) {
        Font base = UIManager.getFont("TextField.font");
        if (base == null) {
            base = field.getFont();
        }
        int style = field.getDocument().getLength() == 0 ? Font.ITALIC : Font.PLAIN;
        Font want = base.deriveFont(style);
        Font now = field.getFont();
        if (now == null || now.getStyle() != want.getStyle() || now.getSize2D() != want.getSize2D()
                || !now.getFamily().equals(want.getFamily())) {
            field.setFont(want);
        }
    }
}
