package org.cellwright.io;

/**
 * The values a scenario key accepts, in SI units, with the words used when a value falls outside.
 *
 * @param lo lowest value accepted (SI)
 * @param loInclusive whether {@code lo} itself is accepted
 * @param hi highest value accepted (SI)
 * @param words the rule in plain words ("must be greater than zero")
 */
record Range(double lo, boolean loInclusive, double hi, String words) {

    /** Any finite value. */
    static final Range ANY = new Range(Double.NEGATIVE_INFINITY, true, Double.POSITIVE_INFINITY, "must be finite");
    /** Greater than zero. */
    static final Range POSITIVE = new Range(0, false, Double.POSITIVE_INFINITY, "must be greater than zero");
    /** Zero or more. */
    static final Range NON_NEGATIVE = new Range(0, true, Double.POSITIVE_INFINITY, "must not be negative");
    /** A bath temperature: liquid water at 1 atm, 0 to 100 C. */
    static final Range LIQUID_WATER = new Range(273.15, true, 373.15,
            "must lie between 0 C and 100 C (liquid water at 1 atm)");
    /** An ambient temperature around a tank: -50 C to 60 C. */
    static final Range AMBIENT = new Range(223.15, true, 333.15, "must lie between -50 C and 60 C");
    /** A transfer coefficient; it counts the electrons of the whole reaction (see Kinetics), so 0 to 4. */
    static final Range TRANSFER_COEFFICIENT = new Range(0, true, 4, "must lie between 0 and 4");

    /** A volume fraction, above zero and at most one. */
    static final Range FRACTION = new Range(0, false, 1, "must lie above 0 and at most 1");

    boolean contains(double v) {
        return (loInclusive ? v >= lo : v > lo) && v <= hi && Double.isFinite(v);
    }
}
