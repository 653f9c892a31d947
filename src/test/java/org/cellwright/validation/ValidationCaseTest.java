package org.cellwright.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The validation case's verdict and its printing: a case outside its tolerance fails, noise does not show. */
class ValidationCaseTest {

    @Test
    void aCaseOutsideItsToleranceFails() {
        assertTrue(ValidationCase.relative("a", "c", "s", "V", 2.0, 2.009, 0.005, 3).passes());
        assertFalse(ValidationCase.relative("a", "c", "s", "V", 2.0, 2.011, 0.005, 3).passes());
        assertFalse(ValidationCase.absolute("a", "c", "s", "V", 0.5, 0.5021, 2e-3, 3).passes());
        assertTrue(ValidationCase.range("a", "c", "s", "V", 1.8, 2.2, 2.2, 3).passes());
        assertFalse(ValidationCase.range("a", "c", "s", "V", 1.8, 2.2, 2.21, 3).passes());
        assertFalse(ValidationCase.relative("a", "c", "s", "V", 2.0, Double.NaN, 0.005, 3).passes());
    }

    @Test
    void errorsArePrintedStably() {
        ValidationCase rel = ValidationCase.relative("a", "c", "s", "mol/m3", 0.6977, 0.69738, 0.005, 4);
        assertEquals("0.6977 mol/m3", rel.expectedText());
        assertEquals("0.6974 mol/m3", rel.actualText());
        assertEquals("-0.046 %", rel.errorText());
        assertEquals("± 0.50 %", rel.toleranceText());
        // round-off far below the tolerance is printed as a bound, not as digits that change with the platform
        ValidationCase noise = ValidationCase.relative("a", "c", "s", "g", 118.549, 118.549 * (1 + 3e-15), 1e-9, 6);
        assertEquals("< 1e-09 %", noise.errorText());
        ValidationCase range = ValidationCase.range("a", "c", "s", "V", 3.3, 3.5, 3.55, 3);
        assertEquals("3.30 to 3.50 V", range.expectedText());
        assertEquals("+0.050 V outside", range.errorText());
        assertEquals("inside", ValidationCase.range("a", "c", "s", "", 0.89, 0.92, 0.907, 3).errorText());
    }

    @Test
    void significantFiguresCarryOverADecade() {
        assertEquals("10.0", ValidationCase.sig(9.996, 3));
        assertEquals("0.00100", ValidationCase.sig(0.001, 3));
        assertEquals("1.34e-05", ValidationCase.sig(1.34e-5, 3));
        assertEquals("-0.046", ValidationCase.sig(-0.04612, 2));
    }

    @Test
    void theReportNamesEveryCaseAndTheCommandThatWritesIt() {
        String page = ValidationReport.render(List.of(
                ValidationCase.relative("Faraday", "copper | deposit", "CODATA", "g", 1.0, 1.0, 1e-9, 4)));
        assertTrue(page.contains(ValidationReport.REGENERATE));
        assertTrue(page.contains("| Faraday | copper \\| deposit | CODATA | 1.000 g | 1.000 g |"), page);
        assertTrue(page.contains("Cases: 1, passing: 1."));
    }
}
