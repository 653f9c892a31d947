package org.cellwright.study;

import java.util.Objects;

/**
 * One measured column of a run log, aligned with the log's times; a blank cell is NaN.
 *
 * @param column the column's name as written in the log's header ("cell_voltage_V", "c_Cu2+_g_per_L")
 * @param quantity what it measures
 * @param species the species' canonical name for a concentration, else null
 * @param values one value per log row, in the log's unit ({@link LoggedQuantity#unit()}); NaN where blank
 */
public record LogSeries(String column, LoggedQuantity quantity, String species, double[] values) {

    public LogSeries {
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(quantity, "quantity");
        if (quantity.isConcentration() && species == null) {
            throw new IllegalArgumentException(column + ": a concentration needs its species");
        }
        values = values.clone();
    }

    /** @return how many rows hold a value */
    public int count() {
        int n = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                n++;
            }
        }
        return n;
    }

    /** @return the root mean square of the values given, the column's typical magnitude (0 when none) */
    public double rootMeanSquare() {
        double s = 0;
        int n = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                s += v * v;
                n++;
            }
        }
        return n == 0 ? 0 : Math.sqrt(s / n);
    }
}
