package org.cellwright.sim.ode;

/**
 * Coefficients of ROS34PW2, a four-stage Rosenbrock-W method of order 3 with an embedded solution of order 2.
 *
 * <p>Published coefficients: J. Rang and L. Angermann, "New Rosenbrock W-methods of order 3 for partial
 * differential algebraic equations of index 1", BIT Numerical Mathematics 45 (2005) 761-787, method ROS34PW2
 * (gamma = 0.435866521508459, alpha_ij, gamma_ij, b_i and the embedded b^_i), in the form of Hairer and Wanner,
 * <i>Solving Ordinary Differential Equations II</i>, 2nd ed. (1996), Section IV.7, eq. (7.4). The method is
 * L-stable (R(infinity) = 0), stiffly accurate (b_i = alpha_4i + gamma_4i), and its order conditions hold for any
 * approximation of the Jacobian (W-method), which is what allows the integrator to reuse a Jacobian over steps.
 *
 * <p>Derived here, not published: the coefficients of the transformed scheme of Hairer-Wanner (IV.7.23)
 * ({@code a = alpha Gamma^-1}, {@code c = diag(1/gamma) - Gamma^-1}, {@code m = b Gamma^-1}), and the continuous
 * extension used for dense output, {@code y(t0 + theta h) = y0 + sum_i b_i(theta) k_i}, whose cubic weights
 * {@code b_i(theta)} are the unique solution of the four Rosenbrock order conditions up to order 3
 * (Hairer-Wanner Table IV.7.1) with the right-hand sides scaled to a step of theta h:
 * {@code sum b_i = theta}, {@code sum b_i beta'_i = theta^2/2 - gamma theta}, {@code sum b_i alpha_i^2 = theta^3/3},
 * {@code sum b_i beta_ij beta'_j = theta^3/6 - gamma theta^2 + gamma^2 theta}. At theta = 1 they reduce to b_i.
 * They match the interpolation table that PETSc ships for this method (TSROSWRA34PW2, {@code binterpt}),
 * checked in the tests.
 */
final class Ros34Pw2Tableau {

    /** Number of stages. */
    static final int STAGES = 4;

    /** Diagonal coefficient gamma. */
    static final double GAMMA = 4.3586652150845900e-01;

    /** Order of the main solution. */
    static final int ORDER = 3;

    /** Order of the embedded solution used for the error estimate. */
    static final int EMBEDDED_ORDER = 2;

    /** alpha_ij of Rang and Angermann (2005), strictly lower triangular. */
    static final double[][] ALPHA = {
        {0.0, 0.0, 0.0, 0.0},
        {8.7173304301691801e-01, 0.0, 0.0, 0.0},
        {8.4457060015369423e-01, -1.1299064236484185e-01, 0.0, 0.0},
        {0.0, 0.0, 1.0, 0.0}};

    /** gamma_ij of Rang and Angermann (2005), lower triangular with gamma on the diagonal. */
    static final double[][] GAMMA_IJ = {
        {GAMMA, 0.0, 0.0, 0.0},
        {-8.7173304301691801e-01, GAMMA, 0.0, 0.0},
        {-9.0338057013044082e-01, 5.4180672388095326e-02, GAMMA, 0.0},
        {2.4212380706095346e-01, -1.2232505839045147e+00, 5.4526025533510214e-01, GAMMA}};

    /** Weights b_i of the order-3 solution. */
    static final double[] B = {
        2.4212380706095346e-01, -1.2232505839045147e+00, 1.5452602553351020e+00, 4.3586652150845900e-01};

    /** Weights b^_i of the embedded order-2 solution. */
    static final double[] B_HAT = {
        3.7810903145819369e-01, -9.6042292212423178e-02, 5.0000000000000000e-01, 2.1793326075422950e-01};

    /** Stage times alpha_i = sum_j alpha_ij, as fractions of the step. */
    static final double[] STAGE_TIME = new double[STAGES];

    /** gamma_i = sum_j gamma_ij (diagonal included): weight of h df/dt in stage i. */
    static final double[] STAGE_GAMMA = new double[STAGES];

    /** Transformed a_ij = (alpha Gamma^-1)_ij: stage argument y0 + sum_j a_ij u_j. */
    static final double[][] A = new double[STAGES][STAGES];

    /** Transformed c_ij = -(Gamma^-1)_ij for j &lt; i: stage right-hand side term (c_ij / h) u_j. */
    static final double[][] C = new double[STAGES][STAGES];

    /** Transformed m_i = (b Gamma^-1)_i: y1 = y0 + sum_i m_i u_i. */
    static final double[] M = new double[STAGES];

    /** Transformed error weights (b - b^) Gamma^-1: error estimate sum_i e_i u_i. */
    static final double[] E = new double[STAGES];

    /** Dense output weights in k form: b_i(theta) = sum_p DENSE_K[i][p] theta^(p+1), p = 0..2. */
    static final double[][] DENSE_K = new double[STAGES][3];

    /** Dense output weights in transformed form: m_i(theta) = sum_p DENSE[p][i] theta^(p+1). */
    static final double[][] DENSE = new double[3][STAGES];

    static {
        double[][] gammaInverse = lowerTriangularInverse(GAMMA_IJ);
        for (int i = 0; i < STAGES; i++) {
            for (int j = 0; j < STAGES; j++) {
                STAGE_TIME[i] += ALPHA[i][j];
                STAGE_GAMMA[i] += GAMMA_IJ[i][j];
                for (int k = 0; k < STAGES; k++) {
                    A[i][j] += ALPHA[i][k] * gammaInverse[k][j];
                }
                C[i][j] = j < i ? -gammaInverse[i][j] : 0.0;
            }
        }
        for (int j = 0; j < STAGES; j++) {
            for (int k = 0; k < STAGES; k++) {
                M[j] += B[k] * gammaInverse[k][j];
                E[j] += (B[k] - B_HAT[k]) * gammaInverse[k][j];
            }
        }
        deriveDenseOutput(gammaInverse);
    }

    private Ros34Pw2Tableau() {
    }

    /**
     * Fills the transformed dense-output weights m_i(theta) and their derivatives d m_i / d theta.
     *
     * @param theta  fraction of the step, 0 to 1
     * @param weight output, length {@link #STAGES}
     * @param slope  output, length {@link #STAGES}
     */
    static void denseWeights(double theta, double[] weight, double[] slope) {
        for (int i = 0; i < STAGES; i++) {
            double d1 = DENSE[0][i];
            double d2 = DENSE[1][i];
            double d3 = DENSE[2][i];
            weight[i] = theta * (d1 + theta * (d2 + theta * d3));
            slope[i] = d1 + theta * (2.0 * d2 + theta * 3.0 * d3);
        }
    }

    /** Solves the four order conditions once per power of theta (see class javadoc). */
    private static void deriveDenseOutput(double[][] gammaInverse) {
        double[][] beta = new double[STAGES][STAGES];
        double[] betaPrime = new double[STAGES];
        for (int i = 0; i < STAGES; i++) {
            for (int j = 0; j < i; j++) {
                beta[i][j] = ALPHA[i][j] + GAMMA_IJ[i][j];
                betaPrime[i] += beta[i][j];
            }
        }
        DenseLu lu = new DenseLu(STAGES);
        double g = GAMMA;
        // right-hand sides of the conditions, one column per power theta^1, theta^2, theta^3
        double[][] rhs = {
            {1.0, -g, 0.0, g * g},
            {0.0, 0.5, 0.0, -g},
            {0.0, 0.0, 1.0 / 3.0, 1.0 / 6.0}};
        for (int p = 0; p < 3; p++) {
            double[][] matrix = lu.matrix();
            for (int i = 0; i < STAGES; i++) {
                double tall = 0.0;
                for (int j = 0; j < i; j++) {
                    tall += beta[i][j] * betaPrime[j];
                }
                matrix[0][i] = 1.0;
                matrix[1][i] = betaPrime[i];
                matrix[2][i] = STAGE_TIME[i] * STAGE_TIME[i];
                matrix[3][i] = tall;
            }
            if (!lu.factor()) {
                throw new IllegalStateException("ROS34PW2 dense-output order conditions are singular");
            }
            double[] x = rhs[p].clone();
            lu.solve(x);
            for (int i = 0; i < STAGES; i++) {
                DENSE_K[i][p] = x[i];
            }
            for (int j = 0; j < STAGES; j++) {
                for (int k = 0; k < STAGES; k++) {
                    DENSE[p][j] += x[k] * gammaInverse[k][j];
                }
            }
        }
    }

    private static double[][] lowerTriangularInverse(double[][] l) {
        int n = l.length;
        double[][] inv = new double[n][n];
        for (int col = 0; col < n; col++) {
            for (int i = col; i < n; i++) {
                double s = i == col ? 1.0 : 0.0;
                for (int k = col; k < i; k++) {
                    s -= l[i][k] * inv[k][col];
                }
                inv[i][col] = s / l[i][i];
            }
        }
        return inv;
    }
}
