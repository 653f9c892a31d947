package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.await;
import static org.cellwright.ui.OnEdt.edt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.awt.Robot;
import java.awt.event.KeyEvent;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JSlider;
import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/**
 * Opens the real window under a display (Xvfb in CI), loads the default scenario, runs it, lets it play,
 * jumps to the end, moves the five sliders in turn and measures the time from each move to the last chart redrawn,
 * pins a run and compares, scrubs back, switches to dark, and saves screenshots under target/. Skipped
 * without a display. Run by the surefire execution "window-smoke" (without -Djava.awt.headless=true).
 */
class CellwrightWindowSmokeTest {

    /** Time the window may take to load the library and the scenario (s): about 1 s here, 30 s for a slow CI. */
    private static final int LOAD_S = 60;

    /** Slider moves before the measured ones: the first runs include the JIT compiling the engine. */
    private static final int WARM_UP = 5;
    /** Slider moves measured: three rounds of the five sliders. */
    private static final int MEASURED = 15;

    private CellwrightWindow window;

    private static double median(List<ReplotClock.Latency> l) {
        double[] t = l.stream().mapToDouble(ReplotClock.Latency::totalMs).sorted().toArray();
        return t.length % 2 == 1 ? t[t.length / 2] : (t[t.length / 2 - 1] + t[t.length / 2]) / 2;
    }

    @AfterEach
    void close() throws Exception {
        if (window != null) {
            SwingUtilities.invokeAndWait(window::dispose);
        }
    }

    @Test
    void opensRunsReplotsAndSavesScreenshots() throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: the window smoke test needs one (Xvfb in CI)");
        window = CellwrightWindow.open(false);
        await("the library and the default scenario load", LOAD_S, window::isReady);
        assertEquals("tin-stripping-liquor.toml", edt(() -> window.session().name()));
        assertEquals(0, (int) edt(() -> window.form().problemsShown()), "the default scenario shows no problems");

        // the keys, typed as a person would: F5 runs, Space pauses, but in a text field Space is a space
        Robot robot = new Robot();
        robot.setAutoDelay(30);
        edt(() -> {
            window.frame().toFront();
            window.knobs().slider(Knob.GAP).requestFocusInWindow();
            return null;
        });
        await("a slider has the keyboard", 10, () -> edt(() -> window.knobs().slider(Knob.GAP).isFocusOwner()));
        type(robot, KeyEvent.VK_F5);
        await("F5 starts the run playing", 30, () -> edt(() -> window.director().state() == Playback.State.PLAYING));
        type(robot, KeyEvent.VK_SPACE);
        await("Space pauses", 10, () -> edt(() -> window.director().state() == Playback.State.PAUSED));
        JTextComponent title = edt(() -> window.form().field("title").orElseThrow());
        String titleText = edt(title::getText);
        edt(() -> {
            title.requestFocusInWindow();
            title.setCaretPosition(0);
            return null;
        });
        await("the title field has the keyboard", 10, () -> edt(title::isFocusOwner));
        type(robot, KeyEvent.VK_SPACE);
        await("Space types a space in a text field", 10, () -> edt(title::getText).equals(" " + titleText));
        assertEquals(Playback.State.PAUSED, edt(() -> window.director().state()), "and does not resume the run");
        edt(() -> {
            title.setText(titleText);
            title.setCaretPosition(0);
            window.knobs().slider(Knob.GAP).requestFocusInWindow();
            return null;
        });
        await("a slider has the keyboard again", 10, () -> edt(() -> window.knobs().slider(Knob.GAP).isFocusOwner()));
        type(robot, KeyEvent.VK_SPACE);
        await("Space resumes", 10, () -> edt(() -> window.director().state() == Playback.State.PLAYING));
        Thread.sleep(1500);
        RunResult run = edt(() -> window.director().result());
        int midway = edt(() -> window.director().shown().size());
        assertTrue(midway > 0 && midway < run.trace().size(),
                "after 1.5 s of playback part of the run is shown: " + midway + " of " + run.trace().size());
        edt(() -> {
            window.actions().toEnd.actionPerformed(null);
            return null;
        });
        assertEquals(Playback.State.FINISHED, edt(() -> window.director().state()));
        assertEquals(run.trace().size(), (int) edt(() -> window.director().shown().size()));
        assertFalse(edt(() -> window.director().result().events().isEmpty()), "the tin run has events to log");
        assertTrue(edt(() -> window.director().result().events().stream()
                .anyMatch(e -> e.kind() == RunEvent.Kind.NEAR_LIMITING_CURRENT)), "the Sn2+ supply reaches its limit");
        CautionList cautions = edt(() -> CautionList.of(window.director().result().summary().warnings()));
        assertTrue(cautions.safety().stream().anyMatch(c -> c.topic().equals("Chlorine")),
                "a graphite anode in a chloride bath: the chlorine caution shows");
        shoot("window-light.png");

        // move the five sliders in turn, a few steps up, then down; each move waits for its replot
        for (int i = 0; i < WARM_UP + MEASURED; i++) {
            Knob k = Knob.values()[i % Knob.values().length];
            int delta = (i / Knob.values().length) % 2 == 0 ? 15 : -15;
            int before = edt(() -> window.director().clock().history().size());
            edt(() -> {
                JSlider s = window.knobs().slider(k);
                s.setValue(s.getValue() + delta);
                return null;
            });
            await("replot " + i + " (" + k + ")", 20, () -> edt(() -> window.director().clock().history().size() > before));
        }
        List<ReplotClock.Latency> all = edt(() -> window.director().clock().history());
        List<ReplotClock.Latency> measured = all.subList(WARM_UP, all.size());
        double median = median(measured);
        double warmUp = median(all.subList(0, WARM_UP));
        double engine = measured.stream().mapToDouble(ReplotClock.Latency::engineMs).sorted()
                .toArray()[measured.size() / 2];
        String gapText = edt(() -> window.knobs().valueText(Knob.GAP));
        assertEquals(gapText, edt(() -> window.form().draft().get("cell.gap")), "the form follows the slider");
        assertEquals(edt(() -> window.knobs().valueText(Knob.TEMPERATURE)),
                edt(() -> window.form().draft().get("electrolyte.temperature")));
        Files.createDirectories(Path.of("target"));
        String report = String.format(Locale.ROOT, "slider to replot: median %.1f ms over %d moves after %d warm-up"
                + " moves (engine median %.1f ms); the warm-up moves' median %.1f ms%n%s%n", median, MEASURED, WARM_UP,
                engine, warmUp, all);
        Files.writeString(Path.of("target/window-replot.txt"), report, StandardCharsets.UTF_8);
        System.out.print("window smoke: " + report);
        // Generous bound for a loaded CI machine under Xvfb; the figure itself is reported (target/window-replot.txt).
        assertTrue(median < 1500, "slider to replot took " + median + " ms (median)");

        // pin, change the current density, compare
        edt(() -> {
            window.actions().pin.actionPerformed(null);
            return null;
        });
        assertTrue(edt(() -> window.director().reference() != null), "the pinned run is the reference");
        JSlider supply = edt(() -> window.knobs().slider(Knob.SUPPLY));
        int before = edt(() -> window.director().clock().history().size());
        edt(() -> {
            supply.setValue(supply.getValue() + 60);
            return null;
        });
        await("replot after the supply slider", 20, () -> edt(() -> window.director().clock().history().size() > before));
        shoot("window-compare.png");

        // scrub back to the middle of the run
        edt(() -> {
            window.director().scrubTo(run.summary().durationS() / 2);
            return null;
        });
        int half = edt(() -> window.director().shown().size());
        assertTrue(half > 1 && half < run.trace().size(), "scrubbing back shows part of the run: " + half);
        edt(() -> {
            window.actions().toEnd.actionPerformed(null);
            window.toggleDark();
            return null;
        });
        assertTrue(edt(window::isDark));
        shoot("window-dark.png");
    }

    private static void type(Robot robot, int key) {
        robot.keyPress(key);
        robot.keyRelease(key);
    }

    private void shoot(String name) throws Exception {
        Thread.sleep(300);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> img.set(window.snapshot()));
        Files.createDirectories(Path.of("target"));
        write(img.get(), Path.of("target", name));
    }

    private static void write(BufferedImage img, Path file) throws IOException {
        assertTrue(img.getWidth() > 800 && img.getHeight() > 500, "window size " + img.getWidth() + "x" + img.getHeight());
        ImageIO.write(img, "png", file.toFile());
    }
}
