package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.cellwright.cell.Compartments;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.Separator;
import org.cellwright.chem.Species;
import org.junit.jupiter.api.Test;

/**
 * A graphite anode in a stannous chloride bath oxidises Sn2+ to Sn4+, which the cathode then reduces back,
 * stealing its current. Keeping the anode's products away from the cathode (a separator, or slow exchange
 * between the zones of an unstirred cell) raises the current efficiency; ferrous iron in an undivided cell
 * lowers it once the anode outruns its Sn2+ supply. Transport across a separator keeps each compartment
 * electroneutral.
 */
class CompartmentsTest {

    /** 2 L of 25 g/L tin in 1 M HCl, 1.5 A on 1 dm2, gently stirred, graphite anode, 3 h. */
    private static Scenario tinCell(Map<String, Double> extra) {
        return tinCell(extra, 100e-6);
    }

    private static Scenario tinCell(Map<String, Double> extra, double layerM) {
        return DepositScenarios.cell(DepositScenarios.tinChloride(25, 1.0, extra), 0.002, "stainless", "graphite",
                0.01, 0.03, layerM, 1.5, 3 * 3600, 600, "Sn");
    }

    private static double efficiency(Scenario sc) {
        return DepositScenarios.run(sc).summary().currentEfficiency();
    }

    @Test
    void aSeparatorKeepsTheAnodesTin4FromStealingCathodeCurrent() {
        Scenario open = tinCell(Map.of());
        RunResult undivided = DepositScenarios.run(open);
        RunResult membrane = DepositScenarios.run(DepositScenarios.with(open,
                Compartments.divided(Separator.of(Separator.Kind.ANION_MEMBRANE))));
        RunResult diaphragm = DepositScenarios.run(DepositScenarios.with(open,
                Compartments.divided(Separator.of(Separator.Kind.DIAPHRAGM))));
        // undivided: the anode's Sn4+ reaches the cathode and takes a good part of its current
        double stolen = -DepositScenarios.charge(undivided, "cathode:Sn4+/Sn2+") / undivided.summary().chargeC();
        assertTrue(stolen > 0.08, "Sn4+ took " + stolen);
        // an anion-exchange membrane passes no cation: no Sn4+ ever reaches the catholyte
        int sn4 = membrane.speciesNames().indexOf("Sn4+");
        assertEquals(0, membrane.summary().finalConcentrationMolPerM3().get("Sn4+"), 1e-6);
        assertTrue(membrane.summary().finalAnolyteConcentrationMolPerM3().get("Sn4+") > 10);
        assertTrue(-DepositScenarios.charge(membrane, "cathode:Sn4+/Sn2+") < 1e-3 * membrane.summary().chargeC());
        assertTrue(sn4 >= 0);
        // a diaphragm lets some across (diffusion, and migration with the current), so it lies in between
        double ceOpen = undivided.summary().currentEfficiency();
        double ceDiaphragm = diaphragm.summary().currentEfficiency();
        double ceMembrane = membrane.summary().currentEfficiency();
        assertTrue(ceOpen < ceDiaphragm && ceDiaphragm < ceMembrane, ceOpen + " < " + ceDiaphragm + " < " + ceMembrane);
        assertTrue(ceMembrane > 0.98, "membrane: " + ceMembrane);
    }

    @Test
    void slowerExchangeBetweenTheZonesOfAnUnstirredCellRaisesTheEfficiency() {
        Scenario open = tinCell(Map.of());
        double ceOpen = efficiency(open);
        double previous = 0;
        // 10, 0.1 and 0.001 L/min between two 1 L zones
        for (double lPerMin : new double[] {10, 0.1, 0.001}) {
            double ce = efficiency(DepositScenarios.with(open, Compartments.zones(lPerMin * 1e-3 / 60)));
            assertTrue(ce > previous, lPerMin + " L/min: " + ce + " after " + previous);
            previous = ce;
            if (lPerMin == 10) {
                // source: two zones exchanging their volume every 6 s over an hour behave as one well-mixed bath
                // (the exchange time is 1/600 of the run); to 1 % of the efficiency
                assertEquals(ceOpen, ce, 0.01 * ceOpen);
            }
        }
    }

    @Test
    void ferrousIronIsOxidisedOnlyOnceTheAnodeOutrunsItsTin2SupplyAndThenLowersTheEfficiency() {
        Map<String, Double> iron = Map.of("Fe2+", 2.0 / 55.845 * 1000);
        // gently stirred: the anode's Sn2+ supply (2 F km c = 300 A/m2) covers its 150 A/m2. Sn2+/Sn4+ (E0
        // 0.15 V) is oxidised before Fe2+/Fe3+ (E0 0.77 V; CRC electrochemical series): the iron does nothing
        RunResult calmPlain = DepositScenarios.run(tinCell(Map.of()));
        RunResult calmIron = DepositScenarios.run(tinCell(iron));
        assertTrue(DepositScenarios.charge(calmIron, "anode:Fe3+/Fe2+") < 1e-6 * calmIron.summary().chargeC());
        assertEquals(calmPlain.summary().currentEfficiency(), calmIron.summary().currentEfficiency(), 1e-4);
        // still bath: Sn2+ reaches the anode at only 100 A/m2, the anode potential rises past Fe2+/Fe3+ and the
        // anode oxidises Fe2+ next (then makes chlorine). The Fe3+ either reaches the cathode (and is reduced
        // back, stealing current) or oxidises Sn2+ in the bulk (2 Fe3+ + Sn2+ = 2 Fe2+ + Sn4+), and that Sn4+
        // steals cathode current in turn; without iron that share of the anode's current would have made
        // chlorine gas, of which only a part dissolves and oxidises Sn2+
        RunResult plain = DepositScenarios.run(tinCell(Map.of(), 300e-6));
        RunResult withIron = DepositScenarios.run(tinCell(iron, 300e-6));
        assertTrue(DepositScenarios.charge(withIron, "anode:Fe3+/Fe2+") > 0.02 * withIron.summary().chargeC(),
                "the anode oxidises Fe2+");
        assertTrue(-DepositScenarios.charge(withIron, "cathode:Fe3+/Fe2+") > 0, "the cathode reduces some Fe3+");
        double fe3 = withIron.summary().finalConcentrationMolPerM3().get("Fe3+");
        double fe2 = withIron.summary().finalConcentrationMolPerM3().get("Fe2+");
        assertTrue(fe3 < 1e-3 * fe2, "Sn2+ keeps the iron reduced in the bulk: Fe3+ " + fe3 + ", Fe2+ " + fe2);
        assertTrue(withIron.summary().finalConcentrationMolPerM3().get("Sn4+")
                > plain.summary().finalConcentrationMolPerM3().get("Sn4+"), "more Sn4+ with iron");
        assertTrue(withIron.summary().currentEfficiency() < plain.summary().currentEfficiency(),
                withIron.summary().currentEfficiency() + " vs " + plain.summary().currentEfficiency());
        assertTrue(withIron.summary().gasMol().get("Cl2") < plain.summary().gasMol().get("Cl2"), "less chlorine");
    }

    @Test
    void eachCompartmentStaysElectroneutralAndAMembranePassesOnlyItsCounterIons() {
        for (Compartments c : List.of(Compartments.divided(Separator.of(Separator.Kind.ANION_MEMBRANE)),
                Compartments.divided(Separator.of(Separator.Kind.CATION_MEMBRANE)),
                Compartments.divided(Separator.of(Separator.Kind.DIAPHRAGM)), Compartments.zones(1e-6))) {
            RunResult r = DepositScenarios.run(DepositScenarios.with(tinCell(Map.of("Fe2+", 20.0)), c));
            InstantState first = r.trace().get(0).state();
            InstantState last = r.trace().get(r.trace().size() - 1).state();
            // source: electroneutrality; the model's migration carries exactly the current across, so the charge
            // that the electrode reactions take from or give to each compartment comes back. Tolerance 1e-7 of
            // the ionic charge: the finite-difference Jacobian breaks this linear invariant at the 1e-8 level
            double scale = ionic(r, first.concentrationsMolPerM3(), true);
            assertEquals(ionic(r, first.concentrationsMolPerM3(), false), ionic(r, last.concentrationsMolPerM3(), false),
                    1e-7 * scale, c.kind() + " catholyte");
            assertEquals(ionic(r, first.anolyteConcentrationsMolPerM3(), false),
                    ionic(r, last.anolyteConcentrationsMolPerM3(), false), 1e-7 * scale, c.kind() + " anolyte");
            if (c.separator() != null && c.separator().kind() == Separator.Kind.ANION_MEMBRANE) {
                // no cation crosses: the anolyte keeps its iron and tin, the catholyte's tin goes to the deposit
                assertEquals(tin(r, first.anolyteConcentrationsMolPerM3()), tin(r, last.anolyteConcentrationsMolPerM3()),
                        1e-9 * tin(r, first.anolyteConcentrationsMolPerM3()));
                double catholyteL = 1.0;
                double tinBefore = tin(r, first.concentrationsMolPerM3()) * catholyteL * 1e-3;
                double tinAfter = tin(r, last.concentrationsMolPerM3()) * catholyteL * 1e-3
                        + r.summary().depositKg().get("Sn") / 0.11871;
                assertEquals(tinBefore, tinAfter, 1e-9 * tinBefore);
            }
            if (c.separator() != null && c.separator().kind() == Separator.Kind.CATION_MEMBRANE) {
                int cl = r.speciesNames().indexOf("Cl-");
                assertEquals(first.anolyteConcentrationsMolPerM3()[cl], last.anolyteConcentrationsMolPerM3()[cl], 1e-6,
                        "no anion crosses a cation membrane");
            }
        }
    }

    @Test
    void theSeparatorAddsItsResistanceToTheGap() {
        Scenario open = tinCell(Map.of());
        for (Separator s : List.of(Separator.of(Separator.Kind.ANION_MEMBRANE), Separator.of(Separator.Kind.DIAPHRAGM))) {
            RunResult r = DepositScenarios.run(DepositScenarios.with(open, Compartments.divided(s)));
            InstantState t0 = r.trace().get(0).state();
            double kappa = t0.conductivitySPerM();
            double area = 0.01;
            // source: resistances in series, R = (gap - L)/(kappa A) + L/(kappa_sep A); a membrane at its
            // conductivity (2 S/m, anion membranes, from memory), a diaphragm at kappa porosity^1.5 (Bruggeman,
            // Ann. Phys. 24 (1935) 636). At t = 0 both compartments hold the same bath and no gas yet.
            double kSep = s.kind().isMembrane() ? 2.0 : kappa * Math.pow(0.5, 1.5);
            double expected = 1.5 * ((0.03 - s.thicknessM()) / (kappa * area) + s.thicknessM() / (kSep * area));
            assertEquals(expected, t0.ohmicSolutionV(), expected * 1e-9, s.kind().key());
            assertNotNull(t0.anolyteConcentrationsMolPerM3());
        }
        assertNull(DepositScenarios.run(open).trace().get(0).state().anolyteConcentrationsMolPerM3());
    }

    /** Sum of z c (mol/m3 of charge), or of |z| c. */
    private static double ionic(RunResult r, double[] c, boolean absolute) {
        double sum = 0;
        for (int j = 0; j < c.length; j++) {
            Species s = DepositScenarios.LIB.findSpecies(r.speciesNames().get(j)).orElseThrow();
            sum += (absolute ? Math.abs(s.charge()) : s.charge()) * c[j];
        }
        return sum;
    }

    private static double tin(RunResult r, double[] c) {
        return c[r.speciesNames().indexOf("Sn2+")] + c[r.speciesNames().indexOf("Sn4+")];
    }
}
