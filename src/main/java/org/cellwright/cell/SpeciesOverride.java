package org.cellwright.cell;

/**
 * A scenario's override or addition of a species; null fields keep the library value.
 *
 * @param name canonical species name
 * @param charge charge number, or null
 * @param molarMassKgPerMol molar mass (kg/mol), or null
 * @param diffusionM2PerS diffusion coefficient at 25 C (m2/s), or null
 * @param conductivitySM2PerMol limiting ionic molar conductivity (S m2/mol), or null
 */
public record SpeciesOverride(String name, Integer charge, Double molarMassKgPerMol, Double diffusionM2PerS,
                              Double conductivitySM2PerMol) {
}
