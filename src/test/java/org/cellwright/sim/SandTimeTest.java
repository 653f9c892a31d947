package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The transition time of a still electrolyte under constant current (Sand 1901). */
class SandTimeTest {

    @ParameterizedTest
    // source: tau = pi D (n F c)^2 / (4 i^2): 0.10 M Cu2+ in excess acid, D = 7.14e-10 m2/s, n = 2;
    // i = 100 A/m2 -> 20.9 s, i = 50 A/m2 -> 83.5 s (Bard & Faulkner 2001, section 8.2; physics reference
    // check case 7)
    @CsvSource({"100, 20.9", "50, 83.5"})
    void copperReachesItsTransitionTimeAsSandPredicts(double iAPerM2, double tauS) {
        double exact = Math.PI * 7.14e-10 * Math.pow(2 * 96485.33212 * 100, 2) / (4 * iAPerM2 * iAPerM2);
        assertEquals(tauS, exact, 0.1);
        // tolerance 5 % (issue); the still layer (300 um) is not reached before tau
        assertEquals(exact, transitionTime(iAPerM2, tauS), 0.05 * exact);
    }

    /**
     * @param iAPerM2 the current density of a still 0.10 M Cu2+ bath in excess acid
     * @param tauS the expected transition time, which sets the run's length and output step
     * @return the first output time at which less than 99 % of the current deposits copper (s)
     */
    static double transitionTime(double iAPerM2, double tauS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Cu2+", 100.0);
        comp.put("H+", 1000.0);
        comp.put("SO4^2-", 600.0);
        double area = 1e-4;
        Scenario sc = new Scenario("sand", "", new Electrolyte(0.001, 298.15, comp, null),
                new Electrode("stainless", area), new Electrode("platinum", area),
                new CellSetup(0.01, Agitation.of(AgitationPreset.STILL), 298.15, 0, 10.0),
                PowerSupply.constantCurrent(iAPerM2 * area), new RunSettings(2 * tauS, tauS / 2000, List.of(), "Cu"),
                List.of(), List.of());
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        for (TracePoint p : r.trace()) {
            if (p.timeS() > 0 && p.state().targetEfficiency() < 0.99) {
                return p.timeS();
            }
        }
        return Double.NaN;
    }
}
