package org.cellwright.sim;

import org.apache.commons.math3.ode.FirstOrderIntegrator;

/** Makes the integrator a run uses; the model never steps itself. */
@FunctionalInterface
public interface IntegratorFactory {

    /**
     * @param rates the model (its {@code layout} tells which components are running totals)
     * @param absTol absolute tolerance of each state component
     * @param relTol relative tolerance
     * @param maxStepS largest step allowed (s)
     * @return a fresh integrator
     */
    FirstOrderIntegrator create(CellRates rates, double[] absTol, double relTol, double maxStepS);
}
