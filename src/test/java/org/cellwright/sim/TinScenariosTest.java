package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * The shipped tin scenarios (scenarios/ at the project root, read as a user's file with the built-in
 * library) show the four behaviours a tin recoverer meets: efficiency falling as Sn2+ depletes and Sn4+
 * builds; sponge when the liquor is diluted; dendrites shorting a narrow gap hours into a run; and what a
 * separator with an anode-side additive changes.
 */
class TinScenariosTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    private static RunResult run(String file) throws Exception {
        var sc = new ScenarioReader(LIB).read(Path.of("scenarios", file));
        return CellSimulation.withDefaults().run(sc, LIB, null);
    }

    private static double charge(RunResult r, String label) {
        return r.summary().reactionChargeC().getOrDefault(label, 0.0);
    }

    @Test
    void strippingLiquorLosesEfficiencyAsSn2DepletesAndSn4Builds() throws Exception {
        RunResult r = run("tin-shuttle-efficiency.toml");
        int sn2 = r.speciesNames().indexOf("Sn2+");
        int sn4 = r.speciesNames().indexOf("Sn4+");
        List<TracePoint> t = r.trace();
        double previousEfficiency = 1.1;
        for (int i = 5; i < t.size(); i += 5) {
            InstantState s = t.get(i).state();
            assertTrue(s.targetEfficiency() < previousEfficiency, "efficiency falls at " + s.timeS());
            previousEfficiency = s.targetEfficiency();
            assertTrue(s.concentrationsMolPerM3()[sn2] < t.get(i - 5).state().concentrationsMolPerM3()[sn2]);
        }
        assertTrue(t.get(5).state().targetEfficiency() > 0.9, "near 100 % at first");
        assertTrue(t.get(t.size() - 1).state().targetEfficiency() < 0.4, "well under half at the end");
        assertTrue(t.get(t.size() - 1).state().concentrationsMolPerM3()[sn4] > 50, "Sn4+ builds");
        // the Sn4+ that the anode makes takes a third of the cathode's charge over the run
        assertTrue(-charge(r, "cathode:Sn4+/Sn2+") > 0.3 * r.summary().chargeC());
        assertTrue(charge(r, "anode:Sn4+/Sn2+") > 0.6 * r.summary().chargeC());
        assertEquals("target", r.summary().stopReason());
        assertEquals("powdery", r.summary().morphologyFinal());
        assertTrue(r.summary().currentEfficiency() > 0.5 && r.summary().currentEfficiency() < 0.7);
    }

    @Test
    void dilutedLiquorGivesSpongeAtTheSameCurrent() throws Exception {
        RunResult dilute = run("tin-dilute-sponge.toml");
        RunResult liquor = run("tin-shuttle-efficiency.toml");
        for (TracePoint p : dilute.trace().subList(1, dilute.trace().size())) {
            assertEquals("powdery", p.state().morphology(), "sponge at " + p.timeS());
        }
        // the undiluted liquor starts at half its limiting current: not powdery then
        assertTrue(liquor.trace().get(10).state().targetLimitRatio() < 0.6);
        assertTrue(!"powdery".equals(liquor.trace().get(10).state().morphology()));
        // hydrogen takes most of the current; energy per kilogram several times higher
        assertTrue(-charge(dilute, "cathode:H+/H2") > 0.5 * dilute.summary().chargeC());
        assertTrue(dilute.summary().currentEfficiency() < 0.3);
        assertTrue(dilute.summary().specificEnergyJPerKg() > 4 * liquor.summary().specificEnergyJPerKg());
        assertTrue(dilute.summary().warnings().stream().anyMatch(w -> w.startsWith("Deposit form: ")));
    }

    @Test
    void voltageBreakdownMovesSmoothlyWhenChlorineTakesOverAtTheAnode() throws Exception {
        RunResult r = run("tin-narrow-gap-dendrites.toml");
        List<TracePoint> t = r.trace();
        double largestStep = 0;
        // from the start: the bath holds no Sn4+ then, and the split takes the Nernst potential of Sn4+/Sn2+
        // at Pourbaix's 1e-6 activity for it (ElectrodeKinetics.SHOWN_MIN_ACTIVITY), not volts below zero
        assertTrue(t.get(0).state().equilibriumVoltageV() > 0, "equilibrium voltage at the start "
                + t.get(0).state().equilibriumVoltageV() + " V");
        for (int i = 1; i < t.size(); i++) {
            InstantState a = t.get(i - 1).state();
            InstantState b = t.get(i).state();
            if (b.shorted()) {
                break;
            }
            // the split is exact: equilibrium voltage plus both overpotentials is the electrode potential gap
            // (identity of the current-weighted split, docs/model.md), to rounding
            assertEquals(b.anodePotentialV() - b.cathodePotentialV(),
                    b.equilibriumVoltageV() + b.anodeOverpotentialV() - b.cathodeOverpotentialV(), 1e-9);
            largestStep = Math.max(largestStep, Math.abs(b.equilibriumVoltageV() - a.equilibriumVoltageV()));
        }
        // the anode goes over from Sn2+ oxidation (E0 0.15 V) to chlorine (E0 1.36 V; CRC electrochemical
        // series) during the run; a split by the dominant reaction jumped by 1.18 V between two samples,
        // the current-weighted one follows the shares (1 min samples) in steps of a few tens of mV
        assertTrue(largestStep < 0.15, "largest step of the equilibrium voltage " + largestStep + " V");
    }

    @Test
    void narrowGapShortsHoursIntoTheRun() throws Exception {
        RunResult r = run("tin-narrow-gap-dendrites.toml");
        Double shortS = r.summary().shortCircuitS();
        assertNotNull(shortS);
        assertTrue(shortS > 3 * 3600 && shortS < 8 * 3600, "short at " + shortS);
        assertEquals("end", r.summary().stopReason());
        double amps = 2.0;
        for (TracePoint p : r.trace()) {
            if (p.timeS() > shortS) {
                // the 50 mohm default short: U = I R_short
                assertEquals(amps * 0.05, p.state().cellVoltageV(), 1e-9);
                assertEquals(0.010, p.state().dendriteHeightM(), 1e-9);
            } else {
                assertTrue(p.state().cellVoltageV() > 0.5, p.timeS() + ": " + p.state().cellVoltageV());
                assertTrue(p.state().dendriteHeightM() < 0.010);
            }
        }
        assertTrue(r.events().stream().anyMatch(e -> e.kind() == RunEvent.Kind.SHORT_CIRCUIT));
        assertTrue(r.summary().warnings().get(0).startsWith("Short circuit: at "), r.summary().warnings().toString());
        // the same liquor with the 40 mm gap does not short within its run
        assertNull(run("tin-shuttle-efficiency.toml").summary().shortCircuitS());
    }

    @Test
    void aMembraneAndAFerrousAnolyteKeepTheAnodesOxidantsAwayFromTheCathode() throws Exception {
        RunResult divided = run("tin-divided-cell.toml");
        RunResult undivided = run("tin-shuttle-efficiency.toml");
        // the catholyte (the same liquor, the same volume) never sees Sn4+ or Fe3+
        assertEquals(0, divided.summary().finalConcentrationMolPerM3().get("Sn4+"), 1e-6);
        assertEquals(0, divided.summary().finalConcentrationMolPerM3().getOrDefault("Fe3+", 0.0), 1e-6);
        assertTrue(-charge(divided, "cathode:Sn4+/Sn2+") < 1e-3 * divided.summary().chargeC());
        // the anode oxidises the anolyte's Fe2+ rather than evolving chlorine
        assertTrue(charge(divided, "anode:Fe3+/Fe2+") > 0.85 * divided.summary().chargeC());
        assertTrue(divided.summary().finalAnolyteConcentrationMolPerM3().get("Fe3+") > 0.5e3);
        assertTrue(divided.summary().gasMol().get("Cl2") < 0.5 * undivided.summary().gasMol().get("Cl2"));
        // and the efficiency rises by a quarter of the charge
        assertTrue(divided.summary().currentEfficiency() > undivided.summary().currentEfficiency() + 0.2,
                divided.summary().currentEfficiency() + " vs " + undivided.summary().currentEfficiency());
    }
}
