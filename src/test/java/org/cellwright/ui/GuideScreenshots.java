package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.await;
import static org.cellwright.ui.OnEdt.edt;

import java.awt.Component;
import java.awt.Container;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JComponent;
import javax.swing.JSlider;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;

/**
 * Takes the screenshots of the user's guide (docs/guide.md): opens the real window under a display (Xvfb),
 * runs scenarios to the end and writes PNGs. Not a test (Surefire does not run it); run by
 * {@code dev/screenshots.sh}, which lists what it wrote.
 *
 * <p>Usage: {@code GuideScreenshots OUT_DIR [SCENARIO.toml ...]}: the tour of the window on the default
 * scenario (the run at the end, half-way, the cautions, a pinned run compared, a mistake in the form, the
 * dark look, the what-if sliders), then one picture per scenario file given, run to the end. Tabs are found
 * by their titles, so views added later (a new tab) can be shot by adding a line here.
 */
public final class GuideScreenshots {

    private static final int LOAD_S = 120;
    private static final int RUN_S = 120;

    private final CellwrightWindow window;
    private final Path out;
    private final List<Path> written = new ArrayList<>();

    private GuideScreenshots(CellwrightWindow window, Path out) {
        this.window = window;
        this.out = out;
    }

    /**
     * @param args the output folder, then scenario files to shoot run to the end
     * @throws Exception when the window cannot be opened or a step times out
     */
    public static void main(String[] args) throws Exception {
        if (args.length < 1) {
            System.err.println("usage: GuideScreenshots OUT_DIR [SCENARIO.toml ...]");
            System.exit(2);
        }
        Path out = Path.of(args[0]);
        Files.createDirectories(out);
        CellwrightWindow w = CellwrightWindow.open(false);
        GuideScreenshots shots = new GuideScreenshots(w, out);
        int code = 0;
        try {
            await("the library and the default scenario load", LOAD_S, w::isReady);
            shots.tour();
            for (int i = 1; i < args.length; i++) {
                shots.scenario(Path.of(args[i]));
            }
        } catch (Exception | AssertionError e) {
            System.err.println("screenshots: " + e.getMessage());
            code = 1;
        } finally {
            SwingUtilities.invokeAndWait(w::dispose);
        }
        shots.written.forEach(p -> System.out.println(p));
        System.exit(code);
    }

    /** The window on the default scenario, part by part. */
    private void tour() throws Exception {
        runToEnd();
        selectTab("Summary");
        shoot("window-summary.png");
        crop("whatif.png", edt(() -> window.knobs()));
        selectTab("Cautions");
        shoot("window-cautions.png");
        // half-way through the run: the charts and the event log up to the play head
        double half = edt(() -> window.director().result().summary().durationS()) / 2;
        edt(() -> {
            window.director().scrubTo(half);
            return null;
        });
        selectTab("Summary");
        shoot("window-halfway.png");
        edt(() -> {
            window.director().jumpToEnd();
            return null;
        });
        // pin, then the current density up by a quarter of the slider, compared
        edt(() -> {
            window.actions().pin.actionPerformed(null);
            return null;
        });
        JSlider supply = edt(() -> window.knobs().slider(Knob.SUPPLY));
        int before = edt(() -> window.director().clock().history().size());
        edt(() -> {
            supply.setValue(supply.getValue() - (supply.getMaximum() - supply.getMinimum()) / 5);
            return null;
        });
        await("the replot after the supply slider", RUN_S,
                () -> edt(() -> window.director().clock().history().size() > before));
        selectTab("Compare");
        shoot("window-compare.png");
        edt(() -> {
            window.clearReference();
            return null;
        });
        // a mistake typed into the form: the message stands under the field
        Optional<JTextComponent> gap = edt(() -> window.form().field("cell.gap"));
        if (gap.isPresent()) {
            String was = edt(() -> gap.get().getText());
            edt(() -> {
                gap.get().setText("35 mmm");
                return null;
            });
            Thread.sleep(1200);
            crop("form-problem.png", edt(() -> window.form()));
            shoot("window-problem.png");
            edt(() -> {
                gap.get().setText(was);
                return null;
            });
            Thread.sleep(1200);
        }
        edt(() -> {
            ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
            window.session().open(t.text(), t.fileName(), null);
            window.toggleDark();
            return null;
        });
        runToEnd();
        selectTab("Summary");
        shoot("window-dark.png");
        edt(() -> {
            window.toggleDark();
            return null;
        });
    }

    /** One scenario file, opened, run to the end, its summary shown. */
    private void scenario(Path file) throws Exception {
        edt(() -> {
            window.session().openFile(file);
            return null;
        });
        runToEnd();
        selectTab("Summary");
        String name = file.getFileName().toString().replaceFirst("\\.toml$", "");
        shoot("scenario-" + name + ".png");
    }

    private void runToEnd() throws Exception {
        Object previous = edt(() -> window.director().result());
        edt(() -> {
            window.run();
            return null;
        });
        await("the run is computed", RUN_S, () -> edt(() -> window.director().result() != null
                && window.director().result() != previous && !window.director().computing()));
        edt(() -> {
            window.director().jumpToEnd();
            return null;
        });
        await("the run shows to its end", RUN_S, () -> edt(() -> window.director().state() == Playback.State.FINISHED));
        Thread.sleep(500);
    }

    private void selectTab(String title) throws Exception {
        edt(() -> {
            JTabbedPane tabs = tabsWith(window.frame().getContentPane(), title);
            if (tabs == null) {
                throw new IllegalStateException("no tab titled " + title);
            }
            tabs.setSelectedIndex(tabs.indexOfTab(title));
            return null;
        });
        Thread.sleep(300);
    }

    private static JTabbedPane tabsWith(Container c, String title) {
        for (Component k : c.getComponents()) {
            if (k instanceof JTabbedPane t && t.indexOfTab(title) >= 0) {
                return t;
            }
            if (k instanceof Container inner) {
                JTabbedPane found = tabsWith(inner, title);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private void shoot(String name) throws Exception {
        Thread.sleep(300);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> img.set(window.snapshot()));
        write(img.get(), name);
    }

    /** A part of the window, cut out of a snapshot of the whole (so it looks as it does on screen). */
    private void crop(String name, JComponent part) throws Exception {
        Thread.sleep(300);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            BufferedImage all = window.snapshot();
            Rectangle r = SwingUtilities.convertRectangle(part.getParent(), part.getBounds(), window.frame().getRootPane());
            Rectangle visible = part.getVisibleRect();
            r = new Rectangle(r.x + visible.x, r.y + visible.y, visible.width, visible.height)
                    .intersection(new Rectangle(0, 0, all.getWidth(), all.getHeight()));
            img.set(all.getSubimage(r.x, r.y, r.width, r.height));
        });
        write(img.get(), name);
    }

    private void write(BufferedImage img, String name) throws Exception {
        Path p = out.resolve(name);
        ImageIO.write(img, "png", p.toFile());
        written.add(p);
    }
}
