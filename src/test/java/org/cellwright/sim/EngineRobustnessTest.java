package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Compartments;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.Separator;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/**
 * Regressions for odd scenarios found by {@link ConservationTest} with other seeds, each written out here with
 * its values (rounded) and the cause it exposed. Work is counted in evaluations of the rates, which do not
 * depend on the machine; each bound sits several times above what the fixed engine needs and far below what
 * the fault cost.
 */
class EngineRobustnessTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    /**
     * Seed 2, scenario 119: copper, lead and Sn4+ chloride, divided by a diaphragm, 5.1 A against a 2.89 V
     * limit. After two hours the needed voltage rises to the limit and turns back within the integrator's
     * error, so right after the event the switching function was again on its old side: Commons Math then
     * searched the rest of the step in steps of 1e-6 s, millions of operating-point solves (the run did not
     * finish in ten minutes). With the 1 mV hysteresis each touch is logged as entered and left, and the run
     * takes about 84 000 evaluations (most of them steps rejected for a depleted species a little below zero,
     * a separate open point), well under a second.
     */
    @Test
    void aNeedThatTouchesTheVoltageLimitIsLoggedEnteredThenLeft() {
        Map<String, Double> bath = new LinkedHashMap<>();
        bath.put("Pb2+", 17.5568);
        bath.put("Cu2+", 286.442);
        bath.put("Sn4+", 75.8481);
        bath.put("Cl-", 911.390);
        Map<String, Double> anolyte = new LinkedHashMap<>();
        anolyte.put("Pb2+", 14.3904);
        anolyte.put("Cu2+", 560.252);
        anolyte.put("Sn4+", 86.6705);
        anolyte.put("Cl-", 1457.50);
        Scenario sc = new Scenario("touching the voltage limit", "", new Electrolyte(1.96117e-3, 309.008, bath, null),
                new Electrode("stainless", 0.0179490), new Electrode("graphite", 0.0235744),
                new CellSetup(0.0129462, Agitation.of(AgitationPreset.NATURAL), 305.732, 0.0186290, null,
                        new Compartments(Compartments.Kind.DIVIDED, null, anolyte,
                                Separator.of(Separator.Kind.DIAPHRAGM), 0)),
                new PowerSupply(ControlMode.CURRENT, 5.10854, 0, 2.88836, Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(8410.84, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(true, 8.59283e-7, 1.66177e-5, 0.270166));
        assertEquals(2.0e-4, sc.cell().agitation().diffusionLayerM(), 1e-12, "the natural preset, as in the scenario");
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        assertEquals(RunEvent.Kind.END, r.events().get(r.events().size() - 1).kind());
        assertTrue(r.rhsEvaluations() < 200_000, "evaluations " + r.rhsEvaluations());
        RunEvent.Kind expected = RunEvent.Kind.VOLTAGE_LIMIT_ENTERED;
        int limitEvents = 0;
        for (RunEvent e : r.events()) {
            if (e.kind() == RunEvent.Kind.VOLTAGE_LIMIT_ENTERED || e.kind() == RunEvent.Kind.VOLTAGE_LIMIT_LEFT) {
                assertEquals(expected, e.kind(), "entered and left alternate, at " + e.timeS() + " s");
                expected = expected == RunEvent.Kind.VOLTAGE_LIMIT_ENTERED
                        ? RunEvent.Kind.VOLTAGE_LIMIT_LEFT : RunEvent.Kind.VOLTAGE_LIMIT_ENTERED;
                limitEvents++;
            }
        }
        assertTrue(limitEvents >= 1, "the limit is reached");
    }
}
