package org.cellwright.ui;

import java.util.List;

import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;

import org.cellwright.study.SweepAxis;

/**
 * One axis of the sweep view: the key (offered with a range around the scenario's value, or typed as a dotted
 * path), the first and last values with units, how many values and whether they are spaced on a log scale.
 */
final class SweepAxisRow {

    /** The second key's choice for a sweep of one key. */
    static final String ONE_KEY = "(none: vary one key)";

    private final JComboBox<Object> key = new JComboBox<>();
    private final JTextField from = new JTextField(9);
    private final JTextField to = new JTextField(9);
    private final JSpinner n = new JSpinner(new SpinnerNumberModel(SweepKeys.DEFAULT_N, 2, 100, 1));
    private final JCheckBox log = new JCheckBox();
    private final boolean optional;

    SweepAxisRow(boolean optional) {
        this.optional = optional;
        key.setEditable(true);
        key.setToolTipText("<html>A common key, or type any scenario key as a dotted path<br>"
                + "(e.g. reaction.H+/H2.i0, electrolyte.composition.\"Cu2+\"); the ends take units</html>");
        from.setToolTipText("First value with its unit (e.g. 10 mm, 0.5 A/dm2, 20 C)");
        to.setToolTipText("Last value with its unit; a bare number takes the other end's unit");
        n.setToolTipText("How many values, ends included");
        log.setToolTipText("Space the values evenly on a log scale (both ends above zero)");
        key.addActionListener(e -> {
            if (key.getSelectedItem() instanceof SweepKeys.Choice c) {
                from.setText(c.from());
                to.setText(c.to());
                log.setSelected(c.log());
            }
            boolean on = !off();
            from.setEnabled(on);
            to.setEnabled(on);
            n.setEnabled(on);
            log.setEnabled(on);
        });
    }

    /** Puts the row's controls into the view's grid. */
    void addTo(JPanel p, int row, String name) {
        p.add(new JLabel(name), SweepView.at(row, 0));
        p.add(key, SweepView.at(row, 1));
        p.add(from, SweepView.at(row, 2));
        p.add(to, SweepView.at(row, 3));
        p.add(n, SweepView.at(row, 4));
        p.add(log, SweepView.at(row, 5));
    }

    /** Offers keys, choosing the given one unless a key was already chosen. */
    void offer(List<SweepKeys.Choice> keys, int chosen) {
        Object was = key.getSelectedItem();
        key.removeAllItems();
        if (optional) {
            key.addItem(ONE_KEY);
        }
        keys.forEach(key::addItem);
        Object again = was instanceof SweepKeys.Choice c ? keys.stream().filter(k -> k.key().equals(c.key()))
                .findFirst().orElse(null) : was;
        String fromText = from.getText();
        String toText = to.getText();
        boolean logScale = log.isSelected();
        key.setSelectedItem(again != null ? again : keys.get(Math.min(chosen, keys.size() - 1)));
        if (again != null && !fromText.isBlank()) {
            // the same key as before: keep the range the user typed
            from.setText(fromText);
            to.setText(toText);
            log.setSelected(logScale);
        }
    }

    /** @return true when the row is the second one and set to vary one key only */
    boolean off() {
        return optional && ONE_KEY.equals(key.getSelectedItem());
    }

    /** Chooses a key and its range (as the user would). */
    void set(String keyText, String fromText, String toText, int count, boolean logScale) {
        Object match = null;
        for (int i = 0; i < key.getItemCount(); i++) {
            if (key.getItemAt(i) instanceof SweepKeys.Choice c && c.key().equals(keyText)) {
                match = c;
            }
        }
        key.setSelectedItem(match != null ? match : keyText);
        from.setText(fromText);
        to.setText(toText);
        n.setValue(count);
        log.setSelected(logScale);
    }

    /** Turns the row off (one key only). */
    void turnOff() {
        key.setSelectedItem(ONE_KEY);
    }

    /**
     * @return the axis as typed
     * @throws IllegalArgumentException with a message for people when it does not read
     */
    SweepAxis axis() {
        Object k = key.getEditor().getItem();
        String text = k instanceof SweepKeys.Choice c ? c.key() : k == null ? "" : k.toString();
        return SweepKeys.axis(text, from.getText(), to.getText(), (Integer) n.getValue(), log.isSelected());
    }

    /** @return the key's list box */
    JComponent keyBox() {
        return key;
    }
}
