package org.cellwright.sim;

import java.util.List;

import org.cellwright.chem.BathConductivity;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.chem.Species;
import org.cellwright.chem.WaterViscosity;

/**
 * Transport properties of the bath that follow composition and temperature: diffusion coefficients
 * (Stokes-Einstein with the viscosity of water), the electrolytic conductivity (the library's model,
 * {@link BathConductivity}, evaluated at every call so that the rates stay a smooth function of the state)
 * and, from the same speciation, the free H+ that sets the acid's activity in sulfate baths (much of the
 * acid is bound as HSO4-).
 * A pinned conductivity follows temperature by Walden's rule, {@code kappa mu = const} (viscosity of water).
 */
final class BathProperties {

    /** Property evaluation is clamped to the liquid range of water (K). */
    private static final double LOWEST_K = 273.15;
    private static final double HIGHEST_K = 373.15;

    private final Double pinnedConductivity;
    private final double pinnedMu;
    private final double muRef;
    private final BathConductivity conductivity;

    BathProperties(ChemLibrary chem, List<Species> species, Double pinnedConductivitySPerM, double pinnedAtK) {
        this.pinnedConductivity = pinnedConductivitySPerM;
        this.pinnedMu = WaterViscosity.of(clamp(pinnedAtK));
        this.muRef = WaterViscosity.of(PhysicalConstants.REFERENCE_TEMPERATURE_K);
        this.conductivity = new BathConductivity(chem, species.stream().map(Species::name).toList());
    }

    private static double clamp(double tempK) {
        return Math.min(Math.max(tempK, LOWEST_K), HIGHEST_K);
    }

    /**
     * @param tempK temperature (K)
     * @return the Stokes-Einstein factor {@code D(T)/D(25 C) = (T/298.15) mu(25 C)/mu(T)}
     */
    double diffusionFactor(double tempK) {
        double t = clamp(tempK);
        return (t / PhysicalConstants.REFERENCE_TEMPERATURE_K) * muRef / WaterViscosity.of(t);
    }

    /**
     * The conductivity of the bath without gas (S/m). Also speciates the bath for
     * {@link #freeConcentration}, also when the conductivity is pinned.
     */
    double conductivity(double[] c, double tempK) {
        double t = clamp(tempK);
        double model = conductivity.of(c, t);
        return pinnedConductivity != null ? pinnedConductivity * pinnedMu / WaterViscosity.of(t) : model;
    }

    /**
     * @param j species index
     * @param total the species' total concentration (mol/m3)
     * @return its free concentration after the sulfate equilibria of the last {@link #conductivity} call
     *     (mol/m3); the total for species the equilibria do not touch
     */
    double freeConcentration(int j, double total) {
        return conductivity.freeMolPerM3(j);
    }

    /** @return molar volume of an ideal gas at {@code tempK} and 1 atm (m3/mol) */
    static double gasMolarVolume(double tempK) {
        return PhysicalConstants.GAS_CONSTANT * tempK / PhysicalConstants.STANDARD_ATMOSPHERE_PA;
    }
}
