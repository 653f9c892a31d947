package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.cli.Main;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.RunLogReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.study.FitCancelledException;
import org.cellwright.study.FitMonitor;
import org.cellwright.study.FitProgress;
import org.cellwright.study.FittedParameter;
import org.cellwright.study.MeasuredLog;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import picocli.CommandLine;

/**
 * The window's fit, without a screen: the scenario as the window holds it (written back to TOML by the
 * scenario writer) fitted to the shipped demo log reaches the values of {@code cellwright fit} within that
 * command's 95 % intervals, reports progress, can be cancelled, and explains bad requests in words.
 */
class FitControllerTest {

    private static final Path SCENARIO = Path.of("scenarios", "copper-etchant-bleed.toml");
    private static final Path LOG = Path.of("scenarios", "copper-etchant-bleed-log.csv");
    private static final List<String> FREE = List.of("cell.diffusion_layer", "cell.contact_resistance");

    private static ChemLibrary lib;
    private static MeasuredLog log;
    private static String windowText;

    @BeforeAll
    static void load() throws Exception {
        lib = LibraryReader.builtIn();
        log = new RunLogReader(lib).read(LOG).log();
        Scenario shown = new ScenarioReader(lib).load(SCENARIO, List.of()).scenario();
        windowText = ScenarioWriter.write(shown, lib);
    }

    @Test
    void reachesTheCommandLinesValuesWithinItsIntervals() throws Exception {
        List<FitProgress> seen = new ArrayList<>();
        FitController.Outcome o = FitController.fit(new FitController.Request(windowText, "copper-etchant-bleed.toml",
                FREE, Map.of(), log), lib, new FitMonitor() {
                    @Override
                    public synchronized void progress(FitProgress p) {
                        seen.add(p);
                    }
                });
        assertTrue(o.result().outcome().converged());
        assertFalse(seen.isEmpty(), "progress is reported");
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i).iteration() > seen.get(i - 1).iteration(), "iterations count up");
        }

        StringWriter out = new StringWriter();
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(new StringWriter()));
        assertEquals(0, cl.execute("fit", SCENARIO.toString(), "--log", LOG.toString(), "--free",
                String.join(",", FREE), "--json", "-"));
        JsonNode cli = new ObjectMapper().readTree(out.toString()).get("parameters");
        for (String key : FREE) {
            FittedParameter mine = o.result().outcome().parameter(key);
            JsonNode theirs = cli.get(key);
            double lo = theirs.get("ci95").get(0).asDouble();
            double hi = theirs.get("ci95").get(1).asDouble();
            assertTrue(mine.value() >= lo && mine.value() <= hi, key + " = " + mine.value() + " lies outside the"
                    + " command line's interval " + lo + " to " + hi);
            // the same data and method: the intervals agree to a few per cent of their width
            assertEquals(hi - lo, mine.high() - mine.low(), 0.05 * (hi - lo), key + " interval width");
        }
        // source: the log's header: made by the engine with a 45 um layer and 12 mohm of contacts
        assertTrue(o.result().outcome().parameter("cell.diffusion_layer").covers(45e-6));
        assertTrue(o.result().outcome().parameter("cell.contact_resistance").covers(0.012));

        // the fitted scenario, rounded to the digits the log supports, reads back with the fitted values
        Scenario back = new ScenarioReader(lib).parse(o.fittedText(), "fitted.toml", List.of()).scenario();
        assertEquals(back, o.fittedScenario());
        double layer = o.result().outcome().parameter("cell.diffusion_layer").value();
        FittedParameter p = o.result().outcome().parameter("cell.diffusion_layer");
        assertEquals(layer, back.cell().agitation().diffusionLayerM(), (p.high() - p.low()) / 20);
        assertEquals(o.fittedScenario().run(), new ScenarioReader(lib).load(SCENARIO, List.of()).scenario().run(),
                "the fitted scenario keeps its own run settings (not the log's span)");
        assertEquals(2, FitController.parameterRows(o).size());
        assertTrue(FitController.parameterRows(o).get(0)[1].endsWith(" um"), "the layer is shown in um");
        assertTrue(FitController.parameterRows(o).get(1)[2].contains("mohm to"), "the interval in mohm");
        assertEquals(4, FitController.residualRows(o).size(), "one row per logged column");
    }

    @Test
    void cancelStopsTheFitBeforeItsNextEngineRun() {
        FitMonitor cancelAtOnce = new FitMonitor() {
            @Override
            public boolean cancelled() {
                return true;
            }
        };
        long t0 = System.nanoTime();
        assertThrows(FitCancelledException.class, () -> FitController.fit(new FitController.Request(windowText,
                "copper-etchant-bleed.toml", FREE, Map.of(), log), lib, cancelAtOnce));
        // one engine run is 6 to 40 ms (docs/fit-and-report.md); 2 s leaves room for a loaded machine
        assertTrue((System.nanoTime() - t0) / 1e9 < 2, "the cancelled fit took too long");
    }

    @Test
    void badRequestsAreExplainedInWords() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> FitController.fit(new FitController.Request(
                windowText, "copper-etchant-bleed.toml", List.of("cell.gapp"), Map.of(), log), lib, FitMonitor.NONE));
        List<String> words = FitController.problems(e);
        assertEquals(1, words.size(), words.toString());
        assertTrue(words.get(0).startsWith("free key cell.gapp: "), words.get(0));
        IllegalArgumentException w = assertThrows(IllegalArgumentException.class, () -> FitController.fit(
                new FitController.Request(windowText, "x", FREE, Map.of("deposit_kg", 2.0), log), lib, FitMonitor.NONE));
        assertTrue(FitController.problems(w).get(0).contains("deposit_kg"), FitController.problems(w).toString());
        assertTrue(FitController.problems(new IllegalStateException("boom")).get(0).startsWith("Internal failure"));
    }

    @Test
    void offersTheCommonKeysOfTheScenario() throws Exception {
        Scenario s = new ScenarioReader(lib).load(SCENARIO, List.of()).scenario();
        List<FitController.Candidate> c = FitController.candidates(s, lib);
        assertEquals("cell.diffusion_layer", c.get(0).key());
        assertEquals("cell.contact_resistance", c.get(1).key());
        assertTrue(c.get(0).preselected() && c.get(1).preselected());
        assertTrue(c.stream().anyMatch(k -> k.key().equals("reaction.H+/H2.i0")), c.toString());
        assertTrue(c.stream().anyMatch(k -> k.key().equals("reaction.O2/H2O.i0")), c.toString());
        assertFalse(c.stream().anyMatch(k -> k.key().equals("cell.zone_exchange")), "not a zoned cell");
    }

    @Test
    void roundsToTheDigitsTheLogSupports() {
        FittedParameter narrow = new FittedParameter("cell.diffusion_layer", 44.94858853653737e-6, 44.86e-6,
                45.04e-6, 0.002, org.cellwright.study.ParameterScale.LOG);
        assertEquals(44.95e-6, FitController.rounded(List.of(narrow))[0], 1e-15);
        // an interval narrower than the fourth digit keeps more digits
        FittedParameter tight = new FittedParameter("k", 1.23456789, 1.234567, 1.234569, 1e-7,
                org.cellwright.study.ParameterScale.LINEAR);
        double r = FitController.rounded(List.of(tight))[0];
        assertTrue(Math.abs(r - 1.23456789) <= (1.234569 - 1.234567) / 20, "rounded to " + r);
    }
}
