package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Base64;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Both report formats open in a standard reader and carry the cautions, the figures and the charts: the
 * HTML through the JDK's XML parser (it is well-formed XHTML), the PDF through PDFBox's loader, text
 * extractor and renderer. The run is the shipped tin scenario: 2 A for 6 h, graphite anode in chloride.
 */
class ReportWritersTest {

    private static RunReport report;

    @BeforeAll
    static void build() {
        report = RunReport.of("tin-stripping-liquor.toml", ReportFixture.tin(), ReportFixture.LIBRARY);
    }

    @Test
    void htmlIsWellFormedAndSelfContained() throws Exception {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        HtmlReport.write(report, buf);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(buf.toByteArray()));
        String ns = "http://www.w3.org/1999/xhtml";
        NodeList sections = doc.getElementsByTagNameNS(ns, "section");
        StringBuilder ids = new StringBuilder();
        for (int i = 0; i < sections.getLength(); i++) {
            ids.append(((Element) sections.item(i)).getAttribute("id")).append(' ');
        }
        assertEquals("safety figures plots voltage charge forecast events notes inputs ", ids.toString());
        NodeList images = doc.getElementsByTagNameNS(ns, "img");
        // source: RunCharts, six charts per run
        assertEquals(6, images.getLength());
        for (int i = 0; i < images.getLength(); i++) {
            String src = ((Element) images.item(i)).getAttribute("src");
            assertTrue(src.startsWith("data:image/png;base64,"), "image " + i + " is not embedded");
            BufferedImage img = ImageIO.read(new ByteArrayInputStream(
                    Base64.getDecoder().decode(src.substring(src.indexOf(',') + 1))));
            // source: HtmlReport, 640 x 420 layout px at a scale of 1.5
            assertEquals(960, img.getWidth());
            assertEquals(630, img.getHeight());
        }
        String text = doc.getDocumentElement().getTextContent();
        assertCarriesTheEssentials(text);
        assertTrue(text.contains("[electrolyte.composition]"), "the scenario as TOML");
        String raw = buf.toString(StandardCharsets.UTF_8);
        // nothing is fetched from elsewhere: no linked style sheets, scripts or remote images
        assertTrue(!raw.contains("<link") && !raw.contains("<script") && !raw.contains("src=\"http"), "external");
    }

    @Test
    void pdfLoadsAndItsTextCarriesTheCautionsAndFigures() throws Exception {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        PdfReport.write(report, buf);
        // the font substitution PDFBox warns of on every glyph run stays off the user's terminal
        assertEquals(java.util.logging.Level.SEVERE,
                java.util.logging.Logger.getLogger("org.apache.pdfbox.pdmodel.font").getLevel());
        try (PDDocument doc = Loader.loadPDF(buf.toByteArray())) {
            assertTrue(doc.getNumberOfPages() >= 2, "pages: " + doc.getNumberOfPages());
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertCarriesTheEssentials(text);
            // the charts' labels are text too (Helvetica through PdfBoxGraphics2D)
            assertTrue(text.contains("Bath composition") && text.contains("Cell voltage and its parts"), text);
            BufferedImage page = new PDFRenderer(doc).renderImageWithDPI(0, 50);
            // source: PdfReport, the caution bands' fill #fdf3ec; rendered, the first page shows it
            assertTrue(countColour(page, 0xfdf3ec, 6) > 500, "no caution band on the first page");
        }
    }

    private static void assertCarriesTheEssentials(String text) {
        String t = text.replaceAll("\\s+", " ");
        for (String must : new String[] {"Chlorine", "Hydrogen", "Acid", "graphite anode", "safety data sheets",
                "local codes", "Key figures", "Where the charge went", "Where the cell voltage goes",
                "stainless"}) {
            assertTrue(t.contains(must), "missing '" + must + "'");
        }
        // source: Faraday: 2 A for 6 h is 12 A h = 43200 C
        assertTrue(t.contains("12 A h (43200 C)"), "charge");
        // source: scenarios/tin-stripping-liquor.toml, Sn2+ 25 g/L and the stop at 3 g/L
        assertTrue(t.contains("25 g/L") && t.contains("Sn2+ below 3 g/L"), "inputs");
    }

    private static int countColour(BufferedImage img, int rgb, int tolerance) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                if (Math.abs(((p >> 16) & 255) - ((rgb >> 16) & 255)) <= tolerance
                        && Math.abs(((p >> 8) & 255) - ((rgb >> 8) & 255)) <= tolerance
                        && Math.abs((p & 255) - (rgb & 255)) <= tolerance) {
                    n++;
                }
            }
        }
        return n;
    }
}
