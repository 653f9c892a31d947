package org.cellwright.ui;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.cellwright.io.Unit;
import org.cellwright.io.UnitCatalog;
import org.cellwright.io.UnitException;
import org.cellwright.io.UnitParser;

/**
 * Rounds values that the window itself puts into the form (a sweep point's values, a fitted scenario) to
 * what a person would type: {@value #DIGITS} significant digits, the diffusion layer in micrometres and a
 * contact resistance below 1 ohm in milliohms ("37.78 mm", "1.278 A/dm2", "44.91 um", "11.88 mohm" rather
 * than "37.7778 mm", "1.27778 A/dm2", "0.04491 mm", "0.01188 ohm"). Only the
 * form's text changes (the scenario then run is the one the form shows); the scenario writer keeps writing
 * files that read back exactly.
 */
final class FormRounding {

    /** Significant digits of a value loaded into the form. */
    static final int DIGITS = 4;
    /** Most digits a derived value keeps when it is already a short decimal (a fitted "12.346 mohm"). */
    static final int CLEAN_DIGITS = 6;
    /** Relative distance within which a value counts as equal to a short decimal (binary round-off). */
    private static final double CLEAN = 1e-12;
    /** The contact resistance's key. */
    private static final String CONTACTS = "cell.contact_resistance";

    private static final Pattern NUMBER_UNIT = Pattern.compile("\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)"
            + "\\s*(.*?)\\s*");

    private FormRounding() {
    }

    /**
     * @param key the form field's key (a {@link FormFields} key, or "electrolyte.composition#" for a
     *     concentration)
     * @param text a value as the sweep wrote it ("37.7778 mm")
     * @return it with at most {@value #DIGITS} significant digits, in micrometres for the diffusion layer;
     *     text that is not a number with a unit ("sparged", a list) unchanged
     */
    static String sweepValue(String key, String text) {
        return round(key, text, false);
    }

    /**
     * @param key the form field's key
     * @param text a value of a scenario the window derived (a fit), as the scenario writer wrote it
     * @return it as a short decimal of up to {@value #CLEAN_DIGITS} digits when it is one (up to round-off,
     *     "0.04491 mm" as "44.91 um"), else rounded to {@value #DIGITS} significant digits
     */
    static String derivedValue(String key, String text) {
        return round(key, text, true);
    }

    /**
     * Rounds every value with a unit in a draft derived by the window (its fields and concentrations), as
     * {@link #derivedValue} does.
     *
     * @param d the draft (changed)
     */
    static void derived(ScenarioDraft d) {
        for (FieldSpec f : FormFields.ALL) {
            if (f.dimension() != null || f.key().equals(FormFields.SUPPLY_VALUE)) {
                String t = d.get(f.key());
                if (!t.isBlank()) {
                    d.set(f.key(), derivedValue(f.key(), t));
                }
            }
        }
        List<ScenarioDraft.Row> rows = new ArrayList<>();
        for (ScenarioDraft.Row r : d.composition()) {
            rows.add(new ScenarioDraft.Row(r.species(), derivedValue(FormFields.COMPOSITION, r.concentration())));
        }
        d.setComposition(rows);
    }

    private static String round(String key, String text, boolean keepClean) {
        if (text == null) {
            return null;
        }
        Matcher m = NUMBER_UNIT.matcher(text);
        if (!m.matches() || !m.group(2).matches("[A-Za-z%/0-9^ .*-]*")) {
            return text;
        }
        double v;
        String unit = m.group(2);
        try {
            v = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            return text;
        }
        String better = key.equals(FormFields.DIFFUSION_LAYER) ? "um"
                : key.equals(CONTACTS) && v != 0 ? "mohm" : null;
        if (better != null && !unit.equals(better)) {
            try {
                Unit u = UnitCatalog.symbol(better);
                double si = UnitParser.parse(text, u.dimension()).si();
                if (better.equals("mohm") && Math.abs(si) >= 1) {
                    better = null;
                } else {
                    v = u.fromSi(si);
                    unit = better;
                }
            } catch (UnitException e) {
                return text;
            }
        }
        if (!Double.isFinite(v)) {
            return text;
        }
        String number = keepClean ? clean(v) : null;
        if (number == null) {
            number = significant(v, DIGITS);
        }
        return unit.isEmpty() ? number : number + " " + unit;
    }

    /** @return the shortest decimal of up to {@value #CLEAN_DIGITS} digits equal to v up to round-off, or null */
    private static String clean(double v) {
        for (int d = 1; d <= CLEAN_DIGITS; d++) {
            String s = significant(v, d);
            double back = Double.parseDouble(s);
            if (Math.abs(back - v) <= CLEAN * Math.abs(v)) {
                return s;
            }
        }
        return null;
    }

    /**
     * @return v rounded to {@code digits} significant digits (half up) without trailing zeros: plainly written
     *     from 0.001 to below 1e7 ("37.78", "0.0045"), else with an exponent ("1e-5", "2.5e7")
     */
    static String significant(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_UP)).stripTrailingZeros();
        double abs = Math.abs(b.doubleValue());
        if (abs >= 1e-3 && abs < 1e7) {
            return b.toPlainString();
        }
        int exponent = b.precision() - b.scale() - 1;
        BigDecimal mantissa = b.movePointLeft(exponent).stripTrailingZeros();
        return mantissa.toPlainString() + "e" + exponent;
    }
}
