package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * The statistics of a least-squares optimum: the covariance {@code s^2 (J^T J)^-1} of the parameters'
 * internal values, with {@code s^2 = SS / (n - p)}, formed through the singular value decomposition of the
 * Jacobian J (which also shows combinations of parameters the data cannot tell apart), and the 95 %
 * intervals {@code u +- t(0.975, n - p) se} mapped back to values.
 *
 * <p>Source: Bates and Watts, Nonlinear Regression Analysis and Its Applications (Wiley, 1988), section 2.3
 * (linear approximation inference regions); the same statistics the NIST StRD certified standard deviations
 * are computed with (NIST/ITL StRD, nonlinear regression, "certified values").
 */
final class ParameterCovariance {

    /** Singular values below this fraction of the largest mean directions the data do not determine. */
    static final double RANK_TOLERANCE = 1e-10;

    private ParameterCovariance() {
    }

    /**
     * Fails with a plain message when a parameter does not move any residual.
     *
     * @param parameters the free parameters
     * @param jac the Jacobian at the start (n x p)
     * @throws IllegalArgumentException naming each parameter whose column is zero
     */
    static void requireSensitive(List<FreeParameter> parameters, double[][] jac) {
        double[] norms = columnNorms(jac, parameters.size());
        double max = 0;
        for (double v : norms) {
            max = Math.max(max, v);
        }
        List<String> dead = new ArrayList<>();
        for (int j = 0; j < norms.length; j++) {
            if (norms[j] == 0 || norms[j] < 1e-12 * max) {
                dead.add(parameters.get(j).key());
            }
        }
        if (!dead.isEmpty()) {
            throw new InsensitiveParameterException(dead);
        }
    }

    private static double[] columnNorms(double[][] jac, int p) {
        double[] norms = new double[p];
        for (double[] row : jac) {
            for (int j = 0; j < p; j++) {
                norms[j] += row[j] * row[j];
            }
        }
        for (int j = 0; j < p; j++) {
            norms[j] = Math.sqrt(norms[j]);
        }
        return norms;
    }

    /**
     * @param parameters the free parameters
     * @param u the optimum (internal values)
     * @param r the weighted residuals there
     * @param jac the Jacobian there (n x p, internal scale)
     * @param iterations iterations taken
     * @param evaluations model evaluations taken
     * @param converged whether the optimiser converged
     * @return the fit's outcome
     */
    static FitOutcome outcome(List<FreeParameter> parameters, double[] u, double[] r, double[][] jac, int iterations,
                              long evaluations, boolean converged) {
        int n = r.length;
        int p = parameters.size();
        double ss = LeastSquaresFit.sumOfSquares(r);
        int dof = n - p;
        double s2 = ss / dof;
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false));
        double[] sigma = svd.getSingularValues();
        RealMatrix v = svd.getV();
        double cut = sigma[0] * RANK_TOLERANCE;
        double[][] cov = new double[p][p];
        boolean[] unbounded = new boolean[p];
        for (int k = 0; k < sigma.length; k++) {
            if (sigma[k] <= cut) {
                for (int j = 0; j < p; j++) {
                    if (Math.abs(v.getEntry(j, k)) > 0.1) {
                        unbounded[j] = true;
                    }
                }
                continue;
            }
            double w = s2 / (sigma[k] * sigma[k]);
            for (int i = 0; i < p; i++) {
                for (int j = 0; j < p; j++) {
                    cov[i][j] += w * v.getEntry(i, k) * v.getEntry(j, k);
                }
            }
        }
        double t = new TDistribution(dof).inverseCumulativeProbability(0.975);
        List<FittedParameter> fitted = new ArrayList<>();
        double[] se = new double[p];
        for (int j = 0; j < p; j++) {
            FreeParameter fp = parameters.get(j);
            se[j] = unbounded[j] ? Double.POSITIVE_INFINITY : Math.sqrt(cov[j][j]);
            double lo = unbounded[j] ? Double.NEGATIVE_INFINITY : fp.scale().toValue(u[j] - t * se[j]);
            double hi = unbounded[j] ? Double.POSITIVE_INFINITY : fp.scale().toValue(u[j] + t * se[j]);
            if (unbounded[j] && fp.scale() != ParameterScale.LINEAR) {
                lo = 0;
            }
            fitted.add(new FittedParameter(fp.key(), fp.scale().toValue(u[j]), lo, hi, se[j], fp.scale()));
        }
        double[][] corr = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                corr[i][j] = unbounded[i] || unbounded[j] ? Double.NaN : cov[i][j] / (se[i] * se[j]);
            }
        }
        return new FitOutcome(fitted, iterations, evaluations, n, ss, Math.sqrt(s2), corr, converged);
    }
}
