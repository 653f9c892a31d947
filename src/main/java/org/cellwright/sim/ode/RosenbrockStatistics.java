package org.cellwright.sim.ode;

/**
 * Work done by the last {@link Ros34Pw2Integrator#integrate} call, for tests and benchmarks.
 *
 * @param rhsEvaluations         all evaluations of f(t, y), including those for Jacobians and the starting step
 * @param jacobianRhsEvaluations the part of rhsEvaluations spent on finite-difference Jacobians and df/dt
 * @param jacobians              Jacobians formed (by differences or analytically)
 * @param decompositions         LU factorisations of (1/(h gamma)) I - J
 * @param acceptedSteps          accepted steps
 * @param rejectedSteps          rejected attempts, all causes
 * @param negativityRejections   rejected attempts caused by a flagged component below -absTol
 */
public record RosenbrockStatistics(int rhsEvaluations, int jacobianRhsEvaluations, int jacobians,
                                   int decompositions, int acceptedSteps, int rejectedSteps,
                                   int negativityRejections) {
}
