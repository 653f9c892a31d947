package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cellwright.io.Dimension;
import org.cellwright.io.UnitParser;
import org.junit.jupiter.api.Test;

/** Values the window loads into the form read as a person would type them. */
class FormRoundingTest {

    @Test
    void sweepValuesKeepFourSignificantDigits() {
        // the texts of a 10-value sweep of 10-60 mm and 0.5-4 A/dm2 (steps of 50/9 mm and 3.5/9 A/dm2)
        assertEquals("37.78 mm", FormRounding.sweepValue("cell.gap", "37.7778 mm"));
        assertEquals("1.278 A/dm2", FormRounding.sweepValue(FormFields.SUPPLY_VALUE, "1.27778 A/dm2"));
        assertEquals("18.33 g/L", FormRounding.sweepValue(FormFields.COMPOSITION, "18.3333 g/L"));
        // values that need fewer digits stay as they are
        assertEquals("30 mm", FormRounding.sweepValue("cell.gap", "30 mm"));
        assertEquals("0.5 A/dm2", FormRounding.sweepValue(FormFields.SUPPLY_VALUE, "0.5 A/dm2"));
        // words and text without a number are not touched
        assertEquals("sparged", FormRounding.sweepValue(FormFields.AGITATION, "sparged"));
        assertEquals("none", FormRounding.sweepValue("supply.current_limit", "none"));
    }

    @Test
    void theDiffusionLayerIsWrittenInMicrometres() throws Exception {
        // a fitted 44.91 um that the scenario writer wrote in mm (44.91 um does not read back bit for bit)
        assertEquals("44.91 um", FormRounding.derivedValue(FormFields.DIFFUSION_LAYER, "0.04491 mm"));
        // 0.1 mm of a sweep: 100 um
        assertEquals("100 um", FormRounding.sweepValue(FormFields.DIFFUSION_LAYER, "0.1 mm"));
        assertEquals("35.94 um", FormRounding.sweepValue(FormFields.DIFFUSION_LAYER, "0.0359381 mm"));
        // the text reads back within round-off of the value it replaces
        assertEquals(4.491e-5, UnitParser.parse(FormRounding.derivedValue(FormFields.DIFFUSION_LAYER, "0.04491 mm"),
                Dimension.LENGTH).si(), 1e-18);
    }

    @Test
    void aSmallContactResistanceIsWrittenInMilliohms() {
        // the window's fit of the shipped copper log gives 11.88 mohm, written by the scenario writer in ohm
        assertEquals("11.88 mohm", FormRounding.derivedValue("cell.contact_resistance", "0.01188 ohm"));
        assertEquals("2.5 ohm", FormRounding.derivedValue("cell.contact_resistance", "2.5 ohm"));
        assertEquals("0 ohm", FormRounding.derivedValue("cell.contact_resistance", "0 ohm"));
    }

    @Test
    void derivedValuesKeepTheDigitsTheyHaveAndLoseRoundOff() {
        // the writer's exact text of 340/9 mm: 17 digits, which no one types
        assertEquals("37.78 mm", FormRounding.derivedValue("cell.gap", "37.77777777777778 mm"));
        // a fitted value kept at five digits because its interval is narrow stays at five
        assertEquals("12.346 mohm", FormRounding.derivedValue("cell.contact_resistance", "12.346 mohm"));
        // binary round-off of a short decimal is taken away, the decimal kept
        assertEquals("0.3 mol/L", FormRounding.derivedValue(FormFields.COMPOSITION, "0.30000000000000004 mol/L"));
        assertEquals("1e-5 mol/L", FormRounding.derivedValue(FormFields.COMPOSITION, "1e-5 mol/L"));
        assertEquals("2.5e7", FormRounding.significant(2.5e7, 4));
        assertEquals("0.0045", FormRounding.significant(0.0045, 4));
        assertEquals("-1.235e-6", FormRounding.significant(-1.23456e-6, 4));
    }

    @Test
    void aDraftDerivedByTheWindowIsRoundedFieldByField() throws Exception {
        ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
        ScenarioDraft d = ScenarioDraft.parse(t.text(), t.fileName());
        d.set("cell.gap", "37.77777777777778 mm");
        d.set(FormFields.AGITATION, "");
        d.set(FormFields.DIFFUSION_LAYER, "0.04491 mm");
        d.setConcentration("Sn2+", "18.333333333333332 g/L");
        FormRounding.derived(d);
        assertEquals("37.78 mm", d.get("cell.gap"));
        assertEquals("44.91 um", d.get(FormFields.DIFFUSION_LAYER));
        assertTrue(d.composition().stream().anyMatch(r -> r.concentration().equals("18.33 g/L")), d.composition().toString());
    }
}
