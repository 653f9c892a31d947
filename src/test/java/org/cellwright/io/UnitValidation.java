package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.validation.ValidationCase;

/**
 * The English units of the scenario files against NIST SP 811 (2008), Appendix B.9, as in
 * {@link UnitParserTest}, for the validation report (docs/validation.md): the conversions a plater meets.
 */
public final class UnitValidation {

    private UnitValidation() {
    }

    private static double si(String text, Dimension d) {
        try {
            return UnitParser.parse(text, d).si();
        } catch (UnitException e) {
            throw new IllegalStateException(text, e);
        }
    }

    /** @return the unit cases, freshly computed */
    public static List<ValidationCase> cases() {
        List<ValidationCase> out = new ArrayList<>();
        String source = "NIST SP 811 (2008), Appendix B.9 (from memory)";
        // source: NIST SP 811 (2008), B.9: ft2 = 9.290304e-2 m2 exactly, so 1 A/ft2 = 10.763910 A/m2; 1e-15
        // (an exact definition)
        out.add(ValidationCase.relative("Units", "1 ASF (ampere per square foot)", source + "; ft2 exact", "A/m2",
                1 / 0.09290304, si("1 ASF", Dimension.CURRENT_DENSITY), 1e-15, 8));
        // source: NIST SP 811, B.9: gallon [U.S.] = 3.785412e-3 m3, printed to 7 digits: half a unit in the last
        out.add(ValidationCase.absolute("Units", "1 gal (U.S.)", source, "L", 3.785412,
                1e3 * si("1 gal", Dimension.VOLUME), 0.5e-6, 7));
        // source: NIST SP 811, B.9: ounce (avoirdupois) per gallon [U.S.] = 7.489152 kg/m3, printed to 7 digits
        out.add(ValidationCase.absolute("Units", "1 oz/gal (avoirdupois per U.S. gallon)", source, "g/L", 7.489152,
                si("1 oz/gal", Dimension.MASS_CONCENTRATION), 0.5e-6, 7));
        return out;
    }
}
