package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/**
 * Cu+ is stable in water only as chloro complexes: in a sulfate bath copper deposits by the overall
 * two-electron reaction alone, in a chloride bath the one-electron couples run beside it (library key
 * {@code requires}).
 */
class CuprousCopperTest {

    private static final double F = 96485.33212331001;

    private static RunResult run(String anion, double anionMolPerM3) {
        Map<String, Double> c = new LinkedHashMap<>();
        c.put("Cu2+", 300.0);
        c.put("H+", 1000.0);
        c.put(anion, anionMolPerM3);
        Scenario sc = DepositScenarios.cell(c, 0.002, "stainless", "platinum", 0.01, 0.03, 100e-6, 1.0, 3600, 600, "Cu");
        return DepositScenarios.run(sc);
    }

    @Test
    void inSulfateCopperDepositsByTheTwoElectronReactionAlone() {
        RunResult r = run("SO4^2-", 800.0);
        assertFalse(r.speciesNames().contains("Cu+"), r.speciesNames().toString());
        assertFalse(r.cathodeReactions().contains("Cu2+/Cu+"));
        assertFalse(r.cathodeReactions().contains("Cu+/Cu"));
        // source: Faraday's law; at a quarter of the limiting current in acid sulfate, all the charge
        // but the hydrogen's deposits copper (no Cu+ shuttle): efficiency within 0.5 % of 1
        double kg = r.summary().depositKg().get("Cu");
        assertEquals(1.0, kg * 2 * F / 0.063546 / r.summary().chargeC(), 0.005);
    }

    @Test
    void inChlorideTheCuprousCouplesRun() {
        RunResult r = run("Cl-", 1600.0);
        assertTrue(r.speciesNames().contains("Cu+"));
        assertTrue(r.cathodeReactions().contains("Cu2+/Cu+"));
        assertTrue(-r.summary().reactionChargeC().getOrDefault("cathode:Cu2+/Cu+", 0.0) > 0,
                r.summary().reactionChargeC().toString());
    }
}
