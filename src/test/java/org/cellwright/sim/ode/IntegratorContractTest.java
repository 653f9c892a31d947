package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import org.apache.commons.math3.exception.DimensionMismatchException;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.exception.OutOfRangeException;
import org.apache.commons.math3.ode.ExpandableStatefulODE;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.SecondaryEquations;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

/** Input checks, error paths and the less common parts of the Commons Math contract. */
class IntegratorContractTest {

    private static final double TOL = 1.0e-8;

    /** y' = -(1 + t) y, y(0) = 1: exact y = exp(-(t + t^2/2)); depends on t explicitly. */
    static final class TimeDependentDecay implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return 1;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            yDot[0] = -(1.0 + t) * y[0];
        }
    }

    @Test
    void nonAutonomousEquationsUseTheTimeDerivative() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, TOL, TOL);
        double[] y = {1.0};
        integrator.integrate(new TimeDependentDecay(), 0.0, y, 2.0, y);
        // source: analytic
        double expected = Math.exp(-4.0);
        assertEquals(expected, y[0], 10.0 * (TOL + TOL * expected));
        RosenbrockStatistics stats = integrator.getStatistics();
        // one column plus one df/dt difference per Jacobian
        assertEquals(2 * stats.jacobians(), stats.jacobianRhsEvaluations());
    }

    @Test
    void integratesBackwardInTime() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, TOL, TOL);
        double[] y = {Math.exp(-1.5)};
        double end = integrator.integrate(new TimeDependentDecay(), 1.0, y, 0.0, y);
        assertEquals(0.0, end, 0.0);
        // source: analytic, y(1) = exp(-1.5) carried back to y(0) = 1
        assertEquals(1.0, y[0], 10.0 * (TOL + TOL));
    }

    @Test
    void carriesSecondaryEquationsAlong() {
        ExpandableStatefulODE expandable = new ExpandableStatefulODE(new EventHandlingTest.Decay());
        // z' = y accumulates the decayed amount: z(t) = 1 - exp(-t)
        int index = expandable.addSecondaryEquations(new SecondaryEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] primary, double[] primaryDot, double[] secondary,
                                           double[] secondaryDot) {
                secondaryDot[0] = primary[0];
            }
        });
        expandable.setTime(0.0);
        expandable.setPrimaryState(new double[] {1.0});
        expandable.setSecondaryState(index, new double[] {0.0});
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, TOL, TOL);
        integrator.integrate(expandable, 3.0);
        // source: analytic; the error of z is not controlled (Commons Math convention: primary components only),
        // but the same stages give it the same accuracy
        assertEquals(Math.exp(-3.0), expandable.getPrimaryState()[0], 10.0 * (TOL + TOL));
        assertEquals(1.0 - Math.exp(-3.0), expandable.getSecondaryState(index)[0], 100.0 * TOL);
    }

    @Test
    void reportsStepSizeUnderflowAtABlowUp() {
        // y' = y^2, y(0) = 1 has y = 1/(1 - t), infinite at t = 1
        FirstOrderDifferentialEquations blowUp = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                yDot[0] = y[0] * y[0];
            }
        };
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(1.0e-9, 1.0, TOL, TOL);
        double[] y = {1.0};
        StepSizeUnderflowException e = assertThrows(StepSizeUnderflowException.class,
                () -> integrator.integrate(blowUp, 0.0, y, 2.0, y));
        // a linearly implicit method can step just across the pole before failing (observed t = 1 + 2e-8)
        assertEquals(1.0, e.getTime(), 1.0e-6, "failed at t = " + e.getTime());
        assertTrue(e.getStepSize() < 1.0e-9);
        assertTrue(e.getMessage().contains("minimum step"), e.getMessage());
    }

    @Test
    void rejectsStepsWhoseStagesAreNotFinite() {
        int[] nanCalls = {0};
        // y' = -y, but written with a logarithm that is NaN for a negative stage value, as a careless RHS might be
        FirstOrderDifferentialEquations fragile = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                if (y[0] < 0.0) {
                    nanCalls[0]++;
                }
                yDot[0] = -y[0] + 0.0 * Math.log(y[0]);
            }
        };
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 100.0, 1.0e-3, 1.0e-3);
        integrator.setAutonomous(true);
        integrator.setInitialStepSize(30.0);
        double[] y = {1.0};
        integrator.integrate(fragile, 0.0, y, 10.0, y);
        assertTrue(nanCalls[0] > 0, "the first 30 s step should visit a negative stage value");
        // source: analytic; loose tolerance 1e-3
        assertEquals(Math.exp(-10.0), y[0], 10.0 * (1.0e-3 + 1.0e-3 * Math.exp(-10.0)));
    }

    @Test
    void checksTolerancesAndFlagsAgainstTheDimension() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, new double[] {1e-6, 1e-6},
                new double[] {1e-6, 1e-6});
        double[] y = {1.0, 0.0, 0.0};
        assertThrows(DimensionMismatchException.class, () -> integrator.integrate(new RobertsonProblem(), 0, y, 1, y));
        assertThrows(DimensionMismatchException.class,
                () -> new Ros34Pw2Integrator(0.0, 1.0, new double[] {1e-6}, new double[] {1e-6, 1e-6}));
        assertThrows(IllegalArgumentException.class, () -> new Ros34Pw2Integrator(0.0, 1.0, -1.0, 1e-6));
        Ros34Pw2Integrator flagged = new Ros34Pw2Integrator(0.0, 1.0, 1e-6, 1e-6);
        flagged.setNonNegative(3);
        assertThrows(OutOfRangeException.class, () -> flagged.integrate(new RobertsonProblem(), 0, y, 1, y));
        assertThrows(OutOfRangeException.class, () -> flagged.setNonNegative(-1));
    }

    @Test
    void honoursTheEvaluationLimit() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0e6, 1.0e-8, 1.0e-6);
        integrator.setMaxEvaluations(50);
        double[] y = {1.0, 0.0, 0.0};
        assertThrows(MaxCountExceededException.class,
                () -> integrator.integrate(new RobertsonProblem(), 0.0, y, 4.0e5, y));
    }

    @Test
    void interpolatorSurvivesExternalization() throws IOException, ClassNotFoundException {
        StepInterpolator[] kept = new StepInterpolator[1];
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 0.5, TOL, TOL);
        integrator.addStepHandler(new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public void handleStep(StepInterpolator interpolator, boolean isLast) {
                if (kept[0] == null && interpolator.getCurrentTime() > 0.2) {
                    kept[0] = interpolator.copy();
                }
            }
        });
        double[] y = {1.0};
        integrator.integrate(new TimeDependentDecay(), 0.0, y, 1.0, y);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(kept[0]);
        }
        StepInterpolator restored;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            restored = (StepInterpolator) in.readObject();
        }
        double tm = 0.5 * (kept[0].getPreviousTime() + kept[0].getCurrentTime());
        kept[0].setInterpolatedTime(tm);
        restored.setInterpolatedTime(tm);
        assertEquals(kept[0].getInterpolatedState()[0], restored.getInterpolatedState()[0], 0.0);
        assertEquals(kept[0].getInterpolatedDerivatives()[0], restored.getInterpolatedDerivatives()[0], 0.0);
        // and the copy is the solution: exact exp(-(t + t^2/2)) to the tolerance
        assertEquals(Math.exp(-(tm + 0.5 * tm * tm)), restored.getInterpolatedState()[0], 10.0 * (TOL + TOL));
    }
}
