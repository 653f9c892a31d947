package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.cellwright.cell.Scenario;
import org.cellwright.io.UnitException;
import org.junit.jupiter.api.Test;

/** The what-if sliders on the tin scenario: 2 A/dm2 on 1 dm2, gap 30 mm, Sn2+ 25 g/L, 25 C, still bath. */
class WhatIfTest {

    private final Scenario tin = TinRun.scenario();
    private final WhatIf w = new WhatIf(tin, SupplyKind.CURRENT_DENSITY, "Sn2+", TinRun.lib());

    @Test
    void readsTheScenariosValuesInTheSlidersUnits() {
        // source: the scenario file; 1 A/dm2 = 100 A/m2 (docs/scenario-format.md)
        assertEquals(2.0, w.value(Knob.SUPPLY, tin), 1e-12);
        assertEquals(30.0, w.value(Knob.GAP, tin), 1e-12);
        // 25 g/L given, converted to mol/m3 with 118.71 g/mol and back
        assertEquals(25.0, w.value(Knob.CONCENTRATION, tin), 1e-9);
        assertEquals(25.0, w.value(Knob.TEMPERATURE, tin), 1e-9);
        // source: AgitationPreset STILL, 300 um
        assertEquals(300.0, w.value(Knob.AGITATION, tin), 1e-9);
        for (Knob k : Knob.values()) {
            assertTrue(w.scale(k).covers(w.value(k, tin)), k + " scale covers the loaded value");
        }
    }

    @Test
    void appliesEachSliderThroughTheRecordsWithMethods() throws UnitException {
        // 3 A/dm2 = 300 A/m2 on the 1 dm2 = 0.01 m2 cathode: 3 A
        assertEquals(3.0, w.apply(Knob.SUPPLY, tin, "3 A/dm2").supply().currentA(), 1e-12);
        assertEquals(0.0245, w.apply(Knob.GAP, tin, "24.5 mm").cell().gapM(), 1e-15);
        // 20 g/L of Sn2+ at 118.71 g/mol (CIAAW 2021, as in the library) = 168.478 mol/m3
        assertEquals(20 / 0.11871, w.apply(Knob.CONCENTRATION, tin, "20 g/L").electrolyte()
                .compositionMolPerM3().get("Sn2+"), 1e-9);
        // 40 C = 313.15 K (SI Brochure, 9th ed., 2.3.1)
        assertEquals(313.15, w.apply(Knob.TEMPERATURE, tin, "40 C").electrolyte().temperatureK(), 1e-12);
        Scenario stirred = w.apply(Knob.AGITATION, tin, "120 um");
        assertEquals(120e-6, stirred.cell().agitation().diffusionLayerM(), 1e-18);
        assertNull(stirred.cell().agitation().preset());
        assertEquals(tin.electrolyte(), stirred.electrolyte(), "other parts are untouched");
    }

    @Test
    void theSliderRunsExactlyWhatTheFormThenShowsAndSaves() throws Exception {
        Map<Knob, Integer> positions = Map.of(Knob.SUPPLY, 700, Knob.GAP, 150, Knob.CONCENTRATION, 333,
                Knob.TEMPERATURE, 612, Knob.AGITATION, 901);
        for (Knob k : Knob.values()) {
            String text = w.textAt(k, positions.get(k));
            Scenario viaSlider = w.apply(k, tin, text);
            ScenarioDraft d = ScenarioDraft.parse(ScenarioTemplate.defaultTemplate().text(), "tin.toml");
            w.writeTo(d, k, text);
            DraftCheck.Outcome viaForm = DraftCheck.draft(d, TinRun.lib(), "tin.toml");
            assertTrue(viaForm.ok(), k + " " + text + ": " + viaForm);
            assertEquals(viaSlider, viaForm.scenario(), k + " at " + text);
        }
    }

    @Test
    void valuesAreWrittenWithThreeSignificantDigits() {
        assertEquals("24.5 mm", w.text(Knob.GAP, 24.4999));
        assertEquals("40 C", w.text(Knob.TEMPERATURE, 40.0));
        assertEquals("0.123 A/dm2", w.text(Knob.SUPPLY, 0.12345));
        assertEquals("1230 um", w.text(Knob.AGITATION, 1234.5));
    }

    @Test
    void aScheduleHasNoSingleSetValue() {
        WhatIf s = new WhatIf(tin, SupplyKind.SCHEDULE, null, TinRun.lib());
        assertFalse(s.enabled(Knob.SUPPLY));
        assertFalse(s.enabled(Knob.CONCENTRATION));
        assertTrue(s.enabled(Knob.GAP));
        assertThrows(IllegalArgumentException.class, () -> s.apply(Knob.SUPPLY, tin, "3 V"));
    }

    @Test
    void voltageControlSetsTheVoltage() throws UnitException {
        Scenario cv = tin.withSupply(tin.supply().withVoltage(2.4));
        WhatIf v = new WhatIf(cv, SupplyKind.VOLTAGE, "Sn2+", TinRun.lib());
        assertEquals("V", v.unit(Knob.SUPPLY));
        assertEquals(2.4, v.value(Knob.SUPPLY, cv), 1e-12);
        assertEquals(3.1, v.apply(Knob.SUPPLY, cv, "3.1 V").supply().voltageV(), 1e-12);
    }

    @Test
    void describesARunByItsSliderValues() {
        assertEquals("2 A/dm2, gap 30 mm, Sn2+ 25 g/L, 25 C, layer 300 um", WhatIf.describe(tin, TinRun.lib(), "Sn2+"));
    }
}
