package org.cellwright.sim.deposit;

import org.cellwright.chem.DepositClass;

/**
 * The form of a deposit from how close the metal deposits to its limiting current, {@code r = i / iL},
 * and the metal's Winand class, with inhibiting additives moving a "normal" metal to the "intermediate"
 * thresholds.
 *
 * <p>Thresholds (upper bounds of r for each form), from the bands of Winand (Hydrometallurgy 29 (1992) 567;
 * Electrochim. Acta 39 (1994) 1091), Ibl (Adv. Electrochem. Electrochem. Eng. 2, 1962) and Popov, Djokic &amp;
 * Grgur (Fundamental Aspects of Electrometallurgy, 2002), all from memory:
 * <pre>
 *   class                          compact   rough    dendritic   powdery
 *   intermediate (Cu, Au;          r < 0.35  < 0.60   < 0.95      >= 0.95
 *     normal metals with additives)
 *   normal (Sn, Pb, Ag, Zn, Cd     never     < 0.35   < 0.95      >= 0.95
 *     from simple salts)
 *   inert (Ni, Fe, Co)             r < 0.60  < 0.95   never       >= 0.95
 * </pre>
 * Industrial copper is run at or below 0.3-0.35 of its limiting current to stay compact; nodules and
 * field-oriented crystals appear from about 0.35, dendrites toward the limit. Normal metals without
 * inhibitors grow coarse isolated crystals at any r (Winand's FI type) and dendrites from about 0.35.
 * Inert metals stay fine-grained until hydrogen co-evolution at the limit makes them spongy. "At or beyond
 * the limiting current" (Ibl's powder condition) is read as r >= 0.95: the metal's surface concentration
 * is below 5 % of the bulk and hydrogen or another reduction takes the rest of the current (the model's
 * partial current approaches iL but never reaches it).
 */
public final class Morphology {

    /** Share of the limiting current read as "at the limit": the powder condition (model choice, see above). */
    public static final double POWDER_RATIO = 0.95;
    /** Intermediate metals: compact below this ratio (industrial copper, 0.30-0.35 of iL). */
    public static final double INTERMEDIATE_COMPACT = 0.35;
    /** Intermediate metals: nodular/rough below this ratio, dendritic above. */
    public static final double INTERMEDIATE_ROUGH = 0.60;
    /** Normal metals without additives: coarse isolated crystals below this ratio, dendrites above. */
    public static final double NORMAL_ROUGH = 0.35;
    /** Inert metals: compact below this ratio. */
    public static final double INERT_COMPACT = 0.60;

    private Morphology() {
    }

    /**
     * @param ratio the metal's partial current over its limiting current, 0..1 (values outside are clamped)
     * @param metalClass the metal's Winand class
     * @param additives true when inhibiting additives are in the bath
     * @return the deposit form
     */
    public static DepositForm classify(double ratio, DepositClass metalClass, boolean additives) {
        double r = Double.isFinite(ratio) ? Math.max(0, ratio) : 0;
        if (r >= POWDER_RATIO) {
            return DepositForm.POWDERY;
        }
        DepositClass effective = metalClass == DepositClass.NORMAL && additives ? DepositClass.INTERMEDIATE
                : metalClass;
        return switch (effective) {
            case INTERMEDIATE -> r < INTERMEDIATE_COMPACT ? DepositForm.COMPACT
                    : r < INTERMEDIATE_ROUGH ? DepositForm.ROUGH : DepositForm.DENDRITIC;
            case NORMAL -> r < NORMAL_ROUGH ? DepositForm.ROUGH : DepositForm.DENDRITIC;
            case INERT -> r < INERT_COMPACT ? DepositForm.COMPACT : DepositForm.ROUGH;
        };
    }
}
