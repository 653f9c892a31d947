package org.cellwright.sim.ode;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * Robertson's chemical kinetics problem: A -> B (k1 = 0.04), B + B -> C + B (k2 = 3e7), B + C -> A + C (k3 = 1e4),
 * y(0) = (1, 0, 0).
 *
 * <p>Source: H. H. Robertson, "The solution of a set of reaction rate equations", in J. Walsh (ed.), Numerical
 * Analysis: an Introduction, Academic Press (1966) 178-182; as problem ROBER in Hairer and Wanner, Solving ODEs II,
 * 2nd ed. (1996), Section IV.1, eq. (1.4). Counts its right-hand-side calls.
 */
class RobertsonProblem implements FirstOrderDifferentialEquations {

    static final double K1 = 0.04;
    static final double K2 = 3.0e7;
    static final double K3 = 1.0e4;

    int calls;

    @Override
    public int getDimension() {
        return 3;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        calls++;
        double r1 = K1 * y[0];
        double r2 = K2 * y[1] * y[1];
        double r3 = K3 * y[1] * y[2];
        yDot[0] = -r1 + r3;
        yDot[1] = r1 - r2 - r3;
        yDot[2] = r2;
    }

    /** The same equations with their Jacobian in closed form. */
    static final class WithJacobian extends RobertsonProblem implements AnalyticJacobian {

        int jacobianCalls;

        @Override
        public void jacobian(double t, double[] y, double[][] dfdy) {
            jacobianCalls++;
            dfdy[0][0] = -K1;
            dfdy[0][1] = K3 * y[2];
            dfdy[0][2] = K3 * y[1];
            dfdy[1][0] = K1;
            dfdy[1][1] = -2.0 * K2 * y[1] - K3 * y[2];
            dfdy[1][2] = -K3 * y[1];
            dfdy[2][0] = 0.0;
            dfdy[2][1] = 2.0 * K2 * y[1];
            dfdy[2][2] = 0.0;
        }
    }
}
