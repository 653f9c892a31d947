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

    /**
     * Seed 4, scenario 155: lead and sodium sulphate, divided by an anion membrane, held at 1.149 V, below the
     * voltage that would drive oxygen evolution hard: 9 nA, 4.4e-5 C in 4706 s. The invariant projection of the
     * Jacobian mixed the charge-through-a-short row, exactly zero before a short, with the total-charge row, so
     * that charge picked up 8.6e-14 C of round-off without any short. Before a short it is now left out of the
     * projection and stays exactly zero.
     */
    @Test
    void noChargeThroughAShortBeforeThereIsOne() {
        Scenario sc = leadSulphateBelowDecomposition();
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        StateLayout layout = new CellRates(sc, ReactionNetwork.of(LIB, sc)).layout();
        assertEquals(null, r.summary().shortCircuitS(), "no short in this run");
        assertEquals(0, r.finalState()[layout.shortCharge], 0, "charge through a short");
        assertTrue(r.finalState()[layout.charge] > 1e-5 && r.finalState()[layout.charge] < 1e-4,
                "the run passes little charge: " + r.finalState()[layout.charge]);
    }

    /**
     * Seed 4, scenario 155 and seed 3, scenario 124 (zinc chloride, stainless cathode, lead anode, 1.054 V,
     * 10 pA): the rates conserve charge only as well as the potential solve makes each electrode's reactions
     * carry the cell current, i.e. within 1e-16 A/m2 (its absolute acceptance) or di/dE times one ulp of E
     * (E is a double), whichever is larger. {@link ConservationTest} takes its floor for the charge balances
     * from this bound, so it is checked here on both scenarios, at their start: the sum of the cathode's
     * partial currents against the cell current.
     */
    @Test
    void theChargeBalanceOfTheRatesIsResolvedToTheSolvesAcceptance() {
        Map<String, Double> zinc = new LinkedHashMap<>();
        zinc.put("Zn2+", 66.32752507182019);
        zinc.put("Cl-", 132.65505014364038);
        Scenario zincBelowDecomposition = new Scenario("zinc chloride below decomposition", "",
                new Electrolyte(0.0025858042223870555, 304.36795265249174, zinc, null),
                new Electrode("stainless", 0.009815042969997587), new Electrode("lead", 0.011369308494091528),
                new CellSetup(0.07345932316764663, Agitation.of(AgitationPreset.GENTLE), 299.82323612736405,
                        0.042129080361654477, null, Compartments.undivided()),
                new PowerSupply(ControlMode.VOLTAGE, 0, 1.0539189904888486, Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(3757.6836593119656, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(false, 1.8190129667948198E-6, 1.6993027741231585E-5, 0.07038315848498639));
        for (Scenario sc : List.of(leadSulphateBelowDecomposition(), zincBelowDecomposition)) {
            ReactionNetwork net = ReactionNetwork.of(LIB, sc);
            CellRates rates = new CellRates(sc, net);
            StateLayout layout = rates.layout();
            double[] y = rates.initialState();
            double[] f = new double[y.length];
            rates.computeDerivatives(0, y, f);
            double cathode = 0;
            for (int k = 0; k < net.cathodeSlots.size(); k++) {
                cathode += f[layout.reactionCharge0 + k];
            }
            OperatingPoint op = rates.operatingPoint();
            double[] slope = new double[1];
            op.cathode.total(op.cathodeE, slope);
            // source: ElectrodeKinetics.potentialFor, its acceptance 1e-13 max(|i|, 1e-3 A/m2) and its stop
            // where a Newton step falls below half an ulp of E
            double resolution = op.cathodeAreaM2 * Math.max(1e-13 * Math.max(Math.abs(f[layout.charge])
                    / op.cathodeAreaM2, 1e-3), Math.abs(slope[0]) * Math.ulp(op.cathodeE));
            assertTrue(f[layout.charge] > 0 && f[layout.charge] < 1e-8, sc.title() + ": almost no current, "
                    + f[layout.charge] + " A");
            assertEquals(-f[layout.charge], cathode, resolution, sc.title() + ": cathode partial currents");
        }
    }

    /** Seed 4, scenario 155, written out (values as generated). */
    private static Scenario leadSulphateBelowDecomposition() {
        Map<String, Double> bath = new LinkedHashMap<>();
        bath.put("Pb2+", 131.49401501320932);
        bath.put("Na+", 97.57884351762875);
        bath.put("SO4^2-", 180.2834367720237);
        return new Scenario("lead sulphate below decomposition", "",
                new Electrolyte(0.0034327183499414725, 325.4712637815577, bath, null),
                new Electrode("copper", 0.02633428691486571), new Electrode("platinum", 0.04733940082224929),
                new CellSetup(0.04045912088704672, Agitation.of(AgitationPreset.STILL), 321.5888474193783,
                        0.02272162433466477, null, new Compartments(Compartments.Kind.DIVIDED,
                        0.0024635596803067937, null, Separator.of(Separator.Kind.ANION_MEMBRANE), 0)),
                new PowerSupply(ControlMode.VOLTAGE, 0, 1.1490795288936586, Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY, List.of()),
                new RunSettings(4705.694719648506, 300, List.of(), null), List.of(), List.of(),
                new DepositSettings(false, 2.0999039537048515E-6, 1.4743585802272502E-5, 0.011436986106346355));
    }
}
