package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSeparator;
import javax.swing.SwingConstants;

/**
 * The line at the bottom of the window: what just happened, the values at the play head, how long the
 * engine took, and how long a slider took from move to replot; a busy bar while the engine computes.
 */
final class StatusBar extends JPanel {

    private static final long serialVersionUID = 1L;

    private final JLabel message = new JLabel("Reading the chemistry library...");
    private final JLabel readout = new JLabel(" ");
    private final JLabel timing = new JLabel(" ");
    private final JProgressBar busy = new JProgressBar();
    private boolean error;

    StatusBar() {
        super(new BorderLayout());
        setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(1, 0, 0, 0,
                new Color(0, 0, 0, 0)), BorderFactory.createEmptyBorder(3, 10, 3, 10)));
        busy.setIndeterminate(true);
        busy.setVisible(false);
        busy.setPreferredSize(new Dimension(90, 8));
        JLabel messageLabel = message;
        add(messageLabel, BorderLayout.CENTER);
        JPanel right = new JPanel(new FlowLayout(FlowLayout.RIGHT, 10, 0));
        right.setOpaque(false);
        readout.setToolTipText("Values at the play head");
        timing.setToolTipText("Engine time of the last run; time from a slider's move to the last chart redrawn"
                + " (median over the session)");
        right.add(readout);
        right.add(new JSeparator(SwingConstants.VERTICAL));
        right.add(timing);
        right.add(busy);
        add(right, BorderLayout.EAST);
    }

    /** @param text what just happened */
    void say(String text) {
        error = false;
        message.setText(text);
        message.setForeground(null);
    }

    /** @param text what went wrong */
    void fail(String text) {
        error = true;
        message.setText(text);
        message.setForeground(UiTheme.color("error.foreground"));
    }

    /** @return the message shown */
    String message() {
        return message.getText();
    }

    /** @return true when the message is an error */
    boolean isError() {
        return error;
    }

    /** @param text values at the play head */
    void readout(String text) {
        readout.setText(text);
    }

    /** @param text the timing figures */
    void timing(String text) {
        timing.setText(text);
    }

    /** @return the timing text */
    String timingText() {
        return timing.getText();
    }

    /** @param on true while the engine computes */
    void busy(boolean on) {
        busy.setVisible(on);
    }
}
