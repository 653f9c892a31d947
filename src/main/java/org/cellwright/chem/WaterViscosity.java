package org.cellwright.chem;

/**
 * Dynamic viscosity of liquid water at 0.1 MPa, and the Stokes-Einstein temperature scaling of diffusion
 * coefficients built on it.
 *
 * <p>Table: CRC Handbook of Chemistry and Physics, 92nd ed., "Viscosity of water at temperatures between
 * -24 C and 100 C" (from memory; the values agree with the IAPWS 2008 formulation within 0.1 %), every 5 C
 * from 0 to 100 C. Between table points {@code ln(mu)} is interpolated linearly in temperature (error below
 * 0.1 % against the printed table at the half-way points); from -20 to 0 C and from 100 to 120 C the end
 * segments are extended.
 */
public final class WaterViscosity {

    private static final double FIRST_C = 0.0;
    private static final double STEP_C = 5.0;
    /** mPa s at 0, 5, ..., 100 C. */
    private static final double[] MPA_S = {
        1.7914, 1.5182, 1.3060, 1.1376, 1.0016, 0.8900, 0.7972, 0.7191, 0.6527, 0.5963,
        0.5465, 0.5036, 0.4660, 0.4329, 0.4035, 0.3775, 0.3544, 0.3337, 0.3146, 0.2977, 0.2818};
    private static final double LOWEST_C = -20.0;
    private static final double HIGHEST_C = 120.0;

    private WaterViscosity() {
    }

    /**
     * @param tempK temperature (K), -20 to 120 C
     * @return the viscosity of water (Pa s)
     */
    public static double of(double tempK) {
        double c = tempK - PhysicalConstants.ZERO_CELSIUS_K;
        if (!(c >= LOWEST_C && c <= HIGHEST_C)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "water viscosity is tabulated for %.0f to %.0f C, not %.2f C", LOWEST_C, HIGHEST_C, c));
        }
        double x = (c - FIRST_C) / STEP_C;
        int i = (int) Math.floor(x);
        i = Math.max(0, Math.min(MPA_S.length - 2, i));
        double f = x - i;
        double ln = (1 - f) * Math.log(MPA_S[i]) + f * Math.log(MPA_S[i + 1]);
        return Math.exp(ln) * 1e-3;
    }

    /**
     * Stokes-Einstein scaling of a diffusion coefficient: {@code D(T) = D25 (T / 298.15 K) mu(25 C) / mu(T)}.
     *
     * @param d25 diffusion coefficient at 25 C (m2/s)
     * @param tempK temperature (K)
     * @return the diffusion coefficient at {@code tempK} (m2/s)
     */
    public static double diffusionAt(double d25, double tempK) {
        double ref = PhysicalConstants.REFERENCE_TEMPERATURE_K;
        return d25 * (tempK / ref) * of(ref) / of(tempK);
    }
}
