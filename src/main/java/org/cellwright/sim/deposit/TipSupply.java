package org.cellwright.sim.deposit;

/**
 * What feeds a dendrite tip at one instant: the depositing metal's ion in the bath and in the cathode's
 * diffusion layer, the kinetics of its reduction at the cathode's potential, and the tip's geometry. SI units.
 *
 * @param n electrons per metal atom
 * @param molarVolumeM3PerMol molar volume of the metal (m3/mol)
 * @param diffusionM2PerS diffusion coefficient of the metal's ion (m2/s)
 * @param bulkMolPerM3 bulk concentration of the ion (mol/m3)
 * @param layerM thickness of the flat cathode's Nernst diffusion layer (m)
 * @param surfaceRatio surface over bulk concentration of the ion at the flat cathode, 0..1
 * @param kineticAPerM2 cathodic kinetic current density of the deposition at the cathode's potential and the
 *     bulk composition (A/m2, positive): the current with no mass-transfer loss
 * @param tipRadiusM radius of the hemispherical tip (m)
 * @param curvatureFactor the factor by which the tip's curvature slows its kinetics, exp(-alpha_c F dE / RT)
 *     with dE the Gibbs-Thomson shift (see {@link TipGrowth#gibbsThomsonShiftV})
 * @param initialHeightM height below which a protrusion does not level further (m)
 */
public record TipSupply(double n, double molarVolumeM3PerMol, double diffusionM2PerS, double bulkMolPerM3,
                        double layerM, double surfaceRatio, double kineticAPerM2, double tipRadiusM,
                        double curvatureFactor, double initialHeightM) {
}
