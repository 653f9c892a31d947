package org.cellwright.sim;

import org.cellwright.chem.PhysicalConstants;
import org.cellwright.chem.Species;

import java.util.List;

/**
 * Transport properties of the bath that follow composition and temperature: diffusion coefficients and
 * the electrolytic conductivity.
 */
final class BathProperties {

    private final List<Species> species;
    private final Double pinnedConductivity;
    private final double pinnedAtK;

    BathProperties(List<Species> species, Double pinnedConductivitySPerM, double pinnedAtK) {
        this.species = species;
        this.pinnedConductivity = pinnedConductivitySPerM;
        this.pinnedAtK = pinnedAtK;
    }

    /** @return the diffusion coefficient of species {@code j} at {@code tempK} (m2/s) */
    double diffusion(int j, double tempK) {
        return species.get(j).diffusionM2PerS() * viscosityRatio(tempK) * tempK / PhysicalConstants.REFERENCE_TEMPERATURE_K;
    }

    /** @return the conductivity of the bath (S/m) */
    double conductivity(double[] c, double tempK) {
        if (pinnedConductivity != null) {
            return pinnedConductivity * viscosityRatio(tempK) / viscosityRatio(pinnedAtK);
        }
        double sum = 0;
        double ionic = 0;
        for (int j = 0; j < c.length; j++) {
            Species s = species.get(j);
            sum += s.conductivitySM2PerMol() * c[j];
            ionic += 0.5 * s.charge() * s.charge() * c[j] * 1e-3;
        }
        double sq = Math.sqrt(ionic);
        return sum * (1 - 0.6 * sq / (1 + sq)) * viscosityRatio(tempK);
    }

    /** Water viscosity at 25 C over viscosity at T (interim Andrade-type fit; replaced by chem data). */
    private static double viscosityRatio(double tempK) {
        return Math.exp(1780.0 * (1 / PhysicalConstants.REFERENCE_TEMPERATURE_K - 1 / tempK));
    }

    /** @return molar volume of an ideal gas at {@code tempK} and 1 atm (m3/mol) */
    static double gasMolarVolume(double tempK) {
        return PhysicalConstants.GAS_CONSTANT * tempK / PhysicalConstants.STANDARD_ATMOSPHERE_PA;
    }
}
