package org.cellwright.study;

import java.util.List;

/**
 * Where a running fit stands.
 *
 * @param iteration iterations of the optimiser so far (1 for the first Jacobian)
 * @param evaluations model evaluations so far (engine runs, for a fit to a log)
 * @param sumOfSquares weighted residual sum of squares at the current point
 * @param keys the free parameters' keys
 * @param values their current values (SI), in the order of {@code keys}
 */
public record FitProgress(int iteration, long evaluations, double sumOfSquares, List<String> keys,
                          double[] values) {

    public FitProgress {
        keys = List.copyOf(keys);
        values = values.clone();
    }
}
