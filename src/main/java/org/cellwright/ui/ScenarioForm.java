package org.cellwright.ui;

import java.awt.Dimension;
import java.awt.GridBagLayout;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

import org.cellwright.cell.AgitationPreset;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;

/**
 * The scenario as a form: one field per value, in sections (bath, electrodes, cell, supply, run), each
 * checked as it is typed, with what is wrong written under the field. Edits go straight into the
 * {@link ScenarioDraft}; the listener hears of each so that the whole scenario can be checked and run.
 */
final class ScenarioForm extends ColumnPanel {

    private static final long serialVersionUID = 1L;
    private static final String OUTLINE = "JComponent.outline";
    /** The agitation choice that sets the diffusion layer directly. */
    static final String SET_LAYER = "thickness, set below";
    private static final int MESSAGE_WIDTH = 210;

    private final transient ChemLibrary lib;
    private final transient Runnable edited;
    private final Map<String, JTextComponent> fields = new HashMap<>();
    private final Map<String, FieldMessage> messages = new HashMap<>();
    private final JComboBox<SupplyKind> supplyKind = new JComboBox<>(SupplyKind.values());
    private final JComboBox<String> agitation = new JComboBox<>();
    private final CompositionEditor composition;
    private final FieldMessage general = new FieldMessage(MESSAGE_WIDTH + 100);
    private final FieldMessage warnings = new FieldMessage(MESSAGE_WIDTH + 100);
    private transient ScenarioDraft draft = ScenarioDraft.empty();
    private final FormGrid grid = new FormGrid(this);
    private boolean quiet;

    /**
     * @param lib the chemistry library (names, molar masses, materials)
     * @param edited called after each edit by the user
     */
    ScenarioForm(ChemLibrary lib, Runnable edited) {
        super(new GridBagLayout());
        this.lib = lib;
        this.edited = edited;
        this.composition = new CompositionEditor(lib, this::compositionEdited);
        setBorder(BorderFactory.createEmptyBorder(8, 10, 12, 10));
        for (AgitationPreset p : AgitationPreset.values()) {
            agitation.addItem(p.key());
        }
        agitation.addItem(SET_LAYER);
        build();
    }

    private void build() {
        grid.span(general);
        grid.span(warnings);
        grid.section("Description");
        text("title");
        JTextArea notes = new JTextArea(3, 20);
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        notes.setToolTipText("Free text for whoever runs the scenario: what to look at.");
        JScrollPane notesScroll = new JScrollPane(notes);
        notesScroll.setPreferredSize(new Dimension(100, 64));
        notesScroll.setMinimumSize(new Dimension(60, 64));
        register(FormFields.NOTES, notes);
        labelled("Notes", notesScroll, FormFields.NOTES);
        grid.section("Bath");
        text("electrolyte.volume");
        text("electrolyte.temperature");
        text("electrolyte.conductivity");
        JLabel comp = new JLabel("Composition");
        comp.setToolTipText("Start concentration of each dissolved species.");
        grid.span(comp);
        grid.span(composition);
        grid.section("Electrodes");
        String materials = String.join(", ", lib.materials().stream().map(ElectrodeMaterial::name).toList());
        text("cathode.material").setToolTipText(tip("cathode.material") + "<br>Known: " + materials + "</html>");
        text("cathode.area");
        text("anode.material").setToolTipText(tip("anode.material") + "<br>Known: " + materials + "</html>");
        text("anode.area");
        grid.section("Cell");
        text("cell.gap");
        agitation.setToolTipText(tip(FormFields.AGITATION) + "</html>");
        agitation.addActionListener(e -> agitationChosen());
        labelled("Agitation", agitation, FormFields.AGITATION);
        text(FormFields.DIFFUSION_LAYER);
        text("cell.ambient");
        text("cell.contact_resistance");
        text("cell.heat_loss");
        grid.section("Supply");
        supplyKind.setToolTipText("What the supply holds: a current, a current density (times the cathode area) or a"
                + " voltage.");
        supplyKind.addActionListener(e -> supplyKindChosen());
        labelled("Sets", supplyKind, null);
        text(FormFields.SUPPLY_VALUE);
        text("supply.voltage_limit");
        text("supply.current_limit");
        grid.section("Run");
        text("run.duration");
        text("run.output_interval");
        text(FormFields.STOPS);
        text("run.target");
        grid.end();
    }

    /** @return the draft the form edits */
    ScenarioDraft draft() {
        return draft;
    }

    /**
     * Shows a draft (no edit event).
     *
     * @param d the draft
     */
    void show(ScenarioDraft d) {
        this.draft = d;
        quiet = true;
        try {
            supplyKind.removeAllItems();
            for (SupplyKind k : SupplyKind.values()) {
                if (k != SupplyKind.SCHEDULE || d.hasSchedule()) {
                    supplyKind.addItem(k);
                }
            }
            supplyKind.setSelectedItem(d.supplyKind());
            fields.forEach((key, f) -> {
                f.setText(d.get(key));
                f.setCaretPosition(0);
            });
            String preset = d.get(FormFields.AGITATION).strip();
            agitation.setSelectedItem(preset.isEmpty() && !d.get(FormFields.DIFFUSION_LAYER).isBlank() ? SET_LAYER
                    : preset.isEmpty() ? AgitationPreset.STILL.key() : preset);
            fields.get(FormFields.DIFFUSION_LAYER).setEnabled(SET_LAYER.equals(agitation.getSelectedItem()));
            fields.get(FormFields.SUPPLY_VALUE).setEnabled(d.supplyKind() != SupplyKind.SCHEDULE);
            composition.show(d.composition());
            fields.keySet().forEach(this::check);
            general.show(null, false);
            warnings.show(null, true);
        } finally {
            quiet = false;
        }
        revalidate();
        repaint();
    }

    /**
     * Puts a value into a field and the draft, as a slider does (no edit event).
     *
     * @param key the field key
     */
    void refresh(String key) {
        quiet = true;
        try {
            if (key.equals(FormFields.COMPOSITION)) {
                composition.show(draft.composition());
            } else if (key.equals(FormFields.DIFFUSION_LAYER)) {
                agitation.setSelectedItem(SET_LAYER);
                fields.get(key).setEnabled(true);
                fields.get(key).setText(draft.get(key));
            } else {
                fields.get(key).setText(draft.get(key));
            }
        } finally {
            quiet = false;
        }
    }

    /**
     * Shows the outcome of checking the whole draft: the reader's problems beside fields that pass their own
     * check, problems of no field and warnings at the top.
     *
     * @param o the outcome
     */
    void showOutcome(DraftCheck.Outcome o) {
        fields.keySet().forEach(this::check);
        o.fieldErrors().forEach((key, e) -> {
            FieldMessage m = messages.get(key);
            if (m != null && !m.showing()) {
                m.show(e.text(), false);
                fields.get(key).putClientProperty(OUTLINE, "error");
            }
        });
        composition.showReaderErrors(o.fieldErrors());
        general.show(o.generalErrors().isEmpty() ? null : String.join("\n", o.generalErrors()), false);
        warnings.show(o.warnings().isEmpty() ? null : "Note: " + String.join("; ", o.warnings()), true);
        revalidate();
    }

    /** @return how many fields show a problem */
    int problemsShown() {
        return (int) messages.values().stream().filter(FieldMessage::showing).count();
    }

    /** @return the species the composition names (canonical) */
    List<String> species() {
        return composition.knownSpecies();
    }

    /**
     * @param key a field key
     * @return the text field for it (for tests and focus)
     */
    Optional<JTextComponent> field(String key) {
        return Optional.ofNullable(fields.get(key));
    }

    /**
     * @param key a field key
     * @return the message under it
     */
    Optional<FieldMessage> message(String key) {
        return Optional.ofNullable(messages.get(key));
    }

    private void compositionEdited() {
        draft.setComposition(composition.rows());
        if (!quiet) {
            edited.run();
        }
    }

    private void agitationChosen() {
        Object sel = agitation.getSelectedItem();
        boolean layer = SET_LAYER.equals(sel);
        JTextComponent layerField = fields.get(FormFields.DIFFUSION_LAYER);
        if (layerField != null) {
            layerField.setEnabled(layer);
            // the greyed field shows the chosen preset's thickness, not a made-up example
            String hint = layer || sel == null ? FormFields.find(FormFields.DIFFUSION_LAYER).map(FieldSpec::example).orElse("")
                    : AgitationPreset.find(sel.toString()).map(p -> Math.round(p.diffusionLayerM() * 1e6) + " um ("
                    + p.key() + ")").orElse("");
            layerField.putClientProperty("JTextField.placeholderText", hint);
        }
        if (quiet || sel == null) {
            return;
        }
        if (layer) {
            String preset = draft.get(FormFields.AGITATION);
            draft.set(FormFields.AGITATION, "");
            if (layerField.getText().isBlank()) {
                double um = AgitationPreset.find(preset.isBlank() ? "still" : preset).orElse(AgitationPreset.STILL)
                        .diffusionLayerM() * 1e6;
                layerField.setText(Math.round(um) + " um");
            }
        } else {
            draft.set(FormFields.AGITATION, sel.toString());
            layerField.setText("");
        }
        edited.run();
    }

    private void supplyKindChosen() {
        SupplyKind k = (SupplyKind) supplyKind.getSelectedItem();
        if (quiet || k == null) {
            return;
        }
        draft.setSupplyKind(k);
        fields.get(FormFields.SUPPLY_VALUE).setEnabled(k != SupplyKind.SCHEDULE);
        check(FormFields.SUPPLY_VALUE);
        edited.run();
    }

    private JTextField text(String key) {
        FieldSpec spec = FormFields.find(key).orElseThrow();
        JTextField f = new JTextField(12);
        f.putClientProperty("JTextField.placeholderText", spec.example());
        HintStyle.install(f);
        f.setToolTipText(tip(key) + "</html>");
        register(key, f);
        labelled(spec.label(), f, key);
        return f;
    }

    private String tip(String key) {
        FieldSpec spec = FormFields.find(key).orElseThrow();
        return "<html><div style='width:300px'>" + FieldMessage.escape(spec.tooltip()) + "</div>";
    }

    private void register(String key, JTextComponent f) {
        fields.put(key, f);
        f.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                typed(key);
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                typed(key);
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                typed(key);
            }
        });
    }

    private void typed(String key) {
        draft.set(key, fields.get(key).getText());
        check(key);
        if (!quiet) {
            edited.run();
        }
    }

    private void check(String key) {
        FieldMessage m = messages.get(key);
        if (m == null) {
            return;
        }
        Optional<DraftCheck.FieldError> e = DraftCheck.field(key, fields.get(key).getText(), draft.supplyKind(), lib);
        m.show(e.map(DraftCheck.FieldError::text).orElse(null), false);
        fields.get(key).putClientProperty(OUTLINE, e.isPresent() ? "error" : null);
    }

    private void labelled(String caption, JComponent comp, String key) {
        grid.labelled(caption, comp);
        if (key != null) {
            FieldMessage m = new FieldMessage(MESSAGE_WIDTH);
            messages.put(key, m);
            grid.message(m);
        }
    }
}
