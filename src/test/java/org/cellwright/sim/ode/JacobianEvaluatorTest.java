package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Finite-difference Jacobian and time derivative against closed forms. */
class JacobianEvaluatorTest {

    @Test
    void differenceJacobianMatchesRobertsonAnalyticJacobian() {
        RobertsonProblem.WithJacobian problem = new RobertsonProblem.WithJacobian();
        double[] y = {0.7158, 9.1855e-6, 0.2842};
        double[] f0 = new double[3];
        problem.computeDerivatives(0.0, y, f0);
        // increment floors absTol/relTol as the integrator would pass them (1e-10 / 1e-6, 1e-14 / 1e-6)
        JacobianEvaluator evaluator = new JacobianEvaluator(3, null, new double[] {1.0e-4, 1.0e-8, 1.0e-4});
        double[][] difference = new double[3][3];
        evaluator.evaluate(problem::computeDerivatives, 0.0, y, f0, 1.0, difference, null);
        double[][] exact = new double[3][3];
        problem.jacobian(0.0, y, exact);
        for (int i = 0; i < 3; i++) {
            double rowScale = 0.0;
            for (int j = 0; j < 3; j++) {
                rowScale = Math.max(rowScale, Math.abs(exact[i][j]));
            }
            for (int j = 0; j < 3; j++) {
                // forward differences with a sqrt(eps) increment are good to about 1e-8 of the row's largest entry;
                // 1e-6 leaves room for the curvature of the y2^2 term
                assertEquals(exact[i][j], difference[i][j], 1.0e-6 * rowScale, "entry " + i + "," + j);
            }
        }
        assertEquals(1 + 3, problem.calls, "f0 plus one call per column");
    }

    @Test
    void timeDerivativeByOneDifference() {
        RightHandSide rhs = (t, y, yDot) -> yDot[0] = Math.sin(t) * y[0];
        double t = 1.3;
        double[] y = {2.0};
        double[] f0 = {Math.sin(t) * 2.0};
        double[][] dfdy = new double[1][1];
        double[] dfdt = new double[1];
        new JacobianEvaluator(1, null, new double[] {1.0}).evaluate(rhs, t, y, f0, 0.1, dfdy, dfdt);
        // source: analytic, d/dy = sin t, d/dt = y cos t; forward-difference accuracy about 1e-8
        assertEquals(Math.sin(t), dfdy[0][0], 1.0e-7);
        assertEquals(2.0 * Math.cos(t), dfdt[0], 1.0e-7);
    }
}
