package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;

import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/**
 * The deposit's form over a run follows how close the target metal deposits to its limiting current, with
 * the thresholds of its Winand class (see {@link org.cellwright.sim.deposit.Morphology}).
 */
class DepositFormTest {

    private static Scenario copper(double cuGPerL) {
        Map<String, Double> c = new LinkedHashMap<>();
        double cu = cuGPerL / 63.546 * 1000;
        c.put("Cu2+", cu);
        c.put("H+", 1000.0);
        c.put("SO4^2-", cu + 500);
        // 2 A/dm2 on 1 dm2, gently stirred (100 um), lead-calcium anode, 2 L
        return DepositScenarios.cell(c, 0.002, "stainless", "lead-calcium", 0.01, 0.04, 100e-6, 2.0, 3600, 300, "Cu");
    }

    @Test
    void dilutingACopperBathAtTheSameCurrentMovesItsDepositFromCompactToPowdery() {
        // source: copper (Winand "intermediate") is compact below about 0.35 of its limiting current and powdery
        // at it (Winand 1992; Ibl 1962; physics reference section 9): 40 g/L gives iL = 2 F D c / delta = 870 A/m2,
        // so 200 A/m2 is 0.23 of it; at 5 g/L iL = 108 A/m2 and 200 A/m2 is beyond it
        RunResult rich = DepositScenarios.run(copper(40));
        RunResult lean = DepositScenarios.run(copper(5));
        for (TracePoint p : rich.trace().subList(1, rich.trace().size())) {
            assertEquals("compact", p.state().morphology(), "40 g/L at " + p.timeS());
            assertTrue(p.state().targetLimitRatio() < 0.35);
        }
        for (TracePoint p : lean.trace().subList(1, lean.trace().size())) {
            assertEquals("powdery", p.state().morphology(), "5 g/L at " + p.timeS());
        }
        assertEquals("compact", rich.summary().morphologyFinal());
        assertEquals("powdery", lean.summary().morphologyFinal());
        // in between the bands follow one another as the bath is diluted
        String previous = "compact";
        String[] order = {"compact", "rough", "dendritic", "powdery"};
        for (double g : new double[] {30, 15, 10, 8, 6}) {
            String form = DepositScenarios.run(copper(g)).summary().morphologyFinal();
            assertTrue(java.util.Arrays.asList(order).indexOf(form) >= java.util.Arrays.asList(order).indexOf(previous),
                    g + " g/L gives " + form + " after " + previous);
            previous = form;
        }
    }

    @Test
    void tinFromChlorideWithoutAdditivesIsNotCompactAtPracticalCurrents() {
        // source: common practice, tin from simple acid chloride without addition agents grows coarse crystals
        // and needles (Winand's "normal" class; physics reference section 9). Practical currents 1-3 A/dm2,
        // still to stirred baths, 15-40 g/L of tin.
        for (double g : new double[] {15, 40}) {
            for (double layer : new double[] {300e-6, 100e-6, 30e-6}) {
                for (double amps : new double[] {1.0, 3.0}) {
                    Scenario sc = DepositScenarios.cell(DepositScenarios.tinChloride(g, 1.0, Map.of()), 0.002,
                            "stainless", "tin", 0.01, 0.04, layer, amps, 1800, 300, "Sn");
                    RunResult r = DepositScenarios.run(sc);
                    for (TracePoint p : r.trace().subList(1, r.trace().size())) {
                        assertNotEquals("compact", p.state().morphology(), g + " g/L, " + layer + " m, " + amps + " A");
                    }
                }
            }
        }
    }

    @Test
    void withAdditivesTinDepositsCompactFarFromItsLimit() {
        // the same stirred bath at 1 A/dm2 (a tenth of tin's limit) with levelling additives: Winand's inhibition
        // moves a normal metal to the intermediate bands, compact below 0.35 of iL
        Scenario sc = DepositScenarios.cell(DepositScenarios.tinChloride(40, 1.0, Map.of()), 0.002, "stainless", "tin",
                0.01, 0.04, 30e-6, 1.0, 1800, 300, "Sn");
        RunResult plain = DepositScenarios.run(sc);
        RunResult inhibited = DepositScenarios.run(sc.withDeposit(DepositSettings.defaults().withAdditives(true)));
        assertEquals("rough", plain.summary().morphologyFinal());
        assertEquals("compact", inhibited.summary().morphologyFinal());
    }
}
