package org.cellwright.ui;

import java.awt.Component;
import java.awt.KeyboardFocusManager;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.Icon;
import javax.swing.JCheckBoxMenuItem;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JRootPane;
import javax.swing.KeyStroke;
import javax.swing.text.JTextComponent;

/**
 * The window's commands, their keys and its menu bar. Space (pause or resume) and End (jump to the end) act
 * only while the keyboard is not in a text field, so typing a space or moving to the end of a value still
 * works in the form.
 */
final class WindowActions {

    /** What the actions do; the window implements it. */
    interface Commands {
        void newFromTemplate();

        void open();

        void save();

        void saveAs();

        void export(RunExport.Kind kind);

        void quit();

        void run();

        void togglePause();

        void jumpToEnd();

        void pin();

        void clearReference();

        void toggleDark();

        void showShortcuts();

        void showAbout();
    }

    private static final int CTRL = InputEvent.CTRL_DOWN_MASK;

    final Action newFrom;
    final Action open;
    final Action save;
    final Action saveAs;
    final Action export;
    final Action quit;
    final Action run;
    final Action pause;
    final Action toEnd;
    final Action pin;
    final Action clearReference;
    final Action dark;
    final Action shortcuts;
    final Action about;
    private final List<Action> exportKinds = new ArrayList<>();
    /** The File > Export menu, once the menu bar is made (other commands add their exports to it). */
    JMenu exports;

    WindowActions(Commands c) {
        newFrom = action("New from template...", "Start a new scenario from a shipped one", key(KeyEvent.VK_N, CTRL),
                null, c::newFromTemplate);
        open = action("Open...", "Open a scenario file", key(KeyEvent.VK_O, CTRL), null, c::open);
        save = action("Save", "Save the scenario as the form shows it", key(KeyEvent.VK_S, CTRL), null, c::save);
        saveAs = action("Save as...", "Save the scenario to another file", key(KeyEvent.VK_S, CTRL | InputEvent.SHIFT_DOWN_MASK),
                null, c::saveAs);
        export = action("Export...", "Export the run: chart sheet (PNG, SVG), time series (CSV) or summary (JSON)",
                key(KeyEvent.VK_E, CTRL), null, () -> c.export(null));
        for (RunExport.Kind k : RunExport.Kind.values()) {
            exportKinds.add(action(k + "...", "Export " + k, null, null, () -> c.export(k)));
        }
        quit = action("Quit", "Close the window", key(KeyEvent.VK_Q, CTRL), null, c::quit);
        run = action("Run", "Run the scenario from the start and watch it unfold (F5 or Ctrl+R)",
                KeyStroke.getKeyStroke(KeyEvent.VK_F5, 0), new GlyphIcon(GlyphIcon.Shape.PLAY, 14, null), c::run);
        pause = action("Pause", "Pause or resume the playback (Space)", null,
                new GlyphIcon(GlyphIcon.Shape.PAUSE, 14, null), c::togglePause);
        toEnd = action("End", "Jump to the end of the run (End)", null, new GlyphIcon(GlyphIcon.Shape.TO_END, 14, null),
                c::jumpToEnd);
        pin = action("Pin this run", "Keep the run shown now for comparison; it is drawn dashed (Ctrl+P)",
                key(KeyEvent.VK_P, CTRL), new GlyphIcon(GlyphIcon.Shape.PIN, 14, null), c::pin);
        clearReference = action("Clear the reference", "Stop drawing a pinned run under the live curves", null, null,
                c::clearReference);
        dark = action("Dark look", "Switch between the light and the dark look (Ctrl+D)", key(KeyEvent.VK_D, CTRL),
                null, c::toggleDark);
        shortcuts = action("Keyboard shortcuts", "List the keys", KeyStroke.getKeyStroke(KeyEvent.VK_F1, 0), null,
                c::showShortcuts);
        about = action("About Cellwright", "Version, licence and data sources", null, null, c::showAbout);
    }

    /** The keys of the window, for the shortcut list: key, what it does. */
    static final String[][] KEYS = {
        {"F5, Ctrl+R", "run the scenario from the start and play it back"},
        {"Space", "pause or resume the playback (outside text fields)"},
        {"End", "jump to the end of the run (outside text fields)"},
        {"Ctrl+P", "pin the run shown for comparison (drawn dashed)"},
        {"Ctrl+O", "open a scenario file"},
        {"Ctrl+S", "save"},
        {"Ctrl+Shift+S", "save as"},
        {"Ctrl+N", "new scenario from a shipped one"},
        {"Ctrl+E", "export the run (PNG, SVG, CSV, JSON)"},
        {"Ctrl+D", "switch light and dark"},
        {"Ctrl+L", "load a measured log (CSV), drawn over the charts"},
        {"Ctrl+F", "fit the scenario to the measured log"},
        {"F1", "this list"},
        {"Ctrl+Q", "quit"},
    };

    /**
     * Binds the keys that have no menu accelerator (the menu bar binds the others).
     *
     * @param root the window's root pane
     */
    void bind(JRootPane root) {
        bindKey(root, KeyStroke.getKeyStroke(KeyEvent.VK_R, CTRL), "run-again", run);
        bindKey(root, KeyStroke.getKeyStroke(KeyEvent.VK_SPACE, 0), "pause", outsideText(pause));
        bindKey(root, KeyStroke.getKeyStroke(KeyEvent.VK_END, 0), "to-end", outsideText(toEnd));
    }

    private static void bindKey(JRootPane root, KeyStroke k, Object name, Action a) {
        root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(k, name);
        root.getActionMap().put(name, a);
    }

    /** @return the menu bar */
    JMenuBar menuBar() {
        JMenuBar bar = new JMenuBar();
        JMenu file = new JMenu("File");
        file.setMnemonic(KeyEvent.VK_F);
        file.add(newFrom);
        file.add(open);
        file.add(save);
        file.add(saveAs);
        file.addSeparator();
        JMenu exports = new JMenu("Export");
        exports.add(item(export));
        exports.addSeparator();
        exportKinds.forEach(exports::add);
        file.add(exports);
        this.exports = exports;
        file.addSeparator();
        file.add(quit);
        JMenu runMenu = new JMenu("Run");
        runMenu.setMnemonic(KeyEvent.VK_R);
        runMenu.add(run);
        JMenuItem p = new JMenuItem(pause);
        p.setText("Pause or resume    Space");
        runMenu.add(p);
        JMenuItem e = new JMenuItem(toEnd);
        e.setText("Jump to the end    End");
        runMenu.add(e);
        runMenu.addSeparator();
        runMenu.add(pin);
        runMenu.add(clearReference);
        JMenu view = new JMenu("View");
        view.setMnemonic(KeyEvent.VK_V);
        view.add(new JCheckBoxMenuItem(dark));
        JMenu help = new JMenu("Help");
        help.setMnemonic(KeyEvent.VK_H);
        help.add(shortcuts);
        help.add(about);
        bar.add(file);
        bar.add(runMenu);
        bar.add(view);
        bar.add(help);
        return bar;
    }

    private static JMenuItem item(Action a) {
        return new JMenuItem(a);
    }

    /**
     * Enables the commands that need a run and names the pause button after what it would do.
     *
     * @param state the playback state, or null before a run
     * @param runnable true when the scenario checks out
     */
    void refresh(Playback.State state, boolean runnable) {
        run.setEnabled(runnable);
        boolean hasRun = state != null;
        pause.setEnabled(hasRun);
        toEnd.setEnabled(hasRun && state != Playback.State.FINISHED);
        pin.setEnabled(hasRun);
        export.setEnabled(hasRun);
        exportKinds.forEach(a -> a.setEnabled(hasRun));
        boolean playing = state == Playback.State.PLAYING;
        pause.putValue(Action.NAME, playing || state == null ? "Pause"
                : state == Playback.State.FINISHED ? "Replay" : "Resume");
        pause.putValue(Action.SMALL_ICON, new GlyphIcon(playing || state == null ? GlyphIcon.Shape.PAUSE
                : state == Playback.State.FINISHED ? GlyphIcon.Shape.RESTART : GlyphIcon.Shape.PLAY, 14, null));
    }

    private static KeyStroke key(int code, int modifiers) {
        return KeyStroke.getKeyStroke(code, modifiers);
    }

    /**
     * @param name menu text
     * @param tip tooltip
     * @param key accelerator, or null
     * @param icon icon, or null
     * @param r what it does
     * @return an action that runs {@code r}
     */
    static Action action(String name, String tip, KeyStroke key, Icon icon, Runnable r) {
        Action a = new AbstractAction(name, icon) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                r.run();
            }
        };
        a.putValue(Action.SHORT_DESCRIPTION, tip);
        if (key != null) {
            a.putValue(Action.ACCELERATOR_KEY, key);
        }
        return a;
    }

    /** @return the action, switched off while the keyboard is in a text field or a list box */
    static Action outsideText(Action a) {
        return new AbstractAction() {
            private static final long serialVersionUID = 1L;

            @Override
            public boolean isEnabled() {
                Component owner = KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner();
                return a.isEnabled() && !(owner instanceof JTextComponent) && !(owner instanceof JComboBox);
            }

            @Override
            public void actionPerformed(ActionEvent e) {
                a.actionPerformed(e);
            }
        };
    }
}
