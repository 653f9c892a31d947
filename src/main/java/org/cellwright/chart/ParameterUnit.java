package org.cellwright.chart;

import java.util.Locale;

/**
 * The unit a scenario key's value is shown in, chosen from the key's last segment the way the trade writes
 * it (a diffusion layer in micrometres, a contact resistance in milliohm, an exchange current density in
 * A/m2), with the factor and offset from SI. Keys it does not know are shown in SI.
 *
 * @param symbol the unit as printed ("um", "mohm"); "" for a pure number or an unknown key
 * @param factor shown value = SI value * factor + offset
 * @param offset see {@code factor}
 */
public record ParameterUnit(String symbol, double factor, double offset) {

    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    private static final double ZERO_CELSIUS_K = 273.15;

    /**
     * @param key a scenario key (dotted path)
     * @return its display unit
     */
    public static ParameterUnit of(String key) {
        String last = key.substring(key.lastIndexOf('.') + 1);
        boolean composition = key.startsWith("electrolyte.composition");
        if (composition) {
            return new ParameterUnit("mol/L", 1e-3, 0);
        }
        return switch (last) {
            case "diffusion_layer" -> new ParameterUnit("um", 1e6, 0);
            case "gap" -> new ParameterUnit("mm", 1e3, 0);
            case "contact_resistance" -> new ParameterUnit("mohm", 1e3, 0);
            case "i0" -> new ParameterUnit("A/m2", 1, 0);
            case "e0", "voltage", "voltage_limit" -> new ParameterUnit("V", 1, 0);
            case "temperature", "ambient" -> new ParameterUnit("C", 1, -ZERO_CELSIUS_K);
            case "area" -> new ParameterUnit("dm2", 100, 0);
            case "volume" -> new ParameterUnit("L", 1e3, 0);
            case "current", "current_limit" -> new ParameterUnit("A", 1, 0);
            case "current_density" -> new ParameterUnit("A/dm2", 1e-2, 0);
            case "heat_loss" -> new ParameterUnit("W/K", 1, 0);
            case "diffusion" -> new ParameterUnit("m2/s", 1, 0);
            case "molar_mass" -> new ParameterUnit("g/mol", 1e3, 0);
            case "conductivity" -> key.startsWith("species.") ? new ParameterUnit("S cm2/mol", 1e4, 0)
                    : new ParameterUnit("mS/cm", 10, 0);
            default -> new ParameterUnit("", 1, 0);
        };
    }

    /**
     * @param si a value in SI units
     * @return the value in this unit with four significant digits, e.g. "149.8 um"
     */
    public String format(double si) {
        if (!Double.isFinite(si)) {
            return si > 0 ? "+inf" : "-inf";
        }
        String num = number(si * factor + offset);
        return symbol.isEmpty() ? num : num + " " + symbol;
    }

    /**
     * @param v a number
     * @return four significant digits without trailing zeros, scientific below 1e-3 and from 1e4
     */
    static String number(double v) {
        if (v != 0 && (Math.abs(v) < 1e-3 || Math.abs(v) >= 1e4)) {
            String[] parts = String.format(Locale.ROOT, "%.3e", v).split("e");
            return trim(parts[0]) + "e" + parts[1];
        }
        return trim(String.format(Locale.ROOT, "%.4g", v));
    }

    private static String trim(String s) {
        return s.contains(".") && !s.contains("e") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }
}
