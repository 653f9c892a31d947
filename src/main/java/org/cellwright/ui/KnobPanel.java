package org.cellwright.ui;

import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;

import org.cellwright.cell.Scenario;

/**
 * The what-if sliders: supply set value, gap, one species' concentration, bath temperature and agitation.
 * Moving one tells the listener at once (with the time of the move, for the replot clock); the value it
 * stands at is shown beside its caption, in its unit.
 */
final class KnobPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** Hears of slider moves. */
    interface Listener {
        /**
         * @param knob the slider moved by the user
         * @param text its value as the form writes it ("24.5 mm")
         * @param atNanos {@link System#nanoTime()} at the move
         */
        void moved(Knob knob, String text, long atNanos);

        /** @param species the species chosen for the concentration slider */
        void speciesChosen(String species);
    }

    private final Map<Knob, JSlider> sliders = new EnumMap<>(Knob.class);
    private final Map<Knob, JLabel> values = new EnumMap<>(Knob.class);
    private final Map<Knob, JLabel> captions = new EnumMap<>(Knob.class);
    private final JComboBox<String> species = new JComboBox<>();
    private final transient Listener listener;
    private transient WhatIf whatIf;
    private boolean quiet;

    /** @param listener hears of moves */
    KnobPanel(Listener listener) {
        super(new GridBagLayout());
        this.listener = listener;
        setBorder(BorderFactory.createEmptyBorder(6, 10, 8, 10));
        int row = 0;
        for (Knob k : Knob.values()) {
            if (k == Knob.CONCENTRATION) {
                species.setToolTipText("The species whose start concentration the slider below changes.");
                species.addActionListener(e -> {
                    if (!quiet && species.getSelectedItem() != null) {
                        listener.speciesChosen((String) species.getSelectedItem());
                    }
                });
                GridBagConstraints c = constraints(row++, 0);
                c.gridwidth = 2;
                c.fill = GridBagConstraints.HORIZONTAL;
                c.insets = new Insets(6, 0, 0, 0);
                add(species, c);
            }
            JLabel caption = new JLabel(k.label());
            JLabel value = new JLabel("-");
            value.setFont(UiTheme.font(0, Font.BOLD));
            JSlider s = new JSlider(0, KnobScale.STEPS, KnobScale.STEPS / 2);
            s.setFocusable(true);
            s.addChangeListener(e -> moved(k));
            GridBagConstraints c = constraints(row++, 0);
            c.insets = new Insets(k == Knob.CONCENTRATION ? 2 : 8, 0, 0, 0);
            add(caption, c);
            c = constraints(row - 1, 1);
            c.anchor = GridBagConstraints.EAST;
            c.insets = new Insets(k == Knob.CONCENTRATION ? 2 : 8, 0, 0, 0);
            add(value, c);
            c = constraints(row++, 0);
            c.gridwidth = 2;
            c.fill = GridBagConstraints.HORIZONTAL;
            add(s, c);
            sliders.put(k, s);
            values.put(k, value);
            captions.put(k, caption);
        }
        GridBagConstraints c = constraints(row, 0);
        c.weighty = 1;
        add(new JLabel(), c);
    }

    private static GridBagConstraints constraints(int row, int col) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = row;
        c.gridx = col;
        c.weightx = col == 0 ? 1 : 0;
        c.anchor = GridBagConstraints.WEST;
        return c;
    }

    /**
     * Sets the sliders for a scenario (no move events).
     *
     * @param w the sliders' scales and units
     * @param s the scenario whose values they show
     * @param speciesChoice the species the concentration slider may change
     */
    void configure(WhatIf w, Scenario s, List<String> speciesChoice) {
        this.whatIf = w;
        quiet = true;
        try {
            species.removeAllItems();
            speciesChoice.forEach(species::addItem);
            if (w.species() != null) {
                species.setSelectedItem(w.species());
            }
            species.setEnabled(!speciesChoice.isEmpty());
            for (Knob k : Knob.values()) {
                JSlider sl = sliders.get(k);
                boolean on = w.enabled(k);
                sl.setEnabled(on);
                sl.setToolTipText(w.tooltip(k));
                captions.get(k).setToolTipText(w.tooltip(k));
                captions.get(k).setText(k == Knob.SUPPLY ? supplyCaption(w) : k.label());
            }
            sync(s);
        } finally {
            quiet = false;
        }
    }

    private static String supplyCaption(WhatIf w) {
        return switch (w.unit(Knob.SUPPLY)) {
            case "A/dm2" -> "Current density";
            case "A" -> "Current";
            default -> "Voltage";
        };
    }

    /**
     * Moves the sliders to a scenario's values (no move events).
     *
     * @param s the scenario
     */
    void sync(Scenario s) {
        if (whatIf == null) {
            return;
        }
        boolean was = quiet;
        quiet = true;
        try {
            for (Knob k : Knob.values()) {
                if (whatIf.enabled(k)) {
                    double v = whatIf.value(k, s);
                    sliders.get(k).setValue(whatIf.scale(k).positionOf(v));
                    values.get(k).setText(whatIf.text(k, v));
                } else {
                    values.get(k).setText("-");
                }
            }
        } finally {
            quiet = was;
        }
    }

    /**
     * @param k a slider
     * @return the slider (for tests and the smoke test)
     */
    JSlider slider(Knob k) {
        return sliders.get(k);
    }

    /**
     * @param k a slider
     * @return the value it shows
     */
    String valueText(Knob k) {
        return values.get(k).getText();
    }

    private void moved(Knob k) {
        if (quiet || whatIf == null || !whatIf.enabled(k)) {
            return;
        }
        long now = System.nanoTime();
        String text = whatIf.textAt(k, sliders.get(k).getValue());
        values.get(k).setText(text);
        listener.moved(k, text, now);
    }
}
