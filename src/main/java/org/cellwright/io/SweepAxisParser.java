package org.cellwright.io;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.cellwright.study.AxisValue;
import org.cellwright.study.SweepAxis;

/**
 * Reads a sweep's {@code --vary} option into a {@link SweepAxis}. Forms:
 * <ul>
 *   <li>{@code key=FROM:TO:N}: N values evenly spaced from FROM to TO, both ends included, e.g.
 *       {@code cell.gap=20mm:60mm:9} or {@code supply.current_density="1:4 A/dm2:7"} (a bare end takes the
 *       other end's unit; ends in different units of one dimension are converted to TO's unit);</li>
 *   <li>{@code key=FROM:TO:N:log}: N values evenly spaced on a log scale (both ends above zero), e.g.
 *       {@code cell.diffusion_layer=20um:400um:9:log};</li>
 *   <li>{@code key=A,B,C}: the listed values, numbers with units or words
 *       ({@code cell.agitation=still,gentle,stirred}).</li>
 * </ul>
 * Each value is set into the scenario as {@code --set key=value} would set it, so any key with any unit can
 * be varied and is checked the same way. Numbers are written with at most six significant digits.
 */
public final class SweepAxisParser {

    /** Most values on one axis (our own limit, to catch a typo such as 20:60:900). */
    public static final int MAX_VALUES = 1000;
    private static final int DIGITS = 6;
    private static final Pattern NUMBER = Pattern.compile(
            "\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    private SweepAxisParser() {
    }

    /**
     * @param option the option's text, "key=FROM:TO:N[:log]" or "key=A,B,C"
     * @return the axis
     * @throws IllegalArgumentException with a message naming the option and what is wrong
     */
    public static SweepAxis parse(String option) {
        int eq = option.indexOf('=');
        if (eq <= 0 || option.substring(0, eq).isBlank()) {
            throw bad(option, "expected key=FROM:TO:N, e.g. --vary cell.gap=20mm:60mm:9");
        }
        String key = option.substring(0, eq).strip();
        String value = unquote(option.substring(eq + 1).strip());
        if (value.isEmpty()) {
            throw bad(option, "no values after '='");
        }
        if (value.contains(":")) {
            return range(option, key, value.split(":", -1));
        }
        if (value.contains(",")) {
            return list(option, key, value.split(",", -1));
        }
        throw bad(option, "expected FROM:TO:N (e.g. 20mm:60mm:9) or a list A,B,C; one value is not a sweep");
    }

    private static SweepAxis range(String option, String key, String[] parts) {
        if (parts.length < 3 || parts.length > 4) {
            throw bad(option, "expected FROM:TO:N or FROM:TO:N:log");
        }
        boolean log = false;
        if (parts.length == 4) {
            String spacing = parts[3].strip().toLowerCase(Locale.ROOT);
            if (!spacing.equals("log") && !spacing.equals("lin")) {
                throw bad(option, "the fourth part must be 'log' or 'lin', got '" + parts[3].strip() + "'");
            }
            log = spacing.equals("log");
        }
        int n;
        try {
            n = Integer.parseInt(parts[2].strip());
        } catch (NumberFormatException e) {
            throw bad(option, "N must be a whole number of values, got '" + parts[2].strip() + "'");
        }
        if (n < 2 || n > MAX_VALUES) {
            throw bad(option, "N must be from 2 to " + MAX_VALUES + ", got " + n);
        }
        Written from = number(option, parts[0]);
        Written to = number(option, parts[1]);
        Unit unit = to.unit().or(from::unit).orElse(null);
        double a = from.in(unit, option);
        double b = to.in(unit, option);
        if (a == b) {
            throw bad(option, "FROM and TO are the same value");
        }
        if (log && !(a > 0 && b > 0)) {
            throw bad(option, "a log range needs FROM and TO above zero");
        }
        List<AxisValue> values = new ArrayList<>(n);
        Set<String> seen = new HashSet<>();
        for (int k = 0; k < n; k++) {
            double f = (double) k / (n - 1);
            double v = k == n - 1 ? b : log ? a * Math.pow(b / a, f) : a + (b - a) * f;
            String num = QuantityFormat.number(v, DIGITS);
            double rounded = Double.parseDouble(num);
            if (!seen.add(num)) {
                throw bad(option, "the values are too close to tell apart with " + DIGITS + " digits");
            }
            String text = unit == null ? num : num + " " + unit.symbol();
            values.add(new AxisValue(text, rounded, unit == null ? rounded : unit.toSi(rounded)));
        }
        return new SweepAxis(key, unit == null ? "" : unit.symbol(), values, log);
    }

    private static SweepAxis list(String option, String key, String[] items) {
        List<String> texts = new ArrayList<>();
        for (String item : items) {
            String t = unquote(item.strip());
            if (t.isEmpty()) {
                throw bad(option, "an empty value in the list");
            }
            if (texts.contains(t)) {
                throw bad(option, "'" + t + "' is listed twice");
            }
            texts.add(t);
        }
        List<Written> numbers = new ArrayList<>();
        for (String t : texts) {
            numbers.add(tryNumber(t).orElse(null));
        }
        boolean numeric = numbers.stream().allMatch(w -> w != null)
                && numbers.stream().map(w -> w.unit().map(Unit::symbol).orElse("")).distinct().count() == 1;
        List<AxisValue> values = new ArrayList<>();
        for (int k = 0; k < texts.size(); k++) {
            if (numeric) {
                Written w = numbers.get(k);
                values.add(new AxisValue(texts.get(k), w.number(), w.unit().map(u -> u.toSi(w.number()))
                        .orElse(w.number())));
            } else {
                values.add(new AxisValue(texts.get(k), k, Double.NaN));
            }
        }
        String unit = numeric ? numbers.get(0).unit().map(Unit::symbol).orElse("") : "";
        return new SweepAxis(key, unit, values, false);
    }

    /** A number as written, with its unit if it has one. */
    private record Written(double number, Optional<Unit> unit, String text) {

        /** @return the number in {@code target} (or as written when there is no unit) */
        double in(Unit target, String option) {
            if (unit.isEmpty() || target == null || unit.get().equals(target)) {
                return number;
            }
            if (unit.get().dimension() != target.dimension()) {
                throw bad(option, "'" + text + "' is " + unit.get().dimension().description() + " but the other end is "
                        + target.dimension().description());
            }
            return target.fromSi(unit.get().toSi(number));
        }
    }

    private static Written number(String option, String text) {
        Matcher m = NUMBER.matcher(text);
        if (!m.matches()) {
            throw bad(option, "'" + text.strip() + "' is not a number with a unit");
        }
        return written(option, m, text);
    }

    private static Optional<Written> tryNumber(String text) {
        Matcher m = NUMBER.matcher(text);
        if (!m.matches()) {
            return Optional.empty();
        }
        try {
            return Optional.of(written(text, m, text));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    private static Written written(String option, Matcher m, String text) {
        double number = Double.parseDouble(m.group(1));
        String unitText = m.group(2);
        if (unitText.isEmpty()) {
            return new Written(number, Optional.empty(), text.strip());
        }
        Unit unit = UnitCatalog.find(unitText).orElseThrow(() -> bad(option, "unknown unit '" + unitText + "'"));
        return new Written(number, Optional.of(unit), text.strip());
    }

    private static String unquote(String s) {
        if (s.length() >= 2 && (s.charAt(0) == '"' || s.charAt(0) == '\'') && s.charAt(s.length() - 1) == s.charAt(0)) {
            return s.substring(1, s.length() - 1).strip();
        }
        return s;
    }

    private static IllegalArgumentException bad(String option, String message) {
        return new IllegalArgumentException("--vary " + option + ": " + message);
    }
}
