package org.cellwright.io;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;

/**
 * Writes SI values as readable "number unit" text that reads back to exactly the same double.
 *
 * <p>For each preferred unit in turn the shortest decimal (fewest significant digits) that parses back to
 * the identical SI value is found; the first unit that needs at most {@value #READABLE_DIGITS} digits wins.
 * Otherwise the value is written in its SI unit with as many digits as it needs (at most 17, which always
 * round-trips a double).
 */
final class QuantityFormat {

    /** Most significant digits a value may need in a preferred unit before the SI unit is used instead. */
    static final int READABLE_DIGITS = 6;

    private QuantityFormat() {
    }

    /**
     * @param si the value in SI units
     * @param dimension its dimension
     * @param preferred unit symbols to try, most readable first
     * @return text such as "0.8 L" that {@link UnitParser} reads back to {@code si} exactly
     */
    static String format(double si, Dimension dimension, List<String> preferred) {
        for (String symbol : preferred) {
            String text = shortest(si, UnitCatalog.symbol(symbol), dimension, READABLE_DIGITS);
            if (text != null) {
                return text;
            }
        }
        Unit siUnit = UnitCatalog.of(dimension).stream().filter(u -> u.factor() == 1 && u.offset() == 0)
                .findFirst().orElseThrow();
        String text = shortest(si, siUnit, dimension, 17);
        if (text == null) {
            throw new IllegalStateException("cannot write " + si + " " + siUnit.symbol() + " exactly");
        }
        return text;
    }

    /** @return a concentration (mol/m3) as text, in mol/L when readable */
    static String concentration(double molPerM3) {
        return format(molPerM3, Dimension.AMOUNT_CONCENTRATION, List.of("mol/L", "mmol/L"));
    }

    private static String shortest(double si, Unit unit, Dimension dimension, int maxDigits) {
        double v = unit.fromSi(si);
        if (!Double.isFinite(v)) {
            return null;
        }
        for (int digits = 1; digits <= maxDigits; digits++) {
            String text = number(v, digits) + " " + unit.symbol();
            try {
                if (Double.compare(UnitParser.parse(text, dimension).si(), si) == 0) {
                    return text;
                }
            } catch (UnitException e) {
                throw new IllegalStateException("writer produced unreadable text " + text, e);
            }
        }
        return null;
    }

    /** @return {@code v} rounded to {@code digits} significant digits, plain or with an exponent */
    static String number(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        BigDecimal bd = new BigDecimal(v).round(new MathContext(digits)).stripTrailingZeros();
        double magnitude = Math.abs(bd.doubleValue());
        if (magnitude >= 1.0e-4 && magnitude < 1.0e7) {
            return bd.toPlainString();
        }
        return bd.toString().toLowerCase(Locale.ROOT).replace("e+", "e");
    }

    /** @return a plain number that reads back exactly, for dimensionless values */
    static String plain(double v) {
        for (int digits = 1; digits <= 17; digits++) {
            String text = number(v, digits);
            if (Double.parseDouble(text) == v) {
                return text.contains(".") || text.contains("e") ? text : text + ".0";
            }
        }
        return Double.toString(v);
    }
}
