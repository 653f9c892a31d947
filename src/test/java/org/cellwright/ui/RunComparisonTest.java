package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Locale;

import javax.swing.JTable;

import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.junit.jupiter.api.Test;

class RunComparisonTest {

    @Test
    void pinsKeepsTheNewestAndShowsTheFigures() {
        RunResult run = TinRun.run();
        RunComparison c = new RunComparison();
        assertNull(c.pinCurrent(), "nothing shown, nothing to pin");
        c.setCurrent("2 A/dm2", run);
        RunComparison.Entry first = c.pinCurrent();
        assertEquals("#1  2 A/dm2", first.label());
        assertEquals("pinned run #1", first.name());
        for (int i = 0; i < RunComparison.MAX_PINNED + 2; i++) {
            c.pinCurrent();
        }
        assertEquals(RunComparison.MAX_PINNED, c.pinned().size());
        // 11 pins in all: the last 8, #4 to #11, are kept
        assertEquals("#4  2 A/dm2", c.pinned().get(0).label(), "the oldest were dropped");
        RunSummary s = run.summary();
        assertEquals(String.format(Locale.ROOT, "%.1f", 100 * s.currentEfficiency()), c.getValueAt(1, 2));
        assertEquals(String.format(Locale.ROOT, "%.3g g Sn", s.depositKg().get("Sn") * 1000), c.getValueAt(1, 1));
        assertEquals("now", c.getValueAt(0, 0));
        assertEquals("#4", c.getValueAt(1, 0));
        assertEquals("now: 2 A/dm2", c.describe(0));
        assertEquals("#4  2 A/dm2", c.describe(1));
    }

    /** A new run shown must not clear the selected (drawn) reference. */
    @Test
    void aNewRunKeepsTheSelectedReference() {
        RunComparison c = new RunComparison();
        JTable table = new JTable(c);
        c.setCurrent("a", TinRun.run());
        c.pinCurrent();
        table.setRowSelectionInterval(1, 1);
        c.setCurrent("b", TinRun.run());
        assertEquals(1, table.getSelectedRow());
        c.remove(1);
        assertEquals(1, c.getRowCount());
    }
}
