package org.cellwright.io;

import java.util.Objects;

/**
 * A parsed physical value in SI units.
 *
 * @param si the value in the SI unit of its dimension ({@link Dimension#siUnit()})
 * @param dimension what it measures
 * @param unit the unit symbol it was written in, or "" for a bare (SI) number
 */
public record Quantity(double si, Dimension dimension, String unit) {

    public Quantity {
        Objects.requireNonNull(dimension, "dimension");
        Objects.requireNonNull(unit, "unit");
    }
}
