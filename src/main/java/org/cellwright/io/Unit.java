package org.cellwright.io;

/**
 * A unit symbol accepted in scenario files and its affine map to SI: {@code si = value * factor + offset}.
 * The offset is zero for every unit but degrees Celsius.
 *
 * @param symbol the symbol as written ("A/dm2", "mL", "C")
 * @param dimension what it measures
 * @param factor SI value of one unit (e.g. 100 for A/dm2 in A/m2)
 * @param offset SI value of the unit's zero (273.15 K for Celsius, else 0)
 * @param name a plain-words name for documentation ("ampere per square decimetre")
 */
public record Unit(String symbol, Dimension dimension, double factor, double offset, String name) {

    /** @return the SI value of {@code value} in this unit */
    public double toSi(double value) {
        return value * factor + offset;
    }

    /** @return the value in this unit of an SI value */
    public double fromSi(double si) {
        return (si - offset) / factor;
    }
}
