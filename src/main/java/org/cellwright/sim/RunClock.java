package org.cellwright.sim;

import java.util.Locale;

/** Formats simulated times for people: "1 h 42 min", "35 min", "12 s". */
public final class RunClock {

    private RunClock() {
    }

    /**
     * @param seconds a time (s)
     * @return the time in hours and minutes, or minutes and seconds below ten minutes
     */
    public static String format(double seconds) {
        if (seconds < 600) {
            long s = Math.round(seconds);
            return s < 60 ? s + " s" : String.format(Locale.ROOT, "%d min %d s", s / 60, s % 60);
        }
        long min = Math.round(seconds / 60);
        return min < 60 ? min + " min" : String.format(Locale.ROOT, "%d h %d min", min / 60, min % 60);
    }
}
