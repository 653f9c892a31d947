package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Window;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.WindowConstants;
import javax.swing.table.DefaultTableModel;

import org.cellwright.chart.FitText;
import org.cellwright.study.FitOutcome;
import org.cellwright.study.FitProgress;
import org.cellwright.study.LogSeries;
import org.cellwright.study.MeasuredLog;

/**
 * The fit dialog: which values to set free (the common ones as boxes, any numeric key as text), a weight per
 * logged column, then the fit's progress (iteration, engine runs, sum of squares) with Cancel, and its
 * outcome: each value with its 95 % interval in its unit, how closely each column is matched, pairs the log
 * barely tells apart. The fit itself runs in a {@link FitController} off the event thread; the window stays
 * usable while it runs.
 */
final class FitDialog extends JDialog {

    private static final long serialVersionUID = 1L;

    /** What the dialog asks of the window. */
    interface Host {
        /**
         * @param keys the free keys
         * @param weights weight per column
         * @param listener hears of the fit
         */
        void startFit(List<String> keys, Map<String, Double> weights, FitController.Listener listener);

        /** Asks the running fit to stop. */
        void cancelFit();

        /** Saves the fitted scenario (asks for a file). */
        void saveFitted();
    }

    private final transient Host host;
    private final List<JCheckBox> boxes = new ArrayList<>();
    private final transient List<FitController.Candidate> candidates;
    private final JTextField other = new JTextField();
    private final Map<String, JTextField> weightFields = new LinkedHashMap<>();
    private final JLabel setupError = new JLabel(" ");
    private final CardLayout cards = new CardLayout();
    private final JPanel body = new JPanel(cards);
    private final JProgressBar bar = new JProgressBar();
    private final JTextArea progress = new JTextArea(3, 60);
    private final DefaultTableModel params = table("value", "fitted", "95 % interval", "started from");
    private final DefaultTableModel residuals = table("column", "measured minus fitted (rms)", "typical", "weight");
    private final JTextArea notes = new JTextArea(4, 60);
    private final JButton fit = new JButton("Fit");
    private final JButton cancel = new JButton("Close");
    private final JButton save = new JButton("Save the fitted scenario...");
    private final JButton again = new JButton("Change the free values...");
    private boolean running;

    /**
     * @param owner the window
     * @param scenarioName the scenario's name
     * @param log the measured log
     * @param candidates the keys to offer
     * @param host what the dialog asks of the window
     */
    FitDialog(Window owner, String scenarioName, MeasuredLog log, List<FitController.Candidate> candidates, Host host) {
        super(owner, "Fit " + scenarioName + " to the measured log", ModalityType.MODELESS);
        this.host = host;
        this.candidates = List.copyOf(candidates);
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new java.awt.event.WindowAdapter() {
            @Override
            public void windowClosing(java.awt.event.WindowEvent e) {
                close();
            }
        });
        body.add(setup(log), "setup");
        body.add(running(), "run");
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 6, 0));
        buttons.add(again);
        buttons.add(save);
        buttons.add(fit);
        buttons.add(cancel);
        again.setVisible(false);
        save.setVisible(false);
        fit.addActionListener(e -> start());
        cancel.addActionListener(e -> close());
        save.addActionListener(e -> host.saveFitted());
        again.addActionListener(e -> showSetup());
        JPanel all = new JPanel(new BorderLayout(0, 10));
        all.setBorder(BorderFactory.createEmptyBorder(12, 14, 12, 14));
        JLabel head = new JLabel("<html><b>Fit " + scenarioName + "</b> to " + log.source() + "</html>");
        all.add(head, BorderLayout.NORTH);
        all.add(body, BorderLayout.CENTER);
        all.add(buttons, BorderLayout.SOUTH);
        setContentPane(all);
        getRootPane().setDefaultButton(fit);
        setSize(new Dimension(760, 600));
        setLocationRelativeTo(owner);
    }

    private JComponent setup(MeasuredLog log) {
        JPanel p = new JPanel(new GridBagLayout());
        int row = 0;
        p.add(bold("Free values"), GridPlace.pairCell(row++, 0, 2, 0));
        p.add(muted("Each starts from the scenario as the window shows it; move the sliders first to start closer."),
                GridPlace.pairCell(row++, 0, 2, 2));
        for (FitController.Candidate c : candidates) {
            JCheckBox b = new JCheckBox("<html>" + c.label() + " <font color='gray'>" + c.key() + "</font></html>",
                    c.preselected());
            boxes.add(b);
            p.add(b, GridPlace.pairCell(row++, 0, 2, 1));
        }
        p.add(new JLabel("Other keys:"), GridPlace.pairCell(row, 0, 1, 8));
        other.setToolTipText("Any numeric scenario key as a dotted path, comma-separated, e.g."
                + " electrolyte.temperature, species.Cu2+.diffusion, reaction.H+/H2.alpha_c");
        other.putClientProperty("JTextField.placeholderText", "e.g. species.Cu2+.diffusion, reaction.O2/H2O.alpha_a");
        p.add(other, GridPlace.pairCell(row++, 1, 1, 8));
        p.add(bold("Weights"), GridPlace.pairCell(row++, 0, 2, 14));
        p.add(muted("1 counts a column as much as the others (each is divided by its typical value); 2 trusts it"
                + " twice as much."), GridPlace.pairCell(row++, 0, 2, 2));
        for (LogSeries s : log.series()) {
            if (s.count() == 0) {
                continue;
            }
            JTextField w = new JTextField("1", 5);
            weightFields.put(s.column(), w);
            p.add(new JLabel(s.column() + "  (" + s.count() + " values)"), GridPlace.pairCell(row, 0, 1, 3));
            GridBagConstraints c = GridPlace.pairCell(row++, 1, 1, 3);
            c.fill = GridBagConstraints.NONE;
            p.add(w, c);
        }
        setupError.setForeground(UiTheme.color("error.foreground"));
        p.add(setupError, GridPlace.pairCell(row++, 0, 2, 10));
        GridBagConstraints fill = GridPlace.pairCell(row, 0, 2, 0);
        fill.weighty = 1;
        p.add(new JLabel(), fill);
        JScrollPane s = new JScrollPane(p);
        s.setBorder(BorderFactory.createEmptyBorder());
        return s;
    }

    private JComponent running() {
        JPanel p = new JPanel(new BorderLayout(0, 8));
        JPanel top = new JPanel(new BorderLayout(0, 4));
        bar.setIndeterminate(true);
        top.add(bar, BorderLayout.NORTH);
        progress.setEditable(false);
        progress.setOpaque(false);
        progress.setLineWrap(true);
        progress.setWrapStyleWord(true);
        top.add(progress, BorderLayout.CENTER);
        p.add(top, BorderLayout.NORTH);
        JPanel tables = new JPanel(new GridBagLayout());
        tables.add(bold("Fitted values"), GridPlace.pairCell(0, 0, 2, 0));
        tables.add(scroll(widths(new JTable(params), 190, 110, 240, 110), 4), GridPlace.pairCell(1, 0, 2, 2));
        tables.add(bold("Columns: how closely the fitted run follows each"), GridPlace.pairCell(2, 0, 2, 10));
        tables.add(scroll(widths(new JTable(residuals), 170, 230, 150, 100), 5), GridPlace.pairCell(3, 0, 2, 2));
        notes.setEditable(false);
        notes.setOpaque(false);
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        JScrollPane notesScroll = new JScrollPane(notes);
        notesScroll.setBorder(BorderFactory.createEmptyBorder());
        notesScroll.setOpaque(false);
        notesScroll.getViewport().setOpaque(false);
        // a wrapped text area asks for its height at whatever width it had last; a fixed box keeps the
        // tables above at their own heights
        notesScroll.setPreferredSize(new Dimension(700, 110));
        notesScroll.setMinimumSize(new Dimension(300, 60));
        GridBagConstraints n = GridPlace.pairCell(4, 0, 2, 10);
        n.weighty = 1;
        n.fill = GridBagConstraints.BOTH;
        tables.add(notesScroll, n);
        p.add(tables, BorderLayout.CENTER);
        return p;
    }

    /** Reads the setup and starts the fit; setup errors are shown under the weights. */
    void start() {
        if (running) {
            return;
        }
        List<String> keys = new ArrayList<>();
        for (int i = 0; i < boxes.size(); i++) {
            if (boxes.get(i).isSelected()) {
                keys.add(candidates.get(i).key());
            }
        }
        for (String k : other.getText().split(",")) {
            if (!k.isBlank() && !keys.contains(k.strip())) {
                keys.add(k.strip());
            }
        }
        if (keys.isEmpty()) {
            setupError.setText("Tick at least one value to fit, or write a key under Other keys.");
            return;
        }
        Map<String, Double> weights = new LinkedHashMap<>();
        for (Map.Entry<String, JTextField> e : weightFields.entrySet()) {
            String text = e.getValue().getText().strip();
            double w;
            try {
                w = Double.parseDouble(text);
            } catch (NumberFormatException ex) {
                w = Double.NaN;
            }
            if (!(w > 0) || Double.isInfinite(w)) {
                setupError.setText("Weight of " + e.getKey() + ": expected a number above 0, got '" + text + "'.");
                e.getValue().requestFocusInWindow();
                return;
            }
            if (w != 1) {
                weights.put(e.getKey(), w);
            }
        }
        setupError.setText(" ");
        running = true;
        params.setRowCount(0);
        residuals.setRowCount(0);
        notes.setText("");
        bar.setIndeterminate(true);
        bar.setVisible(true);
        progress.setText("Starting: the engine runs the scenario over the log's span...");
        fit.setVisible(false);
        save.setVisible(false);
        again.setVisible(false);
        cancel.setText("Cancel the fit");
        cards.show(body, "run");
        host.startFit(keys, weights, listener());
    }

    private FitController.Listener listener() {
        return new FitController.Listener() {
            @Override
            public void progress(FitProgress p) {
                showProgress(p);
            }

            @Override
            public void finished(FitController.Outcome o) {
                running = false;
                showOutcome(o);
            }

            @Override
            public void failed(List<String> problems) {
                running = false;
                showSetup();
                setupError.setText("<html>" + String.join("<br>", problems.stream().map(FitDialog::html).toList())
                        + "</html>");
            }

            @Override
            public void cancelled() {
                running = false;
                showSetup();
                setupError.setText("The fit was cancelled; the window's scenario is unchanged.");
            }
        };
    }

    private void showProgress(FitProgress p) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "Iteration %d, %d engine runs, weighted sum of squares %.4g.", p.iteration(), p.evaluations(),
                p.sumOfSquares()));
        for (int j = 0; j < p.keys().size(); j++) {
            sb.append(j == 0 ? "\nNow at " : ", ").append(p.keys().get(j)).append(" = ")
                    .append(org.cellwright.chart.ParameterUnit.of(p.keys().get(j)).format(p.values()[j]));
        }
        progress.setText(sb.toString());
    }

    /** @param o the finished fit: its values, columns and notes */
    void showOutcome(FitController.Outcome o) {
        cards.show(body, "run");
        bar.setVisible(false);
        FitOutcome out = o.result().outcome();
        progress.setText(String.format(Locale.ROOT, "%s after %d iterations, %d engine runs, %.1f s. The fitted"
                + " scenario is loaded in the window (not saved yet); the log stays drawn over it.",
                out.converged() ? "Converged" : "Stopped at the iteration limit (best point shown)", out.iterations(),
                out.evaluations(), o.result().elapsedS()));
        params.setRowCount(0);
        FitController.parameterRows(o).forEach(params::addRow);
        residuals.setRowCount(0);
        FitController.residualRows(o).forEach(residuals::addRow);
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "Residual standard deviation %.3g (weighted; %d values, %d degrees of"
                + " freedom). The intervals assume independent errors of equal weighted variance.",
                out.residualSd(), out.observations(), out.degreesOfFreedom()));
        for (String l : FitText.lines("", o.result(), o.starts())) {
            if (l.strip().startsWith("!")) {
                lines.add(l.strip().substring(1).strip());
            }
        }
        notes.setText(String.join("\n", lines));
        fit.setVisible(false);
        save.setVisible(true);
        again.setVisible(true);
        cancel.setText("Close");
    }

    private void showSetup() {
        cards.show(body, "setup");
        fit.setVisible(true);
        save.setVisible(false);
        again.setVisible(false);
        cancel.setText("Close");
    }

    /** Cancels a running fit (it stops before its next engine run), else closes the dialog. */
    void close() {
        if (running) {
            host.cancelFit();
            progress.setText("Cancelling: the fit stops before its next engine run...");
            return;
        }
        dispose();
    }

    /** @return true while a fit runs */
    boolean isRunning() {
        return running;
    }

    /** @return the progress line and the last setup error (for tests) */
    String shownStatus() {
        return progress.getText() + "\n" + setupError.getText();
    }

    /** @return the fitted values table (for tests) */
    DefaultTableModel parameterTable() {
        return params;
    }

    private static String html(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private static DefaultTableModel table(String... columns) {
        return new DefaultTableModel(columns, 0) {
            private static final long serialVersionUID = 1L;

            @Override
            public boolean isCellEditable(int row, int column) {
                return false;
            }
        };
    }

    private static JTable widths(JTable t, int... px) {
        for (int i = 0; i < px.length; i++) {
            t.getColumnModel().getColumn(i).setPreferredWidth(px[i]);
        }
        return t;
    }

    private static JScrollPane scroll(JTable t, int rows) {
        t.setFillsViewportHeight(true);
        t.getTableHeader().setReorderingAllowed(false);
        JScrollPane s = new JScrollPane(t);
        s.setPreferredSize(new Dimension(700, (rows + 1) * 24 + 4));
        s.setMinimumSize(new Dimension(300, (rows + 1) * 24 + 4));
        return s;
    }

    private static JLabel bold(String text) {
        JLabel l = new JLabel(text);
        l.setFont(UiTheme.font(0, Font.BOLD));
        return l;
    }

    private static JLabel muted(String text) {
        JLabel l = new JLabel("<html>" + html(text) + "</html>");
        l.setForeground(UiTheme.color("muted.foreground"));
        return l;
    }
}
