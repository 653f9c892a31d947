package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Checks the published ROS34PW2 coefficients against the order conditions they must satisfy and the derived
 * dense-output weights against an independent table.
 */
class Ros34Pw2TableauTest {

    private static final int S = Ros34Pw2Tableau.STAGES;
    private static final double G = Ros34Pw2Tableau.GAMMA;
    // coefficients are printed with 17 significant digits: residuals of a few ulp are expected
    private static final double COEFFICIENT_TOLERANCE = 1.0e-14;

    private static double betaPrime(int i) {
        double s = 0.0;
        for (int j = 0; j < i; j++) {
            s += Ros34Pw2Tableau.ALPHA[i][j] + Ros34Pw2Tableau.GAMMA_IJ[i][j];
        }
        return s;
    }

    private static double[] conditions(double[] b) {
        double o1 = 0.0;
        double o2 = 0.0;
        double o3a = 0.0;
        double o3b = 0.0;
        for (int i = 0; i < S; i++) {
            double alpha = Ros34Pw2Tableau.STAGE_TIME[i];
            double tall = 0.0;
            for (int j = 0; j < i; j++) {
                tall += (Ros34Pw2Tableau.ALPHA[i][j] + Ros34Pw2Tableau.GAMMA_IJ[i][j]) * betaPrime(j);
            }
            o1 += b[i];
            o2 += b[i] * betaPrime(i);
            o3a += b[i] * alpha * alpha;
            o3b += b[i] * tall;
        }
        return new double[] {o1, o2, o3a, o3b};
    }

    @Test
    void mainSolutionSatisfiesTheRosenbrockOrderConditionsUpToOrderThree() {
        double[] c = conditions(Ros34Pw2Tableau.B);
        // source: Hairer and Wanner, Solving ODEs II, 2nd ed., Table IV.7.1 (order conditions of Rosenbrock methods)
        assertEquals(1.0, c[0], COEFFICIENT_TOLERANCE);
        assertEquals(0.5 - G, c[1], COEFFICIENT_TOLERANCE);
        assertEquals(1.0 / 3.0, c[2], COEFFICIENT_TOLERANCE);
        assertEquals(1.0 / 6.0 - G + G * G, c[3], COEFFICIENT_TOLERANCE);
    }

    @Test
    void embeddedSolutionHasOrderTwoExactly() {
        double[] c = conditions(Ros34Pw2Tableau.B_HAT);
        // source: Hairer and Wanner, Solving ODEs II, Table IV.7.1; Rang and Angermann (2005): embedded order 2
        assertEquals(1.0, c[0], COEFFICIENT_TOLERANCE);
        assertEquals(0.5 - G, c[1], COEFFICIENT_TOLERANCE);
        assertTrue(Math.abs(c[2] - 1.0 / 3.0) > 1.0e-3, "an order-3 embedded method would give no error estimate");
    }

    @Test
    void bothSolutionsSatisfyTheSecondOrderWConditions() {
        // source: Hairer and Wanner, Solving ODEs II, Section IV.7 (W-methods): with an arbitrary matrix in place of
        // the Jacobian, order 2 needs sum b_i alpha_i = 1/2 and sum b_i gamma'_i = -gamma separately
        for (double[] b : new double[][] {Ros34Pw2Tableau.B, Ros34Pw2Tableau.B_HAT}) {
            double sumAlpha = 0.0;
            double sumGamma = 0.0;
            for (int i = 0; i < S; i++) {
                double gammaPrime = 0.0;
                for (int j = 0; j < i; j++) {
                    gammaPrime += Ros34Pw2Tableau.GAMMA_IJ[i][j];
                }
                sumAlpha += b[i] * Ros34Pw2Tableau.STAGE_TIME[i];
                sumGamma += b[i] * gammaPrime;
            }
            assertEquals(0.5, sumAlpha, COEFFICIENT_TOLERANCE);
            assertEquals(-G, sumGamma, COEFFICIENT_TOLERANCE);
        }
    }

    @Test
    void methodIsStifflyAccurateAndLStable() {
        // source: Rang and Angermann, BIT 45 (2005) 761-787: ROS34PW2 is stiffly accurate, hence R(infinity) = 0
        for (int j = 0; j < S - 1; j++) {
            assertEquals(Ros34Pw2Tableau.B[j], Ros34Pw2Tableau.ALPHA[S - 1][j] + Ros34Pw2Tableau.GAMMA_IJ[S - 1][j],
                    COEFFICIENT_TOLERANCE);
        }
        assertEquals(Ros34Pw2Tableau.B[S - 1], G, 0.0);
        assertEquals(0.0, stiffLimit(Ros34Pw2Tableau.B), COEFFICIENT_TOLERANCE);
    }

    /** R(infinity) = 1 - b^T (alpha + Gamma)^-1 1 for weights b in k form. */
    private static double stiffLimit(double[] b) {
        DenseLu lu = new DenseLu(S);
        double[][] m = lu.matrix();
        for (int i = 0; i < S; i++) {
            for (int j = 0; j < S; j++) {
                m[i][j] = Ros34Pw2Tableau.ALPHA[i][j] + Ros34Pw2Tableau.GAMMA_IJ[i][j];
            }
        }
        assertTrue(lu.factor());
        double[] ones = {1.0, 1.0, 1.0, 1.0};
        lu.solve(ones);
        double s = 0.0;
        for (int i = 0; i < S; i++) {
            s += b[i] * ones[i];
        }
        return 1.0 - s;
    }

    @Test
    void denseOutputWeightsMatchPetscInterpolationTable() {
        // source: PETSc, src/ts/impls/rosw/rosw.c, TSROSWRA34PW2 binterpt[stage][power] (coefficients of
        // theta^1..theta^3), an independent derivation of the same order-3 continuous extension
        double[][] petsc = {
            {1.0564298455794094, -1.3864882699759573, 0.5721822314575016},
            {2.296429974281067, -8.262611700275677, 4.742931142090097},
            {-1.307599564525376, 7.250979895056055, -4.398120075195578},
            {-1.045260255335102, 2.398120075195581, -0.9169932983520199}};
        for (int i = 0; i < S; i++) {
            for (int p = 0; p < 3; p++) {
                // the table is printed to 16 digits; our solve of a 4x4 system adds a few ulp
                assertEquals(petsc[i][p], Ros34Pw2Tableau.DENSE_K[i][p], 1.0e-13, "stage " + i + " power " + (p + 1));
            }
            double[] d = Ros34Pw2Tableau.DENSE_K[i];
            double atOne = d[0] + d[1] + d[2];
            assertEquals(Ros34Pw2Tableau.B[i], atOne, COEFFICIENT_TOLERANCE);
        }
    }

    @Test
    void denseOutputStaysBoundedOnStiffComponents() {
        double largest = 0.0;
        double lowest = 0.0;
        for (int k = 0; k <= 1000; k++) {
            double theta = k / 1000.0;
            double[] b = new double[S];
            for (int i = 0; i < S; i++) {
                double[] d = Ros34Pw2Tableau.DENSE_K[i];
                b[i] = theta * (d[0] + theta * (d[1] + theta * d[2]));
            }
            double r = stiffLimit(b);
            largest = Math.max(largest, Math.abs(r));
            lowest = Math.min(lowest, r);
        }
        // source: derived here (javadoc of Ros34Pw2StepInterpolator): R(theta, infinity) falls from 1 at theta = 0 to
        // 0 at theta = 1 with a dip to -0.732 near theta = 0.6; a bound of 1 is what keeps the extension safe on
        // stiff components (no growth with h * lambda)
        assertEquals(1.0, largest, 1.0e-12);
        assertEquals(-0.732, lowest, 1.0e-3);
    }
}
