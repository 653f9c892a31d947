package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.cellwright.cell.Scenario;
import org.cellwright.chart.RunReport;
import org.cellwright.chart.SafetyCautions;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The window's report export: the scenario shown is run and written as HTML or PDF through the same report
 * code as {@code cellwright report}; the files open in a standard reader and carry the safety cautions;
 * a failed write leaves nothing behind.
 */
class ReportExportTest {

    private static ChemLibrary lib;
    private static Scenario copper;

    @TempDir
    Path dir;

    @BeforeAll
    static void load() throws Exception {
        lib = LibraryReader.builtIn();
        copper = new ScenarioReader(lib).load(Path.of("scenarios", "copper-etchant-bleed.toml"), List.of()).scenario();
    }

    @Test
    void htmlOpensAndCarriesTheCautions() throws Exception {
        Path out = ReportExport.withExtension(dir.resolve("copper-report"), ReportExport.Format.HTML);
        assertEquals("copper-report.html", out.getFileName().toString());
        RunReport r = ReportExport.write(copper, "copper-etchant-bleed.toml", lib, ReportExport.Format.HTML, out);
        // source: docs/fit-and-report.md: acid from 0.05 mol/L of H+ and hydrogen from the cathode; the
        // copper bath holds 1 mol/L of H+ and a lead-calcium anode
        assertTrue(r.cautions().size() >= 2, r.cautions().toString());
        var doc = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(out.toFile());
        String text = doc.getDocumentElement().getTextContent().replaceAll("\\s+", " ");
        for (SafetyCautions.Caution c : r.cautions()) {
            assertTrue(text.contains(c.hazard()), "the HTML names the caution " + c.hazard());
        }
        assertTrue(text.contains("copper-etchant-bleed.toml"));
        assertOnly(out);
    }

    @Test
    void pdfOpensAndCarriesTheCautions() throws Exception {
        Path out = dir.resolve("copper.pdf");
        RunReport r = ReportExport.write(copper, "copper-etchant-bleed.toml", lib, ReportExport.Format.PDF, out);
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            assertTrue(doc.getNumberOfPages() >= 2);
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            for (SafetyCautions.Caution c : r.cautions()) {
                assertTrue(text.contains(c.hazard()), "the PDF names the caution " + c.hazard());
            }
        }
        assertOnly(out);
    }

    @Test
    void aFailedWriteLeavesNothing() throws IOException {
        Path missing = dir.resolve("no-such-folder").resolve("r.html");
        assertThrows(IOException.class, () -> ReportExport.write(copper, "c", lib, ReportExport.Format.HTML, missing));
        assertFalse(Files.exists(missing.getParent()));
        // the target is a folder: the report is written to a temporary file, which must not be left behind
        Path folder = Files.createDirectory(dir.resolve("taken.pdf"));
        Files.writeString(folder.resolve("keep.txt"), "x", StandardCharsets.UTF_8);
        assertThrows(IOException.class, () -> ReportExport.write(copper, "c", lib, ReportExport.Format.PDF, folder));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of("taken.pdf"), s.map(p -> p.getFileName().toString()).toList(),
                    "no partial file next to the target");
        }
        assertTrue(Files.isDirectory(folder) && Files.exists(folder.resolve("keep.txt")), "the folder is untouched");
    }

    private void assertOnly(Path out) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of(out.getFileName().toString()), s.map(p -> p.getFileName().toString()).toList(),
                    "the report and no temporary file");
        }
        assertTrue(Files.size(out) > 10_000, "a report with charts: " + Files.size(out) + " bytes");
    }
}
