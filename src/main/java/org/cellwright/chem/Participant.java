package org.cellwright.chem;

import java.util.Objects;

/**
 * One participant of a reaction with its signed stoichiometric coefficient.
 *
 * <p>For an electrode reaction written as a reduction {@code O + n e- = R}, participants on the
 * oxidised (left) side have negative coefficients and those on the reduced (right) side positive ones.
 * For a homogeneous reaction, reactants are negative and products positive.
 *
 * @param name species name, metal symbol, gas formula ("H2", "O2", "Cl2") or "H2O"
 * @param coefficient signed stoichiometric coefficient
 * @param phase the phase the participant is in
 */
public record Participant(String name, double coefficient, Phase phase) {

    public Participant {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(phase, "phase");
        if (coefficient == 0 || !Double.isFinite(coefficient)) {
            throw new IllegalArgumentException(name + ": stoichiometric coefficient must be finite and non-zero");
        }
    }
}
