package org.cellwright.sim.ode;

/**
 * One attempted ROS34PW2 step in the transformed form of Hairer and Wanner (IV.7.23): for i = 1..4,
 * <pre>
 *   ((1/(h gamma)) I - J) u_i = f(t0 + alpha_i h, y0 + sum_{j&lt;i} a_ij u_j) + sum_{j&lt;i} (c_ij / h) u_j
 *                               + gamma_i h df/dt,
 *   y1 = y0 + sum m_i u_i,    error estimate = sum e_i u_i,
 * </pre>
 * with coefficients from {@link Ros34Pw2Tableau}. Stage 1 reuses f(t0, y0), so a step costs three new
 * right-hand-side evaluations. Holds the work arrays; allocates nothing per step.
 */
final class Ros34Pw2Step {

    private static final int S = Ros34Pw2Tableau.STAGES;

    private final int n;
    /** Transformed stage vectors u_i. */
    final double[][] stages;
    /** Candidate solution y1. */
    final double[] solution;
    /** Error estimate y1 - y1^ (embedded). */
    final double[] error;
    private final double[] stageState;
    private final double[] stageRate;

    Ros34Pw2Step(int n) {
        this.n = n;
        this.stages = new double[S][n];
        this.solution = new double[n];
        this.error = new double[n];
        this.stageState = new double[n];
        this.stageRate = new double[n];
    }

    /**
     * Computes the stages, y1 and the error estimate.
     *
     * @param rhs  counted right-hand side
     * @param t0   time at the start (s)
     * @param y0   state at the start
     * @param f0   f(t0, y0)
     * @param h    signed step (s)
     * @param dfdt df/dt at the start, or null for autonomous equations
     * @param lu   factorised (1/(h gamma)) I - J for this h
     * @return false if a stage produced a value that is not finite (the step must be retried smaller)
     */
    boolean attempt(RightHandSide rhs, double t0, double[] y0, double[] f0, double h, double[] dfdt, DenseLu lu) {
        for (int i = 0; i < S; i++) {
            double[] rate = f0;
            if (i > 0) {
                for (int k = 0; k < n; k++) {
                    double s = y0[k];
                    for (int j = 0; j < i; j++) {
                        s += Ros34Pw2Tableau.A[i][j] * stages[j][k];
                    }
                    stageState[k] = s;
                }
                rhs.evaluate(t0 + Ros34Pw2Tableau.STAGE_TIME[i] * h, stageState, stageRate);
                rate = stageRate;
            }
            double[] u = stages[i];
            double timeTerm = Ros34Pw2Tableau.STAGE_GAMMA[i] * h;
            for (int k = 0; k < n; k++) {
                double s = rate[k];
                for (int j = 0; j < i; j++) {
                    s += (Ros34Pw2Tableau.C[i][j] / h) * stages[j][k];
                }
                if (dfdt != null) {
                    s += timeTerm * dfdt[k];
                }
                u[k] = s;
            }
            lu.solve(u);
            for (int k = 0; k < n; k++) {
                if (!Double.isFinite(u[k])) {
                    return false;
                }
            }
        }
        for (int k = 0; k < n; k++) {
            double y = y0[k];
            double e = 0.0;
            for (int i = 0; i < S; i++) {
                y += Ros34Pw2Tableau.M[i] * stages[i][k];
                e += Ros34Pw2Tableau.E[i] * stages[i][k];
            }
            solution[k] = y;
            error[k] = e;
        }
        return true;
    }
}
