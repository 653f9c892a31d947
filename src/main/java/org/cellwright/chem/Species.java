package org.cellwright.chem;

import java.util.Map;
import java.util.Objects;

/**
 * A dissolved species of the electrolyte.
 *
 * @param name canonical name in trade notation (see {@link SpeciesName})
 * @param charge charge number z (dimensionless, signed)
 * @param molarMassKgPerMol molar mass (kg/mol)
 * @param diffusionM2PerS diffusion coefficient at infinite dilution and 25 C (m2/s)
 * @param conductivitySM2PerMol limiting ionic molar conductivity per mole of the ion as written, 25 C
 *     (S m2/mol); 0 for neutral species
 * @param elements elemental composition (element symbol to atoms per formula unit)
 * @param sources where each number comes from, keyed by property name ("molar_mass", "diffusion",
 *     "conductivity", ...)
 */
public record Species(String name, int charge, double molarMassKgPerMol, double diffusionM2PerS,
                      double conductivitySM2PerMol, Map<String, Integer> elements,
                      Map<String, String> sources) {

    public Species {
        Objects.requireNonNull(name, "name");
        if (!(molarMassKgPerMol > 0)) {
            throw new IllegalArgumentException(name + ": molar mass must be > 0 kg/mol, got " + molarMassKgPerMol);
        }
        if (!(diffusionM2PerS > 0)) {
            throw new IllegalArgumentException(name + ": diffusion coefficient must be > 0 m2/s, got " + diffusionM2PerS);
        }
        if (!(conductivitySM2PerMol >= 0)) {
            throw new IllegalArgumentException(name + ": ionic conductivity must be >= 0 S m2/mol, got "
                    + conductivitySM2PerMol);
        }
        elements = Map.copyOf(elements);
        sources = Map.copyOf(sources);
    }

    /** @return a copy with another diffusion coefficient (m2/s) */
    public Species withDiffusion(double diffusion) {
        return new Species(name, charge, molarMassKgPerMol, diffusion, conductivitySM2PerMol, elements, sources);
    }

    /** @return a copy with another limiting ionic molar conductivity (S m2/mol) */
    public Species withConductivity(double conductivity) {
        return new Species(name, charge, molarMassKgPerMol, diffusionM2PerS, conductivity, elements, sources);
    }
}
