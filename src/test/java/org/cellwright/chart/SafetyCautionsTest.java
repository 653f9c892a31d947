package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.Test;

/** The hazards each shipped scenario raises follow from its anode, bath and current. */
class SafetyCautionsTest {

    private static List<String> hazards(RunResult r) {
        return SafetyCautions.of(r, ReportFixture.LIBRARY).stream().map(SafetyCautions.Caution::hazard).toList();
    }

    @Test
    void inertGraphiteInChlorideGivesChlorineAndTheAcidBathAcid() {
        List<SafetyCautions.Caution> c = SafetyCautions.of(ReportFixture.tin(), ReportFixture.LIBRARY);
        // source: scenarios/tin-stripping-liquor.toml: graphite anode (inert in the library), Cl- 1.975 mol/L,
        // H+ 1.5 mol/L, stainless cathode giving hydrogen once tin reaches its limit
        // the tin run also forecasts a dendrite short within the run, which adds the electrical caution
        assertEquals(List.of("Chlorine", "Hydrogen", "Acid"), c.stream().map(SafetyCautions.Caution::hazard).toList()
                .subList(0, 3));
        assertTrue(c.get(0).trigger().contains("graphite") && c.get(0).trigger().contains("1.98 mol/L"),
                c.get(0).trigger());
    }

    @Test
    void leadCalciumAnodeInSulfateGivesLeadButNoChlorine() {
        List<String> h = hazards(ReportFixture.copper());
        // source: scenarios/copper-etchant-bleed.toml: lead-calcium anode, sulfate bath without chloride
        assertTrue(h.contains("Lead") && h.contains("Acid"), h.toString());
        assertTrue(!h.contains("Chlorine"), h.toString());
    }

    @Test
    void aSolubleAnodeInChlorideGivesNoChlorineAndHighCurrentIsElectrical() {
        // a tin anode dissolves instead of giving off chlorine (library: material.tin has soluble_metal Sn)
        List<String> h = hazards(ReportFixture.run("tin-stripping-liquor.toml", "anode.material=tin",
                "supply.current=\"6 A\"", "run.duration=\"20 min\""));
        assertTrue(!h.contains("Chlorine"), h.toString());
        // source: SafetyCautions.HIGH_CURRENT_A, 5 A (common practice); 6 A is above it
        assertTrue(h.contains("Electrical"), h.toString());
    }

    @Test
    void notesOnTheDataAreKeptApartFromHazards() {
        List<String> notes = SafetyCautions.dataNotes(ReportFixture.tin());
        assertTrue(notes.stream().noneMatch(n -> n.startsWith("Chlorine") || n.startsWith("Hydrogen")), notes.toString());
        // source: the tin run builds Sn4+ above 1 g/L, which the engine notes (RunWarnings.tinChemistry)
        assertTrue(notes.stream().anyMatch(n -> n.startsWith("Tin(IV)")), notes.toString());
    }

    @Test
    void theReportCautionsAHotBathFrom50C() {
        // source: scenarios/copper-electrowinning.toml runs at 45 C; 50 C is the threshold (common practice)
        List<String> warm = hazards(ReportFixture.run("copper-electrowinning.toml", "run.duration=\"1 h\""));
        assertTrue(!warm.contains("Hot bath"), warm.toString());
        List<SafetyCautions.Caution> hot = SafetyCautions.of(ReportFixture.run("copper-electrowinning.toml",
                "run.duration=\"1 h\"", "electrolyte.temperature=\"60 C\""), ReportFixture.LIBRARY);
        SafetyCautions.Caution c = hot.stream().filter(k -> k.hazard().equals("Hot bath")).findFirst().orElseThrow();
        assertTrue(c.trigger().startsWith("the bath reaches 6") && c.advice().contains("heat-resistant gloves"),
                c.toString());
        assertTrue(SafetyCautions.dataNotes(ReportFixture.run("copper-electrowinning.toml", "run.duration=\"1 h\"",
                "electrolyte.temperature=\"60 C\"")).stream().noneMatch(n -> n.startsWith("Hot bath")));
    }

    @Test
    void theReportCautionsAnAcidNitrateBathAndNoSulfateOrChlorideBath() {
        // source: scenarios/silver-nitrate-refining.toml: 0.521 mol/L NO3-, 0.15 mol/L H+
        List<SafetyCautions.Caution> c = SafetyCautions.of(ReportFixture.run("silver-nitrate-refining.toml"),
                ReportFixture.LIBRARY);
        SafetyCautions.Caution n = c.stream().filter(k -> k.hazard().equals("Nitrate")).findFirst().orElseThrow();
        assertTrue(n.trigger().startsWith("0.52 mol/L of nitrate") && n.advice().contains("nitrogen oxides"),
                n.toString());
        assertTrue(!hazards(ReportFixture.copper()).contains("Nitrate"));
        assertTrue(!hazards(ReportFixture.tin()).contains("Nitrate"));
    }
}
