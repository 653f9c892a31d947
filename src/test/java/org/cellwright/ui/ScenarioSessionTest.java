package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.edt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.AbstractAction;

import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The window's controllers wired as in the window, without a screen: open the default scenario, run and play
 * it, move a slider (the form follows, the run is replotted whole), pin and compare, save what the form shows.
 */
class ScenarioSessionTest {

    @TempDir
    Path dir;

    private ScenarioSession session;
    private RunDirector director;
    private ScenarioForm form;
    private RunComparison comparison;
    private final AtomicReference<String> title = new AtomicReference<>();

    private void build() {
        ChartGrid grid = new ChartGrid(() -> director == null ? List.of() : director.shown(), () -> director.chartDrawn());
        AbstractAction none = new AbstractAction("x") {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
            }
        };
        PlaybackBar bar = new PlaybackBar(none, none, none, s -> director.setSpeed(s), t -> director.scrubTo(t));
        comparison = new RunComparison();
        StatusBar status = new StatusBar();
        director = new RunDirector(TinRun.lib(), new RunPanels(grid, bar, new EventLogPanel(t -> { }), new SummaryPanel(),
                new CautionPanel(), new CautionStrip(() -> { }), comparison, status), () -> { });
        form = new ScenarioForm(TinRun.lib(), () -> session.formEdited());
        knobs = new KnobPanel(new KnobPanel.Listener() {
            @Override
            public void moved(Knob knob, String text, long atNanos) {
                session.knobMoved(knob, text, atNanos);
            }

            @Override
            public void speciesChosen(String species) {
                session.speciesChosen(species);
            }
        });
        session = new ScenarioSession(TinRun.lib(), form, knobs, director, status, (n, c) -> title.set(n + (c ? "*" : "")));
    }

    private KnobPanel knobs;

    @Test
    void openRunSlideCompareAndSave() throws Exception {
        edt(() -> {
            build();
            ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
            session.open(t.text(), t.fileName(), null);
            return null;
        });
        assertEquals("tin-stripping-liquor.toml", title.get());
        assertEquals("Sn2+", edt(() -> session.whatIf().species()), "the target metal's ion");
        edt(() -> {
            session.run();
            return null;
        });
        await(() -> director.state() != null);
        assertEquals(Playback.State.PLAYING, edt(director::state));
        assertTrue(edt(() -> SteadyAxes.frozen(director.charts())), "the axes hold still while the run plays");
        edt(() -> {
            director.jumpToEnd();
            return null;
        });
        assertEquals(TinRun.run().trace().size(), (int) edt(() -> director.shown().size()));
        assertEquals(TinRun.run().summary(), edt(() -> director.result().summary()), "the same run as the engine's");

        edt(() -> {
            comparison.pinCurrent();
            director.setReference(comparison.entry(1));
            knobs.slider(Knob.GAP).setValue(knobs.slider(Knob.GAP).getValue() - 100);
            return null;
        });
        String gapText = edt(() -> knobs.valueText(Knob.GAP));
        assertEquals(gapText, edt(() -> form.draft().get("cell.gap")), "the form shows the slider's value");
        assertEquals("tin-stripping-liquor.toml*", title.get(), "a slider move changes the scenario");
        await(() -> director.result() != null && !director.computing()
                && director.result().scenario().cell().gapM() < 0.0299);
        double gap = edt(() -> director.result().scenario().cell().gapM());
        assertEquals(parseMm(gapText), gap, 1e-15);
        assertEquals(Playback.State.FINISHED, edt(director::state), "a slider replots the whole run at once");
        assertFalse(edt(() -> SteadyAxes.frozen(director.charts())), "a replot lets the axes follow the data");
        assertNotNull(edt(director::reference));
        assertEquals(edt(() -> director.result().trace().size()), edt(() -> director.charts().model().pointCount()));

        Path file = dir.resolve("tin-narrow.toml");
        assertEquals(null, edt(() -> session.saveTo(file)));
        String saved = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(saved.contains("gap = \"" + gapText + "\""), saved);
        assertEquals(edt(session::scenario), new ScenarioReader(TinRun.lib()).read(file), "saved as shown");
        assertFalse(edt(session::changed));
        assertEquals("tin-narrow.toml", title.get());
    }

    @Test
    void aFormWithProblemsIsNeitherRunNorSaved() throws Exception {
        edt(() -> {
            build();
            ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
            session.open(t.text(), t.fileName(), null);
            form.field("electrolyte.volume").orElseThrow().setText("lots");
            return null;
        });
        String why = edt(() -> session.saveTo(dir.resolve("x.toml")));
        assertTrue(why.contains("problems"), why);
        assertFalse(Files.exists(dir.resolve("x.toml")));
    }

    private static double parseMm(String text) throws Exception {
        return org.cellwright.io.UnitParser.parse(text, org.cellwright.io.Dimension.LENGTH).si();
    }

    private static void await(OnEdt.Check c) throws Exception {
        OnEdt.await("the session settles", 30, () -> edt(c::ok));
    }
}
