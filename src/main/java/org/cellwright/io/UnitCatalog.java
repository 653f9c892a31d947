package org.cellwright.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The closed list of units the trade writes in scenario files, each with its exact factor to SI.
 *
 * <p>Non-metric factors follow their legal definitions, which NIST SP 811 (2008), Appendix B.8 and B.9,
 * prints rounded to 7 digits: international foot 0.3048 m and inch 0.0254 m (exact), U.S. gallon 231 in3 =
 * 3.785411784e-3 m3 (exact), avoirdupois pound 0.45359237 kg and ounce = pound/16 (exact). "ppm" is read as
 * mg/L, which holds for dilute aqueous solutions of density 1 kg/L (common practice in plating shops).
 *
 * <p>Symbols are matched after normalisation ({@link #normalise(String)}): spaces, "*", "·" and "^" are
 * dropped, superscript digits become digits, "µ"/"μ" becomes "u", "°C"/"℃"/"degC" becomes "C", "Ω" becomes
 * "ohm". An exact match wins; otherwise a case-insensitive match is used when only one unit fits.
 */
public final class UnitCatalog {

    /** Square foot (m2), exact by the 1959 international foot of 0.3048 m. */
    public static final double SQUARE_FOOT_M2 = 0.3048 * 0.3048;
    /** U.S. liquid gallon (m3), exactly 231 cubic inches. */
    public static final double US_GALLON_M3 = 231 * 0.0254 * 0.0254 * 0.0254;
    /** Avoirdupois pound (kg), exact. */
    public static final double POUND_KG = 0.45359237;
    /** Avoirdupois ounce (kg), exactly 1/16 pound. */
    public static final double OUNCE_KG = POUND_KG / 16;

    private static final List<Unit> UNITS = List.of(
            u("A", Dimension.CURRENT, 1, "ampere"),
            u("mA", Dimension.CURRENT, 1.0e-3, "milliampere"),
            u("kA", Dimension.CURRENT, 1.0e3, "kiloampere"),
            u("A/m2", Dimension.CURRENT_DENSITY, 1, "ampere per square metre"),
            u("A/dm2", Dimension.CURRENT_DENSITY, 100, "ampere per square decimetre"),
            u("mA/cm2", Dimension.CURRENT_DENSITY, 10, "milliampere per square centimetre"),
            u("A/cm2", Dimension.CURRENT_DENSITY, 1.0e4, "ampere per square centimetre"),
            u("kA/m2", Dimension.CURRENT_DENSITY, 1.0e3, "kiloampere per square metre"),
            u("A/ft2", Dimension.CURRENT_DENSITY, 1 / SQUARE_FOOT_M2, "ampere per square foot"),
            u("ASF", Dimension.CURRENT_DENSITY, 1 / SQUARE_FOOT_M2, "ampere per square foot"),
            u("V", Dimension.VOLTAGE, 1, "volt"),
            u("mV", Dimension.VOLTAGE, 1.0e-3, "millivolt"),
            u("m", Dimension.LENGTH, 1, "metre"),
            u("cm", Dimension.LENGTH, 1.0e-2, "centimetre"),
            u("mm", Dimension.LENGTH, 1.0e-3, "millimetre"),
            u("um", Dimension.LENGTH, 1.0e-6, "micrometre"),
            u("in", Dimension.LENGTH, 0.0254, "inch"),
            u("m2", Dimension.AREA, 1, "square metre"),
            u("dm2", Dimension.AREA, 1.0e-2, "square decimetre"),
            u("cm2", Dimension.AREA, 1.0e-4, "square centimetre"),
            u("mm2", Dimension.AREA, 1.0e-6, "square millimetre"),
            u("ft2", Dimension.AREA, SQUARE_FOOT_M2, "square foot"),
            u("in2", Dimension.AREA, 0.0254 * 0.0254, "square inch"),
            u("m3", Dimension.VOLUME, 1, "cubic metre"),
            u("L", Dimension.VOLUME, 1.0e-3, "litre"),
            u("mL", Dimension.VOLUME, 1.0e-6, "millilitre"),
            u("dm3", Dimension.VOLUME, 1.0e-3, "cubic decimetre"),
            u("cm3", Dimension.VOLUME, 1.0e-6, "cubic centimetre"),
            u("gal", Dimension.VOLUME, US_GALLON_M3, "U.S. gallon"),
            u("mol/m3", Dimension.AMOUNT_CONCENTRATION, 1, "mole per cubic metre"),
            u("mol/L", Dimension.AMOUNT_CONCENTRATION, 1.0e3, "mole per litre"),
            u("M", Dimension.AMOUNT_CONCENTRATION, 1.0e3, "mole per litre (molar)"),
            u("mmol/L", Dimension.AMOUNT_CONCENTRATION, 1, "millimole per litre"),
            u("kg/m3", Dimension.MASS_CONCENTRATION, 1, "kilogram per cubic metre"),
            u("g/L", Dimension.MASS_CONCENTRATION, 1, "gram per litre"),
            u("mg/L", Dimension.MASS_CONCENTRATION, 1.0e-3, "milligram per litre"),
            u("ppm", Dimension.MASS_CONCENTRATION, 1.0e-3, "part per million by mass in water (= mg/L)"),
            u("oz/gal", Dimension.MASS_CONCENTRATION, OUNCE_KG / US_GALLON_M3,
                    "avoirdupois ounce per U.S. gallon"),
            u("K", Dimension.TEMPERATURE, 1, "kelvin"),
            new Unit("C", Dimension.TEMPERATURE, 1, 273.15, "degree Celsius"),
            u("s", Dimension.TIME, 1, "second"),
            u("min", Dimension.TIME, 60, "minute"),
            u("h", Dimension.TIME, 3600, "hour"),
            u("d", Dimension.TIME, 86400, "day"),
            u("ohm", Dimension.RESISTANCE, 1, "ohm"),
            u("mohm", Dimension.RESISTANCE, 1.0e-3, "milliohm"),
            u("S/m", Dimension.CONDUCTIVITY, 1, "siemens per metre"),
            u("S/cm", Dimension.CONDUCTIVITY, 100, "siemens per centimetre"),
            u("mS/cm", Dimension.CONDUCTIVITY, 0.1, "millisiemens per centimetre"),
            u("uS/cm", Dimension.CONDUCTIVITY, 1.0e-4, "microsiemens per centimetre"),
            u("m3/s", Dimension.VOLUME_FLOW, 1, "cubic metre per second"),
            u("L/min", Dimension.VOLUME_FLOW, 1.0e-3 / 60, "litre per minute"),
            u("L/h", Dimension.VOLUME_FLOW, 1.0e-3 / 3600, "litre per hour"),
            u("gal/min", Dimension.VOLUME_FLOW, US_GALLON_M3 / 60, "U.S. gallon per minute"),
            u("W/K", Dimension.HEAT_CONDUCTANCE, 1, "watt per kelvin"),
            u("m2/s", Dimension.DIFFUSIVITY, 1, "square metre per second"),
            u("cm2/s", Dimension.DIFFUSIVITY, 1.0e-4, "square centimetre per second"),
            u("S m2/mol", Dimension.MOLAR_CONDUCTIVITY, 1, "siemens square metre per mole"),
            u("mS m2/mol", Dimension.MOLAR_CONDUCTIVITY, 1.0e-3, "millisiemens square metre per mole"),
            u("S cm2/mol", Dimension.MOLAR_CONDUCTIVITY, 1.0e-4, "siemens square centimetre per mole"),
            u("kg", Dimension.MASS, 1, "kilogram"),
            u("g", Dimension.MASS, 1.0e-3, "gram"),
            u("mg", Dimension.MASS, 1.0e-6, "milligram"),
            u("oz", Dimension.MASS, OUNCE_KG, "avoirdupois ounce"),
            u("lb", Dimension.MASS, POUND_KG, "avoirdupois pound"),
            u("kg/mol", Dimension.MOLAR_MASS, 1, "kilogram per mole"),
            u("g/mol", Dimension.MOLAR_MASS, 1.0e-3, "gram per mole"));

    /** Other spellings, after normalisation, and the symbol they stand for. */
    private static final Map<String, String> ALIASES = Map.of(
            "gpm", "gal/min", "hr", "h", "sec", "s", "l", "L", "ml", "mL", "Ohm", "ohm", "mOhm", "mohm");

    private static final Map<String, Unit> EXACT = new LinkedHashMap<>();
    private static final Map<String, List<Unit>> FOLDED = new LinkedHashMap<>();

    static {
        for (Unit unit : UNITS) {
            EXACT.put(normalise(unit.symbol()), unit);
            FOLDED.computeIfAbsent(fold(unit.symbol()), k -> new ArrayList<>()).add(unit);
        }
        ALIASES.forEach((alias, symbol) -> EXACT.putIfAbsent(alias, EXACT.get(normalise(symbol))));
    }

    private UnitCatalog() {
    }

    private static Unit u(String symbol, Dimension d, double factor, String name) {
        return new Unit(symbol, d, factor, 0, name);
    }

    /** @return every unit, in the order of the documentation */
    public static List<Unit> all() {
        return UNITS;
    }

    /** @return the units of one dimension, in documentation order */
    public static List<Unit> of(Dimension d) {
        return UNITS.stream().filter(u -> u.dimension() == d).toList();
    }

    /**
     * Looks a symbol up: exact (after normalisation), then an alias, then a case-insensitive match that
     * only one unit fits.
     *
     * @param written the symbol as written
     * @return the unit, if the symbol is known
     */
    public static Optional<Unit> find(String written) {
        String key = normalise(written);
        Unit exact = EXACT.get(key);
        if (exact != null) {
            return Optional.of(exact);
        }
        List<Unit> folded = FOLDED.getOrDefault(fold(key), Collections.emptyList());
        return folded.size() == 1 ? Optional.of(folded.get(0)) : Optional.empty();
    }

    /** @return the unit with exactly this symbol; for the writer, which only uses listed symbols */
    public static Unit symbol(String symbol) {
        Unit unit = EXACT.get(normalise(symbol));
        if (unit == null || !unit.symbol().equals(symbol)) {
            throw new IllegalArgumentException("no unit with symbol " + symbol);
        }
        return unit;
    }

    /**
     * Writes a unit symbol in the form used for matching.
     *
     * @param written the symbol as written by a person
     * @return the normalised symbol
     */
    public static String normalise(String written) {
        String s = written.strip()
                .replace("°C", "C").replace("℃", "C").replace("degC", "C")
                .replace("µ", "u").replace("μ", "u")
                .replace("Ω", "ohm").replace("Ω", "ohm")
                .replace('²', '2').replace('³', '3');
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!Character.isWhitespace(c) && c != '*' && c != '·' && c != '^') {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    private static String fold(String symbol) {
        return normalise(symbol).toLowerCase(Locale.ROOT);
    }
}
