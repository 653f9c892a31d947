package org.cellwright.validation;

import java.util.Locale;
import java.util.Objects;

/**
 * One check of Cellwright against the outside world (an analytic solution, a handbook table, a textbook
 * worked example, a standard or a plant figure), computed freshly with the engine: what is checked, its
 * source, the expected value or range, what Cellwright gives, and the tolerance it is held to.
 *
 * <p>Three kinds: a value with a relative tolerance (error shown in per cent), a value with an absolute
 * tolerance (error shown in the value's unit), and a range (a handbook's operating range; error 0 inside,
 * otherwise the distance to the nearer end). Numbers are printed to {@code digits} significant figures, and an
 * error far below its tolerance is printed as a bound, so that floating-point noise does not change the page.
 *
 * @param area what part of the model is checked (Faraday, kinetics, conductivity, ...)
 * @param check what is checked, in words
 * @param source the book and table, paper, standard or plant handbook the expected value comes from
 * @param unit the unit of expected and actual values ("" for a pure number)
 * @param kind how the tolerance is read
 * @param expected the expected value (the middle of a range)
 * @param tolerance relative (fraction) or absolute (unit) tolerance; for a range, half its width
 * @param low the lower end of a range (or of expected - tolerance)
 * @param high the upper end of a range (or of expected + tolerance)
 * @param actual what Cellwright gives
 * @param digits significant figures for expected and actual values
 */
public record ValidationCase(String area, String check, String source, String unit, Kind kind, double expected,
                             double tolerance, double low, double high, double actual, int digits) {

    /** How a case's tolerance is read. */
    public enum Kind { RELATIVE, ABSOLUTE, RANGE }

    /**
     * Errors smaller than this share of the tolerance are printed as a bound: they are round-off, or at least
     * far inside the tolerance, and printing them would make the page change with floating-point noise.
     */
    private static final double NOISE_SHARE = 1e-2;

    public ValidationCase {
        Objects.requireNonNull(area);
        Objects.requireNonNull(check);
        Objects.requireNonNull(source);
        Objects.requireNonNull(unit);
        Objects.requireNonNull(kind);
        if (!(tolerance > 0) || !(low <= high) || digits < 1) {
            throw new IllegalArgumentException("bad tolerance for " + check);
        }
    }

    /** A value held to a relative tolerance (a fraction: 0.005 is 0.5 %). */
    public static ValidationCase relative(String area, String check, String source, String unit, double expected,
                                          double actual, double tolerance, int digits) {
        double a = Math.abs(expected) * tolerance;
        return new ValidationCase(area, check, source, unit, Kind.RELATIVE, expected, tolerance, expected - a,
                expected + a, actual, digits);
    }

    /** A value held to an absolute tolerance in its unit. */
    public static ValidationCase absolute(String area, String check, String source, String unit, double expected,
                                          double actual, double tolerance, int digits) {
        return new ValidationCase(area, check, source, unit, Kind.ABSOLUTE, expected, tolerance,
                expected - tolerance, expected + tolerance, actual, digits);
    }

    /** A value that must fall inside a handbook range. */
    public static ValidationCase range(String area, String check, String source, String unit, double low,
                                       double high, double actual, int digits) {
        return new ValidationCase(area, check, source, unit, Kind.RANGE, (low + high) / 2, (high - low) / 2, low,
                high, actual, digits);
    }

    /** @return whether Cellwright's value is within the tolerance (NaN never passes) */
    public boolean passes() {
        return switch (kind) {
            case RELATIVE, ABSOLUTE -> Math.abs(actual - expected) <= tolerance * scale();
            case RANGE -> actual >= low && actual <= high;
        };
    }

    private double scale() {
        return kind == Kind.RELATIVE ? Math.abs(expected) : 1;
    }

    /** @return the error: relative (fraction), absolute (unit), or outside a range (unit, 0 inside) */
    public double error() {
        return switch (kind) {
            case RELATIVE -> (actual - expected) / Math.abs(expected);
            case ABSOLUTE -> actual - expected;
            case RANGE -> actual < low ? actual - low : actual > high ? actual - high : 0;
        };
    }

    /** @return the error as a fraction of the tolerance (0 inside a range) */
    public double shareOfTolerance() {
        return kind == Kind.RANGE ? (passes() ? 0 : Double.POSITIVE_INFINITY) : Math.abs(error()) / tolerance;
    }

    /** @return the expected value or range, with its unit */
    public String expectedText() {
        String v = kind == Kind.RANGE ? number(low) + " to " + number(high) : number(expected);
        return withUnit(v);
    }

    /** @return Cellwright's value, with its unit; a bound when the expected value is 0 and the error noise */
    public String actualText() {
        if (expected == 0 && kind == Kind.ABSOLUTE && belowNoise()) {
            return withUnit("< " + sig(tolerance * NOISE_SHARE, 1));
        }
        return withUnit(number(actual));
    }

    private boolean belowNoise() {
        return Math.abs(error()) < tolerance * NOISE_SHARE;
    }

    /** @return the error, stable against round-off */
    public String errorText() {
        double e = error();
        return switch (kind) {
            case RELATIVE -> belowNoise()
                    ? "< " + sig(100 * tolerance * NOISE_SHARE, 1) + " %" : signed(100 * e) + " %";
            case ABSOLUTE -> belowNoise()
                    ? withUnit("< " + sig(tolerance * NOISE_SHARE, 1)) : withUnit(signed(e));
            case RANGE -> e == 0 ? "inside" : withUnit(signed(e)) + " outside";
        };
    }

    /** @return the tolerance as written in the table */
    public String toleranceText() {
        return switch (kind) {
            case RELATIVE -> "± " + sig(100 * tolerance, 2) + " %";
            case ABSOLUTE -> withUnit("± " + sig(tolerance, 2));
            case RANGE -> "the range";
        };
    }

    private String number(double v) {
        return sig(v, digits);
    }

    private static String signed(double v) {
        return (v >= 0 ? "+" : "") + sig(v, 2);
    }

    private String withUnit(String v) {
        return unit.isEmpty() ? v : v + " " + unit;
    }

    /** @return v to n significant figures, plain decimals between 1e-4 and 1e6, else scientific */
    static String sig(double v, int n) {
        if (v == 0) {
            return "0";
        }
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e6) {
            int magnitude = (int) Math.floor(Math.log10(a));
            int decimals = Math.max(0, n - 1 - magnitude);
            String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
            // rounding may carry into one more figure (9.96 -> 10.0): print it again with one decimal fewer
            if (decimals > 0 && Math.abs(Double.parseDouble(s)) >= Math.pow(10, magnitude + 1)) {
                s = String.format(Locale.ROOT, "%." + (decimals - 1) + "f", v);
            }
            return s;
        }
        return String.format(Locale.ROOT, "%." + (n - 1) + "e", v);
    }
}
