package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.AbstractIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The stiff mass-action case of {@link ScavengerBath} over two hours, against a reference from Commons Math's
 * explicit Dormand-Prince 8(5,3) integrator at relative tolerance 1e-12.
 *
 * <p>Why that reference can be trusted: (1) on this stiff problem the explicit method's step is capped by
 * stability at about 3/(k A), some 0.1 s, far below what its 8th-order accuracy needs over hours, so its actual
 * errors lie well below the 1e-12 it is asked for; (2) rerunning it at 1e-11 changes no component by more than
 * 3e-12 relative (checked below); (3) it shares nothing with the Rosenbrock method (no Jacobian, no linear
 * solves); (4) A - B agrees with the closed form of {@link ScavengerBath#approximateAMinusB(double)} within that
 * formula's own error bound, and the linear invariants hold to rounding.
 */
class ScavengerBathTest {

    private static final double END = 7200.0;
    private static final double OUTPUT_INTERVAL = 600.0;
    private static double[] reference;
    private static RecordingOutput referenceOutputs;

    @BeforeAll
    static void computeReference() {
        double[] relTol = {1.0e-12, 1.0e-12, 1.0e-12, 1.0e-12};
        double[] absTol = {1.0e-16, 1.0e-20, 1.0e-16, 1.0e-16};
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1.0e-12, END, absTol, relTol);
        referenceOutputs = new RecordingOutput();
        dp.addStepHandler(new StepNormalizer(OUTPUT_INTERVAL, referenceOutputs));
        reference = ScavengerBath.INITIAL.clone();
        dp.integrate(new ScavengerBath(), 0.0, reference, END, reference);

        double[] looser = ScavengerBath.INITIAL.clone();
        new DormandPrince853Integrator(1.0e-12, END, new double[] {1.0e-15, 1.0e-19, 1.0e-15, 1.0e-15},
                new double[] {1.0e-11, 1.0e-11, 1.0e-11, 1.0e-11})
                .integrate(new ScavengerBath(), 0.0, looser, END, looser);
        for (int i = 0; i < 4; i++) {
            // self-consistency of the reference: tenfold looser tolerance moves nothing beyond 1e-10 relative
            assertEquals(reference[i], looser[i], 1.0e-10 * reference[i], "reference component " + i);
        }
    }

    private static double worstRelativeError(double[] y) {
        double worst = 0.0;
        for (int i = 0; i < 4; i++) {
            worst = Math.max(worst, Math.abs(y[i] - reference[i]) / reference[i]);
        }
        return worst;
    }

    private static Ros34Pw2Integrator rosenbrock(double rtol) {
        // A, C, D are of order 0.01 to 0.1 mol/m3, B of order 1e-7: B's absolute tolerance is 1e-6 of the others'
        double[] absTol = {1.0e-3 * rtol, 1.0e-9 * rtol, 1.0e-3 * rtol, 1.0e-3 * rtol};
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, END, absTol, new double[] {rtol, rtol, rtol, rtol});
        integrator.setAutonomous(true);
        integrator.setNonNegative(0, 1, 2, 3);
        return integrator;
    }

    @Test
    void referenceAgreesWithClosedFormAndInvariants() {
        double aMinusB = reference[0] - reference[1];
        // source: analytic, ScavengerBath.approximateAMinusB, error bound 1.3e-5 relative derived in its javadoc
        assertEquals(ScavengerBath.approximateAMinusB(END), aMinusB, 1.3e-5 * aMinusB);
        // source: stoichiometry; linear invariants are kept by Runge-Kutta methods up to rounding
        assertEquals(0.1, reference[0] + reference[2] + reference[3], 1.0e-14);
        assertEquals(0.05, reference[1] + reference[2] - ScavengerBath.FEED * END, 1.0e-14);
    }

    @Test
    void rosenbrockMatchesReferenceAtTightTolerance() {
        double rtol = 1.0e-6;
        Ros34Pw2Integrator integrator = rosenbrock(rtol);
        double[] y = ScavengerBath.INITIAL.clone();
        integrator.integrate(new ScavengerBath(), 0.0, y, END, y);
        // 10 * rtol on every component, B included (its absolute tolerance is 1e-6 of its size), as in RobertsonTest
        double worst = worstRelativeError(y);
        assertTrue(worst < 10.0 * rtol, "worst relative error " + worst);
        assertEquals(0.1, y[0] + y[2] + y[3], 1.0e-14);
        assertEquals(0.05, y[1] + y[2] - ScavengerBath.FEED * END, 1.0e-14);
    }

    @Test
    void needsFarFewerRhsCallsThanDormandPrince54AtEqualAccuracy() {
        double rtol = 1.0e-4;
        Ros34Pw2Integrator stiff = rosenbrock(rtol);
        ScavengerBath stiffCounted = new ScavengerBath();
        double[] y = ScavengerBath.INITIAL.clone();
        stiff.integrate(stiffCounted, 0.0, y, END, y);

        double[] absTol = {1.0e-3 * rtol, 1.0e-9 * rtol, 1.0e-3 * rtol, 1.0e-3 * rtol};
        AbstractIntegrator explicit = new DormandPrince54Integrator(0.0, END, absTol,
                new double[] {rtol, rtol, rtol, rtol});
        ScavengerBath explicitCounted = new ScavengerBath();
        double[] z = ScavengerBath.INITIAL.clone();
        explicit.integrate(explicitCounted, 0.0, z, END, z);

        // both meet the same accuracy goal: every component within 1e-3 relative of the reference (10 * rtol)
        assertTrue(worstRelativeError(y) < 10.0 * rtol, "Rosenbrock error " + worstRelativeError(y));
        assertTrue(worstRelativeError(z) < 10.0 * rtol, "DP54 error " + worstRelativeError(z));
        assertEquals(stiff.getStatistics().rhsEvaluations(), stiffCounted.calls);
        // measured: about 540 calls against 400 000 (the explicit method is held by stability, not accuracy, so
        // loosening its tolerance does not help it); two orders of magnitude is the claim we keep
        double ratio = (double) explicitCounted.calls / stiffCounted.calls;
        assertTrue(ratio > 100.0, "DP54 " + explicitCounted.calls + " vs ROS34PW2 " + stiffCounted.calls);
    }

    @Test
    void fixedIntervalOutputFollowsTheStiffComponent() {
        double rtol = 1.0e-6;
        Ros34Pw2Integrator integrator = rosenbrock(rtol);
        RecordingOutput outputs = new RecordingOutput();
        integrator.addStepHandler(new StepNormalizer(OUTPUT_INTERVAL, outputs));
        double[] y = ScavengerBath.INITIAL.clone();
        integrator.integrate(new ScavengerBath(), 0.0, y, END, y);
        assertEquals(referenceOutputs.times, outputs.times);
        for (int k = 1; k < outputs.states.size(); k++) {
            for (int i = 0; i < 4; i++) {
                double expected = referenceOutputs.states.get(k)[i];
                // B, the quasi-steady component (about 1e-7 mol/m3, relaxing at k A ~ 20 1/s), is read from the
                // dense output inside steps of hundreds of seconds; 10 * rtol as for step ends
                assertEquals(expected, outputs.states.get(k)[i], 10.0 * rtol * expected,
                        "t = " + k * OUTPUT_INTERVAL + " s, component " + i);
            }
        }
    }
}
