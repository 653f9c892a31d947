package org.cellwright.sim.deposit;

import org.cellwright.chem.PhysicalConstants;

/**
 * Ramified growth in an unsupported binary electrolyte (no excess acid or salt), after Chazalviel (Phys. Rev. A
 * 42 (1990) 7355) and Fleury, Chazalviel, Rosso &amp; Sapoval: at the Sand time the cation is exhausted at
 * the cathode, a space charge forms, and the deposit front then advances at the drift speed of the anions,
 * {@code v = t_a J / (z F c0)}. Below the critical current density of a cell of gap L,
 * {@code J* = 2 z c0 F D_s / (t_a L)}, the steady gradient sustains the current and no front starts. Here z
 * is the cation's charge, t_a the anion's transference number, D_s the salt's diffusion coefficient. The
 * engine's baths are supported (acid in excess), where this regime does not arise; the formulas are kept
 * for comparison and for unsupported baths. SI units.
 */
public final class SpaceChargeFront {

    private static final double F = PhysicalConstants.FARADAY;

    private SpaceChargeFront() {
    }

    /** @return the Sand time of the binary salt, {@code pi D_s (z c0 F)^2 / (4 (J t_a)^2)} (s) */
    public static double sandTimeS(double saltDiffusionM2PerS, int z, double bulkMolPerM3, double currentDensityAPerM2,
                                   double anionTransference) {
        double zcf = z * bulkMolPerM3 * F;
        double jt = currentDensityAPerM2 * anionTransference;
        return Math.PI * saltDiffusionM2PerS * zcf * zcf / (4 * jt * jt);
    }

    /** @return the front speed {@code t_a J / (z F c0)} (m/s) */
    public static double frontVelocity(double currentDensityAPerM2, double anionTransference, int z,
                                       double bulkMolPerM3) {
        return anionTransference * currentDensityAPerM2 / (z * F * bulkMolPerM3);
    }

    /** @return the critical current density {@code 2 z c0 F D_s / (t_a L)} (A/m2) */
    public static double criticalCurrentDensity(int z, double bulkMolPerM3, double saltDiffusionM2PerS,
                                                double anionTransference, double gapM) {
        return 2 * z * bulkMolPerM3 * F * saltDiffusionM2PerS / (anionTransference * gapM);
    }
}
