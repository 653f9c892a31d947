package org.cellwright.study;

import java.util.List;
import java.util.Objects;

/**
 * One varied scenario key and its values, in order.
 *
 * @param key the scenario key as a dotted TOML path ({@code cell.gap}, {@code electrolyte.composition."Cu2+"})
 * @param unit the unit the numbers are written in ("mm"), "" for bare numbers or words
 * @param values the values, at least one
 * @param logarithmic true when the values were spaced evenly on a log scale (charts then use a log axis)
 */
public record SweepAxis(String key, String unit, List<AxisValue> values, boolean logarithmic) {

    public SweepAxis {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(unit, "unit");
        values = List.copyOf(values);
        if (values.isEmpty()) {
            throw new IllegalArgumentException("a sweep axis needs at least one value: " + key);
        }
    }

    /** @return the number of values */
    public int size() {
        return values.size();
    }

    /** @return true when every value is a number (the axis can be drawn to scale) */
    public boolean numeric() {
        return values.stream().allMatch(AxisValue::numeric);
    }

    /** @return the axis title for charts: the key with its unit in brackets when there is one */
    public String label() {
        return unit.isEmpty() ? key : key + " (" + unit + ")";
    }
}
