package org.cellwright.io;

import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a physical quantity written as a number and a unit ("0.714e-9 m2/s", "107.2 S cm2/mol",
 * "1e-3 A/cm2", "-0.32 mV/K", "1e6 L/mol/s") into SI, checking its dimension.
 *
 * <p>Grammar of the unit: factors separated by spaces, {@code *} or {@code .}; a {@code /} divides by the
 * single factor that follows it ({@code L/mol/s} is L mol^-1 s^-1); a factor is a unit symbol with an
 * optional integer power ({@code m2}, {@code cm^2}, {@code s-1}). Symbols: m, dm, cm, mm, um; L, mL;
 * g, kg, mg; mol, mmol; s, min, h; A, mA; V, mV; S, mS; K.
 */
public final class LibraryUnits {

    /** Dimension exponents in the order m, kg, s, A, mol, K. */
    public record Dimension(int m, int kg, int s, int a, int mol, int k) {

        /** @return the product of this dimension raised to {@code power} with {@code other} */
        Dimension times(Dimension other, int power) {
            return new Dimension(m + power * other.m, kg + power * other.kg, s + power * other.s,
                    a + power * other.a, mol + power * other.mol, k + power * other.k);
        }
    }

    /** Dimensionless. */
    public static final Dimension NONE = new Dimension(0, 0, 0, 0, 0, 0);
    /** kg/mol. */
    public static final Dimension MOLAR_MASS = new Dimension(0, 1, 0, 0, -1, 0);
    /** m2/s. */
    public static final Dimension DIFFUSIVITY = new Dimension(2, 0, -1, 0, 0, 0);
    /** S m2/mol = A2 s3 kg-1 mol-1. */
    public static final Dimension MOLAR_CONDUCTIVITY = new Dimension(0, -1, 3, 2, -1, 0);
    /** kg/m3. */
    public static final Dimension DENSITY = new Dimension(-3, 1, 0, 0, 0, 0);
    /** V = kg m2 s-3 A-1. */
    public static final Dimension POTENTIAL = new Dimension(2, 1, -3, -1, 0, 0);
    /** V/K. */
    public static final Dimension POTENTIAL_PER_KELVIN = new Dimension(2, 1, -3, -1, 0, -1);
    /** A/m2. */
    public static final Dimension CURRENT_DENSITY = new Dimension(-2, 0, 0, 1, 0, 0);

    private record Unit(double factor, Dimension dimension) {
    }

    private static final Dimension LENGTH = new Dimension(1, 0, 0, 0, 0, 0);
    private static final Dimension VOLUME = new Dimension(3, 0, 0, 0, 0, 0);
    private static final Dimension MASS = new Dimension(0, 1, 0, 0, 0, 0);
    private static final Dimension TIME = new Dimension(0, 0, 1, 0, 0, 0);
    private static final Dimension CURRENT = new Dimension(0, 0, 0, 1, 0, 0);
    private static final Dimension AMOUNT = new Dimension(0, 0, 0, 0, 1, 0);
    private static final Dimension SIEMENS = new Dimension(-2, -1, 3, 2, 0, 0);
    private static final Dimension KELVIN = new Dimension(0, 0, 0, 0, 0, 1);

    private static final Map<String, Unit> UNITS = Map.ofEntries(
            Map.entry("m", new Unit(1, LENGTH)), Map.entry("dm", new Unit(0.1, LENGTH)),
            Map.entry("cm", new Unit(0.01, LENGTH)), Map.entry("mm", new Unit(1e-3, LENGTH)),
            Map.entry("um", new Unit(1e-6, LENGTH)), Map.entry("\u00b5m", new Unit(1e-6, LENGTH)),
            Map.entry("L", new Unit(1e-3, VOLUME)), Map.entry("mL", new Unit(1e-6, VOLUME)),
            Map.entry("g", new Unit(1e-3, MASS)), Map.entry("kg", new Unit(1, MASS)),
            Map.entry("mg", new Unit(1e-6, MASS)),
            Map.entry("mol", new Unit(1, AMOUNT)), Map.entry("mmol", new Unit(1e-3, AMOUNT)),
            Map.entry("s", new Unit(1, TIME)), Map.entry("min", new Unit(60, TIME)),
            Map.entry("h", new Unit(3600, TIME)),
            Map.entry("A", new Unit(1, CURRENT)), Map.entry("mA", new Unit(1e-3, CURRENT)),
            Map.entry("V", new Unit(1, POTENTIAL)), Map.entry("mV", new Unit(1e-3, POTENTIAL)),
            Map.entry("S", new Unit(1, SIEMENS)), Map.entry("mS", new Unit(1e-3, SIEMENS)),
            Map.entry("K", new Unit(1, KELVIN)));

    private static final Pattern QUANTITY = Pattern.compile(
            "^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");
    private static final Pattern FACTOR = Pattern.compile("([A-Za-z\u00b5]+)\\^?(-?\\d+)?");

    private LibraryUnits() {
    }

    /** @return the dimension of a rate constant of overall order {@code order}: (m3/mol)^(order-1)/s */
    public static Dimension rateConstant(int order) {
        return new Dimension(3 * (order - 1), 0, -1, 0, -(order - 1), 0);
    }

    /**
     * @param text a number followed by a unit; a bare number is taken as SI
     * @param expected the dimension the quantity must have
     * @param example a unit to suggest in the error message ("m2/s")
     * @return the value in SI units
     * @throws IllegalArgumentException with a plain message when the text cannot be read or has another dimension
     */
    public static double parse(String text, Dimension expected, String example) {
        Matcher m = QUANTITY.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new IllegalArgumentException("cannot read '" + text + "' as a number with a unit (e.g. \"1.5 "
                    + example + "\")");
        }
        double number = Double.parseDouble(m.group(1));
        String unitText = m.group(2);
        double factor = 1;
        Dimension dimension = NONE;
        if (!unitText.isEmpty()) {
            String[] tokens = unitText.replace("/", " / ").replace("*", " ").split("\\s+");
            int sign = 1;
            for (String token : tokens) {
                if (token.isEmpty()) {
                    continue;
                }
                if (token.equals("/")) {
                    sign = -1;
                    continue;
                }
                for (String part : token.split("\\.(?=[A-Za-z])")) {
                    Matcher f = FACTOR.matcher(part);
                    if (!f.matches() || !UNITS.containsKey(f.group(1))) {
                        throw new IllegalArgumentException("unknown unit '" + part + "' in '" + text
                                + "' (known: " + String.join(", ", new java.util.TreeSet<>(UNITS.keySet())) + ")");
                    }
                    Unit u = UNITS.get(f.group(1));
                    int power = sign * (f.group(2) == null ? 1 : Integer.parseInt(f.group(2)));
                    factor *= Math.pow(u.factor(), power);
                    dimension = dimension.times(u.dimension(), power);
                }
                sign = 1;
            }
        }
        if (!dimension.equals(expected)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "'%s' has the wrong unit: expected something like \"%s\"", text, example));
        }
        double value = number * factor;
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("'" + text + "' is not a finite number");
        }
        return value;
    }
}
