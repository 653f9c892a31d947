package org.cellwright.sim.deposit;

import org.cellwright.chem.PhysicalConstants;

/**
 * Growth of a dendrite tip toward the anode.
 *
 * <p>The published formulas (symbols: n electrons, F Faraday, V_m molar volume, D diffusion coefficient,
 * c0 bulk concentration, r tip radius, gamma surface energy, eta cathodic overpotential as a positive number):
 * <ol>
 *   <li>Faradaic tip speed {@code v = i V_m / (n F)}.</li>
 *   <li>Barton &amp; Bockris (Proc. R. Soc. A 268 (1962) 485): a tip fed by spherical diffusion with local
 *       equilibrium and the Gibbs-Thomson lowering of its equilibrium potential,
 *       {@code i = (n F D c0 / r) (1 - exp(-(n F / R T)(eta - 2 gamma V_m / (n F r))))}; linearised, the
 *       fastest tip has {@code r_opt = 4 gamma V_m / (n F eta)} and {@code v_max = (n F)^2 D c0 eta^2 / (8 gamma R T)}.</li>
 *   <li>Diggle, Despic &amp; Bockris (J. Electrochem. Soc. 116 (1969) 1503): an activation-controlled tip fed
 *       by spherical diffusion, {@code i = i_k / (1 + i_k r / (n F D c0))} with {@code i_k} the kinetic current
 *       density at the overpotential.</li>
 * </ol>
 *
 * <p>The engine integrates the tip height h above the flat deposit with a model that joins them: the tip is a
 * hemisphere of radius r at the cathode's potential, standing at height h in the flat cathode's linear
 * Nernst layer of thickness delta, where the ion's concentration is
 * {@code c_loc = c_s + (c0 - c_s) min(h / delta, 1)} (the protrusion amplification of Despic and Popov:
 * the higher the tip, the richer the solution it reaches). Its current density is formula 3 at that
 * concentration, with the curvature shift of formula 2 on its kinetics:
 * <pre>
 *   i_tip = i_k' / (1 + i_k' / iL_tip),   i_k' = i_k (c_loc / c0) exp(-alpha_c F dE / R T),
 *   iL_tip = n F D c_loc / r,             dE = 2 gamma V_m / (n F r)
 *   dh/dt = V_m (i_tip - i_flat) / (n F), i_flat = i_k c_s / c0
 * </pre>
 * so a tip grows faster the higher it stands in the layer and fastest once it has left it. Near the flat's
 * limiting current (c_s to 0) and with fast kinetics, {@code dh/dt = V_m D c0 h / (delta r)}: exponential
 * growth inside the layer; outside it, formula 3 at the bulk concentration. Below the limit, at
 * {@code rho = i / iL} with a kinetically limited tip, {@code dh/dt = V_m D c0 h rho^2 / (delta^2 (1 - rho))}:
 * Despic and Popov's delta-squared amplification. A protrusion that grows slower than the flat levels toward
 * its initial height. First-order kinetics in the ion (as the engine's electrode kinetics); the cathodic
 * branch only (the back reaction acts alike on tip and flat and cancels in dh/dt).
 */
public final class TipGrowth {

    /**
     * Surface energy of a metal-solution interface (J/m2): 0.5-2 J/m2 for metals, about 1 is used (physics
     * reference sheet section 8, from memory).
     */
    public static final double SURFACE_ENERGY_J_PER_M2 = 1.0;

    private static final double F = PhysicalConstants.FARADAY;
    private static final double R = PhysicalConstants.GAS_CONSTANT;

    private TipGrowth() {
    }

    /**
     * Formula 1: the speed of a surface growing at a current density.
     *
     * @param iAPerM2 current density (A/m2)
     * @param molarVolumeM3PerMol molar volume of the metal (m3/mol)
     * @param n electrons per atom
     * @return speed (m/s)
     */
    public static double velocity(double iAPerM2, double molarVolumeM3PerMol, double n) {
        return iAPerM2 * molarVolumeM3PerMol / (n * F);
    }

    /**
     * The Gibbs-Thomson lowering of a tip's equilibrium potential, {@code 2 gamma V_m / (n F r)}.
     *
     * @return the shift (V)
     */
    public static double gibbsThomsonShiftV(double gammaJPerM2, double molarVolumeM3PerMol, double n, double radiusM) {
        return 2 * gammaJPerM2 * molarVolumeM3PerMol / (n * F * radiusM);
    }

    /**
     * Formula 2: the current density of a tip fed by spherical diffusion, local equilibrium, curvature.
     *
     * @param n electrons
     * @param diffusionM2PerS D (m2/s)
     * @param bulkMolPerM3 c0 (mol/m3)
     * @param radiusM tip radius (m)
     * @param overpotentialV cathodic overpotential, positive (V)
     * @param gammaJPerM2 surface energy (J/m2)
     * @param molarVolumeM3PerMol V_m (m3/mol)
     * @param tempK temperature (K)
     * @return the tip's current density (A/m2), negative below the curvature threshold (the tip dissolves)
     */
    public static double bartonBockrisCurrent(double n, double diffusionM2PerS, double bulkMolPerM3, double radiusM,
                                              double overpotentialV, double gammaJPerM2, double molarVolumeM3PerMol,
                                              double tempK) {
        double shift = gibbsThomsonShiftV(gammaJPerM2, molarVolumeM3PerMol, n, radiusM);
        return n * F * diffusionM2PerS * bulkMolPerM3 / radiusM
                * -Math.expm1(-(n * F / (R * tempK)) * (overpotentialV - shift));
    }

    /** Formula 2, linearised: the tip radius of fastest growth, {@code 4 gamma V_m / (n F eta)} (m). */
    public static double optimumRadiusM(double gammaJPerM2, double molarVolumeM3PerMol, double n, double overpotentialV) {
        return 4 * gammaJPerM2 * molarVolumeM3PerMol / (n * F * overpotentialV);
    }

    /** Formula 2, linearised: the fastest tip speed, {@code (n F)^2 D c0 eta^2 / (8 gamma R T)} (m/s). */
    public static double maxVelocity(double n, double diffusionM2PerS, double bulkMolPerM3, double overpotentialV,
                                     double gammaJPerM2, double tempK) {
        double nf = n * F;
        return nf * nf * diffusionM2PerS * bulkMolPerM3 * overpotentialV * overpotentialV
                / (8 * gammaJPerM2 * R * tempK);
    }

    /**
     * Formula 3: the speed of an activation-controlled tip fed by spherical diffusion.
     *
     * @param kineticAPerM2 the kinetic current density at the tip's overpotential, i0 exp(alpha_c F eta / R T)
     *     with alpha_c counting the electrons of the whole reaction (A/m2)
     * @return speed (m/s)
     */
    public static double activationVelocity(double kineticAPerM2, double n, double radiusM, double diffusionM2PerS,
                                            double bulkMolPerM3, double molarVolumeM3PerMol) {
        double limit = n * F * diffusionM2PerS * bulkMolPerM3 / radiusM;
        return velocity(kineticAPerM2 / (1 + kineticAPerM2 / limit), molarVolumeM3PerMol, n);
    }

    /**
     * The factor by which curvature slows the tip's kinetics, {@code exp(-alpha_c F dE / R T)}.
     *
     * @param alphaC cathodic transfer coefficient of the whole reaction
     */
    public static double curvatureFactor(double alphaC, double n, double molarVolumeM3PerMol, double radiusM,
                                         double tempK) {
        double shift = gibbsThomsonShiftV(SURFACE_ENERGY_J_PER_M2, molarVolumeM3PerMol, n, radiusM);
        return Math.exp(-alphaC * F * shift / (R * tempK));
    }

    /**
     * The engine's tip: its current density at height {@code h} above the flat deposit.
     *
     * @param s what feeds the tip
     * @param heightM h (m), >= 0
     * @return the tip's current density (A/m2, positive)
     */
    public static double tipCurrentDensity(TipSupply s, double heightM) {
        double x = s.layerM() > 0 ? Math.min(Math.max(heightM, 0) / s.layerM(), 1.0) : 1.0;
        double surface = Math.min(Math.max(s.surfaceRatio(), 0), 1);
        double local = surface + (1 - surface) * x;
        double kinetic = s.kineticAPerM2() * local * s.curvatureFactor();
        double limit = s.n() * F * s.diffusionM2PerS() * s.bulkMolPerM3() * local / s.tipRadiusM();
        if (!(kinetic > 0) || !(limit > 0)) {
            return 0;
        }
        return kinetic / (1 + kinetic / limit);
    }

    /** @return the flat cathode's cathodic current density of the same deposition, i_k c_s / c0 (A/m2) */
    public static double flatCurrentDensity(TipSupply s) {
        return Math.max(s.kineticAPerM2(), 0) * Math.min(Math.max(s.surfaceRatio(), 0), 1);
    }

    /**
     * The engine's tip: how fast it rises above the flat deposit.
     *
     * @param s what feeds the tip
     * @param heightM h (m)
     * @return dh/dt (m/s); when negative (the flat outgrows the tip) scaled by {@code 1 - h0/h}, so that a
     *     protrusion levels toward its initial height and no lower
     */
    public static double heightRate(TipSupply s, double heightM) {
        double v = velocity(tipCurrentDensity(s, heightM) - flatCurrentDensity(s), s.molarVolumeM3PerMol(), s.n());
        if (v < 0) {
            v *= heightM > s.initialHeightM() ? 1 - s.initialHeightM() / heightM : 0;
        }
        return v;
    }
}
