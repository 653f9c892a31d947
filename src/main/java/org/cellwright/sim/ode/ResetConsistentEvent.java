package org.cellwright.sim.ode;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Wraps a user's {@link EventHandler} so that a state reset by any handler cannot leave Commons Math 3.6.1's
 * event bookkeeping with the wrong sign.
 *
 * <p>The defect: after an event, Commons Math's {@code EventState} keeps the sign of g computed from the state
 * <i>before</i> a {@code RESET_STATE}. If the reset moves some handler's g across zero (a refill that lifts a
 * concentration back above the level that fired), the next step sees a false sign change and the root finder
 * throws {@code NoBracketingException} (reproduced with Commons Math's own {@code DormandPrince54Integrator};
 * fixed in Hipparchus, issue #184). The remedy here: g is reported as {@code sign * g_user}; after a state reset the
 * integrator calls {@link #afterReset} and, when the reset carried g_user to the other side of zero from where the
 * framework believes it is, the sign is flipped so that the framework's belief holds again. Crossings are then
 * detected as sign changes of the product, and the direction passed to the user is corrected by the same sign.
 * A handler whose g the reset did not change is left alone, so no event is reported twice.
 */
final class ResetConsistentEvent implements EventHandler {

    private final EventHandler user;
    private double sign = 1.0;
    private double lastEventTime = Double.NaN;
    private boolean lastIncreasing;

    ResetConsistentEvent(EventHandler user) {
        this.user = user;
    }

    /** The wrapped handler. */
    EventHandler user() {
        return user;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        sign = 1.0;
        lastEventTime = Double.NaN;
        user.init(t0, y0, t);
    }

    @Override
    public double g(double t, double[] y) {
        return sign * user.g(t, y);
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        lastEventTime = t;
        lastIncreasing = increasing;
        return user.eventOccurred(t, y, sign > 0 ? increasing : !increasing);
    }

    @Override
    public void resetState(double t, double[] y) {
        user.resetState(t, y);
    }

    /**
     * Re-aligns the reported sign after a state reset at time t.
     *
     * @param t       event time (s)
     * @param before  complete state before the reset
     * @param after   complete state after the reset
     * @param forward integration direction
     */
    void afterReset(double t, double[] before, double[] after, boolean forward) {
        double gBefore = user.g(t, before);
        double gAfter = user.g(t, after);
        if (gAfter == gBefore || gAfter == 0.0) {
            return;
        }
        // what the framework holds: for the handler that just fired, the sign just after its crossing (internal
        // "increasing", measured along the integration direction); for the others, the sign before the reset
        boolean frameworkPositive = t == lastEventTime
                ? (forward ? lastIncreasing : !lastIncreasing)
                : sign * gBefore >= 0.0;
        if ((sign * gAfter >= 0.0) != frameworkPositive) {
            sign = -sign;
        }
    }
}
