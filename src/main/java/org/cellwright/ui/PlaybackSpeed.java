package org.cellwright.ui;

import java.util.List;

/**
 * A playback speed: how much simulated time one wall-clock second shows.
 *
 * @param label what the speed menu shows ("1 s = 30 min")
 * @param simSecondsPerSecond simulated seconds per wall-clock second
 */
record PlaybackSpeed(String label, double simSecondsPerSecond) {

    /** Wall-clock time a whole run should take to play at the chosen default speed (s): long enough to follow. */
    static final double DEFAULT_PLAY_S = 12;

    /** The speeds offered, slowest first. */
    static final List<PlaybackSpeed> ALL = List.of(
            new PlaybackSpeed("1 s = 10 s", 10),
            new PlaybackSpeed("1 s = 1 min", 60),
            new PlaybackSpeed("1 s = 5 min", 300),
            new PlaybackSpeed("1 s = 15 min", 900),
            new PlaybackSpeed("1 s = 30 min", 1800),
            new PlaybackSpeed("1 s = 1 h", 3600),
            new PlaybackSpeed("1 s = 3 h", 10800),
            new PlaybackSpeed("1 s = 12 h", 43200));

    @Override
    public String toString() {
        return label;
    }

    /**
     * @param durationS a run's duration (s)
     * @return the offered speed that plays it closest to {@link #DEFAULT_PLAY_S} (on a log scale)
     */
    static PlaybackSpeed forDuration(double durationS) {
        double wanted = durationS / DEFAULT_PLAY_S;
        PlaybackSpeed best = ALL.get(0);
        for (PlaybackSpeed s : ALL) {
            if (Math.abs(Math.log(s.simSecondsPerSecond / wanted)) < Math.abs(Math.log(best.simSecondsPerSecond / wanted))) {
                best = s;
            }
        }
        return best;
    }
}
