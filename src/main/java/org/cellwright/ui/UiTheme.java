package org.cellwright.ui;

import java.awt.Color;
import java.awt.Font;
import java.awt.Window;

import javax.swing.UIManager;
import javax.swing.UnsupportedLookAndFeelException;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;

/**
 * Cellwright's light and dark looks: FlatLaf with our own accent, panel and caution colours (the
 * {@code theme/*.properties} resources), switchable while the window is open.
 */
final class UiTheme {

    private static boolean registered;

    private UiTheme() {
    }

    /**
     * Sets the look before any component is made.
     *
     * @param dark true for the dark look
     */
    static void install(boolean dark) {
        if (!registered) {
            FlatLaf.registerCustomDefaultsSource("org.cellwright.ui.theme");
            registered = true;
        }
        if (dark) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }

    /**
     * Switches the look of every open window (on the event thread).
     *
     * @param dark true for the dark look
     */
    static void switchTo(boolean dark) {
        try {
            UIManager.setLookAndFeel(dark ? new FlatDarkLaf() : new FlatLightLaf());
        } catch (UnsupportedLookAndFeelException e) {
            throw new IllegalStateException("FlatLaf cannot be installed: " + e.getMessage(), e);
        }
        FlatLaf.updateUI();
        for (Window w : Window.getWindows()) {
            w.repaint();
        }
    }

    /** @return true when the dark look is on */
    static boolean isDark() {
        return FlatLaf.isLafDark();
    }

    /**
     * @param key one of our colour keys without the "Cellwright." prefix ("caution.background")
     * @return the colour of the current look
     */
    static Color color(String key) {
        Color c = UIManager.getColor("Cellwright." + key);
        return c != null ? c : UIManager.getColor("Label.foreground");
    }

    /**
     * @param delta size change in points from the look's default font
     * @param style Font.PLAIN, Font.BOLD ...
     * @return a derived default font
     */
    static Font font(float delta, int style) {
        Font base = UIManager.getFont("Label.font");
        return base.deriveFont(style, base.getSize2D() + delta);
    }
}
