package org.cellwright.study;

import java.util.Objects;

/**
 * One value of a sweep axis, as the user gave it and in SI.
 *
 * @param text the value as it is set into the scenario ("25 mm", "stirred"), a {@code --set} value
 * @param number the value in the axis's written unit (25 for "25 mm"); for a value that is a word, its
 *     position on the axis (0, 1, 2 ...)
 * @param si the value in the SI unit of its dimension (0.025 for "25 mm"; a bare number is taken as SI);
 *     NaN for a word
 */
public record AxisValue(String text, double number, double si) {

    public AxisValue {
        Objects.requireNonNull(text, "text");
    }

    /** @return true when the value is a number (with or without a unit), not a word */
    public boolean numeric() {
        return !Double.isNaN(si);
    }
}
