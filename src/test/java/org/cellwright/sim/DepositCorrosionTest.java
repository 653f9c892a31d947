package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.chem.WaterViscosity;
import org.junit.jupiter.api.Test;

/**
 * Oxidants in the bath attack the deposit at the rate their mass transfer to the cathode allows, and their
 * one flux to the cathode is shared, never counted twice: between their reduction by the supply's electrons
 * and by the deposit's (mixed-potential corrosion), and between reactions that draw on the same ion.
 */
class DepositCorrosionTest {

    private static final double F = 96485.33212331001;
    private static final double VOLUME = 0.0005;
    private static final double AREA = 0.01;
    private static final double DELTA = 50e-6;
    private static final double D_SN4 = 0.6e-9;

    /**
     * Tin deposited at 2 A for 30 min from a bath holding Sn4+, then the supply drops to {@code laterAmps}. The
     * Sn4+/Sn2+ exchange current is raised to 100 A/m2 (a scenario override) so that Sn4+ is reduced at its
     * mass-transfer limit a few tens of millivolts from tin's equilibrium potential: the test isolates mass
     * transfer (with 1 A/m2 the reduction there is under mixed control, 89 % of the limit).
     */
    static Scenario tinThen(double laterAmps) {
        Map<String, Double> c = new LinkedHashMap<>();
        c.put("Sn2+", 200.0);
        c.put("Sn4+", 15.0);
        c.put("H+", 1000.0);
        c.put("Cl-", 1460.0);
        Scenario sc = DepositScenarios.cell(c, VOLUME, "stainless", "graphite", AREA, 0.03, DELTA, 2.0, 3 * 3600,
                300, "Sn");
        sc = new Scenario(sc.title(), sc.notes(), sc.electrolyte(), sc.cathode(), sc.anode(), sc.cell(), sc.supply(),
                sc.run(), List.of(), List.of(new ReactionOverride("Sn4+/Sn2+", null, null, 100.0, null, null, null)),
                sc.deposit());
        return sc.withSupply(new PowerSupply(ControlMode.CURRENT, 0, 0, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, List.of(new SetPoint(0, 2.0, false), new SetPoint(1800, laterAmps, false))));
    }

    @Test
    void atOpenCircuitTin4DissolvesTheDepositAtItsMassTransferLimit() {
        RunResult r = CellSimulation.withDefaults().run(tinThen(0.0), TestChemistry.library(10), null);
        int sn4 = r.speciesNames().indexOf("Sn4+");
        int tin = r.metalSymbols().indexOf("Sn");
        TracePoint start = DepositScenarios.at(r, 2100);
        double km = D_SN4 / DELTA;
        // the deposit (1.47 g) lasts until about 5800 s, when Sn4+ has taken it all; check while it covers the sheet
        for (double t : new double[] {2700, 3600, 4500}) {
            TracePoint p = DepositScenarios.at(r, t);
            // source: Sn4+ + Sn = 2 Sn2+ at the mass-transfer limit of Sn4+ to the cathode, so Sn4+ follows the
            // batch-reactor law c = c1 exp(-km A (t - t1) / V) (Pletcher & Walsh 1990; Trinidad, Walsh & Gilroy
            // 1998) and the deposit loses one tin atom per Sn4+ (the mixed-potential theory of corrosion, Wagner
            // & Traud, Z. Elektrochem. 44 (1938) 391). Tolerance 0.5 %: hydrogen on the tin at the mixed potential
            // takes 0.2 % of the corrosion current with the test chemistry's fast hydrogen kinetics.
            double c1 = start.state().concentrationsMolPerM3()[sn4];
            double expected = c1 * Math.exp(-km * AREA * (t - 2100) / VOLUME);
            double c = p.state().concentrationsMolPerM3()[sn4];
            assertEquals(expected, c, expected * 0.005, "Sn4+ at " + t);
            double lostMol = (start.depositKg()[tin] - p.depositKg()[tin]) / 0.11871;
            assertEquals(VOLUME * (c1 - c), lostMol, VOLUME * (c1 - c) * 0.005, "tin lost by " + t);
            assertEquals(0, p.state().currentA(), 0);
        }
        // then the cathode is bare again and rests at the Sn4+/Sn2+ potential: the attack stops with nothing left
        assertEquals(0, r.summary().depositKg().get("Sn"), 1e-9);
        assertTrue(r.trace().get(r.trace().size() - 1).state().cathodePotentialV() > 0.1);
        double redissolvedKg = r.summary().corrodedKg().get("Sn");
        double lostKg = DepositScenarios.at(r, 1800).depositKg()[tin] - r.summary().depositKg().get("Sn");
        assertEquals(lostKg, redissolvedKg, lostKg * 1e-3, "the summary's redissolved tin is what the deposit lost");
        assertTrue(r.summary().currentEfficiency() < DepositScenarios.at(r, 1800).cumulativeEfficiency(),
                "the loss shows in the efficiency");
    }

    @Test
    void belowTheOxidantsLimitTheDepositSuppliesTheRestOfItsReduction() {
        // 0.15 A is below what Sn4+ can take at the cathode (2 F km c A = 0.17 to 0.35 A here): the supply's
        // electrons do not suffice, and the deposit gives the rest
        RunResult r = CellSimulation.withDefaults().run(tinThen(0.15), TestChemistry.library(10), null);
        int sn4 = r.speciesNames().indexOf("Sn4+");
        int tinSlot = r.cathodeReactions().indexOf("Sn2+/Sn");
        int sn4Slot = r.cathodeReactions().indexOf("Sn4+/Sn2+");
        for (double t : new double[] {2400, 3600, 5400}) {
            InstantState s = DepositScenarios.at(r, t).state();
            double limit = 2 * F * (D_SN4 / DELTA) * s.concentrationsMolPerM3()[sn4] * AREA;
            // source: mass-transfer-limited reduction of Sn4+, i = n F km c (Nernst layer, Bard & Faulkner 2001
            // eq. 1.4.10); to 0.1 %, the share of the kinetic resistance at this overpotential
            assertEquals(-limit, s.cathodeCurrentsA()[sn4Slot], limit * 1e-3, "Sn4+ at its limit at " + t);
            assertTrue(limit > 0.15, "the case needs the oxidant's limit above the current");
            // the tin partial current is anodic: the deposit dissolves by what the supply does not give
            assertEquals(limit - 0.15, s.cathodeCurrentsA()[tinSlot], (limit - 0.15) * 0.01, "tin dissolving at " + t);
            assertEquals(null, s.morphology(), "nothing deposits, no deposit form");
        }
    }

    @Test
    void twoReductionsOfCopperShareTheOneCu2FluxToTheCathode() {
        // copper chloride far above its limiting current, built-in library: Cu2+ + 2e- = Cu and Cu2+ + e- = Cu+
        // (Cu+ stable as a chloro complex) both draw on Cu2+
        Map<String, Double> c = new LinkedHashMap<>();
        c.put("Cu2+", 50.0);
        c.put("H+", 1000.0);
        c.put("Cl-", 1100.0);
        double delta = 100e-6;
        Scenario sc = DepositScenarios.cell(c, 0.002, "stainless", "platinum", 0.01, 0.03, delta, 3.0, 3600, 300, "Cu");
        RunResult r = DepositScenarios.run(sc);
        int cu2 = r.speciesNames().indexOf("Cu2+");
        int toMetal = r.cathodeReactions().indexOf("Cu2+/Cu");
        int toCuprous = r.cathodeReactions().indexOf("Cu2+/Cu+");
        double d25 = DepositScenarios.LIB.findSpecies("Cu2+").orElseThrow().diffusionM2PerS();
        for (TracePoint p : r.trace().subList(1, r.trace().size())) {
            InstantState s = p.state();
            // Stokes-Einstein, as the engine: the bath runs some hundredths of a kelvin above 25 C
            double t = s.temperatureK();
            double km = d25 * (t / 298.15) * WaterViscosity.of(298.15) / WaterViscosity.of(t) / delta;
            double supply = km * 0.01 * s.concentrationsMolPerM3()[cu2];
            double drawn = -s.cathodeCurrentsA()[toMetal] / (2 * F) - s.cathodeCurrentsA()[toCuprous] / F;
            // source: a species' flux to an electrode cannot exceed km c A (Nernst layer with zero surface
            // concentration, Bard & Faulkner 2001 eq. 1.4.10); at ten times the limiting current both reductions
            // together take it all but the kinetic remainder (under 1 %)
            assertTrue(drawn <= supply * (1 + 1e-9), "drawn " + drawn + " > supply " + supply + " at " + p.timeS());
            assertTrue(drawn > 0.99 * supply, "drawn " + drawn + " of " + supply + " at " + p.timeS());
            assertTrue(-s.cathodeCurrentsA()[toMetal] > 0 && -s.cathodeCurrentsA()[toCuprous] > 0);
        }
    }
}
