package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fit command as a user calls it: a run's own CSV, written with a known diffusion layer, is fitted back;
 * outputs, the JSON form of the contract, and exit codes for bad input.
 */
class FitCommandTest {

    private static final Path SCENARIO = Path.of("src", "test", "resources", "org", "cellwright", "study",
            "copper-rinse.toml");

    @TempDir
    static Path dir;
    private static Path log;

    @BeforeAll
    static void writeALog() {
        log = dir.resolve("run.csv");
        // a 2 h run of the scenario with a 150 um layer (the file says 100 um), as the run command writes it
        CliRun o = CliRun.of("run", SCENARIO.toString(), "--set", "cell.diffusion_layer=\"150 um\"",
                "--set", "run.duration=\"2 h\"", "--csv", log.toString());
        assertEquals(0, o.code(), o.err());
    }

    @Test
    void jsonOnStandardOutputHasTheContractsKeys() throws Exception {
        CliRun o = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free", "cell.diffusion_layer",
                "--json", "-");
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(o.out());
        JsonNode p = json.get("parameters").get("cell.diffusion_layer");
        // source: the --set of the run that wrote the log, 150 um; without noise the fit finds it to the
        // engine's tolerance (relative 1e-4) and the output interval's interpolation, well inside 0.5 %
        assertEquals(150e-6, p.get("value").asDouble(), 0.005 * 150e-6);
        assertEquals(2, p.get("ci95").size());
        assertTrue(p.get("ci95").get(0).asDouble() < p.get("value").asDouble()
                && p.get("value").asDouble() < p.get("ci95").get(1).asDouble());
        for (String column : List.of("current_A", "cell_voltage_V", "deposit_g", "c_Cu2+_mol_per_L", "temperature_C")) {
            assertTrue(json.get("rmse").has(column), "rmse." + column + " in " + json.get("rmse"));
        }
        assertTrue(json.get("iterations").isInt());
        // the run CSV's other columns are ignored with a warning each
        assertTrue(o.err().contains("cathode_potential_V: warning: not a quantity the fit can use"), o.err());
    }

    @Test
    void humanOutputSaysWhereTheChargeWentAndTheChartIsWritten() throws Exception {
        Path png = dir.resolve("fit.png");
        Path json = dir.resolve("fit.json");
        CliRun o = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free",
                "cell.diffusion_layer,reaction.H+/H2.i0", "--weights", "cell_voltage_V=2,deposit_g=1",
                "--chart", png.toString(), "--json", json.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("95 % interval"), o.out());
        assertTrue(o.out().contains("cell.diffusion_layer") && o.out().contains(" um "), o.out());
        assertTrue(o.out().contains("where the charge went") && o.out().contains("hydrogen"), o.out());
        assertTrue(o.out().contains("current efficiency for Cu"), o.out());
        assertTrue(Files.size(png) > 10_000);
        JsonNode written = new ObjectMapper().readTree(json.toFile());
        assertEquals(2.0, written.get("columns").get("cell_voltage_V").get("weight").asDouble(), 0.0);
    }

    @Test
    void theShippedDemoLogGivesBackTheValuesItWasMadeWith() throws Exception {
        CliRun o = CliRun.of("fit", "scenarios/copper-etchant-bleed.toml", "--log",
                "scenarios/copper-etchant-bleed-log.csv", "--free", "cell.diffusion_layer,cell.contact_resistance",
                "--json", "-");
        assertEquals(0, o.code(), o.err());
        JsonNode p = new ObjectMapper().readTree(o.out()).get("parameters");
        // source: the log's header: made with a 45 um layer and 12 mohm of contacts (seed 2026)
        double[][] truth = {{45e-6}, {0.012}};
        String[] keys = {"cell.diffusion_layer", "cell.contact_resistance"};
        for (int j = 0; j < 2; j++) {
            JsonNode ci = p.get(keys[j]).get("ci95");
            assertTrue(ci.get(0).asDouble() <= truth[j][0] && truth[j][0] <= ci.get(1).asDouble(),
                    keys[j] + " " + ci);
        }
    }

    @Test
    void badInputExitsTwoAndWritesNothing() throws Exception {
        Path json = dir.resolve("never.json");
        CliRun key = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free", "cell.diffusion_layr",
                "--json", json.toString());
        assertEquals(2, key.code());
        assertTrue(key.err().contains("(from --free):1:1: cell.diffusion_layr"), key.err());
        assertFalse(Files.exists(json));

        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "time_min,cell_voltage_V\n0,2.3\n1,two\n");
        CliRun cell = CliRun.of("fit", SCENARIO.toString(), "--log", bad.toString(), "--free", "cell.gap");
        assertEquals(2, cell.code());
        assertTrue(cell.err().contains("bad.csv:3:3: cell_voltage_V: expected a number"), cell.err());
        assertFalse(cell.err().contains("Exception"), cell.err());

        CliRun weight = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free", "cell.gap",
                "--weights", "cell_voltage_V");
        assertEquals(2, weight.code());
        assertTrue(weight.err().contains("--weights"), weight.err());

        CliRun noColumn = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free", "cell.gap",
                "--weights", "voltage=2");
        assertEquals(2, noColumn.code());
        assertTrue(noColumn.err().contains("the log has no such column"), noColumn.err());

        CliRun chart = CliRun.of("fit", SCENARIO.toString(), "--log", log.toString(), "--free", "cell.gap",
                "--chart", dir.resolve("x.jpg").toString());
        assertEquals(2, chart.code());
        assertEquals(2, CliRun.of("fit", SCENARIO.toString(), "--free", "cell.gap").code());
    }

    @Test
    void aReactionKeyWithoutItsMaterialGetsAHint() throws Exception {
        Path noMaterial = dir.resolve("no-material.toml");
        Files.writeString(noMaterial, Files.readString(SCENARIO).replace("[reaction.\"H+/H2\"]\nmaterial = \"copper\"", ""));
        CliRun o = CliRun.of("fit", noMaterial.toString(), "--log", log.toString(), "--free", "reaction.H+/H2.i0");
        assertEquals(2, o.code());
        assertTrue(o.err().contains("reaction.H+/H2.i0 does not change any of the measured values"), o.err());
        assertTrue(o.err().contains("material = \"copper\""), o.err());
    }
}
