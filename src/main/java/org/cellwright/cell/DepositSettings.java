package org.cellwright.cell;

/**
 * What the scenario says about the deposit's growth: whether the bath holds levelling or grain-refining
 * additives (Winand's inhibition), the geometry of the dendrite tip that may grow toward the anode, and the
 * resistance of the short it makes when it gets there.
 *
 * <p>Defaults (see docs/deposit-model.md for their sources): no additives; tip radius 1 um; initial
 * protrusion 5 um; short resistance 50 mohm.
 *
 * @param additives true when the bath holds inhibiting additives (glue, gelatine, cresolsulfonic acid...);
 *     a metal of Winand's "normal" class then deposits like an "intermediate" one
 * @param tipRadiusM radius of the dendrite tip (m), > 0
 * @param initialProtrusionM height of the largest protrusion on the starting cathode (m), > 0
 * @param shortResistanceOhm resistance of the metallic bridge once a dendrite reaches the anode (ohm), > 0
 */
public record DepositSettings(boolean additives, double tipRadiusM, double initialProtrusionM,
                              double shortResistanceOhm) {

    /** Default tip radius (m): 1 um (Barton &amp; Bockris 1962 saw about 0.1 um on silver needles). */
    public static final double DEFAULT_TIP_RADIUS_M = 1e-6;
    /** Default initial protrusion (m): 5 um, the nodules of a brushed or ground starting sheet. */
    public static final double DEFAULT_INITIAL_PROTRUSION_M = 5e-6;
    /** Default resistance of a short (ohm): 50 mohm, a bundle of bridged dendrites on a bench cell. */
    public static final double DEFAULT_SHORT_RESISTANCE_OHM = 0.05;

    public DepositSettings {
        Checks.positive("deposit.tip_radius", tipRadiusM, "m");
        Checks.positive("deposit.initial_protrusion", initialProtrusionM, "m");
        Checks.positive("deposit.short_resistance", shortResistanceOhm, "ohm");
        if (initialProtrusionM < tipRadiusM) {
            throw new IllegalArgumentException("deposit.initial_protrusion (" + initialProtrusionM
                    + " m) must be at least the tip radius (" + tipRadiusM + " m)");
        }
    }

    /** @return the defaults */
    public static DepositSettings defaults() {
        return new DepositSettings(false, DEFAULT_TIP_RADIUS_M, DEFAULT_INITIAL_PROTRUSION_M,
                DEFAULT_SHORT_RESISTANCE_OHM);
    }

    /** @return a copy with or without additives */
    public DepositSettings withAdditives(boolean a) {
        return new DepositSettings(a, tipRadiusM, initialProtrusionM, shortResistanceOhm);
    }
}
