package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javax.swing.JTextField;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.Test;

/** An empty field's hint is set in italics; typed text is upright. */
class HintStyleTest {

    @Test
    void theHintIsItalicAndTypedTextUpright() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            JTextField f = new JTextField(12);
            f.putClientProperty("JTextField.placeholderText", "300 um (still)");
            HintStyle.install(f);
            assertTrue(HintStyle.showsHint(f), "empty: the hint shows, in italics");
            f.setText("45 um");
            assertFalse(f.getFont().isItalic(), "a typed value is upright");
            assertFalse(HintStyle.showsHint(f));
            f.setText("");
            assertTrue(f.getFont().isItalic(), "emptied again: italics");
            // the look's switch (updateUI) keeps the hint's italics
            f.updateUI();
            assertTrue(HintStyle.showsHint(f));
        });
    }
}
