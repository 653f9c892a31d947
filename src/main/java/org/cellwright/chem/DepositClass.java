package org.cellwright.chem;

/**
 * Winand's classification of metals by the kinetics of their deposition (exchange current density,
 * melting point), which governs deposit morphology.
 *
 * <p>Source: J.-C. Winand, Hydrometallurgy 29 (1992) 567; Electrochim. Acta 39 (1994) 1091.
 */
public enum DepositClass {
    /** High exchange current, low melting point (Pb, Sn, Ag, Cd, Zn from simple salts). */
    NORMAL,
    /** Medium exchange current (Cu, Au; Zn with additives). */
    INTERMEDIATE,
    /** Very low exchange current, high melting point (Ni, Fe, Co, Cr). */
    INERT
}
