package org.cellwright.cell;

/** Range checks shared by the scenario records; messages name the key, the value and its unit. */
final class Checks {

    private Checks() {
    }

    static void positive(String key, double v, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(key + " must be a finite value > 0 " + unit + ", got " + v);
        }
    }

    static void nonNegative(String key, double v, String unit) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(key + " must be a finite value >= 0 " + unit + ", got " + v);
        }
    }

    static void within(String key, double v, double lo, double hi, String unit) {
        if (!(v >= lo && v <= hi)) {
            throw new IllegalArgumentException(key + " must lie between " + lo + " and " + hi + " " + unit
                    + ", got " + v);
        }
    }
}
