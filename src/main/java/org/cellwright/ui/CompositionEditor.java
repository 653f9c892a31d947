package org.cellwright.ui;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import javax.swing.JButton;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;

/**
 * The bath's composition in the form: one row per dissolved species (name, start concentration with its
 * unit, a button to remove it), each checked as typed, and a button to add a species.
 */
final class CompositionEditor extends JPanel {

    private static final long serialVersionUID = 1L;
    private static final String OUTLINE = "JComponent.outline";

    private final transient ChemLibrary lib;
    private final transient Runnable edited;
    private final List<JTextField> names = new ArrayList<>();
    private final List<JTextField> values = new ArrayList<>();
    private final List<FieldMessage> messages = new ArrayList<>();
    private boolean quiet;

    /**
     * @param lib the chemistry library (names, molar masses)
     * @param edited called after the user changed a row
     */
    CompositionEditor(ChemLibrary lib, Runnable edited) {
        super(new GridBagLayout());
        this.lib = lib;
        this.edited = edited;
        setOpaque(false);
    }

    /** @param rows the rows to show (replaces all rows; no edit event) */
    void show(List<ScenarioDraft.Row> rows) {
        quiet = true;
        try {
            removeAll();
            names.clear();
            values.clear();
            messages.clear();
            for (ScenarioDraft.Row r : rows) {
                addRow(r.species(), r.concentration());
            }
            addButtonRow();
            for (int i = 0; i < names.size(); i++) {
                check(i);
            }
        } finally {
            quiet = false;
        }
        revalidate();
        repaint();
    }

    /** @return the rows as typed */
    List<ScenarioDraft.Row> rows() {
        List<ScenarioDraft.Row> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            out.add(new ScenarioDraft.Row(names.get(i).getText(), values.get(i).getText()));
        }
        return out;
    }

    /**
     * Shows the reader's problems for rows that pass the check as typed.
     *
     * @param errors field errors by key ({@link FormFields#COMPOSITION} + row index)
     */
    void showReaderErrors(Map<String, DraftCheck.FieldError> errors) {
        for (int i = 0; i < names.size(); i++) {
            DraftCheck.FieldError e = errors.get(FormFields.COMPOSITION + i);
            if (e != null && !messages.get(i).showing()) {
                messages.get(i).show(e.text(), false);
                values.get(i).putClientProperty(OUTLINE, "error");
            }
        }
    }

    /**
     * @return the species the concentration slider can act on: those of the rows that name a known species
     *     with a concentration above zero, canonical names
     */
    List<String> knownSpecies() {
        return rows().stream().map(r -> lib.findSpecies(r.species().strip()).map(Species::name).orElse(null))
                .filter(n -> n != null).distinct().collect(Collectors.toList());
    }

    private void addRow(String species, String concentration) {
        int i = names.size();
        JTextField name = new JTextField(species, 6);
        name.setToolTipText("<html>A dissolved species in any accepted notation: Cu2+, Cu++, Cu^2+, SO4^2-, SO4--,"
                + " H+, Cl-.<br>Species of the built-in library (docs/library.md).</html>");
        name.putClientProperty("JTextField.placeholderText", "Cu2+");
        HintStyle.install(name);
        JTextField value = new JTextField(concentration, 9);
        value.setToolTipText("<html>Start concentration: mol/L, M, mmol/L, mol/m3, or g/L, mg/L, ppm, oz/gal"
                + "<br>(mass units are converted with the species' molar mass from the library).</html>");
        value.putClientProperty("JTextField.placeholderText", "25 g/L");
        HintStyle.install(value);
        JButton remove = new JButton("\u2212");
        remove.setToolTipText("Remove this species from the bath");
        remove.putClientProperty("JButton.buttonType", "toolBarButton");
        remove.setFocusable(false);
        FieldMessage msg = new FieldMessage(230);
        names.add(name);
        values.add(value);
        messages.add(msg);
        DocumentListener l = new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                changed(name);
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                changed(name);
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                changed(name);
            }
        };
        name.getDocument().addDocumentListener(l);
        value.getDocument().addDocumentListener(l);
        remove.addActionListener(e -> {
            int at = names.indexOf(name);
            List<ScenarioDraft.Row> rows = rows();
            rows.remove(at);
            show(rows);
            edited.run();
        });
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = 2 * i;
        c.insets = new Insets(1, 0, 1, 4);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.gridx = 0;
        c.weightx = 0.35;
        add(name, c);
        c.gridx = 1;
        c.weightx = 0.65;
        add(value, c);
        c.gridx = 2;
        c.weightx = 0;
        c.insets = new Insets(1, 0, 1, 0);
        add(remove, c);
        c.gridy = 2 * i + 1;
        c.gridx = 0;
        c.gridwidth = 3;
        c.insets = new Insets(0, 2, 2, 0);
        add(msg, c);
    }

    private void addButtonRow() {
        JButton add = new JButton("Add species");
        add.setToolTipText("Add a dissolved species to the bath");
        add.setFocusable(false);
        add.addActionListener(e -> {
            List<ScenarioDraft.Row> rows = rows();
            rows.add(new ScenarioDraft.Row("", ""));
            show(rows);
            names.get(names.size() - 1).requestFocusInWindow();
            edited.run();
        });
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = 2 * names.size();
        c.gridx = 0;
        c.gridwidth = 3;
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(3, 0, 0, 0);
        add(add, c);
    }

    private void changed(JTextField anyOfRow) {
        int i = names.indexOf(anyOfRow);
        if (i < 0) {
            i = values.indexOf(anyOfRow);
        }
        if (i >= 0) {
            check(i);
        }
        if (!quiet) {
            edited.run();
        }
    }

    private void check(int i) {
        String species = names.get(i).getText();
        var nameError = DraftCheck.species(species, lib);
        var valueError = nameError.isPresent() ? java.util.Optional.<DraftCheck.FieldError>empty()
                : DraftCheck.concentration(species, values.get(i).getText(), lib);
        names.get(i).putClientProperty(OUTLINE, nameError.isPresent() ? "error" : null);
        values.get(i).putClientProperty(OUTLINE, valueError.isPresent() ? "error" : null);
        messages.get(i).show(nameError.or(() -> valueError).map(DraftCheck.FieldError::text).orElse(null), false);
    }
}
