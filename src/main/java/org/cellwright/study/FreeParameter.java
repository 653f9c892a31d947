package org.cellwright.study;

import java.util.Objects;

/**
 * A quantity a fit may change: a scenario key such as {@code cell.diffusion_layer} or
 * {@code reaction.H+/H2.i0}, where it starts and the scale it moves on.
 *
 * @param key the scenario key (dotted path), or any name for a model outside the engine
 * @param start the starting value (SI)
 * @param scale the scale the optimiser moves it on
 * @param typical a typical magnitude (SI, > 0): sets the finite-difference step of a linear parameter that
 *     starts at or near zero
 */
public record FreeParameter(String key, double start, ParameterScale scale, double typical) {

    public FreeParameter {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(scale, "scale");
        if (!Double.isFinite(start)) {
            throw new IllegalArgumentException(key + ": the starting value must be a finite number, got " + start);
        }
        if (scale == ParameterScale.LOG && !(start > 0)) {
            throw new IllegalArgumentException(key + ": a parameter fitted on a log scale must start above zero, got "
                    + start);
        }
        if (scale == ParameterScale.NON_NEGATIVE && start < 0) {
            throw new IllegalArgumentException(key + ": must not start below zero, got " + start);
        }
        if (!(typical > 0) || !Double.isFinite(typical)) {
            throw new IllegalArgumentException(key + ": the typical magnitude must be > 0, got " + typical);
        }
    }

    /** @return a parameter with a typical magnitude equal to its start (or 1 when it starts at zero) */
    public static FreeParameter of(String key, double start, ParameterScale scale) {
        return new FreeParameter(key, start, scale, start != 0 ? Math.abs(start) : 1.0);
    }

    /** @return the same parameter starting elsewhere */
    public FreeParameter startingAt(double value) {
        return new FreeParameter(key, value, scale, typical);
    }
}
