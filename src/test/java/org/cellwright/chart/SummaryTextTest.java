package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** How the printed summary writes deposit masses and purities (common practice of assay reports). */
class SummaryTextTest {

    @Test
    void massesReadInGramsMilligramsOrMicrograms() {
        assertEquals("8021 g", SummaryText.mass(8.0212));
        assertEquals("14.50 g", SummaryText.mass(0.014502));
        assertEquals("0.07450 g", SummaryText.mass(7.45e-5), "10 mg and above stay in grams");
        assertEquals("3.55 mg", SummaryText.mass(3.55e-6));
        assertEquals("0.42 ug", SummaryText.mass(4.2e-10));
    }

    @Test
    void puritySaysTracesInPpmAndNeverRoundsAnImpureMetalToAHundredPercent() {
        assertEquals("99.964 %", SummaryText.massFraction(0.99964));
        assertEquals("> 99.999 %", SummaryText.massFraction(0.9999949));
        assertEquals("5.1 ppm", SummaryText.massFraction(5.1e-6));
        assertEquals("0.036 %", SummaryText.massFraction(3.6e-4));
    }
}
