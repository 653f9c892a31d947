package org.cellwright.sim.ode;

/**
 * Optional interface for equations that can give their Jacobian matrix df/dy in closed form.
 *
 * <p>When the primary {@code FirstOrderDifferentialEquations} passed to {@link Ros34Pw2Integrator} also
 * implements this interface (and no secondary equations are attached), the integrator calls it instead of
 * building the Jacobian by finite differences, which saves one right-hand-side evaluation per state component.
 * The partial derivative with respect to time, if the equations depend on time explicitly, is still formed by
 * one forward difference (see {@link Ros34Pw2Integrator#setAutonomous(boolean)}).
 */
public interface AnalyticJacobian {

    /**
     * Fills the Jacobian of the right-hand side.
     *
     * @param t    time (s)
     * @param y    state, not to be modified
     * @param dfdy output, {@code dfdy[i][j] = d f_i / d y_j} in units of (unit of y_i)/(s * unit of y_j);
     *             its entries are not cleared beforehand
     */
    void jacobian(double t, double[] y, double[][] dfdy);
}
