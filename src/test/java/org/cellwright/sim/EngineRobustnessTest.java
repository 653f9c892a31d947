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
     * Dissolved chlorine below zero by round-off, Sn2+ at 3 mol/m3: the rate k Cl2 Sn2+ continues linearly
     * (the reaction runs backwards and restores the chlorine) with the same slope on both sides of zero.
     */
    @Test
    void massActionContinuesLinearlyThroughZeroInAFirstOrderReactant() {
        double k = 1e3; // m3/(mol s): 1e6 L/(mol s), the library's Cl2 + Sn2+
        int[] index = {0, 1, 2, 3};
        double[] nu = {-1, -1, 1, 2};         // Cl2 + Sn2+ -> Sn4+ + 2 Cl-
        double[] order = {1, 1, 0, 0};
        double x = 1e-9;
        double above = CellRates.massAction(k, index, nu, order, new double[] {x, 3, 180, 700});
        double below = CellRates.massAction(k, index, nu, order, new double[] {-x, 3, 180, 700});
        // source: mass action, r = k [Cl2][Sn2+] (exact for x >= 0)
        assertEquals(k * x * 3, above, 1e-15 * above);
        // the linear continuation, weighted by 180 / (180 + 1e-9) and 700 / (700 + 1e-9): 1 within 1e-11
        assertEquals(-above, below, 1e-10 * above);
        assertEquals(0, CellRates.massAction(k, index, nu, order, new double[] {0, 3, 180, 700}), 0);
        // both reactants below zero, or a missing product: nothing runs
        assertEquals(0, CellRates.massAction(k, index, nu, order, new double[] {-x, -x, 180, 700}), 0);
        assertEquals(0, CellRates.massAction(k, index, nu, order, new double[] {-x, 3, 0, 700}), 0);
        // second order: the slope at zero is zero, so nothing to continue
        assertEquals(0, CellRates.massAction(k, new int[] {0}, new double[] {-1}, new double[] {2},
                new double[] {-x}), 0);
    }

    /**
     * Seed 1, scenario 76: a Sn4+ chloride bath in two zones, graphite anode, held at its 2.52 V limit for the
     * whole hour. Chlorine made in the anolyte zone leaks into the catholyte, where Sn2+ destroys it at about
     * 3e3 1/s: its concentration sits near 1e-9 mol/m3, far below its absolute tolerance, and goes a little
     * negative. With the rate clipped at zero there, the Jacobian lost that mode and the integrator needed
     * 66 052 evaluations (4523 steps, 5411 rejected; 8 s); now about 350.
     */
    @Test
    void chlorineLeakingIntoAStannousZoneKeepsLongSteps() {
        Map<String, Double> bath = new LinkedHashMap<>();
        bath.put("Sn4+", 181.21694743042627);
        bath.put("H+", 11.181315756490417);
        bath.put("Cl-", 736.0491054781955);
        Map<String, Double> anolyte = new LinkedHashMap<>();
        anolyte.put("Sn4+", 355.09108819196865);
        anolyte.put("H+", 19.62404279762965);
        anolyte.put("Cl-", 368.2168147034534);
        Scenario sc = new Scenario("chlorine into a stannous zone", "",
                new Electrolyte(0.00434667974044253, 326.8434370004718, bath, null),
                new Electrode("titanium", 0.007168724578434057), new Electrode("graphite", 0.0044264220545579555),
                new CellSetup(0.04131674833557948, Agitation.of(AgitationPreset.STILL), 323.5114005603533,
                        0.028813735230292382, null, new Compartments(Compartments.Kind.ZONES,
                        0.0013533247889999074, anolyte, null, 1.6047323107162226E-8)),
                new PowerSupply(ControlMode.CURRENT, 1.6547933493438491, 0, 2.518999687719161,
                        Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(3998.7252279297386, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(false, 1.9658657764606775E-6, 1.8255846787251776E-5, 0.9661969700640802));
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        assertEquals(RunEvent.Kind.END, r.events().get(r.events().size() - 1).kind());
        assertTrue(r.rhsEvaluations() < 3000, "evaluations " + r.rhsEvaluations());
        // the supply holds its limit throughout: the mean cell voltage is the limit
        assertEquals(2.518999687719161, r.summary().cellVoltageMeanV(), 1e-6);
    }

    /**
     * Default seed, scenario 159: Cu2+ and Fe3+ chloride, tin anode. The copper deposit is corroded away by Fe3+;
     * the integrator's dense output at an event time left the deposit a hair more than its absolute tolerance
     * below zero, and every following step, however short, was refused for it (the step merely kept it there)
     * until the step size underflowed at 734 s. A step is now refused only for what it takes below zero itself.
     */
    @Test
    void aDepositLeftBelowZeroByTheDenseOutputDoesNotBlockTheNextStep() {
        Map<String, Double> bath = new LinkedHashMap<>();
        bath.put("Cu2+", 78.10675461305247);
        bath.put("Fe3+", 195.47948210845678);
        bath.put("H+", 11.229250261157922);
        bath.put("Cl-", 753.8812058126333);
        Scenario sc = new Scenario("copper corroded by ferric chloride", "",
                new Electrolyte(0.001800451342242626, 327.68356718849617, bath, null),
                new Electrode("stainless", 0.011915074057356338), new Electrode("tin", 0.016724717116988655),
                new CellSetup(0.028033115122439212, Agitation.of(AgitationPreset.STIRRED), 327.302682794521,
                        0.02900871555346158, null, Compartments.undivided()),
                new PowerSupply(ControlMode.CURRENT, 3.757263221551965, 0, Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(6194.505366789821, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(false, 1.5922501643097566E-6, 1.060975957032329E-5, 0.5071187380897312));
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        assertEquals(6194.505366789821, r.summary().durationS(), 1e-9, "the run reaches its end");
        assertTrue(r.rhsEvaluations() < 20_000, "evaluations " + r.rhsEvaluations());
    }

    /**
     * Seed 6, scenario 154: silver and Sn2+ chloride, MMO anode, a silver dendrite shorts the cell and the run
     * goes on. An event was located at the end time itself, which ended the step there without ending the
     * integration, and the next step, of length zero, had an infinite iteration matrix ("singular").
     */
    @Test
    void anEventAtTheEndTimeEndsTheRun() {
        Map<String, Double> bath = new LinkedHashMap<>();
        bath.put("Na+", 15.460785092938165);
        bath.put("Ag+", 296.6007045075007);
        bath.put("Sn2+", 73.75438865631081);
        bath.put("H+", 34.990939169621676);
        bath.put("Cl-", 494.56120608268225);
        Scenario sc = new Scenario("an event at the end", "",
                new Electrolyte(0.0010266035708243852, 309.0191398939472, bath, null),
                new Electrode("copper", 0.00778368584074034), new Electrode("mmo", 0.008262522640906668),
                new CellSetup(0.005319412906922787, Agitation.of(AgitationPreset.GENTLE), 308.45446827118747,
                        0.03406385246337123, null, Compartments.undivided()),
                new PowerSupply(ControlMode.CURRENT, 1.9832400860573776, 0, Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(8424.709172940504, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(true, 1.731523513558478E-6, 8.230917981204673E-6, 0.7942160458594406));
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        assertEquals(RunEvent.Kind.END, r.events().get(r.events().size() - 1).kind());
        assertTrue(r.events().stream().anyMatch(e -> e.kind() == RunEvent.Kind.SHORT_CIRCUIT), "the short");
    }

    /**
     * Seed 2, scenario 119: copper, lead and Sn4+ chloride, divided by a diaphragm, 5.1 A against a 2.89 V
     * limit. After two hours the needed voltage rises to the limit and turns back within the integrator's
     * error, so right after the event the switching function was again on its old side: Commons Math then
     * searched the rest of the step in steps of 1e-6 s, millions of operating-point solves (the run did not
     * finish in ten minutes). With the 1 mV hysteresis each touch is logged as entered and left; with the
     * mass-action rates continued through zero the run takes about 2200 evaluations (84 000 without).
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
        assertTrue(r.rhsEvaluations() < 20_000, "evaluations " + r.rhsEvaluations());
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
