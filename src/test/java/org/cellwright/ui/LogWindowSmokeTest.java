package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.await;
import static org.cellwright.ui.OnEdt.edt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Graphics2D;
import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JComponent;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;

import org.cellwright.sim.RunResult;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/**
 * The measured log in the real window (Xvfb in CI): opens the copper scenario, loads its demo log, runs,
 * fits the diffusion layer and the contact resistance from the fit dialog, checks that the fitted scenario is
 * loaded with the log still drawn over its charts, and saves screenshots of the window with the fit
 * (target/window-fit.png, the dialog in target/window-fit-dialog.png) and of the charge tab
 * (target/window-charge.png). Skipped without a display.
 */
class LogWindowSmokeTest {

    private static final int LOAD_S = 60;
    /** The fit takes about 7 s on two idle cores; generous for a loaded CI machine. */
    private static final int FIT_S = 180;

    private CellwrightWindow window;

    @AfterEach
    void close() throws Exception {
        if (window != null) {
            SwingUtilities.invokeAndWait(() -> {
                if (window.logs().fitDialog() != null) {
                    window.logs().fitDialog().dispose();
                }
                window.dispose();
            });
        }
    }

    @Test
    void loadsFitsAndShowsTheCharge() throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: the window smoke test needs one (Xvfb in CI)");
        window = CellwrightWindow.open(false);
        await("the window loads", LOAD_S, window::isReady);
        edt(() -> {
            window.session().openFile(Path.of("scenarios/copper-etchant-bleed.toml"));
            window.logs().loadLog(Path.of("scenarios/copper-etchant-bleed-log.csv"));
            return null;
        });
        await("the log is read", 30, () -> edt(() -> window.logs().overlay() != null));
        LogOverlay good = edt(() -> window.logs().overlay());

        // a bad log: its problems are listed with line and column in a dialog, and nothing changes
        Path bad = Path.of("target", "bad-log.csv");
        Files.writeString(bad, "time_min,current_A,cell_voltage_V\n0,4.0,2.2\n5,4.0,2.4 V\n3,4.1,2.3\n");
        edt(() -> {
            window.logs().loadLog(bad);
            return null;
        });
        await("the problems dialog opens", 30, () -> edt(() -> problemsDialog() != null));
        javax.swing.JDialog problems = edt(LogWindowSmokeTest::problemsDialog);
        String listed = edt(() -> text(problems.getContentPane()));
        assertTrue(listed.contains("bad-log.csv:3:"), "line of the bad voltage: " + listed);
        assertTrue(listed.contains("cell_voltage_V"), listed);
        assertTrue(!listed.contains("Exception") && !listed.contains("\tat "), "no stack trace: " + listed);
        shoot(problems.getRootPane(), "window-log-problems.png");
        edt(() -> {
            problems.dispose();
            return null;
        });
        assertSame(good, edt(() -> window.logs().overlay()), "a bad log leaves the loaded one in place");
        edt(() -> {
            window.session().run();
            return null;
        });
        await("the run is computed", 60, () -> edt(() -> window.director().result() != null));
        edt(() -> {
            window.director().jumpToEnd();
            return null;
        });
        XYDataset marks = edt(() -> window.director().charts().voltage().getXYPlot().getDataset(LogOverlay.DATASET));
        assertNotNull(marks, "the measured cell voltage is drawn on the voltage chart");
        assertEquals(edt(() -> window.logs().overlay().log().column("cell_voltage_V").count()).intValue(),
                marks.getItemCount(0), "one dot per logged voltage");

        edt(() -> {
            window.logs().fitLog.actionPerformed(null);
            return null;
        });
        FitDialog dialog = edt(() -> window.logs().fitDialog());
        assertNotNull(dialog);
        shoot(dialog.getRootPane(), "window-fit-setup.png");
        String before = edt(() -> window.session().name());
        edt(() -> {
            dialog.start();
            return null;
        });
        await("the first iteration is reported", FIT_S, () -> edt(() -> dialog.shownStatus().contains("Iteration")));
        edt(() -> {
            dialog.close();
            return null;
        });
        await("Cancel stops the fit", 30, () -> edt(() -> !dialog.isRunning()));
        assertTrue(edt(dialog::shownStatus).contains("cancelled"), edt(dialog::shownStatus));
        assertEquals(before, edt(() -> window.session().name()), "a cancelled fit leaves the scenario as it was");
        assertTrue(edt(dialog::isDisplayable), "the dialog stays open for another try");
        edt(() -> {
            dialog.start();
            return null;
        });
        await("the fit finishes", FIT_S, () -> edt(() -> !dialog.isRunning()));
        assertEquals(2, (int) edt(() -> dialog.parameterTable().getRowCount()), "two fitted values listed");
        await("the fitted scenario is replotted", 60, () -> edt(() -> window.director().result() != null
                && window.session().name().endsWith("(fitted)")
                && window.director().result().scenario() == window.session().scenario()));
        RunResult fitted = edt(() -> window.director().result());
        // source: the log's header (made with 45 um and 12 mohm); the fit's intervals are about +-0.1 um and
        // +-0.5 mohm (docs/fit-and-report.md), so 2 um and 2 mohm are loose bounds for a loaded fit
        assertEquals(45e-6, fitted.scenario().cell().agitation().diffusionLayerM(), 2e-6);
        assertEquals(0.012, fitted.scenario().cell().contactResistanceOhm(), 0.002);
        assertNotNull(edt(() -> window.director().charts().voltage().getXYPlot().getDataset(LogOverlay.DATASET)),
                "the log stays drawn over the fitted run");

        JTabbedPane tabs = edt(() -> (JTabbedPane) SwingUtilities.getAncestorOfClass(JTabbedPane.class,
                window.logs().logPanel()));
        edt(() -> {
            tabs.setSelectedIndex(tabs.indexOfTab("Log"));
            return null;
        });
        shoot(window.frame().getRootPane(), "window-fit.png");
        shoot(dialog.getRootPane(), "window-fit-dialog.png");
        edt(() -> {
            dialog.dispose();
            tabs.setSelectedIndex(tabs.indexOfTab("Charge"));
            return null;
        });
        await("the charge tab shows the fitted run", 10,
                () -> edt(() -> window.logs().chargePanel().run() == window.director().result()));
        shoot(window.frame().getRootPane(), "window-charge.png");

        // the report of the scenario shown, written off the event thread as the export menu does
        Path report = Path.of("target", "window-report.html");
        Files.deleteIfExists(report);
        var worker = edt(() -> window.logs().reports().writeReport(window.session().scenario(), window.session().name(),
                ReportExport.Format.HTML, report));
        assertTrue(worker.get().cautions().size() >= 2, "the copper run raises the acid and hydrogen cautions");
        await("the status bar says the report was written", 10, () -> Files.exists(report));
        edt(() -> {
            window.toggleDark();
            return null;
        });
        shoot(window.frame().getRootPane(), "window-charge-dark.png");
    }

    private static javax.swing.JDialog problemsDialog() {
        for (java.awt.Window w : java.awt.Window.getWindows()) {
            if (w instanceof javax.swing.JDialog d && d.isShowing() && "Log problems".equals(d.getTitle())) {
                return d;
            }
        }
        return null;
    }

    /** @return the text of every label and text component inside */
    private static String text(java.awt.Container c) {
        StringBuilder sb = new StringBuilder();
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof javax.swing.JLabel l) {
                sb.append(l.getText()).append('\n');
            } else if (k instanceof javax.swing.text.JTextComponent t) {
                sb.append(t.getText()).append('\n');
            }
            if (k instanceof java.awt.Container inner) {
                sb.append(text(inner));
            }
        }
        return sb.toString();
    }

    private static void shoot(JComponent root, String name) throws Exception {
        Thread.sleep(400);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            BufferedImage b = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = b.createGraphics();
            root.paint(g);
            g.dispose();
            img.set(b);
        });
        Files.createDirectories(Path.of("target"));
        assertTrue(img.get().getWidth() > 200 && img.get().getHeight() > 100, name + " is too small");
        ImageIO.write(img.get(), "png", Path.of("target", name).toFile());
    }
}
