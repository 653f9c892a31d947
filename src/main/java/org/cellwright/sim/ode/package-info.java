/**
 * Stiff ODE integration for the engine: {@link org.cellwright.sim.ode.Ros34Pw2Integrator}, an adaptive
 * Rosenbrock-W method (ROS34PW2, Rang and Angermann 2005) that plugs into the Commons Math 3.6.1 ODE framework
 * (events, step handlers, {@code StepNormalizer}), with dense output, finite-difference or analytic Jacobians
 * ({@link org.cellwright.sim.ode.AnalyticJacobian}) and optional non-negativity of components. Pure computation:
 * no I/O. Method, error control and measured accuracy are described in docs/numerics.md; the benchmark
 * {@code RobertsonBenchmark} (test sources) explains how to run JMH.
 */
package org.cellwright.sim.ode;
