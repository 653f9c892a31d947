package org.cellwright.io;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes SI values as readable "number unit" text that reads back to exactly the same double.
 *
 * <p>For each preferred unit in turn the shortest decimal (fewest significant digits) that parses back to
 * the identical SI value is found; the first unit that needs at most {@value #READABLE_DIGITS} digits wins.
 * Otherwise the preferred unit needing the fewest digits is used (at most 17, which always round-trips a
 * double), and the SI unit as a last resort.
 */
final class QuantityFormat {

    /** Most significant digits a value may need in a unit before a later preferred unit is tried. */
    static final int READABLE_DIGITS = 6;

    /** A unit to try, and the factor the parsed SI value is divided by (a molar mass for g/L, else 1). */
    private record Way(Unit unit, double divisor) {
    }

    /** A candidate text, the number of significant digits it needed and the way it was made. */
    private record Text(String text, int digits, Way way) {
    }

    private QuantityFormat() {
    }

    /**
     * @param si the value in SI units
     * @param dimension its dimension
     * @param preferred unit symbols to try, most readable first
     * @return text such as "0.8 L" that {@link UnitParser} reads back to {@code si} exactly
     */
    static String format(double si, Dimension dimension, List<String> preferred) {
        List<Way> ways = new ArrayList<>();
        preferred.forEach(symbol -> ways.add(new Way(UnitCatalog.symbol(symbol), 1)));
        UnitCatalog.of(dimension).stream().filter(u -> u.factor() == 1 && u.offset() == 0).findFirst()
                .ifPresent(u -> ways.add(new Way(u, 1)));
        return choose(si, ways);
    }

    /**
     * @param molPerM3 a concentration (mol/m3)
     * @param molarMassKgPerMol the species' molar mass (kg/mol), or NaN when unknown (then only amount units)
     * @return text in mol/L, g/L, mmol/L or mg/L, whichever is readable, that reads back exactly
     */
    static String concentration(double molPerM3, double molarMassKgPerMol) {
        boolean mass = molarMassKgPerMol > 0;
        List<Way> ways = new ArrayList<>();
        ways.add(new Way(UnitCatalog.symbol("mol/L"), 1));
        if (mass) {
            ways.add(new Way(UnitCatalog.symbol("g/L"), molarMassKgPerMol));
        }
        ways.add(new Way(UnitCatalog.symbol("mmol/L"), 1));
        if (mass) {
            ways.add(new Way(UnitCatalog.symbol("mg/L"), molarMassKgPerMol));
        }
        ways.add(new Way(UnitCatalog.symbol("mol/m3"), 1));
        return choose(molPerM3, ways);
    }

    private static String choose(double si, List<Way> ways) {
        Text best = null;
        for (Way way : ways) {
            Text t = shortest(si, way);
            if (t != null && t.digits() <= READABLE_DIGITS) {
                return verified(t.text(), si, t.way());
            }
            if (t != null && (best == null || t.digits() < best.digits())) {
                best = t;
            }
        }
        if (best == null) {
            throw new IllegalStateException("cannot write " + si + " so that it reads back exactly");
        }
        return verified(best.text(), si, best.way());
    }

    /** Checks with the parser itself that a chosen text reads back to the value. */
    private static String verified(String text, double si, Way way) {
        try {
            double back = UnitParser.parse(text, way.unit().dimension()).si() / way.divisor();
            if (Double.compare(back, si) != 0) {
                throw new IllegalStateException(text + " reads back as " + back + ", not " + si);
            }
            return text;
        } catch (UnitException e) {
            throw new IllegalStateException("writer produced unreadable text " + text, e);
        }
    }

    private static Text shortest(double si, Way way) {
        double v = way.unit().fromSi(si * way.divisor());
        if (!Double.isFinite(v)) {
            return null;
        }
        BigDecimal exact = new BigDecimal(v);
        for (int digits = 1; digits <= 17; digits++) {
            String number = number(exact, digits);
            // the same arithmetic as UnitParser: parse the number, map it to SI, divide by the molar mass
            double back = way.unit().toSi(Double.parseDouble(number)) / way.divisor();
            if (Double.compare(back, si) == 0) {
                return new Text(number + " " + way.unit().symbol(), digits, way);
            }
        }
        return null;
    }

    /** @return {@code v} rounded to {@code digits} significant digits, plain or with an exponent */
    static String number(double v, int digits) {
        return number(new BigDecimal(v), digits);
    }

    private static String number(BigDecimal v, int digits) {
        if (v.signum() == 0) {
            return "0";
        }
        BigDecimal bd = v.round(new MathContext(digits)).stripTrailingZeros();
        double magnitude = Math.abs(bd.doubleValue());
        if (magnitude >= 1.0e-4 && magnitude < 1.0e7) {
            return bd.toPlainString();
        }
        return bd.toString().toLowerCase(Locale.ROOT).replace("e+", "e");
    }

    /** @return a TOML float that reads back exactly, for dimensionless values */
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
