package org.cellwright.study;

import java.util.List;

/**
 * The outcome of a least-squares fit: the values with their confidence intervals and how well the model
 * matches.
 *
 * @param parameters the fitted parameters, in the order given
 * @param iterations iterations of the Levenberg-Marquardt optimiser
 * @param evaluations model evaluations, the finite-difference Jacobians' included
 * @param observations number of residuals n
 * @param sumOfSquares weighted residual sum of squares at the optimum
 * @param residualSd residual standard deviation s = sqrt(SS / (n - p)), in weighted units
 * @param correlation correlation matrix of the parameters' internal values (p x p)
 * @param converged false when the optimiser stopped at its iteration limit; the values are then the best
 *     point seen, and the intervals are those at it
 */
public record FitOutcome(List<FittedParameter> parameters, int iterations, long evaluations, int observations,
                         double sumOfSquares, double residualSd, double[][] correlation, boolean converged) {

    public FitOutcome {
        parameters = List.copyOf(parameters);
    }

    /** @return the degrees of freedom n - p */
    public int degreesOfFreedom() {
        return observations - parameters.size();
    }

    /** @return the fitted values (SI), in parameter order */
    public double[] values() {
        return parameters.stream().mapToDouble(FittedParameter::value).toArray();
    }

    /**
     * @param key a parameter's key
     * @return its fitted value and interval
     * @throws IllegalArgumentException when no parameter has that key
     */
    public FittedParameter parameter(String key) {
        return parameters.stream().filter(p -> p.key().equals(key)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no fitted parameter '" + key + "'"));
    }
}
