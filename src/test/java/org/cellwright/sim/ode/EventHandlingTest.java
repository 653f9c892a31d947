package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.junit.jupiter.api.Test;

/**
 * Commons Math event handling and fixed-interval output through {@link Ros34Pw2Integrator}, on exponential decay
 * y' = -k y whose crossing times are known in closed form: y0 exp(-k t) = c at t = ln(y0 / c) / k.
 *
 * <p>Events are recorded in lists, never derived from step-handler calls: in Commons Math 3.x an event at the end
 * of a step is handled before the step handler sees that step.
 */
class EventHandlingTest {

    // an event time is off by (state error) / |y'| = (state error) / (k c); with tolerances of 1e-11 the crossings
    // of 1/2, 1/4, 1/8 came out 0.8e-11, 2.1e-11 and 4.3e-11 s early (the global error grows along the run), so the
    // required 1e-9 s holds with a margin of 20
    private static final double TIME_TOLERANCE = 1.0e-9;
    private static final double TOL = 1.0e-11;

    /** y' = -k y with a rate that an event handler may change. */
    static final class Decay implements FirstOrderDifferentialEquations {
        double rate = 1.0;

        @Override
        public int getDimension() {
            return 1;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            yDot[0] = -rate * y[0];
        }
    }

    /** Fires when y falls through a level, records the time, and answers with a fixed action. */
    static class LevelCrossing implements EventHandler {
        final double level;
        final Action action;
        final List<Double> times;

        LevelCrossing(double level, Action action, List<Double> times) {
            this.level = level;
            this.action = action;
            this.times = times;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[0] - level;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            times.add(t);
            return action;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    private static Ros34Pw2Integrator integrator() {
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, TOL, TOL);
        integrator.setAutonomous(true);
        return integrator;
    }

    private static void addEvent(Ros34Pw2Integrator integrator, EventHandler handler) {
        // max check interval 0.1 s: g is monotone here; convergence 1e-12 s, well under the accuracy asked for
        integrator.addEventHandler(handler, 0.1, 1.0e-12, 100);
    }

    @Test
    void stopEndsTheRunAtTheCrossing() {
        List<Double> times = new ArrayList<>();
        Ros34Pw2Integrator integrator = integrator();
        addEvent(integrator, new LevelCrossing(0.25, EventHandler.Action.STOP, times));
        double[] y = {1.0};
        double stop = integrator.integrate(new Decay(), 0.0, y, 10.0, y);
        // source: analytic, exp(-t) = 1/4 at t = ln 4
        assertEquals(Math.log(4.0), stop, TIME_TOLERANCE);
        assertEquals(List.of(stop), times);
        assertEquals(0.25, y[0], 10.0 * TOL);
    }

    @Test
    void continueRecordsEveryCrossingAndRunsToTheEnd() {
        List<Double> times = new ArrayList<>();
        Ros34Pw2Integrator integrator = integrator();
        for (double level : new double[] {0.125, 0.5, 0.25}) {
            addEvent(integrator, new LevelCrossing(level, EventHandler.Action.CONTINUE, times));
        }
        double[] y = {1.0};
        double end = integrator.integrate(new Decay(), 0.0, y, 10.0, y);
        assertEquals(10.0, end, 0.0);
        assertEquals(3, times.size());
        // source: analytic, crossings of 1/2, 1/4, 1/8 at ln 2, ln 4, ln 8, handled in time order
        for (int n = 1; n <= 3; n++) {
            assertEquals(n * Math.log(2.0), times.get(n - 1), TIME_TOLERANCE, "crossing " + n);
        }
        assertEquals(Math.exp(-10.0), y[0], 10.0 * (TOL + TOL * Math.exp(-10.0)));
    }

    @Test
    void resetStateRefillsAndTheDecayStartsAgain() {
        List<Double> times = new ArrayList<>();
        Ros34Pw2Integrator integrator = integrator();
        addEvent(integrator, new LevelCrossing(0.25, EventHandler.Action.RESET_STATE, times) {
            @Override
            public void resetState(double t, double[] y) {
                y[0] = 1.0;
            }
        });
        double[] y = {1.0};
        integrator.integrate(new Decay(), 0.0, y, 10.0, y);
        // source: analytic, each refill to 1 starts a new decay, so the n-th crossing is at n ln 4 (7 before t = 10)
        assertEquals(7, times.size());
        for (int n = 1; n <= 7; n++) {
            // errors of successive event times add up: n * 1e-9 s
            assertEquals(n * Math.log(4.0), times.get(n - 1), n * TIME_TOLERANCE, "refill " + n);
        }
        assertEquals(Math.exp(-(10.0 - 7.0 * Math.log(4.0))), y[0], 100.0 * TOL);
    }

    @Test
    void resetDerivativesSwitchesTheRate() {
        List<Double> times = new ArrayList<>();
        Decay decay = new Decay();
        Ros34Pw2Integrator integrator = integrator();
        addEvent(integrator, new LevelCrossing(0.5, EventHandler.Action.RESET_DERIVATIVES, times) {
            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                decay.rate = 3.0;
                return super.eventOccurred(t, y, increasing);
            }
        });
        double[] y = {1.0};
        integrator.integrate(decay, 0.0, y, 3.0, y);
        assertEquals(Math.log(2.0), times.get(0), TIME_TOLERANCE);
        // source: analytic, y = 0.5 exp(-3 (t - ln 2)) after the switch
        double expected = 0.5 * Math.exp(-3.0 * (3.0 - Math.log(2.0)));
        assertEquals(expected, y[0], 10.0 * (TOL + TOL * expected));
    }

    @Test
    void resetByATimerMovesAnotherHandlerAcrossItsLevel() {
        List<Double> crossings = new ArrayList<>();
        List<Double> refills = new ArrayList<>();
        Ros34Pw2Integrator integrator = integrator();
        addEvent(integrator, new LevelCrossing(0.25, EventHandler.Action.CONTINUE, crossings));
        addEvent(integrator, new LevelCrossing(Double.NaN, EventHandler.Action.RESET_STATE, refills) {
            @Override
            public double g(double t, double[] y) {
                return 2.0 - t;
            }

            @Override
            public void resetState(double t, double[] y) {
                y[0] = 1.0;
            }
        });
        double[] y = {1.0};
        integrator.integrate(new Decay(), 0.0, y, 5.0, y);
        assertEquals(List.of(2.0), refills);
        // source: analytic, 1/4 is crossed at ln 4, the refill at t = 2 lifts y back to 1 (above the level, which
        // must not count as a crossing), and 1/4 is crossed again at 2 + ln 4
        assertEquals(2, crossings.size(), crossings.toString());
        assertEquals(Math.log(4.0), crossings.get(0), TIME_TOLERANCE);
        assertEquals(2.0 + Math.log(4.0), crossings.get(1), TIME_TOLERANCE);
        assertEquals(Math.exp(-3.0), y[0], 10.0 * (TOL + TOL * Math.exp(-3.0)));
    }

    @Test
    void resetOfAnotherComponentDoesNotRepeatTheEvent() {
        List<Double> times = new ArrayList<>();
        Ros34Pw2Integrator integrator = integrator();
        // two independent decays; the crossing of y1 resets y2, which the handler's g does not read
        FirstOrderDifferentialEquations two = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                yDot[0] = -y[0];
                yDot[1] = -y[1];
            }
        };
        addEvent(integrator, new LevelCrossing(0.25, EventHandler.Action.RESET_STATE, times) {
            @Override
            public void resetState(double t, double[] y) {
                y[1] = 1.0;
            }
        });
        double[] y = {1.0, 1.0};
        integrator.integrate(two, 0.0, y, 4.0, y);
        assertEquals(1, times.size(), times.toString());
        // source: analytic, y2 restarts from 1 at ln 4
        double expected = Math.exp(-(4.0 - Math.log(4.0)));
        assertEquals(expected, y[1], 10.0 * (TOL + TOL * expected));
    }

    @Test
    void commonsMathAloneFailsOnAResetAcrossTheLevel() {
        // characterises the Commons Math 3.6.1 defect that ResetConsistentEvent works around (fixed in Hipparchus,
        // issue #184): with its own integrator, a refill across the firing level makes the next step's root
        // search fail; if this test ever fails, the upgraded library no longer needs the wrapper
        DormandPrince54Integrator plain = new DormandPrince54Integrator(0.0, 1.0, TOL, TOL);
        plain.addEventHandler(new LevelCrossing(0.25, EventHandler.Action.RESET_STATE, new ArrayList<>()) {
            @Override
            public void resetState(double t, double[] y) {
                y[0] = 1.0;
            }
        }, 0.1, 1.0e-12, 100);
        double[] y = {1.0};
        assertThrows(NoBracketingException.class, () -> plain.integrate(new Decay(), 0.0, y, 10.0, y));
    }

    @Test
    void stepNormalizerGivesTheSolutionAtFixedIntervals() {
        double tol = 1.0e-6;
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0, tol, tol);
        integrator.setAutonomous(true);
        RecordingOutput output = new RecordingOutput();
        integrator.addStepHandler(new StepNormalizer(0.1, output));
        double[] y = {1.0};
        integrator.integrate(new Decay(), 0.0, y, 5.0, y);
        assertEquals(51, output.times.size());
        for (int k = 0; k < output.times.size(); k++) {
            // StepNormalizer adds 0.1 s k times, so the grid carries rounding of a few ulp
            assertEquals(0.1 * k, output.times.get(k), 1.0e-13);
            double expected = Math.exp(-output.times.get(k));
            // dense output is as accurate as the step ends (order 3 extension): 10 * (absTol + relTol y)
            assertEquals(expected, output.states.get(k)[0], 10.0 * (tol + tol * expected), "t = " + 0.1 * k);
        }
    }
}
