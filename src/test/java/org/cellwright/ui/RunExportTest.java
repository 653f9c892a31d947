package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.cellwright.chart.ChartSheet;
import org.cellwright.io.RunCsvWriter;
import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunExportTest {

    @TempDir
    Path dir;

    @Test
    void writesEachKindByItsExtension() throws Exception {
        RunResult run = TinRun.run();
        for (String name : List.of("sheet.png", "sheet.svg", "series.csv", "summary.json")) {
            RunExport.write(run, "tin.toml", run, "pinned run #1", false, dir.resolve(name));
        }
        BufferedImage png = ImageIO.read(dir.resolve("sheet.png").toFile());
        // the sheet's layout size times the PNG scale of 2
        assertEquals(ChartSheet.DEFAULT_WIDTH * 2, png.getWidth());
        assertEquals(ChartSheet.DEFAULT_HEIGHT * 2, png.getHeight());
        String svg = Files.readString(dir.resolve("sheet.svg"), StandardCharsets.UTF_8);
        assertTrue(svg.contains("<svg") && svg.contains("pinned run #1"), "the reference is named on the sheet");
        List<String> csv = Files.readAllLines(dir.resolve("series.csv"), StandardCharsets.UTF_8);
        assertEquals(String.join(",", RunCsvWriter.header(run)), csv.get(0));
        assertEquals(run.trace().size() + 1, csv.size());
        String json = Files.readString(dir.resolve("summary.json"), StandardCharsets.UTF_8);
        assertTrue(json.contains("\"tin.toml\""), json.substring(0, Math.min(200, json.length())));
        try (var files = Files.list(dir)) {
            assertEquals(4, files.count(), "no temporary files left behind");
        }
    }

    @Test
    void extensionsChooseAndCompleteTheKind() {
        assertEquals(RunExport.Kind.SVG, RunExport.kindOf(Path.of("a.SVG")));
        assertEquals(Path.of("out/run.csv"), RunExport.withExtension(Path.of("out/run"), RunExport.Kind.CSV));
        assertEquals(Path.of("run.json"), RunExport.withExtension(Path.of("run.json"), RunExport.Kind.JSON));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RunExport.kindOf(Path.of("run.pdf")));
        assertTrue(e.getMessage().contains(".png, .svg, .csv or .json"));
    }
}
