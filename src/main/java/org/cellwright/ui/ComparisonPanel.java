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
    private final WrapText legend = new WrapText("", "muted.foreground", -1, java.awt.Font.PLAIN, 330);

    /**
     * @param model the runs
     * @param pinAction keeps the run shown now
     * @param chosen hears of the pinned run chosen as the reference (null for none)
     */
    ComparisonPanel(RunComparison model, Action pinAction, Consumer<RunComparison.Entry> chosen) {
        super(new BorderLayout());
        this.model = model;
        table = new JTable(model) {
            private static final long serialVersionUID = 1L;

            @Override
            public String getToolTipText(java.awt.event.MouseEvent e) {
                int row = rowAtPoint(e.getPoint());
                return row < 0 ? null : model.describe(row);
            }
        };
        table.getTableHeader().setToolTipText("Deposit of the target metal, current efficiency, specific energy,"
                + " mean cell voltage and time to short of each run");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setFillsViewportHeight(true);
        int[] widths = {44, 78, 52, 56, 56, 60};
        for (int i = 0; i < widths.length; i++) {
            table.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        model.addTableModelListener(e -> legend.show(legendText()));
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
        JPanel middle = new JPanel(new BorderLayout());
        JScrollPane scroll = new JScrollPane(table);
        scroll.setPreferredSize(new java.awt.Dimension(300, 130));
        middle.add(scroll, BorderLayout.NORTH);
        legend.setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        middle.add(legend, BorderLayout.CENTER);
        add(middle, BorderLayout.CENTER);
    }

    private String legendText() {
        StringBuilder sb = new StringBuilder();
        for (int row = 0; row < model.getRowCount(); row++) {
            String d = model.describe(row);
            if (!d.isEmpty()) {
                sb.append(sb.length() == 0 ? "" : "\n").append(d);
            }
        }
        return sb.toString();
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
