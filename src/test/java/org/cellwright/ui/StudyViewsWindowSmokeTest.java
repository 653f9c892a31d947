package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.edt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Graphics2D;
import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JComponent;
import javax.swing.RootPaneContainer;
import javax.swing.SwingUtilities;

import org.cellwright.chart.SpreadBands;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/**
 * The studies in the real window under a display (Xvfb in CI): a sweep of the tin scenario from the sweep
 * view (timed, written to {@code target/window-sweep.txt}; 10 x 10 with {@code -Dcellwright.sweep.full=true}), a click on a heat-map cell loading that run
 * into the main window, a planned schedule applied to the form, and the uncertainty bands on the charts and
 * cleared by a change; screenshots under target/. Skipped without a display.
 */
class StudyViewsWindowSmokeTest {

    private static final int LOAD_S = 60;
    /** A goal the tin scenario reaches in a few hours, so that planning takes seconds, not a minute. */
    private static final String GOAL = "3 g";
    /**
     * {@code -Dcellwright.sweep.full=true} runs the 10 x 10 sweep that docs/window.md reports (and its
     * screenshot); by default a 5 x 4 grid keeps the test within about 15 s.
     */
    private static final boolean FULL = Boolean.getBoolean("cellwright.sweep.full");
    private static final int NX = FULL ? 10 : 5;
    private static final int NY = FULL ? 10 : 4;
    /** Samples of the bands: the window's default when measuring, fewer for the quick test. */
    private static final int SAMPLES = FULL ? RangesPanel.DEFAULT_SAMPLES : 12;
    private CellwrightWindow window;

    @AfterEach
    void close() throws Exception {
        if (window != null) {
            SwingUtilities.invokeAndWait(window::dispose);
        }
    }

    @Test
    void sweepPlanAndBands() throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: the window smoke test needs one (Xvfb in CI)");
        window = CellwrightWindow.open(false);
        await("the library and the default scenario load", LOAD_S, window::isReady);
        Studies studies = edt(window::studies);

        // a sweep: gap across, current density up
        SweepView view = edt(() -> {
            studies.openSweep();
            SweepView v = studies.sweepView();
            v.across().set("cell.gap", "10 mm", "60 mm", NX, false);
            v.up().set("supply.current_density", "0.5 A/dm2", "4 A/dm2", NY, false);
            v.setFigure(SummaryFigure.EFFICIENCY);
            return v;
        });
        long start = System.nanoTime();
        edt(() -> {
            view.runSweep();
            return null;
        });
        await("the sweep finishes", 120, () -> edt(() -> view.result() != null && !view.running()));
        double wallS = (System.nanoTime() - start) / 1e9;
        SweepResult r = edt(view::result);
        assertEquals(NX * NY, r.points().size());
        assertEquals(NX * NY, r.okCount(), "every point of the tin grid runs: " + edt(view::messageText));
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "window-sweep.txt"), String.format(Locale.ROOT,
                "%d x %d sweep of the tin scenario from the window: %.2f s from Run to the heat map shown, %.2f s of "
                        + "runs on %d threads%n", NX, NY, wallS, r.elapsedS(), r.threads()), StandardCharsets.UTF_8);

        // a click on a cell: the corner of the narrowest gap and the highest current density
        SweepPoint corner = r.at(0, NY - 1);
        edt(() -> {
            view.pick(corner);
            return null;
        });
        await("the point's run is shown", 30, () -> edt(() -> window.director().result() != null
                && window.director().result().scenario().equals(corner.scenario())));
        assertEquals(corner.scenario(), edt(() -> window.session().scenario()), "the form holds the point's scenario");
        assertEquals("10 mm", edt(() -> window.form().draft().get("cell.gap")), "typed into its field, unit kept");
        shoot(view, "window-sweep.png");

        // a middle point, then its uncertainty bands, cleared by a slider move
        SweepPoint middle = r.at(NX / 2, NY / 4);
        edt(() -> {
            view.pick(middle);
            view.setVisible(false);
            return null;
        });
        // its values go into the form with four significant digits (1.66667 A/dm2 of the sweep as 1.667 A/dm2),
        // and the run shown is the form's
        await("the middle point's run is shown", 30, () -> edt(() -> window.director().result() != null
                && window.director().result().scenario().equals(window.session().scenario())
                && nearPoint(window.session().scenario(), middle.scenario())));
        if (!FULL) {
            assertEquals("1.667 A/dm2", edt(() -> window.form().draft().get(FormFields.SUPPLY_VALUE)));
        }
        edt(() -> {
            window.actions().toEnd.actionPerformed(null);
            studies.ranges().setSamples(SAMPLES);
            studies.toggleBands(true);
            return null;
        });
        await("the bands are computed", 120, () -> edt(() -> studies.bands().bands() != null));
        assertTrue(edt(() -> SpreadBands.shown(window.director().charts())), "bands on the charts");
        assertFalse(edt(() -> studies.ranges().shownRows().isEmpty()), "ranges under the summary");
        shoot(window.frame(), "window-bands.png");
        edt(() -> {
            window.knobs().slider(Knob.GAP).setValue(window.knobs().slider(Knob.GAP).getValue() + 40);
            return null;
        });
        await("a slider move clears the bands", 30, () -> edt(() -> studies.bands().bands() == null
                && !SpreadBands.shown(window.director().charts())));

        // a plan, applied to the form
        PlanView plan = edt(() -> {
            studies.openPlan();
            studies.planView().setGoal(GOAL);
            studies.planView().startPlan();
            return studies.planView();
        });
        await("the plan is made", 120, () -> edt(() -> !plan.running()));
        assertNotNull(edt(plan::shownPlan), "a plan for " + GOAL + " of tin: " + edt(plan::messageText));
        shoot(plan, "window-plan.png");
        edt(() -> {
            plan.apply();
            plan.setVisible(false);
            return null;
        });
        await("the planned run is shown", 30, () -> edt(() -> window.director().result() != null
                && window.director().result().scenario().supply().schedule()
                        .equals(plan.shownPlan().scenario().supply().schedule())));
        assertEquals(SupplyKind.SCHEDULE, edt(() -> window.form().draft().supplyKind()), "the form holds the schedule");
    }

    private static void shoot(java.awt.Window w, String name) throws Exception {
        Thread.sleep(400);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            JComponent root = ((RootPaneContainer) w).getRootPane();
            BufferedImage b = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = b.createGraphics();
            root.paint(g);
            g.dispose();
            img.set(b);
        });
        assertTrue(img.get().getWidth() > 600, "window width " + img.get().getWidth());
        ImageIO.write(img.get(), "png", Path.of("target", name).toFile());
    }

    private static void await(String what, int seconds, OnEdt.Check check) throws Exception {
        System.out.printf(Locale.ROOT, "TIMING %s: %.2f s%n", what, OnEdt.await(what, seconds, check));
    }

    /** @return true when the scenario's gap and current lie within the form's rounding (5e-4) of the point's */
    private static boolean nearPoint(org.cellwright.cell.Scenario shown, org.cellwright.cell.Scenario point) {
        return Math.abs(shown.cell().gapM() - point.cell().gapM()) <= 5e-4 * point.cell().gapM()
                && Math.abs(shown.supply().currentA() - point.supply().currentA()) <= 5e-4 * point.supply().currentA();
    }
}
