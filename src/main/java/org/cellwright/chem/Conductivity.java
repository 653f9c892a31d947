package org.cellwright.chem;

import java.util.Map;

/**
 * Electrolytic conductivity of a bath from its composition and temperature, and the Bruggeman correction for
 * gas bubbles. Pure functions; SI units (S/m, mol/m3, K).
 *
 * <p>Model (fitted parameters and their validation: docs/conductivity.md):
 * <pre>
 *   kappa = sum_i c_i lambda_i                       (free ions after {@link ElectrolyteSpeciation})
 *   lambda_i = lambda0_i (mu(25 C) / mu(T))^s_i / (1 + R_i z_i^2 sqrt(I) + D_i I)
 * </pre>
 * {@code lambda0_i} is the library's limiting ionic molar conductivity at 25 C (per mole of ion), {@code I}
 * the ionic strength of the free ions in mol/L and {@code mu} the viscosity of water ({@link WaterViscosity}).
 * The denominator is a Kohlrausch / Debye-Hückel-Onsager type concentration correction (its low-I limit is the
 * Onsager form {@code lambda0 (1 - R z^2 sqrt(I))}), with R = 0.45 for all ions except H+, for which
 * R = 0.15 and D = 0.18 L/mol (the Grotthuss proton loses mobility more slowly at first, then steadily).
 * R, R_H, D_H and the bisulfate slope of {@link ElectrolyteSpeciation} were fitted by least squares (relative
 * error) to CRC conductivities of HCl, H2SO4, NaCl and CuSO4 at 0.09-2 mol/L (20 C) and to the CRC 25 C
 * equivalent conductivities at 0.005-0.1 mol/L. Temperature follows a Walden-type law with an exponent per
 * ion, {@code s_i = ln(lambda_25 / lambda_18) / ln(mu_18 / mu_25)}, computed from the limiting ionic
 * conductances at 18 and 25 C of Lange's Handbook of Chemistry, Table 8.32 (H+ 0.61, OH- 0.77, Na+ 0.84,
 * K+ 0.77, Ag+ 0.76, Zn2+ and Pb2+ 0.95, Fe2+ 0.99; anions Cl- 0.91, NO3- 0.87, SO4^2- 0.93 from memory);
 * other ions take 0.90.
 */
public final class Conductivity {

    /** Onsager-type coefficient for every ion except H+, (L/mol)^1/2; fitted. */
    static final double RETARDATION = 0.45;
    /** Onsager-type coefficient for H+, (L/mol)^1/2; fitted. */
    static final double PROTON_RETARDATION = 0.15;
    /** Linear term for H+, L/mol; fitted. */
    static final double PROTON_LINEAR = 0.18;
    /** Walden-type temperature exponent for ions without their own value. */
    static final double DEFAULT_EXPONENT = 0.90;
    private static final Map<String, Double> EXPONENTS = Map.ofEntries(
            Map.entry("H+", 0.613), Map.entry("OH-", 0.769), Map.entry("Na+", 0.841), Map.entry("K+", 0.768),
            Map.entry("Ag+", 0.758), Map.entry("Zn2+", 0.953), Map.entry("Pb2+", 0.953), Map.entry("Fe2+", 0.990),
            Map.entry("Cl-", 0.911), Map.entry("NO3-", 0.873), Map.entry("SO4^2-", 0.932));

    private Conductivity() {
    }

    /**
     * @param library species data (charges, limiting conductivities)
     * @param molPerM3 composition by species name (any accepted notation), mol/m3; H+, HSO4- and SO4^2- are
     *     totals that the sulfate equilibria redistribute
     * @param tempK temperature (K)
     * @return the conductivity (S/m)
     */
    public static double of(ChemLibrary library, Map<String, Double> molPerM3, double tempK) {
        return of(library, ElectrolyteSpeciation.of(library, molPerM3), tempK);
    }

    /**
     * @param library species data
     * @param speciation free-ion composition
     * @param tempK temperature (K)
     * @return the conductivity (S/m)
     */
    public static double of(ChemLibrary library, ElectrolyteSpeciation speciation, double tempK) {
        double viscosityRatio = WaterViscosity.of(PhysicalConstants.REFERENCE_TEMPERATURE_K) / WaterViscosity.of(tempK);
        double ionic = speciation.ionicStrengthMolPerL();
        double sqrtI = Math.sqrt(ionic);
        double kappa = 0;
        for (var e : speciation.free().entrySet()) {
            Species s = library.findSpecies(e.getKey()).orElseThrow();
            if (s.charge() == 0 || e.getValue() <= 0) {
                continue;
            }
            boolean proton = s.name().equals(ElectrolyteSpeciation.HYDROGEN);
            double r = proton ? PROTON_RETARDATION : RETARDATION;
            double d = proton ? PROTON_LINEAR : 0.0;
            double z2 = (double) s.charge() * s.charge();
            double lambda = s.conductivitySM2PerMol() * Math.pow(viscosityRatio, temperatureExponent(s.name()))
                    / (1 + r * z2 * sqrtI + d * ionic);
            kappa += e.getValue() * lambda;
        }
        return kappa;
    }

    /** @return the Walden-type temperature exponent of this ion (see the class description) */
    public static double temperatureExponent(String canonicalName) {
        return EXPONENTS.getOrDefault(canonicalName, DEFAULT_EXPONENT);
    }

    /**
     * Bruggeman's correction for a dispersed non-conducting phase (gas bubbles):
     * {@code kappa_eff = kappa (1 - eps)^1.5}. Source: D. A. G. Bruggeman, Ann. Phys. 24 (1935) 636; applied to
     * gas-evolving cells by C. W. Tobias, J. Electrochem. Soc. 106 (1959) 833.
     *
     * @param kappa bubble-free conductivity (S/m)
     * @param voidFraction gas volume fraction, 0 <= eps < 1
     * @return the effective conductivity (S/m)
     */
    public static double bruggeman(double kappa, double voidFraction) {
        if (!(voidFraction >= 0 && voidFraction < 1)) {
            throw new IllegalArgumentException("void fraction must be in [0, 1), got " + voidFraction);
        }
        return kappa * Math.pow(1 - voidFraction, 1.5);
    }

    /**
     * Temperature scaling of a diffusion coefficient by Stokes-Einstein (see {@link WaterViscosity}).
     *
     * @param d25 diffusion coefficient at 25 C (m2/s)
     * @param tempK temperature (K)
     * @return the diffusion coefficient at {@code tempK} (m2/s)
     */
    public static double diffusionAt(double d25, double tempK) {
        return WaterViscosity.diffusionAt(d25, tempK);
    }
}
