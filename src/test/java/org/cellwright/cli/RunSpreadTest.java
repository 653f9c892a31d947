package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** run --spread: ranges in the summary and the JSON, bands on the chart; without it nothing changes. */
class RunSpreadTest {

    private static final String SILVER = Path.of("scenarios", "silver-nitrate-refining.toml").toString();

    @Test
    void theJsonCarriesOrderedPercentilesOfEachFigure() throws Exception {
        CliRun r = CliRun.of("run", SILVER, "--spread", "8", "--seed", "3", "--json", "-", "--set",
                "run.duration=\"30 min\"");
        assertEquals(0, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals(1800.0, json.get("duration_s").asDouble(), 1e-9);
        JsonNode spread = json.get("spread");
        assertEquals(8, spread.get("samples").asInt());
        assertEquals(3, spread.get("seed").asLong());
        assertEquals(4, spread.get("inputs").size());
        for (String key : new String[] {"specific_energy_kWh_per_kg", "current_efficiency", "target_deposit_g",
            "cell_voltage_mean_V", "cell_voltage_max_V", "energy_Wh", "duration_s", "temperature_max_C"}) {
            JsonNode f = spread.get("figures").get(key);
            assertTrue(f.get("p5").asDouble() <= f.get("p50").asDouble()
                    && f.get("p50").asDouble() <= f.get("p95").asDouble(), key + ": " + f);
        }
        // source: Faraday's law, 4.5 A for 30 min of Ag+ (z = 1, 107.8682 g/mol): 8100 C / 96485 C/mol x 107.87
        // g/mol = 9.056 g, whatever the inputs (soluble silver anode, CE 1); 0.01 g covers the integration
        assertEquals(9.056, spread.get("figures").get("target_deposit_g").get("p5").asDouble(), 0.01);
    }

    @Test
    void theSummaryPrintsRangesAndTheChartHasBands(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("sheet.png");
        CliRun r = CliRun.of("run", SILVER, "--spread", "6", "--chart", png.toString(), "--set",
                "run.duration=\"20 min\"");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("spread           6 of 6 samples ran (seed 1)"), r.out());
        assertTrue(r.out().contains("mean cell voltage (V)"), r.out());
        assertTrue(r.out().contains("exchange current densities   log-uniform, 0.1x to 10x"), r.out());
        assertTrue(Files.size(png) > 10_000);
    }

    @Test
    void withoutSpreadTheRunIsAsBeforeAndBadCountsAreBadInput() throws Exception {
        CliRun plain = CliRun.of("run", SILVER, "--json", "-", "--set", "run.duration=\"10 min\"");
        assertEquals(0, plain.code(), plain.err());
        assertFalse(new ObjectMapper().readTree(plain.out()).has("spread"));
        CliRun zero = CliRun.of("run", SILVER, "--spread", "0");
        assertEquals(2, zero.code());
        assertTrue(zero.err().contains("--spread must be from 1 to"), zero.err());
    }
}
