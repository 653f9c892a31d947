package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/** The cautions a run raises follow what the scenario does. */
class RunWarningsTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    private static List<String> warnings(Map<String, Double> comp, String anode, double amps) {
        Scenario sc = new Scenario("w", "", new Electrolyte(0.001, 298.15, comp, null),
                new Electrode("stainless", 0.01), new Electrode(anode, 0.01),
                new CellSetup(0.03, Agitation.of(AgitationPreset.GENTLE), 295.15, 0, null),
                PowerSupply.constantCurrent(amps), new RunSettings(3600, 300, List.of(), null), List.of(), List.of());
        return CellSimulation.withDefaults().run(sc, LIB, null).summary().warnings();
    }

    private static boolean has(List<String> w, String start) {
        return w.stream().anyMatch(s -> s.startsWith(start));
    }

    @Test
    void graphiteInChlorideWarnsOfChlorineAndHydrogenAndAcid() {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Sn2+", 50.0);
        comp.put("H+", 1000.0);
        comp.put("Cl-", 1100.0);
        List<String> w = warnings(comp, "graphite", 2.0);
        assertTrue(has(w, "Chlorine"), w.toString());
        assertTrue(has(w, "Hydrogen"), w.toString());
        assertTrue(has(w, "Acid"), w.toString());
        assertFalse(has(w, "Lead"), w.toString());
    }

    @Test
    void leadAnodeAndLeadInTheBathWarnOfLead() {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Cu2+", 300.0);
        comp.put("H+", 500.0);
        comp.put("SO4^2-", 550.0);
        List<String> w = warnings(comp, "lead-calcium", 0.5);
        assertTrue(has(w, "Lead"), w.toString());
        assertFalse(has(w, "Chlorine"), w.toString());
    }

    @Test
    void stannousBathWithLittleAcidWarnsOfHydrolysis() {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Sn2+", 200.0);
        comp.put("H+", 10.0);
        comp.put("SO4^2-", 205.0);
        // source: basic tin(II) sulfates precipitate from about pH 1.5-2.4 (J. Chem. Soc. A 1967, 1790)
        List<String> w = warnings(comp, "tin", 0.5);
        assertTrue(has(w, "Hydrolysis"), w.toString());
    }
}
