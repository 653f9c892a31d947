package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Fitted values are shown in the trade's units for their key. */
class ParameterUnitTest {

    private static String show(String key, double si) {
        return ParameterUnit.of(key).format(si);
    }

    @Test
    void unitsFollowTheKey() {
        // source: SI prefixes (SI Brochure, 9th ed., table 7): 1 um = 1e-6 m, 1 mohm = 1e-3 ohm
        assertEquals("150 um", show("cell.diffusion_layer", 150e-6));
        assertEquals("19.06 mohm", show("cell.contact_resistance", 0.01906));
        assertEquals("0.00495 A/m2", show("reaction.H+/H2.i0", 4.95e-3));
        // source: SI Brochure, 2.3.1: t/C = T/K - 273.15
        assertEquals("25 C", show("electrolyte.temperature", 298.15));
        // 1 mol/L = 1000 mol/m3; 1 dm2 = 0.01 m2; 1 mS/cm = 0.1 S/m
        assertEquals("0.2106 mol/L", show("electrolyte.composition.\"Sn2+\"", 210.6));
        assertEquals("1.2 dm2", show("cathode.area", 0.012));
        assertEquals("450 mS/cm", show("electrolyte.conductivity", 45));
        assertEquals("3.5e-09", show("zone.exchange_rate", 3.5e-9));
        assertEquals("+inf", show("cell.gap", Double.POSITIVE_INFINITY));
    }
}
