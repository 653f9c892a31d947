package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.junit.jupiter.api.Test;

class SummaryFiguresTest {

    @Test
    void theFiguresAreTheSummarysInTheirUnits() {
        RunResult r = TinRun.run();
        RunSummary s = r.summary();
        Map<String, String> f = SummaryFigures.of(r).stream()
                .collect(Collectors.toMap(SummaryFigures.Figure::label, SummaryFigures.Figure::value));
        assertEquals(String.format(Locale.ROOT, "%.1f %%", 100 * s.currentEfficiency()), f.get("Current efficiency"));
        // 1 kWh = 3.6e6 J
        assertEquals(String.format(Locale.ROOT, "%.3g kWh/kg", s.specificEnergyJPerKg() / 3.6e6), f.get("Specific energy"));
        // 1 A h = 3600 C
        assertEquals(String.format(Locale.ROOT, "%.4g A h", s.chargeC() / 3600), f.get("Charge"));
        assertTrue(f.get("Deposit").startsWith(String.format(Locale.ROOT, "Sn %.4g g", s.depositKg().get("Sn") * 1000)));
        assertEquals("at the set duration, after 6 h 0 min", f.get("Ended"));
        assertEquals(s.shortCircuitS() == null && s.shortCircuitForecastS() == null ? "none foreseen"
                : "at " + org.cellwright.sim.RunClock.format(s.shortCircuitS() != null ? s.shortCircuitS()
                : s.shortCircuitForecastS()), f.get("Short circuit").replace("forecast ", ""));
        for (String needed : List.of("Deposit", "Current efficiency", "Specific energy", "Short circuit", "Deposit form")) {
            assertTrue(f.containsKey(needed), needed);
        }
        SummaryFigures.of(r).forEach(x -> assertTrue(!x.tooltip().isBlank(), x.label() + " has a tooltip"));
    }

    @Test
    void whereTheChargeWentNamesBothElectrodes() {
        List<String> lines = SummaryFigures.chargeShares(TinRun.run());
        assertEquals(2, lines.size());
        assertTrue(lines.get(0).startsWith("cathode: "), lines.get(0));
        assertTrue(lines.get(0).contains("depositing Sn"), lines.get(0));
        assertTrue(lines.get(1).startsWith("anode: "), lines.get(1));
    }
}
