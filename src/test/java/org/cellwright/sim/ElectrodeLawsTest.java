package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.junit.jupiter.api.Test;

/** Nernst, Tafel, Faraday and Ohm as the engine applies them, against their textbook forms. */
class ElectrodeLawsTest {

    private static final double F = 96485.33212331001;

    /** A copper refining cell: copper anode, no gas anywhere, optional pinned conductivity. */
    static Scenario refiningCell(double cuMolPerM3, double amps, double gapM, Double kappa, double durationS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Cu2+", cuMolPerM3);
        comp.put("SO4^2-", cuMolPerM3);
        return new Scenario("refining", "", new Electrolyte(0.010, 298.15, comp, kappa),
                new Electrode("stainless", 0.01), new Electrode("copper", 0.01),
                new CellSetup(gapM, Agitation.ofLayer(50e-6), 298.15, 0, 1e3),
                PowerSupply.constantCurrent(amps), new RunSettings(durationS, 60, List.of(), "Cu"),
                List.of(), List.of());
    }

    static OperatingPoint prepared(Scenario sc, ChemLibrary lib, double t) {
        ReactionNetwork net = ReactionNetwork.of(lib, sc);
        CellRates rates = new CellRates(sc, net);
        OperatingPoint op = rates.operatingPoint();
        op.unpack(t, rates.initialState());
        return op;
    }

    static int slot(OperatingPoint op, String name) {
        for (int k = 0; k < op.net.cathodeSlots.size(); k++) {
            if (op.net.cathodeSlots.get(k).reaction().name().equals(name)) {
                return k;
            }
        }
        throw new AssertionError(name);
    }

    @Test
    void nernstSlopeIs59Point16OverNMillivoltsPerDecadeAt25C() {
        ChemLibrary lib = TestChemistry.library(10);
        OperatingPoint a = prepared(refiningCell(1000, 1, 0.02, null, 60), lib, 1);
        OperatingPoint b = prepared(refiningCell(100, 1, 0.02, null, 60), lib, 1);
        OperatingPoint c = prepared(refiningCell(10, 1, 0.02, null, 60), lib, 1);
        int k = slot(a, "Cu2+/Cu");
        // source: Nernst equation, (ln 10) RT/(nF) = 59.159/2 mV per decade at 298.15 K (CODATA 2018 R, F)
        assertEquals(0.0295797, a.cathode.eEq[k] - b.cathode.eEq[k], 1e-6);
        // source: E = E0 + (RT/2F) ln a(Cu2+): a = 0.01 gives 0.2827 V with E0 = 0.3419 V (CRC
        // Electrochemical Series); physics reference check case 3
        assertEquals(0.2827, c.cathode.eEq[k], 1e-4);
    }

    @Test
    void tafelSlopeFollowsTheTransferCoefficient() {
        ChemLibrary lib = TestChemistry.library(1e-3);
        OperatingPoint op = prepared(refiningCell(1000, 1, 0.02, null, 60), lib, 1e4);
        int k = slot(op, "Cu2+/Cu");
        double e1 = op.cathode.eEq[k] - 0.15;
        double e2 = op.cathode.eEq[k] - 0.25;
        double i1 = -op.cathode.current(k, e1, null);
        double i2 = -op.cathode.current(k, e2, null);
        double slope = (e1 - e2) / (Math.log10(i2) - Math.log10(i1));
        // source: Tafel slope b = 2.303 RT/(alpha_c F) = 118.3 mV per decade for alpha_c = 0.5 at 25 C
        // (Bard & Faulkner 2001, eq. 3.4.15). Mass transfer is 4 decades away here (iL = 3.9e3 A/m2), which
        // bends the slope by under 0.1 %.
        assertEquals(0.11832, slope, 0.11832 * 1e-3);
    }

    @Test
    void faradaysLawGivesTheDepositOfAPureMetalDeposition() {
        RunResult r = CellSimulation.withDefaults().run(refiningCell(1000, 10, 0.02, null, 36000),
                TestChemistry.library(10), null);
        double kg = r.summary().depositKg().get("Cu");
        // source: Faraday's law m = I t M/(z F), CODATA 2018 F, IUPAC M(Cu) = 63.546 g/mol:
        // 100 A for 1 h gives 118.55 g (physics reference check case 1)
        // 10 A for 10 h passes the same charge, at 1000 A/m2 (36 % of the limiting current)
        assertEquals(10 * 36000 * 0.063546 / (2 * F), kg, 1e-9 * kg);
        assertEquals(0.11855, kg, 0.11855 * 2e-4);
        assertEquals(1.0, r.summary().currentEfficiency(), 1e-9);
    }

    @Test
    void gasInTheGapRaisesTheOhmicDropByBruggemansLaw() {
        // a copper cell at five times its limiting current: hydrogen at the cathode, oxygen at the anode
        Scenario sc = TestScenarios.copperBatch(0.001, 0.01, 50e-6, 20.0, 2.0, 600, 60);
        OperatingPoint op = prepared(sc, TestChemistry.library(10), 300);
        op.solve(300);
        double tempK = op.tempK;
        double hydrogen = 0;
        double oxygen = 0;
        for (int k = 0; k < op.cathodeI.length; k++) {
            String name = op.net.cathodeSlots.get(k).reaction().name();
            if (name.equals("H+/H2") || name.equals("H2O/H2")) {
                hydrogen += -op.cathodeI[k] * 0.01 / (2 * F);
            }
        }
        for (int k = 0; k < op.anodeI.length; k++) {
            if (op.net.anodeSlots.get(k).reaction().name().equals("O2/H2O")) {
                oxygen += op.anodeI[k] * 0.01 / (4 * F);
            }
        }
        // source: ideal gas at 1 atm, R from CODATA 2018; void fraction Qg/(Qg + u w gap), docs/model.md
        double gasM3PerS = (hydrogen + oxygen) * 8.314462618 * tempK / 101325;
        double eps = gasM3PerS / (gasM3PerS + 0.05 * 0.1 * 0.03);
        assertTrue(eps > 1e-3, "the case must make gas: " + eps);
        assertEquals(eps, op.voidFraction, 1e-12);
        // source: Bruggeman, kappa_eff = kappa (1 - eps)^1.5 (Ann. Phys. 24 (1935) 636; Tobias 1959)
        double r0 = 0.03 / (op.kappa * 0.01);
        assertEquals(2.0 * r0 * (Math.pow(1 - eps, -1.5) - 1), op.currentA * (op.rGap - op.rGapNoGas), 1e-12);
    }

    @Test
    void ohmicDropRisesLinearlyWithTheGapAtSlopeIOverKappaA() {
        ChemLibrary lib = TestChemistry.library(10);
        double kappa = 3.22;
        double amps = 1.0;
        double[] gaps = {0.01, 0.02, 0.04};
        double[] u = new double[gaps.length];
        for (int g = 0; g < gaps.length; g++) {
            OperatingPoint op = prepared(refiningCell(500, amps, gaps[g], kappa, 60), lib, 30);
            op.solve(30);
            u[g] = op.cellVoltageV;
            // source: R = gap/(kappa A); no gas is made in a refining cell, so no bubble term
            assertEquals(amps * gaps[g] / (kappa * 0.01), op.currentA * op.rGap, 1e-12);
        }
        double slope = amps / (kappa * 0.01);
        assertEquals(slope, (u[1] - u[0]) / (gaps[1] - gaps[0]), slope * 1e-9);
        assertEquals(slope, (u[2] - u[1]) / (gaps[2] - gaps[1]), slope * 1e-9);
    }
}
