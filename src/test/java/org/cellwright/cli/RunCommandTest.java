package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The run command as a user calls it: outputs, exit codes, and no half-written files. */
class RunCommandTest {

    private static final Path SCENARIO = Path.of("scenarios", "copper-etchant-bleed.toml");

    @Test
    void jsonOnStandardOutputCarriesEveryKeyOfTheContract() throws Exception {
        CliRun o = CliRun.of("run", SCENARIO.toString(), "--json", "-", "--set", "run.duration=\"1 h\"");
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(o.out());
        for (String key : List.of("scenario", "stop_reason", "duration_s", "charge_C", "charge_Ah", "deposit_g",
                "deposit_total_g", "purity", "current_efficiency", "energy_Wh", "specific_energy_kWh_per_kg",
                "cell_voltage_V", "final_concentration_mol_per_L", "gas_L", "short_circuit_s",
                "short_circuit_forecast_s", "morphology_final", "temperature_C", "warnings")) {
            assertTrue(json.has(key), "missing key " + key);
        }
        for (String key : List.of("start", "end", "mean", "max")) {
            assertTrue(json.get("cell_voltage_V").has(key), "cell_voltage_V." + key);
        }
        for (String key : List.of("H2", "O2", "Cl2")) {
            assertTrue(json.get("gas_L").has(key), "gas_L." + key);
        }
        assertEquals(3600.0, json.get("duration_s").asDouble(), 1e-6);
        // source: Faraday's law, the charge of 4 A for 1 h is 4 A h
        assertEquals(4.0, json.get("charge_Ah").asDouble(), 1e-9);
        assertTrue(json.get("deposit_g").get("Cu").asDouble() > 0);
    }

    @Test
    void csvChartAndSummaryAreWritten(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("series.csv");
        Path png = dir.resolve("sheet.png");
        CliRun o = CliRun.of("run", SCENARIO.toString(), "--csv", csv.toString(), "--chart", png.toString(),
                "--set", "run.duration=\"2 h\"");
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("current eff."), o.out());
        List<String> lines = Files.readAllLines(csv);
        String header = lines.get(0);
        assertTrue(header.startsWith("time_s,current_A,cell_voltage_V,cathode_potential_V,anode_potential_V,"
                + "ohmic_drop_V,current_efficiency,current_efficiency_cumulative,deposit_g,temperature_C,"
                + "dendrite_height_mm,c_"), header);
        assertTrue(header.contains("c_Cu2+_mol_per_L") && header.contains("i_cathode_Cu2+/Cu_A"), header);
        // 2 h at a 2 min interval: 61 rows and the header
        assertEquals(62, lines.size());
        assertTrue(Files.size(png) > 10_000);
    }

    @Test
    void aBadScenarioFailsWithExitTwoAndLeavesNoOutput(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.toml");
        Files.writeString(bad, Files.readString(SCENARIO).replace("gap = \"40 mm\"", "gap = \"-4 mm\""));
        Path json = dir.resolve("out.json");
        CliRun o = CliRun.of("run", bad.toString(), "--json", json.toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("bad.toml:") && o.err().contains("cell.gap"), o.err());
        assertFalse(o.err().contains("Exception"), o.err());
        assertFalse(Files.exists(json));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "nothing but the scenario may be left in the folder");
        }
    }

    @Test
    void aMissingFileAndABadChartExtensionAreBadInput(@TempDir Path dir) {
        assertEquals(2, CliRun.of("run", dir.resolve("none.toml").toString()).code());
        CliRun o = CliRun.of("run", SCENARIO.toString(), "--chart", dir.resolve("x.gif").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains(".png or .svg"), o.err());
    }
}
