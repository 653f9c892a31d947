package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/** Compares the hand-written LU solve with Commons Math's {@code LUDecomposition}. */
class DenseLuTest {

    @Test
    void solvesLikeCommonsMathOnRandomSystems() {
        long seed = 20250601L;
        SplittableRandom random = new SplittableRandom(seed);
        for (int n : new int[] {1, 3, 10, 40}) {
            double[][] a = new double[n][n];
            double[] b = new double[n];
            DenseLu lu = new DenseLu(n);
            for (int i = 0; i < n; i++) {
                b[i] = random.nextDouble(-1.0, 1.0);
                for (int j = 0; j < n; j++) {
                    // entries spanning six decades, like a chemistry Jacobian
                    a[i][j] = random.nextDouble(-1.0, 1.0) * Math.pow(10.0, random.nextInt(-3, 4));
                    lu.matrix()[i][j] = a[i][j];
                }
            }
            assertTrue(lu.factor(), "seed " + seed);
            double[] x = b.clone();
            lu.solve(x);
            double[] expected = new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver()
                    .solve(new ArrayRealVector(b)).toArray();
            // both use partial pivoting; agreement to 1e-9 relative leaves room for the condition number
            for (int i = 0; i < n; i++) {
                assertArrayEquals(new double[] {expected[i]}, new double[] {x[i]},
                        1.0e-9 * Math.max(1.0, Math.abs(expected[i])), "seed " + seed + ", n " + n + ", i " + i);
            }
        }
    }

    @Test
    void reportsSingularMatrix() {
        DenseLu lu = new DenseLu(3);
        double[][] m = lu.matrix();
        double[][] singular = {{1.0, 2.0, 3.0}, {2.0, 4.0, 6.0}, {0.0, 1.0, 1.0}};
        for (int i = 0; i < 3; i++) {
            System.arraycopy(singular[i], 0, m[i], 0, 3);
        }
        assertFalse(lu.factor());
    }
}
