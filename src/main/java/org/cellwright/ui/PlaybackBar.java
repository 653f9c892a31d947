package org.cellwright.ui;

import java.awt.Dimension;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.function.Consumer;
import java.util.function.DoubleConsumer;

import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;

import org.cellwright.sim.RunClock;

/**
 * The bar above the charts: run, pause or resume, jump to the end, playback speed, and the time slider that
 * shows where the play head stands and scrubs back and forth through the run.
 */
final class PlaybackBar extends JPanel {

    private static final long serialVersionUID = 1L;
    /** Time slider resolution: 2000 steps, finer than one output interval for runs up to 2000 points. */
    static final int TIME_STEPS = 2000;

    private final JButton run;
    private final JButton pause;
    private final JButton toEnd;
    private final JComboBox<PlaybackSpeed> speed = new JComboBox<>(PlaybackSpeed.ALL.toArray(new PlaybackSpeed[0]));
    private final JSlider time = new JSlider(0, TIME_STEPS, 0);
    private final JLabel clock = new JLabel("-");
    private boolean quiet;
    private double endS = 1;

    /**
     * @param runAction starts a run
     * @param pauseAction pauses or resumes
     * @param endAction jumps to the end
     * @param speedChosen hears of a new speed
     * @param scrubbed hears of the user moving the time slider (time in s)
     */
    PlaybackBar(Action runAction, Action pauseAction, Action endAction, Consumer<PlaybackSpeed> speedChosen,
                DoubleConsumer scrubbed) {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(6, 8, 4, 10));
        run = button(runAction);
        run.putClientProperty("JButton.buttonType", null);
        run.setFont(UiTheme.font(0, Font.BOLD));
        pause = button(pauseAction);
        toEnd = button(endAction);
        speed.setToolTipText("Playback speed: how much simulated time one second shows.");
        speed.addActionListener(e -> {
            if (!quiet && speed.getSelectedItem() != null) {
                speedChosen.accept((PlaybackSpeed) speed.getSelectedItem());
            }
        });
        speed.setFocusable(false);
        time.setToolTipText("Simulated time: drag to scrub back and forth through the run.");
        time.setFocusable(false);
        time.addChangeListener(e -> {
            if (!quiet) {
                scrubbed.accept(time.getValue() * endS / TIME_STEPS);
            }
        });
        clock.setFont(UiTheme.font(0, Font.PLAIN));
        clock.setToolTipText("Play head / end of the run (simulated time)");
        clock.setPreferredSize(new Dimension(190, clock.getPreferredSize().height));
        clock.setHorizontalAlignment(JLabel.RIGHT);
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(0, 0, 0, 4);
        add(run, c);
        add(pause, c);
        add(toEnd, c);
        c.insets = new Insets(0, 10, 0, 4);
        JLabel speedLabel = new JLabel("Speed");
        speedLabel.setLabelFor(speed);
        add(speedLabel, c);
        c.insets = new Insets(0, 0, 0, 10);
        add(speed, c);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        add(time, c);
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        c.insets = new Insets(0, 0, 0, 0);
        add(clock, c);
    }

    private JButton button(Action a) {
        JButton b = new JButton(a);
        b.setFocusable(false);
        b.setHideActionText(false);
        b.setToolTipText((String) a.getValue(Action.SHORT_DESCRIPTION));
        return b;
    }

    /**
     * Shows the play head (no scrub event).
     *
     * @param headS the play head (s)
     * @param runEndS the end of the run (s), > 0
     */
    void show(double headS, double runEndS) {
        quiet = true;
        try {
            endS = runEndS > 0 ? runEndS : 1;
            time.setValue((int) Math.round(TIME_STEPS * headS / endS));
            clock.setText(RunClock.format(headS) + " / " + RunClock.format(runEndS));
        } finally {
            quiet = false;
        }
    }

    /** Clears the play head (before a run exists). */
    void clear() {
        quiet = true;
        try {
            time.setValue(0);
            clock.setText("not run yet");
        } finally {
            quiet = false;
        }
    }

    /** @param s the speed to show selected (no event) */
    void showSpeed(PlaybackSpeed s) {
        quiet = true;
        try {
            speed.setSelectedItem(s);
        } finally {
            quiet = false;
        }
    }

    /** @return the time slider (for the smoke test) */
    JSlider timeSlider() {
        return time;
    }

    /** @return the clock's text */
    String clockText() {
        return clock.getText();
    }
}
