package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunSummary;
import org.cellwright.study.GridPoint;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.junit.jupiter.api.Test;

/** The sweep table: one row per point, values as given and in SI, failures with their reason. */
class SweepCsvWriterTest {

    @Test
    void rowsCarryTheValuesTheStatusAndTheFigures() throws Exception {
        SweepAxis axis = SweepAxisParser.parse("electrolyte.composition.\"Ag+\"=20:40 g/L:2");
        List<GridPoint> grid = new Sweep(List.of(axis), p -> null, sc -> null).grid();
        var lib = LibraryReader.builtIn();
        Scenario sc = new ScenarioReader(lib).read(java.nio.file.Path.of("scenarios", "silver-nitrate-refining.toml"),
                List.of("run.duration=\"30 min\""));
        RunSummary s = CellSimulation.withDefaults().run(sc, lib, null).summary();
        SweepResult r = new SweepResult(List.of(axis), List.of(
                new SweepPoint(grid.get(0), SweepPoint.Status.INVALID, null, null, "cell.gap: must be > 0 m, got -1"),
                new SweepPoint(grid.get(1), SweepPoint.Status.OK, sc, s, null)), false, 1.0, 2);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        SweepCsvWriter.write(r, out);
        List<String> lines = out.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(3, lines.size());
        assertTrue(lines.get(0).startsWith("run,\"electrolyte.composition.\"\"Ag+\"\"\",\"electrolyte.composition"
                + ".\"\"Ag+\"\"_SI\",status,stop_reason,duration_s"), lines.get(0));
        assertTrue(lines.get(0).endsWith(",morphology_final,message"), lines.get(0));
        // RFC 4180: a field holding a comma is quoted
        assertTrue(lines.get(1).startsWith("1,20 g/L,20.000000,invalid,,,"), lines.get(1));
        assertTrue(lines.get(1).endsWith(",\"cell.gap: must be > 0 m, got -1\""), lines.get(1));
        String[] row = lines.get(2).split(",", -1);
        List<String> header = SweepCsvWriter.header(r.axes());
        assertEquals(header.size(), row.length);
        assertEquals("ok", row[header.indexOf("status")]);
        assertEquals("Ag", row[header.indexOf("target_metal")]);
        assertEquals(1800.0, Double.parseDouble(row[header.indexOf("duration_s")]), 1e-6);
        // source: 1 kWh = 3.6e6 J (SI Brochure, 9th ed., table 8)
        assertEquals(s.specificEnergyJPerKg() / 3.6e6,
                Double.parseDouble(row[header.indexOf("specific_energy_kWh_per_kg")]), 1e-7 * s.specificEnergyJPerKg() / 3.6e6);
        assertEquals(s.depositKg().get("Ag") * 1000, Double.parseDouble(row[header.indexOf("target_deposit_g")]),
                1e-6 * s.depositKg().get("Ag") * 1000);
    }
}
