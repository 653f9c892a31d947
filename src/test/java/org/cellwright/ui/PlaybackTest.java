package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.TracePoint;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

/** The playback's head, frames and states, on a made-up trace of 61 points 10 s apart (0 to 600 s). */
class PlaybackTest {

    private final List<TracePoint> trace = Traces.every(61, 10);
    private final List<RunEvent> events = List.of(Traces.event(25), Traces.event(250), Traces.event(600));

    @Test
    void startsPausedWithNothingShown() {
        Playback p = new Playback(trace, events, 60);
        assertEquals(Playback.State.PAUSED, p.state());
        assertEquals(0, p.shownPoints());
        assertNull(p.current());
        assertTrue(p.advance(1).isEmpty(), "a paused playback does not move");
        assertEquals(600, p.endS());
    }

    @Test
    void advancesBySpeedTimesWallTime() {
        Playback p = new Playback(trace, events, 60);
        Playback.Frame first = p.play();
        // by construction: play shows the point at t = 0
        assertEquals(1, first.points().size());
        Playback.Frame f = p.advance(0.5);
        // 0.5 s at 60 s/s moves the head to 30 s: points at 10, 20, 30 s join; the event at 25 s is passed
        assertEquals(30, p.headS(), 1e-12);
        assertEquals(List.of(10.0, 20.0, 30.0), f.points().stream().map(TracePoint::timeS).toList());
        assertEquals(List.of(events.get(0)), f.events());
        assertFalse(f.replace());
        assertEquals(30, p.current().timeS());
    }

    @Test
    void statusSaysWhatIsShownAfterAScrubBack() {
        Playback p = new Playback(trace, events, 60);
        p.jumpToEnd();
        assertTrue(p.shownText().startsWith("Showing the whole run (10 min)"), p.shownText());
        p.scrubTo(300);
        // 300 s of the 600 s run: half of it, paused there
        assertTrue(p.shownText().startsWith("Showing 5 min 0 s of 10 min (50 %)."), p.shownText());
        assertFalse(p.shownText().startsWith("Showing the whole run"), p.shownText());
        assertTrue(p.shownText().contains("End shows the whole run"), p.shownText());
        p.jumpToEnd();
        assertTrue(p.shownText().startsWith("Showing the whole run"), p.shownText());
        // the play head past 8 h 0 min of a 9 h 0 min run reads in hours; 88.9 % is written 88 % (never
        // 100 % before the end)
        assertEquals("Showing 8 h 0 min of 9 h 0 min (88 %). Space plays on from here; End shows the whole run.",
                Playback.shownText(8 * 3600, 9 * 3600, Playback.State.PAUSED));
        assertTrue(Playback.shownText(8 * 3600, 9 * 3600, Playback.State.PLAYING).contains("Playing on"));
    }

    @Test
    void finishesAtTheEndAndStops() {
        Playback p = new Playback(trace, events, 60);
        p.play();
        Playback.Frame f = p.advance(100);
        assertEquals(Playback.State.FINISHED, p.state());
        assertEquals(600, p.headS());
        assertEquals(60, f.points().size(), "the 60 points after t = 0");
        assertEquals(3, f.events().size());
        assertTrue(p.advance(1).isEmpty());
    }

    @Test
    void pauseHoldsTheHead() {
        Playback p = new Playback(trace, events, 60);
        p.play();
        p.advance(1);
        p.pause();
        assertEquals(Playback.State.PAUSED, p.state());
        assertTrue(p.advance(5).isEmpty());
        assertEquals(60, p.headS(), 1e-12);
    }

    @Test
    void scrubReplacesWhatIsShownAndPlayingGoesOnFromThere() {
        Playback p = new Playback(trace, events, 60);
        p.play();
        p.jumpToEnd();
        Playback.Frame back = p.scrubTo(255);
        assertTrue(back.replace());
        // the points at 0..250 s (26 of them) and the events at 25 and 250 s
        assertEquals(26, back.points().size());
        assertEquals(2, back.events().size());
        assertEquals(Playback.State.PAUSED, p.state(), "scrubbing back from the end pauses");
        p.play();
        Playback.Frame on = p.advance(1);
        assertEquals(List.of(260.0, 270.0, 280.0, 290.0, 300.0, 310.0), on.points().stream().map(TracePoint::timeS).toList());
    }

    @Test
    void scrubIsClampedToTheRun() {
        Playback p = new Playback(trace, events, 60);
        assertEquals(1, p.scrubTo(-50).points().size());
        assertEquals(0, p.headS());
        assertEquals(61, p.scrubTo(1e9).points().size());
        assertEquals(Playback.State.FINISHED, p.state());
    }

    @Test
    void playingAgainFromTheEndStartsOver() {
        Playback p = new Playback(trace, events, 60);
        p.play();
        p.jumpToEnd();
        Playback.Frame again = p.play();
        assertTrue(again.replace(), "starting over replaces the curves");
        assertEquals(1, again.points().size());
        assertEquals(Playback.State.PLAYING, p.state());
    }

    @Test
    void jumpToEndAppendsTheRest() {
        Playback p = new Playback(trace, events, 60);
        p.play();
        p.advance(2);
        Playback.Frame rest = p.jumpToEnd();
        assertEquals(61 - 13, rest.points().size(), "points after 120 s");
        assertEquals(List.of(events.get(1), events.get(2)), rest.events());
        assertEquals(Playback.State.FINISHED, p.state());
    }

    @Test
    void rejectsBadSpeedsAndEmptyRuns() {
        assertThrows(IllegalArgumentException.class, () -> new Playback(trace, events, 0));
        assertThrows(IllegalArgumentException.class, () -> new Playback(trace, events, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> new Playback(List.of(), events, 60));
        Playback p = new Playback(trace, events, 60);
        assertThrows(IllegalArgumentException.class, () -> p.setSpeed(-1));
    }

    /** Whatever the frame times, the appended frames add up to the trace: no point twice, none lost. */
    @RepeatedTest(20)
    void framesAddUpToTheTrace(RepetitionInfo rep) {
        long seed = 977L * rep.getCurrentRepetition();
        SplittableRandom rnd = new SplittableRandom(seed);
        Playback p = new Playback(trace, events, 1 + rnd.nextDouble(200));
        List<TracePoint> shown = new ArrayList<>(p.play().points());
        List<RunEvent> seen = new ArrayList<>();
        int guard = 0;
        while (p.state() == Playback.State.PLAYING && guard++ < 100_000) {
            if (rnd.nextInt(10) == 0) {
                p.setSpeed(1 + rnd.nextDouble(200));
            }
            Playback.Frame f = p.advance(rnd.nextDouble(0.1));
            shown.addAll(f.points());
            seen.addAll(f.events());
        }
        assertEquals(trace, shown, "seed " + seed);
        assertEquals(events, seen, "seed " + seed);
    }
}
