package org.cellwright.cell;

import java.util.Objects;

/** A condition that ends a run before its duration. Each maps to a root-found event in the engine. */
public sealed interface StopCondition {

    /** Stop when a dendrite bridges the gap (otherwise a short only raises a warning). */
    record ShortCircuit() implements StopCondition {
    }

    /**
     * Stop when a dissolved species falls below a concentration.
     *
     * @param species canonical species name
     * @param molPerM3 threshold (mol/m3)
     */
    record SpeciesBelow(String species, double molPerM3) implements StopCondition {
        public SpeciesBelow {
            Objects.requireNonNull(species, "species");
            Checks.nonNegative("stop threshold", molPerM3, "mol/m3");
        }
    }

    /**
     * Stop when the bath temperature rises above a value.
     *
     * @param kelvin threshold (K)
     */
    record TemperatureAbove(double kelvin) implements StopCondition {
    }

    /**
     * Stop when the cell voltage rises above a value.
     *
     * @param volts threshold (V)
     */
    record VoltageAbove(double volts) implements StopCondition {
    }

    /**
     * Stop when the deposit of a metal reaches a mass.
     *
     * @param metal metal symbol
     * @param kg threshold (kg)
     */
    record DepositAbove(String metal, double kg) implements StopCondition {
        public DepositAbove {
            Objects.requireNonNull(metal, "metal");
            Checks.positive("stop threshold", kg, "kg");
        }
    }
}
