package org.cellwright.sim.ode;

/**
 * In-place LU factorisation with partial (row) pivoting of a small dense square matrix, and the matching
 * forward and back substitution.
 *
 * <p>Doolittle's algorithm as given by Golub and Van Loan, <i>Matrix Computations</i>, 4th ed. (2013),
 * Algorithm 3.4.1 (Gaussian elimination with partial pivoting). Written by hand rather than through
 * Commons Math {@code LUDecomposition} so that the Rosenbrock integrator allocates nothing per step: the engine's
 * systems have 10 to 40 unknowns and are refactored once per step.
 */
final class DenseLu {

    private final int n;
    private final double[][] lu;
    private final int[] pivot;

    /** Creates a workspace for n by n matrices. */
    DenseLu(int n) {
        this.n = n;
        this.lu = new double[n][n];
        this.pivot = new int[n];
    }

    /** The matrix to fill before calling {@link #factor()}; it is overwritten by the factors. */
    double[][] matrix() {
        return lu;
    }

    /**
     * Factors the matrix held in {@link #matrix()}.
     *
     * @return false if a pivot is exactly zero or not finite (singular or invalid matrix), true otherwise
     */
    boolean factor() {
        for (int k = 0; k < n; k++) {
            int p = k;
            double largest = Math.abs(lu[k][k]);
            for (int i = k + 1; i < n; i++) {
                double v = Math.abs(lu[i][k]);
                if (v > largest) {
                    largest = v;
                    p = i;
                }
            }
            if (largest == 0.0 || !Double.isFinite(largest)) {
                return false;
            }
            pivot[k] = p;
            if (p != k) {
                double[] row = lu[p];
                lu[p] = lu[k];
                lu[k] = row;
            }
            double[] rowK = lu[k];
            double inverse = 1.0 / rowK[k];
            for (int i = k + 1; i < n; i++) {
                double[] rowI = lu[i];
                double factor = rowI[k] * inverse;
                rowI[k] = factor;
                if (factor != 0.0) {
                    for (int j = k + 1; j < n; j++) {
                        rowI[j] -= factor * rowK[j];
                    }
                }
            }
        }
        return true;
    }

    /** Solves A x = b in place (b becomes x) with the factors of the last successful {@link #factor()}. */
    void solve(double[] b) {
        for (int k = 0; k < n; k++) {
            int p = pivot[k];
            if (p != k) {
                double t = b[p];
                b[p] = b[k];
                b[k] = t;
            }
        }
        for (int i = 1; i < n; i++) {
            double[] row = lu[i];
            double s = b[i];
            for (int j = 0; j < i; j++) {
                s -= row[j] * b[j];
            }
            b[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double[] row = lu[i];
            double s = b[i];
            for (int j = i + 1; j < n; j++) {
                s -= row[j] * b[j];
            }
            b[i] = s / row[i];
        }
    }
}
