package org.cellwright.study;

/**
 * A free parameter's value at the optimum, with its 95 % confidence interval.
 *
 * <p>The interval is {@code u +- t(0.975, n - p) * se(u)} on the parameter's internal scale (see
 * {@link ParameterScale}), mapped back: a factor either way for a log-scale parameter, symmetric for a linear
 * one, cut at zero for a non-negative one. It is the usual linearised interval of nonlinear least squares
 * (Bates and Watts, Nonlinear Regression Analysis and Its Applications, Wiley 1988, section 2.3); it assumes
 * independent errors of equal variance after weighting, and a model that is nearly linear across it.
 *
 * @param key the parameter's key
 * @param value the fitted value (SI)
 * @param low lower end of the 95 % interval (SI); -infinity when the data do not bound it
 * @param high upper end (SI); +infinity when the data do not bound it
 * @param standardError standard error on the internal scale (for a log-scale parameter, the relative error)
 * @param scale the scale it was fitted on
 */
public record FittedParameter(String key, double value, double low, double high, double standardError,
                              ParameterScale scale) {

    /** @return true when the data bound the parameter on both sides */
    public boolean bounded() {
        return Double.isFinite(low) && Double.isFinite(high);
    }

    /**
     * @param v a value (SI)
     * @return true when {@code v} lies inside the 95 % interval
     */
    public boolean covers(double v) {
        return v >= low && v <= high;
    }
}
