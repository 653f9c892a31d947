package org.cellwright.ui;

import java.util.List;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.TracePoint;

/**
 * Plays a computed run back in simulated time: a play head (s from the start of the run) that moves at a
 * chosen speed (simulated seconds per wall-clock second), and the points and events that the head has
 * passed. Pure logic without Swing: the window's timer calls {@link #advance(double)} and appends what it
 * returns to the charts; the time slider calls {@link #scrubTo(double)}.
 *
 * <p>A frame either extends what is shown ({@link Frame#replace()} false: append its points and events) or
 * replaces it (true: show exactly its points and events).
 */
final class Playback {

    /** Where the playback stands. */
    enum State {
        /** The head is moving. */
        PLAYING,
        /** The head stands before the end. */
        PAUSED,
        /** The head stands at the end: everything is shown. */
        FINISHED
    }

    /**
     * What to show after a move of the head.
     *
     * @param replace true when the points and events replace what is shown, false when they extend it
     * @param points the points to append or show, in time order
     * @param events the events to append or show, in time order
     */
    record Frame(boolean replace, List<TracePoint> points, List<RunEvent> events) {
        /** @return true when nothing changes */
        boolean isEmpty() {
            return !replace && points.isEmpty() && events.isEmpty();
        }
    }

    private final List<TracePoint> trace;
    private final List<RunEvent> events;
    private final double endS;
    private double speed;
    private double headS;
    private int shownPoints;
    private int shownEvents;
    private State state = State.PAUSED;

    /**
     * A playback standing at the start, paused, nothing shown.
     *
     * @param trace the run's points in time order, at least one
     * @param events the run's events in time order
     * @param speed simulated seconds per wall-clock second, > 0
     */
    Playback(List<TracePoint> trace, List<RunEvent> events, double speed) {
        if (trace.isEmpty()) {
            throw new IllegalArgumentException("a run without points cannot be played");
        }
        this.trace = List.copyOf(trace);
        this.events = List.copyOf(events);
        this.endS = trace.get(trace.size() - 1).timeS();
        setSpeed(speed);
    }

    /** @return the state */
    State state() {
        return state;
    }

    /** @return the play head (s from the start) */
    double headS() {
        return headS;
    }

    /** @return the time of the last point (s) */
    double endS() {
        return endS;
    }

    /** @return simulated seconds per wall-clock second */
    double speed() {
        return speed;
    }

    /** @return how many points are shown */
    int shownPoints() {
        return shownPoints;
    }

    /** @return the points shown, in time order */
    List<TracePoint> shown() {
        return trace.subList(0, shownPoints);
    }

    /** @return the events shown, in time order */
    List<RunEvent> shownEvents() {
        return events.subList(0, shownEvents);
    }

    /** @return the last point shown, or null when none is */
    TracePoint current() {
        return shownPoints == 0 ? null : trace.get(shownPoints - 1);
    }

    /** @param simSecondsPerSecond simulated seconds per wall-clock second, > 0 */
    void setSpeed(double simSecondsPerSecond) {
        if (!(simSecondsPerSecond > 0) || Double.isInfinite(simSecondsPerSecond)) {
            throw new IllegalArgumentException("playback speed must be > 0, got " + simSecondsPerSecond);
        }
        this.speed = simSecondsPerSecond;
    }

    /**
     * Starts or resumes; from the end, starts again from the beginning.
     *
     * @return the frame to show (a replacement when starting again, else empty)
     */
    Frame play() {
        Frame f = new Frame(false, List.of(), List.of());
        if (state == State.FINISHED) {
            f = scrubTo(0);
        }
        state = State.PLAYING;
        return f.isEmpty() ? advance(0) : f;
    }

    /** Stops the head where it is (no change when finished). */
    void pause() {
        if (state == State.PLAYING) {
            state = State.PAUSED;
        }
    }

    /**
     * Moves the head by {@code wallSeconds} times the speed, when playing.
     *
     * @param wallSeconds wall-clock time since the last call (s), >= 0
     * @return the points and events the head passed (to append)
     */
    Frame advance(double wallSeconds) {
        if (state != State.PLAYING) {
            return new Frame(false, List.of(), List.of());
        }
        headS = Math.min(endS, headS + Math.max(0, wallSeconds) * speed);
        Frame f = extendTo(headS);
        if (headS >= endS) {
            state = State.FINISHED;
        }
        return f;
    }

    /**
     * Shows everything at once.
     *
     * @return the remaining points and events (to append)
     */
    Frame jumpToEnd() {
        headS = endS;
        state = State.FINISHED;
        return extendTo(endS);
    }

    /**
     * Puts the head at a time; playing continues from there, a finished playback pauses there (unless the
     * time is the end).
     *
     * @param timeS the time (s), clamped to the run
     * @return every point and event up to that time (to show instead of what is shown)
     */
    Frame scrubTo(double timeS) {
        headS = Math.max(0, Math.min(endS, timeS));
        shownPoints = countUpTo(headS);
        shownEvents = eventsUpTo(headS);
        if (headS >= endS) {
            state = State.FINISHED;
        } else if (state == State.FINISHED) {
            state = State.PAUSED;
        }
        return new Frame(true, trace.subList(0, shownPoints), events.subList(0, shownEvents));
    }

    /**
     * @return what the charts show now, for the status bar: the whole run, or the time up to the play head
     *     out of the run's length ("Showing 4 h 0 min of 8 h 0 min (50 %). ...")
     */
    String shownText() {
        return shownText(headS, endS, state);
    }

    /**
     * @param headS the play head (s)
     * @param endS the end of the run (s)
     * @param state the playback's state
     * @return the status bar's sentence about what the charts show
     */
    static String shownText(double headS, double endS, State state) {
        if (headS >= endS) {
            return "Showing the whole run (" + org.cellwright.sim.RunClock.format(endS)
                    + "). Drag the time slider to look back; Space plays it again.";
        }
        String part = String.format(java.util.Locale.ROOT, "Showing %s of %s (%.0f %%).",
                org.cellwright.sim.RunClock.format(headS), org.cellwright.sim.RunClock.format(endS),
                endS > 0 ? Math.floor(100 * headS / endS) : 0);
        return part + (state == State.PLAYING ? " Playing on from here; Space pauses, End shows the whole run."
                : " Space plays on from here; End shows the whole run.");
    }

    private Frame extendTo(double timeS) {
        int points = countUpTo(timeS);
        int ev = eventsUpTo(timeS);
        Frame f = new Frame(false, trace.subList(shownPoints, points), events.subList(shownEvents, ev));
        shownPoints = points;
        shownEvents = ev;
        return f;
    }

    /** @return how many points lie at or before {@code t} (binary search: the trace is in time order) */
    private int countUpTo(double t) {
        int lo = 0;
        int hi = trace.size();
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (trace.get(mid).timeS() <= t) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private int eventsUpTo(double t) {
        int n = 0;
        while (n < events.size() && events.get(n).timeS() <= t) {
            n++;
        }
        return n;
    }
}
