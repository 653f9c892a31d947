package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Conversion factors of the unit parser against NIST SP 811 (2008 ed.), Appendix B, and its error
 * messages.
 *
 * <p>NIST prints inexact factors to 7 significant digits, so those are compared with a tolerance of half a
 * unit in the 7th printed digit ({@link #printed(double, double)}); factors NIST marks exact, and SI-prefix
 * factors, are compared to 1e-15 relative (a few ulps of double arithmetic).
 */
class UnitParserTest {

    private static final double EXACT = 1.0e-15;

    private static double si(String text, Dimension d) throws UnitException {
        return UnitParser.parse(text, d).si();
    }

    /** Tolerance of a 7-digit printed factor: half a unit in its last digit. */
    private static double printed(double value, double unitInLastDigit) {
        return 0.5 * unitInLastDigit + Math.ulp(value);
    }

    private static void assertExact(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * EXACT, () -> "expected " + expected + ", got " + actual);
    }

    @Test
    void englishAreaAndCurrentDensity() throws UnitException {
        // source: NIST SP 811 (2008), Appendix B.9, Area: square foot (ft2) = 9.290304 E-02 m2, exact
        // (from memory of the printed table)
        assertExact(9.290304e-2, si("1 ft2", Dimension.AREA));
        // source: NIST SP 811 (2008), Appendix B.9, Area: square inch (in2) = 6.4516 E-04 m2, exact (from memory)
        assertExact(6.4516e-4, si("1 in2", Dimension.AREA));
        // source: derived from NIST SP 811 (2008), Appendix B.9, ft2 = 9.290304 E-02 m2 exactly:
        // 1 A/ft2 = 1 / 0.09290304 A/m2 = 10.763910416709722 A/m2
        assertExact(10.763910416709722, si("1 A/ft2", Dimension.CURRENT_DENSITY));
        assertExact(10.763910416709722 * 20, si("20 ASF", Dimension.CURRENT_DENSITY));
    }

    @Test
    void englishLengthVolumeMassAndFlow() throws UnitException {
        // source: NIST SP 811 (2008), Appendix B.9, Length: inch (in) = 2.54 E-02 m, exact (from memory)
        assertExact(2.54e-2, si("1 in", Dimension.LENGTH));
        // source: NIST SP 811 (2008), Appendix B.9, Volume: gallon [U.S.] (gal) = 3.785412 E-03 m3 (from memory)
        assertEquals(3.785412e-3, si("1 gal", Dimension.VOLUME), printed(3.785412e-3, 1.0e-9));
        // source: NIST SP 811 (2008), Appendix B.9, Mass: ounce (avoirdupois) (oz) = 2.834952 E-02 kg (from memory)
        assertEquals(2.834952e-2, si("1 oz", Dimension.MASS), printed(2.834952e-2, 1.0e-8));
        // source: NIST SP 811 (2008), Appendix B.9, Mass: pound (avoirdupois) (lb) = 4.535924 E-01 kg (from memory)
        assertEquals(4.535924e-1, si("1 lb", Dimension.MASS), printed(4.535924e-1, 1.0e-7));
        // source: NIST SP 811 (2008), Appendix B.9, Mass divided by volume: ounce (avoirdupois) per gallon [U.S.]
        // = 7.489152 E+00 kg/m3 (from memory)
        assertEquals(7.489152, si("1 oz/gal", Dimension.MASS_CONCENTRATION), printed(7.489152, 1.0e-6));
        // source: NIST SP 811 (2008), Appendix B.9, Volume divided by time: gallon [U.S.] per minute (gpm)
        // = 6.309020 E-05 m3/s (from memory)
        assertEquals(6.309020e-5, si("1 gpm", Dimension.VOLUME_FLOW), printed(6.309020e-5, 1.0e-11));
        assertEquals(6.309020e-5, si("1 gal/min", Dimension.VOLUME_FLOW), printed(6.309020e-5, 1.0e-11));
    }

    @Test
    void litreTimeAndTemperature() throws UnitException {
        // source: NIST SP 811 (2008), Appendix B.9, Volume: liter (L) = 1.0 E-03 m3, exact
        assertExact(0.8e-3, si("0.8 L", Dimension.VOLUME));
        assertExact(250e-6, si("250 mL", Dimension.VOLUME));
        // source: NIST SP 811 (2008), Appendix B.9, Volume divided by time: liter per minute = 1.666667 E-05 m3/s
        // (from memory)
        assertEquals(1.666667e-5, si("1 L/min", Dimension.VOLUME_FLOW), printed(1.666667e-5, 1.0e-11));
        // source: NIST SP 811 (2008), Appendix B.9, Time: minute (min) = 6.0 E+01 s, hour (h) = 3.6 E+03 s,
        // day (d) = 8.64 E+04 s, exact
        assertExact(90, si("1.5 min", Dimension.TIME));
        assertExact(14400, si("4 h", Dimension.TIME));
        assertExact(86400, si("1 d", Dimension.TIME));
        // source: NIST SP 811 (2008), Appendix B.9, Temperature: T/K = t/degC + 273.15, exact
        assertEquals(298.15, si("25 C", Dimension.TEMPERATURE), 1.0e-12);
        assertEquals(273.15, si("0 C", Dimension.TEMPERATURE), 1.0e-12);
        assertEquals(233.15, si("-40 °C", Dimension.TEMPERATURE), 1.0e-12);
        assertEquals(298.0, si("298 K", Dimension.TEMPERATURE), 0.0);
    }

    @ParameterizedTest
    @CsvSource({
        // source: SI prefixes, NIST SP 811 (2008), Table 5 (milli = 1e-3, centi = 1e-2, deci = 1e-1, micro = 1e-6);
        // 1 A/dm2 = 100 A/m2 = 10 mA/cm2 as in the project's physics reference sheet
        "2.5 A/dm2, CURRENT_DENSITY, 250",
        "25 mA/cm2, CURRENT_DENSITY, 250",
        "0.5 kA/m2, CURRENT_DENSITY, 500",
        "300 mA, CURRENT, 0.3",
        "850 mV, VOLTAGE, 0.85",
        "35 mm, LENGTH, 0.035",
        "3.5 cm, LENGTH, 0.035",
        "150 um, LENGTH, 1.5e-4",
        "150 µm, LENGTH, 1.5e-4",
        "150 μm, LENGTH, 1.5e-4",
        "1.2 dm2, AREA, 0.012",
        "120 cm2, AREA, 0.012",
        "1.2 dm², AREA, 0.012",
        "5 mohm, RESISTANCE, 0.005",
        "5 mΩ, RESISTANCE, 0.005",
        "2 Ω, RESISTANCE, 2",
        "450 mS/cm, CONDUCTIVITY, 45",
        "45 S/m, CONDUCTIVITY, 45",
        "1.5 W/K, HEAT_CONDUCTANCE, 1.5",
        "7.2e-10 m2/s, DIFFUSIVITY, 7.2e-10",
        "7.2e-6 cm2/s, DIFFUSIVITY, 7.2e-10",
        "107.2 S cm2/mol, MOLAR_CONDUCTIVITY, 0.01072",
        "107.2 S·cm²/mol, MOLAR_CONDUCTIVITY, 0.01072",
        "100 g, MASS, 0.1",
        "118.71 g/mol, MOLAR_MASS, 0.11871",
        "1.5 mol/L, AMOUNT_CONCENTRATION, 1500",
        "1.5 M, AMOUNT_CONCENTRATION, 1500",
        "20 mmol/L, AMOUNT_CONCENTRATION, 20",
        "40 g/L, MASS_CONCENTRATION, 40",
        "500 ppm, MASS_CONCENTRATION, 0.5",
        "500 mg/L, MASS_CONCENTRATION, 0.5",
        "35mm, LENGTH, 0.035",
        "2.5E-3 m, LENGTH, 0.0025",
        "0.8 l, VOLUME, 8e-4",
        "3 ma, CURRENT, 0.003",
        "20 asf, CURRENT_DENSITY, 215.27820833419443",
        "2 kA, CURRENT, 2000",
        "0.5 A/cm2, CURRENT_DENSITY, 5000",
        "2 dm3, VOLUME, 0.002",
        "5 cm3, VOLUME, 5e-6",
        "50 mm2, AREA, 5e-5",
        "250 mg, MASS, 2.5e-4",
        "1.5 kg, MASS, 1.5",
        "0.12 kg/mol, MOLAR_MASS, 0.12",
        "1 S/cm, CONDUCTIVITY, 100",
        "1400 uS/cm, CONDUCTIVITY, 0.14",
        "60 L/h, VOLUME_FLOW, 1.6666666666666667e-5",
        "5 mS m2/mol, MOLAR_CONDUCTIVITY, 0.005",
        "2 kg/m3, MASS_CONCENTRATION, 2",
        "3 mol/m3, AMOUNT_CONCENTRATION, 3",
        "1 m3/s, VOLUME_FLOW, 1",
    })
    void metricUnits(String text, Dimension d, double expected) throws UnitException {
        assertExact(expected, si(text, d));
    }

    @Test
    void bareNumbersAreSi() throws UnitException {
        assertEquals(3.0, si("3", Dimension.CURRENT), 0.0);
        assertEquals(8.0e-4, si("8e-4", Dimension.VOLUME), 0.0);
        assertEquals(298.15, si("298.15", Dimension.TEMPERATURE), 0.0);
        assertEquals("", UnitParser.parse("3", Dimension.CURRENT).unit());
    }

    @Test
    void everyCatalogUnitReadsItsOwnSymbol() throws UnitException {
        for (Unit u : UnitCatalog.all()) {
            Quantity q = UnitParser.parse("2 " + u.symbol(), u.dimension());
            assertEquals(u.toSi(2), q.si(), 0.0, u.symbol());
            assertEquals(u.symbol(), q.unit());
        }
    }

    @Test
    void massConcentrationsNeedTheMolarMass() throws UnitException {
        // 40 g/L of Sn2+ with M = 118.71 g/mol (IUPAC standard atomic weight of tin) is 336.96 mol/m3
        assertExact(40.0 / 0.11871, UnitParser.concentration("40 g/L", 0.11871));
        assertExact(0.1 / 0.063546, UnitParser.concentration("100 ppm", 0.063546));
        assertExact(1500, UnitParser.concentration("1.5 mol/L", Double.NaN));
        UnitException e = assertThrows(UnitException.class, () -> UnitParser.concentration("40 g/L", Double.NaN));
        assertTrue(e.getMessage().contains("needs the molar mass"), e.getMessage());
        assertEquals(4, e.column());
    }

    @Test
    void unknownUnitSuggestsTheClosestOfTheExpectedDimension() {
        UnitException e = assertThrows(UnitException.class, () -> si("3 A/dm", Dimension.CURRENT_DENSITY));
        assertEquals("unit 'A/dm' is not a current density; did you mean 'A/dm2'?", e.getMessage());
        assertEquals(3, e.column());
    }

    @Test
    void unknownUnitWithoutNeighbourListsTheUnits() {
        UnitException e = assertThrows(UnitException.class, () -> si("  3 furlong", Dimension.LENGTH));
        assertTrue(e.getMessage().startsWith("unit 'furlong' is not a length; use one of m, cm, mm"), e.getMessage());
        assertEquals(5, e.column());
    }

    @Test
    void unitOfAnotherDimensionIsNamed() {
        UnitException e = assertThrows(UnitException.class, () -> si("2.2 V", Dimension.CURRENT));
        assertEquals("expected a current, got a voltage 'V'", e.getMessage());
        assertEquals(5, e.column());
        UnitException c = assertThrows(UnitException.class, () -> UnitParser.concentration("3 A", 0.1));
        assertEquals("expected a concentration, got a current 'A'", c.getMessage());
    }

    @Test
    void notANumber() {
        UnitException e = assertThrows(UnitException.class, () -> si(" abc", Dimension.CURRENT));
        assertTrue(e.getMessage().startsWith("'abc' is not a number with a unit; expected a current"), e.getMessage());
        assertEquals(2, e.column());
        UnitException empty = assertThrows(UnitException.class, () -> si("  ", Dimension.CURRENT));
        assertTrue(empty.getMessage().startsWith("the value is empty"), empty.getMessage());
        UnitException comma = assertThrows(UnitException.class, () -> si("0,8 L", Dimension.VOLUME));
        assertEquals("write the decimal separator as '.', not ','", comma.getMessage());
        assertEquals(2, comma.column());
        UnitException huge = assertThrows(UnitException.class, () -> si("1e999 A", Dimension.CURRENT));
        assertEquals("the number is too large", huge.getMessage());
    }

    @Test
    void exactCaseWinsOverCaseFolding() throws UnitException {
        // "M" (molar) and "m" (metre) fold to the same letters; the exact symbol decides
        assertEquals(1000.0, si("1 M", Dimension.AMOUNT_CONCENTRATION), 0.0);
        assertEquals(1.0, si("1 m", Dimension.LENGTH), 0.0);
        UnitException e = assertThrows(UnitException.class, () -> si("1 m", Dimension.AMOUNT_CONCENTRATION));
        assertEquals("expected an amount concentration, got a length 'm'", e.getMessage());
    }
}
