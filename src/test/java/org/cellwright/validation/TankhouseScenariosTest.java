package org.cellwright.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.junit.jupiter.api.Test;

/**
 * The shipped tankhouse scenarios: their figures are inside the handbook ranges (the cases of
 * {@link TankhouseValidation}, asserted here by name), and the charge goes where a plant metallurgist expects.
 */
class TankhouseScenariosTest {

    private static double share(RunSummary s, String label) {
        return Math.abs(s.reactionChargeC().getOrDefault(label, 0.0)) / s.chargeC();
    }

    @Test
    void cellVoltageEfficiencyAndEnergyAreInsideTheHandbookRanges() {
        // source: Schlesinger et al., Extractive Metallurgy of Copper, 5th ed. 2011 (Cu EW 1.8-2.2 V, 0.85-0.95,
        // 1.8-2.2 kWh/kg); Sinclair, The Extractive Metallurgy of Zinc, AusIMM 2005 (Zn EW 3.3-3.5 V, 0.89-0.92,
        // 3.0-3.4 kWh/kg); the ranges are the tolerance (see TankhouseValidation)
        for (ValidationCase c : TankhouseValidation.cases()) {
            assertTrue(c.passes(), c.check() + ": " + c.actualText() + " outside " + c.expectedText());
        }
        assertEquals(6, TankhouseValidation.cases().size());
    }

    @Test
    void copperLosesItsCurrentToTheIronShuttleAndNotToCuprousCopper() {
        RunResult r = TankhouseValidation.run("copper-electrowinning.toml");
        RunSummary s = r.summary();
        // Cu+ is not stable in sulfate: no one-electron copper couple runs (docs/tankhouse.md)
        assertFalse(r.speciesNames().contains("Cu+"), r.speciesNames().toString());
        // the whole loss is ferric iron reduced at the cathode, made again from ferrous at the anode
        assertEquals(1.0, share(s, "cathode:Cu2+/Cu") + share(s, "cathode:Fe3+/Fe2+"), 1e-3);
        assertTrue(share(s, "cathode:Fe3+/Fe2+") > 0.03 && share(s, "cathode:Fe3+/Fe2+") < 0.10);
        assertTrue(share(s, "anode:Fe3+/Fe2+") > share(s, "cathode:Fe3+/Fe2+"), "ferric iron builds up");
        // common practice: copper is won at 0.3 of its limiting current or less to stay compact
        assertEquals("compact", s.morphologyFinal());
    }

    @Test
    void zincLosesItsCurrentToHydrogenOnTheDeposit() {
        RunSummary s = TankhouseValidation.run("zinc-electrowinning.toml").summary();
        Map<String, Double> q = s.reactionChargeC();
        double hydrogen = share(s, "cathode:H+/H2") + share(s, "cathode:H2O/H2");
        assertEquals(1 - s.currentEfficiency(), hydrogen, 1e-3, q.toString());
        assertEquals(1.0, share(s, "anode:O2/H2O"), 1e-9);
    }

    @Test
    void hydrogenIsCautionedWhereItMattersNotForTracesOnCopper() {
        // copper winning: millilitres of hydrogen over 7200 A h (well under 0.1 % of the charge) are no hazard
        RunSummary copper = TankhouseValidation.run("copper-electrowinning.toml").summary();
        assertFalse(copper.warnings().stream().anyMatch(w -> w.startsWith("Hydrogen")), copper.warnings().toString());
        // zinc winning: about a tenth of the charge makes hydrogen; the caution shows
        RunSummary zinc = TankhouseValidation.run("zinc-electrowinning.toml").summary();
        assertTrue(zinc.warnings().stream().anyMatch(w -> w.startsWith("Hydrogen")), zinc.warnings().toString());
    }
}
