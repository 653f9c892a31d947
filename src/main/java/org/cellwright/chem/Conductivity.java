package org.cellwright.chem;

import java.util.Map;

/**
 * Electrolytic conductivity of a bath from its composition and temperature, and the Bruggeman correction for
 * gas bubbles. Pure functions; SI units (S/m, mol/m3, K).
 *
 * <p>Model (fitted parameters and their validation: docs/conductivity.md):
 * <pre>
 *   kappa = sum_i c_i lambda_i                       (free ions after {@link ElectrolyteSpeciation})
 *   lambda_i = lambda0_i (mu(25 C) / mu(T))^s_i / (1 + R_i z_i^2 sqrt(I))
 *   lambda_H = lambda0_H (mu(25 C) / mu(T))^s_H / (1 + R_H sqrt(I) + D_Cl c_Cl)
 * </pre>
 * {@code lambda0_i} is the library's limiting ionic molar conductivity at 25 C (per mole of ion), {@code I}
 * the ionic strength of the free ions and {@code c_Cl} the chloride concentration, both in mol/L, and
 * {@code mu} the viscosity of water ({@link WaterViscosity}). The denominator is a Kohlrausch /
 * Debye-Hückel-Onsager type concentration correction: at low I it is the Onsager form
 * {@code lambda0 (1 - R z^2 sqrt(I))}. R = 0.47 for every ion but H+; the Grotthuss proton has R_H = 0.20 and
 * loses mobility further in concentrated chloride (D_Cl = 0.14 L/mol; ion association of H3O+ with Cl-),
 * which is what lets one parameter set fit both hydrochloric and sulfuric acid. R, R_H, D_Cl and the
 * bisulfate slope of {@link ElectrolyteSpeciation} were fitted by least squares (relative error) to the CRC
 * conductivities of HCl, H2SO4, NaCl and CuSO4 from 0.09 to 3 mol/L (20 C) and to the CRC 25 C equivalent
 * conductivities at 0.005-0.1 mol/L. Validated up to an ionic strength of about 3 mol/L
 * ({@link #VALIDATED_IONIC_STRENGTH_MOL_PER_L}); beyond, it misses the conductivity maximum of concentrated
 * acids (20 % HCl: +35 %).
 *
 * <p>Temperature follows a Walden-type law with an exponent per ion,
 * {@code s_i = ln(lambda_25 / lambda_18) / ln(mu_18 / mu_25)}, computed from the limiting ionic conductances
 * at 18 and 25 C of Lange's Handbook of Chemistry, Table 8.32 (H+ 0.61, OH- 0.77, Na+ 0.84, K+ 0.77, Ag+ 0.76,
 * Zn2+ and Pb2+ 0.95, Fe2+ 0.99; anions Cl- 0.91, NO3- 0.87, SO4^2- 0.93 from memory); other ions take 0.90.
 */
public final class Conductivity {

    /** Onsager-type coefficient for every ion except H+, (L/mol)^1/2; fitted. */
    static final double RETARDATION = 0.47;
    /** Onsager-type coefficient for H+, (L/mol)^1/2; fitted. */
    static final double PROTON_RETARDATION = 0.20;
    /** Loss of proton mobility per mol/L of chloride, L/mol; fitted. */
    static final double PROTON_CHLORIDE = 0.14;
    /** Highest ionic strength (mol/L) of the handbook data the model was checked against. */
    public static final double VALIDATED_IONIC_STRENGTH_MOL_PER_L = 3.0;
    /** Walden-type temperature exponent for ions without their own value. */
    static final double DEFAULT_EXPONENT = 0.90;
    private static final Map<String, Double> EXPONENTS = Map.ofEntries(
            Map.entry("H+", 0.613), Map.entry("OH-", 0.769), Map.entry("Na+", 0.841), Map.entry("K+", 0.768),
            Map.entry("Ag+", 0.758), Map.entry("Zn2+", 0.953), Map.entry("Pb2+", 0.953), Map.entry("Fe2+", 0.990),
            Map.entry("Cl-", 0.911), Map.entry("NO3-", 0.873), Map.entry("SO4^2-", 0.932));

    private static final String CHLORIDE = "Cl-";

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
        double chloride = speciation.free().getOrDefault(CHLORIDE, 0.0) / 1000.0;
        double kappa = 0;
        for (var e : speciation.free().entrySet()) {
            Species s = library.findSpecies(e.getKey()).orElseThrow();
            if (s.charge() == 0 || e.getValue() <= 0) {
                continue;
            }
            double z2 = (double) s.charge() * s.charge();
            double correction = s.name().equals(ElectrolyteSpeciation.HYDROGEN)
                    ? 1 + PROTON_RETARDATION * sqrtI + PROTON_CHLORIDE * chloride
                    : 1 + RETARDATION * z2 * sqrtI;
            double lambda = s.conductivitySM2PerMol() * Math.pow(viscosityRatio, temperatureExponent(s.name()))
                    / correction;
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
