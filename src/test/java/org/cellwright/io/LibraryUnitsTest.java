package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Unit conversions of the library file (exact SI prefixes and definitions). */
class LibraryUnitsTest {

    @Test
    void conversions() {
        // source: SI definitions: 1 A/cm2 = 1e4 A/m2; 1 S cm2/mol = 1e-4 S m2/mol; 1 g/cm3 = 1000 kg/m3
        assertEquals(1e4 * 2.5e-6, LibraryUnits.parse("2.5e-6 A/cm2", LibraryUnits.CURRENT_DENSITY, "A/m2"), 1e-18);
        assertEquals(0.01072, LibraryUnits.parse("107.2 S cm2/mol", LibraryUnits.MOLAR_CONDUCTIVITY, "S cm2/mol"), 1e-15);
        assertEquals(7287, LibraryUnits.parse("7.287 g/cm3", LibraryUnits.DENSITY, "g/cm3"), 1e-9);
        assertEquals(0.11871, LibraryUnits.parse("118.71 g/mol", LibraryUnits.MOLAR_MASS, "g/mol"), 1e-15);
        assertEquals(-3.2e-4, LibraryUnits.parse("-0.32 mV/K", LibraryUnits.POTENTIAL_PER_KELVIN, "mV/K"), 1e-18);
        assertEquals(7.14e-10, LibraryUnits.parse("7.14e-10 m2/s", LibraryUnits.DIFFUSIVITY, "m2/s"), 1e-24);
        assertEquals(7.14e-10, LibraryUnits.parse("7.14e-6 cm^2 s^-1", LibraryUnits.DIFFUSIVITY, "m2/s"), 1e-24);
        // 1 L/(mol s) = 1e-3 m3/(mol s); 1 L2/(mol2 s) = 1e-6 m6/(mol2 s)
        assertEquals(1e3, LibraryUnits.parse("1e6 L/mol/s", LibraryUnits.rateConstant(2), "L/mol/s"), 1e-9);
        assertEquals(5e-6, LibraryUnits.parse("5 L2/mol2/s", LibraryUnits.rateConstant(3), "L2/mol2/s"), 1e-18);
        assertEquals(0.5, LibraryUnits.parse("0.5 s-1", LibraryUnits.rateConstant(1), "s-1"), 1e-15);
        assertEquals(0.3, LibraryUnits.parse("0.3", LibraryUnits.NONE, "(none)"), 0);
    }

    @Test
    void refusals() {
        assertThrows(IllegalArgumentException.class, () -> LibraryUnits.parse("fast", LibraryUnits.NONE, "x"));
        assertThrows(IllegalArgumentException.class, () -> LibraryUnits.parse("1 V", LibraryUnits.CURRENT_DENSITY, "A/m2"));
        assertThrows(IllegalArgumentException.class, () -> LibraryUnits.parse("1 parsec", LibraryUnits.NONE, "x"));
    }
}
