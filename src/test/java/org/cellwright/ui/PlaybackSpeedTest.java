package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PlaybackSpeedTest {

    @Test
    void defaultSpeedPlaysARunInAboutTwelveSeconds() {
        // 6 h = 21600 s over 12 s is exactly 1800 s per second
        assertEquals("1 s = 30 min", PlaybackSpeed.forDuration(21600).label());
        // 4 h: 1200 s/s lies between 900 and 1800; on a log scale 900 is nearer (ln 4/3 < ln 3/2)
        assertEquals("1 s = 15 min", PlaybackSpeed.forDuration(4 * 3600).label());
        // very short and very long runs get the slowest and fastest speeds
        assertEquals(PlaybackSpeed.ALL.get(0), PlaybackSpeed.forDuration(10));
        assertEquals(PlaybackSpeed.ALL.get(PlaybackSpeed.ALL.size() - 1), PlaybackSpeed.forDuration(30 * 86400));
    }
}
