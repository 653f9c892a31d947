package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Robertson's stiff chemical kinetics against published and independently computed reference values. */
class RobertsonTest {

    // relative tolerance requested from the integrator
    private static final double RTOL = 1.0e-6;
    // y2 peaks at 3.6e-5 and falls to 2e-8 by t = 4e5, so it gets its own absolute tolerance
    private static final double[] ABS_TOL = {1.0e-10, 1.0e-14, 1.0e-10};
    // accepted global error: local error control per step lets the global error reach a few times rtol over
    // hundreds of steps (Hairer and Wanner, Solving ODEs II, Section IV.10 shows achieved accuracy within about a
    // decade of the tolerance; common practice); 10 * rtol
    private static final double GLOBAL_TOLERANCE = 10.0 * RTOL;

    // source: Toronto stiff test set, problem D2 (Robertson with y2 scaled by 1e4 and y3 by 1e2), "true" solution at
    // t = 40 in routine EVALU: 0.7158270687193941, 9.185534764557338e-2, 2.841637457458413e+1 (W. H. Enright and
    // J. D. Pryce, Algorithm 648, ACM TOMS 13 (1987) no. 1, p. 28; as distributed with the DVODE_F90 stiff test
    // driver), unscaled here
    private static final double[] AT_40 = {0.7158270687193941, 9.185534764557338e-6, 0.2841637457458413};

    // source: computed for this test with the RADAU5 algorithm of Hairer and Wanner (scipy 1.17
    // solve_ivp(method="Radau"), rtol 1e-13, atol 1e-20 / 1e-24 / 1e-20, analytic Jacobian); BDF and LSODA runs agree
    // to 6e-11 relative, and the same setup reproduces the t = 40 value above to 2e-14. SUNDIALS' cvRoberts_dns
    // example prints 4.9370e-03 1.9848e-08 9.9506e-01 at rtol 1e-4 (from memory), consistent to its accuracy.
    private static final double[] AT_4E5 = {4.9382745209799930e-03, 1.9849940879544431e-08, 9.9506170562908147e-01};

    private static Ros34Pw2Integrator integrator() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0e6, ABS_TOL, new double[] {RTOL, RTOL, RTOL});
        integrator.setAutonomous(true);
        integrator.setNonNegative(0, 1, 2);
        return integrator;
    }

    private static void assertClose(double[] expected, double[] actual, String where) {
        for (int i = 0; i < expected.length; i++) {
            double relative = Math.abs(actual[i] - expected[i]) / expected[i];
            assertTrue(relative <= GLOBAL_TOLERANCE,
                    where + ": y" + (i + 1) + " = " + actual[i] + " vs " + expected[i] + ", relative " + relative);
        }
    }

    @Test
    void matchesReferenceAtT40AndT4e5WithFiniteDifferenceJacobian() {
        RobertsonProblem problem = new RobertsonProblem();
        Ros34Pw2Integrator integrator = integrator();
        double[] y = {1.0, 0.0, 0.0};
        integrator.integrate(problem, 0.0, y, 40.0, y);
        assertClose(AT_40, y, "t = 40");
        int callsBefore = problem.calls;
        integrator.integrate(problem, 40.0, y, 4.0e5, y);
        assertClose(AT_4E5, y, "t = 4e5");
        // y1 + y2 + y3 = 1 is a linear invariant, kept by any Rosenbrock method up to rounding and the
        // Jacobian's rounding (the difference Jacobian also has zero column sums up to 1e-8 relative)
        assertEquals(1.0, y[0] + y[1] + y[2], 1.0e-12);
        RosenbrockStatistics stats = integrator.getStatistics();
        assertEquals(problem.calls - callsBefore, stats.rhsEvaluations(), "every RHS call is counted");
        // three difference columns per Jacobian (autonomous, so no df/dt column)
        assertEquals(3 * stats.jacobians(), stats.jacobianRhsEvaluations());
    }

    @Test
    void analyticJacobianGivesTheSameAnswerWithoutDifferenceCalls() {
        RobertsonProblem.WithJacobian problem = new RobertsonProblem.WithJacobian();
        Ros34Pw2Integrator integrator = integrator();
        double[] y = {1.0, 0.0, 0.0};
        integrator.integrate(problem, 0.0, y, 4.0e5, y);
        assertClose(AT_4E5, y, "t = 4e5, analytic Jacobian");
        RosenbrockStatistics stats = integrator.getStatistics();
        assertEquals(0, stats.jacobianRhsEvaluations());
        assertEquals(stats.jacobians(), problem.jacobianCalls);
        assertEquals(problem.calls, stats.rhsEvaluations());
    }

    @Test
    void conservesMassAtEveryStep() {
        Ros34Pw2Integrator integrator = integrator();
        double[] worst = {0.0};
        integrator.addStepHandler(new org.apache.commons.math3.ode.sampling.StepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public void handleStep(org.apache.commons.math3.ode.sampling.StepInterpolator interpolator,
                                   boolean isLast) {
                double[] y = interpolator.getInterpolatedState();
                worst[0] = Math.max(worst[0], Math.abs(y[0] + y[1] + y[2] - 1.0));
            }
        });
        double[] y = {1.0, 0.0, 0.0};
        integrator.integrate(new RobertsonProblem(), 0.0, y, 4.0e5, y);
        // rounding only: a few hundred steps of sums of order-1 numbers
        assertTrue(worst[0] < 1.0e-12, "worst |y1 + y2 + y3 - 1| = " + worst[0]);
    }
}
