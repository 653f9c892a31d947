package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report command as a user calls it: both formats, --set, exit codes, and no half-written files. */
class ReportCommandTest {

    private static final Path SCENARIO = Path.of("scenarios", "copper-etchant-bleed.toml");

    @Test
    void writesHtmlAndPdf(@TempDir Path dir) throws Exception {
        Path html = dir.resolve("report.html");
        CliRun o = CliRun.of("report", SCENARIO.toString(), "--out", html.toString(), "--set", "run.duration=\"1 h\"");
        assertEquals(0, o.code(), o.err());
        String text = Files.readString(html);
        assertTrue(text.startsWith("<!DOCTYPE html>") && text.contains("Lead"), "html");
        Path pdf = dir.resolve("report.pdf");
        o = CliRun.of("report", SCENARIO.toString(), "--out", pdf.toString(), "--set", "run.duration=\"1 h\"");
        assertEquals(0, o.code(), o.err());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String t = new PDFTextStripper().getText(doc);
            // source: scenarios/copper-etchant-bleed.toml, a lead-calcium anode in sulfuric acid
            assertTrue(t.contains("Lead") && t.contains("Acid"), t);
            // source: 4 A for 1 h (2 A/dm2 on 2 dm2) is 4 A h
            assertTrue(t.contains("4 A h (14400 C)"), t);
        }
    }

    @Test
    void badInputExitsTwoAndLeavesNothing(@TempDir Path dir) throws Exception {
        CliRun ext = CliRun.of("report", SCENARIO.toString(), "--out", dir.resolve("r.docx").toString());
        assertEquals(2, ext.code());
        assertTrue(ext.err().contains(".html or .pdf"), ext.err());
        Path bad = dir.resolve("bad.toml");
        Files.writeString(bad, Files.readString(SCENARIO).replace("volume = \"2 L\"", "volume = \"-2 L\""));
        CliRun o = CliRun.of("report", bad.toString(), "--out", dir.resolve("r.pdf").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("bad.toml:") && o.err().contains("electrolyte.volume"), o.err());
        assertFalse(o.err().contains("Exception"), o.err());
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "nothing but the scenario may be left in the folder");
        }
    }
}
