package org.cellwright.io;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Reads "number unit" text ("2.5 A/dm2", "25 C", "0.8 L", "35mm") into SI values, for the closed list of
 * units in {@link UnitCatalog}. A bare number is taken in the SI unit of the expected dimension.
 *
 * <p>Errors say what is wrong and carry the 1-based column within the text: an unknown unit with the closest
 * unit of the expected dimension ("unit 'A/dm' is not a current density; did you mean 'A/dm2'?"), a unit
 * of another dimension ("expected a current, got a voltage 'V'"), or text that is not a number.
 */
public final class UnitParser {

    private UnitParser() {
    }

    /**
     * Parses a value of one dimension.
     *
     * @param text the value as written
     * @param expected the dimension it must have
     * @return the value in SI units
     * @throws UnitException when the text is not a number with a unit of that dimension
     */
    public static Quantity parse(String text, Dimension expected) throws UnitException {
        return parse(text, expected.description(), List.of(expected));
    }

    /**
     * Parses a concentration written as amount per volume (mol/L, M, mmol/L, mol/m3) or, given the molar
     * mass of the species, as mass per volume (g/L, mg/L, ppm, oz/gal, kg/m3).
     *
     * @param text the value as written; a bare number is mol/m3
     * @param molarMassKgPerMol molar mass of the species (kg/mol), or NaN when unknown (then a mass-based
     *     unit is an error)
     * @return the concentration (mol/m3)
     * @throws UnitException when the text is not a concentration or the molar mass is needed but unknown
     */
    public static double concentration(String text, double molarMassKgPerMol) throws UnitException {
        Quantity q = parse(text, "a concentration",
                List.of(Dimension.AMOUNT_CONCENTRATION, Dimension.MASS_CONCENTRATION));
        if (q.dimension() == Dimension.AMOUNT_CONCENTRATION) {
            return q.si();
        }
        if (!(molarMassKgPerMol > 0)) {
            throw new UnitException("a mass concentration in " + q.unit()
                    + " needs the molar mass of the species; give it in mol/L instead", unitColumn(text));
        }
        return q.si() / molarMassKgPerMol;
    }

    /**
     * Parses a value that may have any of several dimensions.
     *
     * @param text the value as written
     * @param description what is expected, for messages ("a concentration")
     * @param accepted the accepted dimensions; a bare number is read in the SI unit of the first
     * @return the value in SI units, with the dimension it turned out to have
     * @throws UnitException when the text is not a number with an accepted unit
     */
    public static Quantity parse(String text, String description, List<Dimension> accepted)
            throws UnitException {
        if (text == null || text.isBlank()) {
            throw new UnitException("the value is empty; expected " + description + examples(accepted), 1);
        }
        int start = firstNonBlank(text);
        int end = numberEnd(text, start);
        if (end == start) {
            throw new UnitException("'" + text.strip() + "' is not a number with a unit; expected "
                    + description + examples(accepted), start + 1);
        }
        if (end < text.length() - 1 && text.charAt(end) == ',' && Character.isDigit(text.charAt(end + 1))) {
            throw new UnitException("write the decimal separator as '.', not ','", end + 1);
        }
        double number = Double.parseDouble(text.substring(start, end));
        if (!Double.isFinite(number)) {
            throw new UnitException("the number is too large", start + 1);
        }
        String unitText = text.substring(end).strip();
        if (unitText.isEmpty()) {
            return new Quantity(number, accepted.get(0), "");
        }
        int unitColumn = firstNonBlank(text, end) + 1;
        Optional<Unit> unit = UnitCatalog.find(unitText);
        if (unit.isEmpty()) {
            List<String> symbols = symbols(accepted);
            String hint = Spelling.closest(unitText, symbols).map(s -> "; did you mean '" + s + "'?")
                    .orElse("; use one of " + String.join(", ", symbols));
            throw new UnitException("unit '" + unitText + "' is not " + description + hint, unitColumn);
        }
        Unit u = unit.get();
        if (!accepted.contains(u.dimension())) {
            throw new UnitException("expected " + description + ", got " + u.dimension().description() + " '"
                    + unitText + "'", unitColumn);
        }
        return new Quantity(u.toSi(number), u.dimension(), u.symbol());
    }

    /** @return the 1-based column where the unit part of {@code text} begins (1 when there is none) */
    static int unitColumn(String text) {
        int start = firstNonBlank(text);
        int end = numberEnd(text, start);
        return end == start ? start + 1 : firstNonBlank(text, end) + 1;
    }

    private static String examples(List<Dimension> accepted) {
        return " such as '" + accepted.stream().map(Dimension::example).collect(Collectors.joining("' or '")) + "'";
    }

    private static List<String> symbols(List<Dimension> accepted) {
        return accepted.stream().flatMap(d -> UnitCatalog.of(d).stream()).map(Unit::symbol).toList();
    }

    private static int firstNonBlank(String s) {
        return firstNonBlank(s, 0);
    }

    private static int firstNonBlank(String s, int from) {
        int i = from;
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        return i;
    }

    /** Scans [sign] digits [. digits] [e [sign] digits]; returns the index after the number, or start. */
    private static int numberEnd(String s, int start) {
        int i = start;
        if (i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < s.length() && Character.isDigit(s.charAt(i))) {
            i++;
            digits++;
        }
        if (i < s.length() && s.charAt(i) == '.') {
            i++;
            while (i < s.length() && Character.isDigit(s.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return start;
        }
        if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            int j = i + 1;
            if (j < s.length() && (s.charAt(j) == '+' || s.charAt(j) == '-')) {
                j++;
            }
            int expStart = j;
            while (j < s.length() && Character.isDigit(s.charAt(j))) {
                j++;
            }
            if (j > expStart) {
                i = j;
            }
        }
        return i;
    }
}
