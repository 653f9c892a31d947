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
    private final double[][] input;
    private final double[][] lu;
    private final int[] pivot;
    private final int[] order;
    private final double[] work;

    /** Creates a workspace for n by n matrices. */
    DenseLu(int n) {
        this.n = n;
        this.input = new double[n][n];
        this.lu = new double[n][n];
        this.pivot = new int[n];
        this.order = new int[n];
        this.work = new double[n];
    }

    /** The matrix to fill before calling {@link #factor()}; the factors are kept apart from it. */
    double[][] matrix() {
        return input;
    }

    /**
     * Orders the unknowns so that those whose column holds only its diagonal come first (components that
     * nothing else depends on, such as running totals), then permutes the matrix symmetrically. Such a
     * column needs no elimination, and the rest is eliminated among the coupled unknowns only: the cost
     * falls from n^3/3 to about m^3/3 for m coupled unknowns, with the same factors up to the permutation.
     */
    private void permute() {
        int next = 0;
        for (int k = 0; k < n; k++) {
            if (diagonalOnly(k)) {
                order[next++] = k;
            }
        }
        for (int k = 0; k < n; k++) {
            if (!diagonalOnly(k)) {
                order[next++] = k;
            }
        }
        for (int i = 0; i < n; i++) {
            double[] from = input[order[i]];
            double[] to = lu[i];
            for (int j = 0; j < n; j++) {
                to[j] = from[order[j]];
            }
        }
    }

    private boolean diagonalOnly(int k) {
        for (int i = 0; i < n; i++) {
            if (i != k && input[i][k] != 0.0) {
                return false;
            }
        }
        return true;
    }

    /**
     * Factors the matrix held in {@link #matrix()}.
     *
     * @return false if a pivot is exactly zero or not finite (singular or invalid matrix), true otherwise
     */
    boolean factor() {
        permute();
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
    void solve(double[] rhs) {
        double[] b = work;
        for (int i = 0; i < n; i++) {
            b[i] = rhs[order[i]];
        }
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
        for (int i = 0; i < n; i++) {
            rhs[order[i]] = b[i];
        }
    }
}
