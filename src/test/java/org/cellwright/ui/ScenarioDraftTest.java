package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The form's draft: read from a file's text, written back as scenario text, checked by the scenario reader,
 * each problem placed beside its field.
 */
class ScenarioDraftTest {

    static ChemLibrary lib;

    @BeforeAll
    static void library() {
        lib = LibraryReader.builtIn();
    }

    private static ScenarioDraft tin() throws ScenarioException {
        return ScenarioDraft.parse(ScenarioTemplate.defaultTemplate().text(), "tin.toml");
    }

    @Test
    void everyShippedScenarioComesBackThroughTheFormUnchanged() throws Exception {
        for (ScenarioTemplate t : ScenarioTemplate.all()) {
            Scenario direct = new ScenarioReader(lib).parse(t.text(), t.fileName(), List.of()).scenario();
            DraftCheck.Outcome o = DraftCheck.draft(ScenarioDraft.parse(t.text(), t.fileName()), lib, t.fileName());
            assertTrue(o.ok(), t.fileName() + ": " + o.fieldErrors() + o.generalErrors());
            assertEquals(direct, o.scenario(), t.fileName());
        }
    }

    @Test
    void fieldsKeepTheUsersNotation() throws Exception {
        ScenarioDraft d = tin();
        assertEquals("2 A/dm2", d.get(FormFields.SUPPLY_VALUE));
        assertEquals(SupplyKind.CURRENT_DENSITY, d.supplyKind());
        assertEquals("30 mm", d.get("cell.gap"));
        assertEquals("Sn2+ < 3 g/L", d.get(FormFields.STOPS));
        assertEquals(new ScenarioDraft.Row("Sn2+", "25 g/L"), d.composition().get(0));
        String text = DraftToml.write(d).text();
        assertTrue(text.contains("current_density = \"2 A/dm2\""), text);
        assertTrue(text.contains("\"Sn2+\" = \"25 g/L\""), text);
    }

    @Test
    void aBadUnitIsPlacedBesideItsFieldAtItsColumn() throws Exception {
        ScenarioDraft d = tin();
        d.set("cell.gap", "30 mmm");
        DraftCheck.Outcome o = DraftCheck.draft(d, lib, "tin.toml");
        assertNull(o.scenario());
        DraftCheck.FieldError e = o.fieldErrors().get("cell.gap");
        assertNotNull(e, o.toString());
        assertTrue(e.message().contains("'mm'"), e.message());
        // "30 mmm": the unit starts at the fourth character
        assertEquals(4, e.column());
    }

    @Test
    void rangeAndNameProblemsFindTheirFields() throws Exception {
        ScenarioDraft d = tin();
        d.set("cell.gap", "-5 mm");
        d.set("electrolyte.volume", "");
        d.set("anode.material", "grafite");
        d.setComposition(List.of(new ScenarioDraft.Row("Sn2+", "25 g/L"), new ScenarioDraft.Row("Xq3+", "1 g/L"),
                new ScenarioDraft.Row("H+", "1.5 mol/L"), new ScenarioDraft.Row("Cl-", "1.975 mol/L")));
        DraftCheck.Outcome o = DraftCheck.draft(d, lib, "tin.toml");
        assertTrue(o.fieldErrors().containsKey("cell.gap"), o.toString());
        assertTrue(o.fieldErrors().containsKey("electrolyte.volume"), o.toString());
        assertTrue(o.fieldErrors().get("anode.material").message().contains("graphite"), o.toString());
        assertTrue(o.fieldErrors().containsKey(FormFields.COMPOSITION + 1), o.toString());
    }

    @Test
    void supplyKindAgitationAndStopsAreWrittenAsTheFormSets() throws Exception {
        ScenarioDraft d = tin();
        d.setSupplyKind(SupplyKind.CURRENT);
        d.set(FormFields.SUPPLY_VALUE, "3 A");
        d.set(FormFields.AGITATION, "stirred");
        d.set(FormFields.STOPS, "short; Sn2+ < 2 g/L ;");
        Scenario s = DraftCheck.draft(d, lib, "t").scenario();
        assertNotNull(s);
        assertEquals(ControlMode.CURRENT, s.supply().mode());
        assertEquals(3.0, s.supply().currentA());
        // source: AgitationPreset (Pletcher and Walsh 1990, from memory): stirred 30 um
        assertEquals(30e-6, s.cell().agitation().diffusionLayerM(), 1e-18);
        assertEquals(2, s.run().stops().size());
        assertTrue(s.run().stops().get(0) instanceof StopCondition.ShortCircuit);
        d.set(FormFields.DIFFUSION_LAYER, "150 um");
        DraftCheck.Outcome both = DraftCheck.draft(d, lib, "t");
        assertNull(both.scenario(), "a preset and a thickness together are refused");
    }

    @Test
    void partsTheFormHasNoFieldForAreKept() throws Exception {
        String text = ScenarioTemplate.defaultTemplate().text().replace("[supply]\ncurrent_density = \"2 A/dm2\"",
                "[supply]\nschedule = [ { at = \"0 h\", current = \"2 A\" }, { at = \"1 h\", current = \"1.5 A\", ramp = true } ]")
                + "\n[species.\"Sn2+\"]\ndiffusion = \"0.8e-9 m2/s\"\n";
        ScenarioDraft d = ScenarioDraft.parse(text, "s.toml");
        assertEquals(SupplyKind.SCHEDULE, d.supplyKind());
        assertTrue(d.hasSchedule());
        Scenario s = DraftCheck.draft(d, lib, "s.toml").scenario();
        assertNotNull(s, DraftCheck.draft(d, lib, "s.toml").toString());
        assertEquals(2, s.supply().schedule().size());
        assertEquals(1, s.speciesOverrides().size());
        assertEquals(0.8e-9, s.speciesOverrides().get(0).diffusionM2PerS());
        assertEquals(new ScenarioReader(lib).parse(text, "s.toml", List.of()).scenario(), s);
    }

    @Test
    void unknownKeysStillReachTheReader() throws Exception {
        String text = ScenarioTemplate.defaultTemplate().text().replace("[run]\n", "[run]\nduraton = \"2 h\"\n");
        DraftCheck.Outcome o = DraftCheck.draft(ScenarioDraft.parse(text, "u.toml"), lib, "u.toml");
        assertNull(o.scenario());
        assertTrue(o.generalErrors().stream().anyMatch(m -> m.contains("duraton")), o.toString());
    }

    @Test
    void notesWithQuotesBackslashesAndLinesSurvive() throws Exception {
        ScenarioDraft d = tin();
        String notes = "Line one with \"quotes\" and a back\\slash.\nLine two with \"\"\" three quotes.";
        d.set(FormFields.NOTES, notes);
        Scenario s = DraftCheck.draft(d, lib, "t").scenario();
        assertEquals(notes, s.notes().strip());
    }

    @Test
    void syntaxErrorsAreReportedWithTheirLine() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioDraft.parse("title = \"a\"\n[cell\ngap = 3\n", "bad.toml"));
        assertEquals(2, e.problems().get(0).line());
    }

    @Test
    void setConcentrationFindsTheRowInAnyNotation() throws Exception {
        ScenarioDraft d = ScenarioDraft.parse("[electrolyte.composition]\n\"Cu++\" = \"40 g/L\"\n", "c.toml");
        d.setConcentration("Cu2+", "20 g/L");
        assertEquals(List.of(new ScenarioDraft.Row("Cu++", "20 g/L")), d.composition());
        d.setConcentration("H+", "1 mol/L");
        assertEquals(2, d.composition().size());
    }
}
