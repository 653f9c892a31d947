package org.cellwright.sim;

import java.util.List;
import java.util.function.ToDoubleBiFunction;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * An event of a run: a continuous switching function {@code g(t, y)} whose zero the integrator locates by
 * root finding, and what to do then (stop, or go on and record). Occurrences go to the run's event log.
 */
final class RunEventDetector implements EventHandler {

    /** Describes an occurrence in plain words. */
    interface Wording {
        /**
         * @param t time of the event (s)
         * @param y state then
         * @param increasing true when g rose through zero
         * @return the event, or null to record nothing
         */
        RunEvent describe(double t, double[] y, boolean increasing);
    }

    /** Sets up a switching function that keeps state of its own, at the start of each integration segment. */
    interface Start {
        /**
         * @param t0 start of the segment (s)
         * @param y0 state then
         */
        void at(double t0, double[] y0);
    }

    private final ToDoubleBiFunction<Double, double[]> g;
    private final Start start;
    private final boolean stop;
    private final Wording wording;
    private final List<RunEvent> log;
    private boolean fired;
    /** How many recent (time, value) pairs are recalled. */
    private static final int RECALLED = 8;
    private final double[] recalledT = filledNaN();
    private final double[] recalledG = new double[RECALLED];
    private int next;

    private static double[] filledNaN() {
        double[] a = new double[RECALLED];
        java.util.Arrays.fill(a, Double.NaN);
        return a;
    }

    RunEventDetector(ToDoubleBiFunction<Double, double[]> g, boolean stop, Wording wording, List<RunEvent> log) {
        this(g, (t0, y0) -> { }, stop, wording, log);
    }

    /**
     * @param g the switching function
     * @param start called at the start of each integration segment, before g is first asked there
     * @param stop whether the run stops at the event
     * @param wording what goes into the log
     * @param log the run's event log
     */
    RunEventDetector(ToDoubleBiFunction<Double, double[]> g, Start start, boolean stop, Wording wording,
                     List<RunEvent> log) {
        this.g = g;
        this.start = start;
        this.stop = stop;
        this.wording = wording;
        this.log = log;
    }

    /** @return true once the event has occurred */
    boolean fired() {
        return fired;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        start.at(t0, y0);
        forgetValues();
    }

    /**
     * Forgets the values of g recalled so far: to be called when g itself changes (a switching function with
     * hysteresis moves its threshold once the event has occurred), so that no value of the old g is given
     * again at a time already asked about.
     */
    void forgetValues() {
        java.util.Arrays.fill(recalledT, Double.NaN);
    }

    /**
     * The switching function. A time already asked about gives the value it gave then: the electrode
     * potentials behind some switching functions are solved iteratively from the last solution, and the state
     * at the start of a step comes from a different interpolator than at the end of the step before, so a
     * fresh evaluation there could change the sign of a value near zero and break the root search (Commons
     * Math requires the sign it saw at the step's start).
     */
    @Override
    public double g(double t, double[] y) {
        for (int i = 0; i < RECALLED; i++) {
            if (recalledT[i] == t) {
                return recalledG[i];
            }
        }
        double value = g.applyAsDouble(t, y);
        recalledT[next] = t;
        recalledG[next] = value;
        next = (next + 1) % RECALLED;
        return value;
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        RunEvent e = wording.describe(t, y, increasing);
        if (e != null) {
            log.add(e);
        }
        fired = true;
        return stop ? Action.STOP : Action.RESET_DERIVATIVES;
    }

    @Override
    public void resetState(double t, double[] y) {
        // the state does not jump
    }
}
