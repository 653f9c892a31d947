package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.study.AxisValue;
import org.cellwright.study.SweepAxis;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The --vary option: ranges with units, log ranges, lists, and clear errors. */
class SweepAxisParserTest {

    private static List<String> texts(SweepAxis a) {
        return a.values().stream().map(AxisValue::text).toList();
    }

    @Test
    void aRangeWithUnitsOnBothEnds() {
        SweepAxis a = SweepAxisParser.parse("cell.gap=20mm:60mm:5");
        assertEquals("cell.gap", a.key());
        assertEquals("mm", a.unit());
        assertEquals(List.of("20 mm", "30 mm", "40 mm", "50 mm", "60 mm"), texts(a));
        // source: 1 mm = 1e-3 m (SI prefix milli)
        assertEquals(0.03, a.values().get(1).si(), 1e-15);
        assertEquals(30.0, a.values().get(1).number());
        assertEquals("cell.gap (mm)", a.label());
        assertFalse(a.logarithmic());
    }

    @Test
    void aBareEndTakesTheOtherEndsUnitAndQuotesAreDropped() {
        SweepAxis a = SweepAxisParser.parse("supply.current_density=\"1:4 A/dm2:4\"");
        assertEquals(List.of("1 A/dm2", "2 A/dm2", "3 A/dm2", "4 A/dm2"), texts(a));
        // source: 1 A/dm2 = 100 A/m2 (1 dm2 = 0.01 m2)
        assertEquals(300.0, a.values().get(2).si(), 1e-12);
    }

    @Test
    void endsInTwoUnitsOfOneDimensionAreWrittenInTheUnitOfTo() {
        SweepAxis a = SweepAxisParser.parse("cell.diffusion_layer=0.1mm:300um:3");
        assertEquals(List.of("100 um", "200 um", "300 um"), texts(a));
        SweepAxis t = SweepAxisParser.parse("electrolyte.temperature=293.15K:40C:3");
        // source: t/C = T/K - 273.15 (SI Brochure 2.3.1): 293.15 K is 20 C
        assertEquals(List.of("20 C", "30 C", "40 C"), texts(t));
        assertEquals(303.15, t.values().get(1).si(), 1e-9);
    }

    @Test
    void aLogRangeIsEvenOnALogScale() {
        SweepAxis a = SweepAxisParser.parse("cell.diffusion_layer=10um:1000um:3:log");
        assertEquals(List.of("10 um", "100 um", "1000 um"), texts(a));
        assertTrue(a.logarithmic());
        SweepAxis b = SweepAxisParser.parse("reaction.H+/H2.i0=1e-4:1e-2:5:log");
        assertEquals("", b.unit());
        assertEquals(1e-3, b.values().get(2).si(), 1e-18);
        assertEquals("0.000316228", b.values().get(1).text());
    }

    @Test
    void sixDigitsAreWrittenAndTheLastValueIsExactlyTo() {
        SweepAxis a = SweepAxisParser.parse("supply.current=0.5:4 A:20");
        assertEquals("0.684211 A", a.values().get(1).text());
        assertEquals("4 A", a.values().get(19).text());
        assertEquals(20, a.size());
    }

    @Test
    void aListOfNumbersWithOneUnitIsNumericAndWordsAreNot() {
        SweepAxis n = SweepAxisParser.parse("cell.gap=10 mm, 25 mm,40 mm");
        assertTrue(n.numeric());
        assertEquals("mm", n.unit());
        assertEquals(0.025, n.values().get(1).si(), 1e-15);
        SweepAxis w = SweepAxisParser.parse("cell.agitation=still,gentle,stirred");
        assertFalse(w.numeric());
        assertEquals(List.of("still", "gentle", "stirred"), texts(w));
        assertEquals(2.0, w.values().get(2).number());
        assertTrue(Double.isNaN(w.values().get(0).si()));
    }

    @ParameterizedTest
    @ValueSource(strings = {"cell.gap", "=1:2:3", "cell.gap=20mm", "cell.gap=20mm:60mm", "cell.gap=20mm:60mm:x",
        "cell.gap=20mm:60mm:1", "cell.gap=20mm:60mm:5000", "cell.gap=20mm:60V:3", "cell.gap=20mm:60mm:3:cubic",
        "cell.gap=0mm:60mm:3:log", "cell.gap=20mm:20mm:3", "cell.gap=20 furlong:60mm:3", "cell.gap=a,,b",
        "cell.gap=a,b,a", "cell.gap=1:1.0000001:10"})
    void badOptionsSayWhatIsWrong(String option) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SweepAxisParser.parse(option));
        assertTrue(e.getMessage().startsWith("--vary " + option + ": "), e.getMessage());
    }
}
