package org.cellwright.ui;

/**
 * Maps the integer positions of a slider (0 to {@link #STEPS}) to values and back, linearly or on a
 * logarithmic scale (for quantities that matter by ratio: current, gap, concentration, layer thickness).
 * Reversed scales run from {@code max} at position 0 to {@code min} at the right end.
 *
 * @param min smallest value (in any unit), > 0 for a log scale
 * @param max largest value, > min
 * @param log true for a logarithmic scale
 * @param reversed true when the right end is the smallest value
 */
record KnobScale(double min, double max, boolean log, boolean reversed) {

    /** Slider positions: 1000 steps give 0.1 % of the span, finer than a mouse can place (common practice). */
    static final int STEPS = 1000;

    KnobScale {
        if (!(max > min) || (log && !(min > 0))) {
            throw new IllegalArgumentException("bad knob scale " + min + " to " + max + (log ? " (log)" : ""));
        }
    }

    /**
     * @param position a slider position, clamped to 0..STEPS
     * @return the value there
     */
    double valueAt(int position) {
        double f = Math.max(0, Math.min(STEPS, position)) / (double) STEPS;
        if (reversed) {
            f = 1 - f;
        }
        return log ? min * Math.pow(max / min, f) : min + f * (max - min);
    }

    /**
     * @param value a value, clamped to the scale
     * @return the nearest slider position
     */
    int positionOf(double value) {
        double v = Math.max(min, Math.min(max, value));
        double f = log ? Math.log(v / min) / Math.log(max / min) : (v - min) / (max - min);
        if (reversed) {
            f = 1 - f;
        }
        return (int) Math.round(f * STEPS);
    }

    /**
     * @param value a value
     * @return true when it lies within the scale
     */
    boolean covers(double value) {
        return value >= min && value <= max;
    }
}
