package org.cellwright.sim.ode;

/**
 * Forms the Jacobian df/dy and, for non-autonomous equations, the time derivative df/dt needed by the
 * Rosenbrock stages.
 *
 * <p>df/dy comes from {@link AnalyticJacobian} when available, otherwise from forward differences, one column
 * per right-hand-side evaluation, reusing f(t, y) already known at the start of the step. The increment of
 * column j is {@code sqrt(eps) * max(|y_j|, s_j)}, where the floor {@code s_j = absTol_j / relTol_j} is the
 * magnitude below which the absolute tolerance governs that component (absTol_j alone when relTol_j is 0),
 * the threshold that MATLAB's stiff solvers pass to their difference Jacobian (Shampine and Reichelt, "The
 * MATLAB ODE suite", SIAM J. Sci. Comput. 18 (1997) 1-22, Section 5; from memory). Increments are positive,
 * so a non-negative concentration is never perturbed below zero. df/dt is one forward difference with increment
 * {@code sqrt(eps) * max(|t|, |h|)} taken in the direction of integration.
 */
final class JacobianEvaluator {

    private static final double SQRT_EPS = Math.sqrt(Math.ulp(1.0));

    private final int n;
    private final AnalyticJacobian analytic;
    private final double[] floor;
    private final double[] yWork;
    private final double[] fWork;

    /**
     * @param n        dimension of the complete state
     * @param analytic closed-form Jacobian, or null for finite differences
     * @param floor    increment floors s_j, length n
     */
    JacobianEvaluator(int n, AnalyticJacobian analytic, double[] floor) {
        this.n = n;
        this.analytic = analytic;
        this.floor = floor.clone();
        this.yWork = new double[n];
        this.fWork = new double[n];
    }

    /** True when the Jacobian comes from {@link AnalyticJacobian}. */
    boolean isAnalytic() {
        return analytic != null;
    }

    /**
     * Fills dfdy (and dfdt when it is not null).
     *
     * @param rhs  counted right-hand side
     * @param t    time (s)
     * @param y    state, unchanged on return
     * @param f0   f(t, y)
     * @param h    current signed step (s), sets the direction and scale of the time increment
     * @param dfdy output n by n
     * @param dfdt output, or null for autonomous equations
     */
    void evaluate(RightHandSide rhs, double t, double[] y, double[] f0, double h, double[][] dfdy, double[] dfdt) {
        System.arraycopy(y, 0, yWork, 0, n);
        if (analytic != null) {
            for (double[] row : dfdy) {
                java.util.Arrays.fill(row, 0.0);
            }
            analytic.jacobian(t, yWork, dfdy);
        } else {
            for (int j = 0; j < n; j++) {
                double yj = y[j];
                double perturbed = yj + SQRT_EPS * Math.max(Math.abs(yj), floor[j]);
                double delta = perturbed - yj;
                if (delta == 0.0) {
                    perturbed = yj + SQRT_EPS;
                    delta = perturbed - yj;
                }
                yWork[j] = perturbed;
                rhs.evaluate(t, yWork, fWork);
                yWork[j] = yj;
                for (int i = 0; i < n; i++) {
                    dfdy[i][j] = (fWork[i] - f0[i]) / delta;
                }
            }
        }
        if (dfdt != null) {
            double direction = h < 0 ? -1.0 : 1.0;
            double scale = Math.max(Math.abs(t), Math.abs(h));
            double tPerturbed = t + direction * SQRT_EPS * (scale > 0.0 ? scale : 1.0);
            double delta = tPerturbed - t;
            rhs.evaluate(tPerturbed, yWork, fWork);
            for (int i = 0; i < n; i++) {
                dfdt[i] = (fWork[i] - f0[i]) / delta;
            }
        }
    }
}
