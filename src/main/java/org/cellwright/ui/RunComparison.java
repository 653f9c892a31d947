package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.swing.table.AbstractTableModel;

import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;

/**
 * The runs kept for comparison, side by side with the run shown now: deposit of the target metal, current
 * efficiency, specific energy, mean cell voltage and time to short. Row 0 is the run shown now; the pinned
 * runs follow, oldest first. At most {@link #MAX_PINNED} runs are kept; pinning one more drops the oldest.
 */
final class RunComparison extends AbstractTableModel {

    private static final long serialVersionUID = 1L;
    /** Most runs kept: enough to compare a few what-ifs, few enough to read side by side. */
    static final int MAX_PINNED = 8;

    private static final String[] COLUMNS = {"Run", "Deposit", "Eff. %", "kWh/kg", "Mean V", "Short"};
    /** What each column holds, for the header tooltips. */
    static final String[] COLUMN_TIPS = {"The run shown now, and the pinned runs by number",
        "Deposit of the target metal (g)", "Current efficiency for the target metal, whole run (%)",
        "Specific energy per kg of target metal (kWh/kg)", "Time-averaged cell voltage (V)",
        "Time of a short circuit, or its forecast (~)"};

    /**
     * A run and its label.
     *
     * @param label a few words naming it (its slider values)
     * @param name a short name for chart subtitles ("pinned run #2")
     * @param run the run
     */
    record Entry(String label, String name, RunResult run) {
    }

    private Entry current;
    private final List<Entry> pinned = new ArrayList<>();

    /**
     * @param label the label of the run shown now
     * @param run the run shown now, or null when none
     */
    void setCurrent(String label, RunResult run) {
        current = run == null ? null : new Entry(label, "the run shown", run);
        // row 0 always exists: an update keeps the table's selection (a data-changed event would clear it)
        fireTableRowsUpdated(0, 0);
    }

    /**
     * Keeps the run shown now.
     *
     * @return the entry kept, or null when no run is shown
     */
    Entry pinCurrent() {
        if (current == null) {
            return null;
        }
        if (pinned.size() == MAX_PINNED) {
            pinned.remove(0);
            fireTableRowsDeleted(1, 1);
        }
        int n = nextNumber();
        Entry e = new Entry("#" + n + "  " + current.label(), "pinned run #" + n, current.run());
        pinned.add(e);
        fireTableRowsInserted(pinned.size(), pinned.size());
        return e;
    }

    private int number;

    private int nextNumber() {
        return ++number;
    }

    /** @param row a table row of a pinned run (1 and up) */
    void remove(int row) {
        if (row >= 1 && row <= pinned.size()) {
            pinned.remove(row - 1);
            fireTableRowsDeleted(row, row);
        }
    }

    /**
     * @param row a table row
     * @return its entry (row 0 the run shown now), or null
     */
    Entry entry(int row) {
        if (row == 0) {
            return current;
        }
        return row >= 1 && row <= pinned.size() ? pinned.get(row - 1) : null;
    }

    /** @return the pinned runs, oldest first */
    List<Entry> pinned() {
        return List.copyOf(pinned);
    }

    private static String row(Entry e) {
        String l = e.label();
        return l.startsWith("#") ? l.substring(1, l.indexOf(' ') < 0 ? l.length() : l.indexOf(' ')) : l;
    }

    /**
     * @param row a table row
     * @return the run's full label, for the row's tooltip and the list under the table
     */
    String describe(int row) {
        Entry e = entry(row);
        if (e == null) {
            return "";
        }
        return row == 0 ? "now: " + e.label() : e.label();
    }

    @Override
    public int getRowCount() {
        return 1 + pinned.size();
    }

    @Override
    public int getColumnCount() {
        return COLUMNS.length;
    }

    @Override
    public String getColumnName(int column) {
        return COLUMNS[column];
    }

    @Override
    public Object getValueAt(int row, int column) {
        Entry e = entry(row);
        if (e == null) {
            return column == 0 ? "(no run yet)" : "";
        }
        RunSummary s = e.run().summary();
        return switch (column) {
            case 0 -> row == 0 ? "now" : "#" + row(e);
            case 1 -> s.targetMetal() == null ? String.format(Locale.ROOT, "%.3g g", s.depositTotalKg() * 1000)
                    : String.format(Locale.ROOT, "%.3g g %s", s.depositKg().getOrDefault(s.targetMetal(), 0.0) * 1000,
                    s.targetMetal());
            case 2 -> s.targetMetal() == null ? "-" : String.format(Locale.ROOT, "%.1f", 100 * s.currentEfficiency());
            case 3 -> Double.isFinite(s.specificEnergyJPerKg())
                    ? String.format(Locale.ROOT, "%.3g", s.specificEnergyJPerKg() / 3.6e6) : "-";
            case 4 -> String.format(Locale.ROOT, "%.2f", s.cellVoltageMeanV());
            default -> s.shortCircuitS() != null ? RunClock.format(s.shortCircuitS())
                    : s.shortCircuitForecastS() != null ? "~" + RunClock.format(s.shortCircuitForecastS()) : "none";
        };
    }
}
