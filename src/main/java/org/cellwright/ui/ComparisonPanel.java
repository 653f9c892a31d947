package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.function.Consumer;

import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;

/**
 * The comparison tab: the run shown now beside the pinned runs, one row each; the selected pinned run is
 * drawn dashed under the live curves.
 */
final class ComparisonPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    private final RunComparison model;
    private final JTable table;

    /**
     * @param model the runs
     * @param pinAction keeps the run shown now
     * @param chosen hears of the pinned run chosen as the reference (null for none)
     */
    ComparisonPanel(RunComparison model, Action pinAction, Consumer<RunComparison.Entry> chosen) {
        super(new BorderLayout());
        this.model = model;
        table = new JTable(model);
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setFillsViewportHeight(true);
        table.getColumnModel().getColumn(0).setPreferredWidth(170);
        table.setToolTipText("Select a pinned run to draw it dashed under the live curves.");
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting()) {
                int row = table.getSelectedRow();
                chosen.accept(row >= 1 ? model.entry(row) : null);
            }
        });
        JButton pin = new JButton(pinAction);
        pin.setFocusable(false);
        JButton remove = new JButton("Remove");
        remove.setToolTipText("Remove the selected pinned run");
        remove.setFocusable(false);
        remove.addActionListener(e -> {
            int row = table.getSelectedRow();
            if (row >= 1) {
                model.remove(row);
                chosen.accept(null);
            }
        });
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 4));
        buttons.add(pin);
        buttons.add(remove);
        JLabel hint = new JLabel("<html><div style='width:300px'>Pin a run, change a slider, and compare: the"
                + " selected pinned run is drawn dashed.</div></html>");
        hint.setBorder(BorderFactory.createEmptyBorder(2, 8, 4, 8));
        JPanel top = new JPanel(new BorderLayout());
        top.add(buttons, BorderLayout.NORTH);
        top.add(hint, BorderLayout.CENTER);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    /** Pins the run shown now and selects it, so that it is drawn as the reference. */
    void pinAndSelect() {
        if (model.pinCurrent() != null) {
            int row = model.getRowCount() - 1;
            table.setRowSelectionInterval(row, row);
        }
    }

    /** @return the table (for tests) */
    JTable table() {
        return table;
    }
}
