package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;

import org.cellwright.sim.RunResult;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.w3c.dom.Document;

class ChartRenderingTest {

    private static RunResult run;
    private static RunResult reference;

    @TempDir
    Path dir;

    @BeforeAll
    static void runs() {
        run = ChartFixtures.runWithVoltageLimit(2.0, 2.45, 3 * 3600);
        reference = ChartFixtures.run(1.5, 3 * 3600);
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void eachChartDrawsOnTheStylesBackground(boolean dark) {
        ChartStyle style = ChartStyle.of(dark);
        RunCharts charts = RunCharts.of(run, style);
        charts.setReference(reference, "1.5 A");
        for (JFreeChart chart : charts.all()) {
            BufferedImage img = new BufferedImage(640, 480, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            ChartRenderingInfo info = new ChartRenderingInfo();
            chart.draw(g, new Rectangle2D.Double(0, 0, 640, 480), info);
            g.dispose();
            String name = chart.getTitle().getText();
            // the corner is outside every plot: the style's paper colour
            assertEquals(style.paper().getRGB(), img.getRGB(1, 1), name);
            Rectangle2D area = info.getPlotInfo().getDataArea();
            assertTrue(area.getWidth() > 300 && area.getHeight() > 200, name + " leaves room for data: " + area);
            int plotBg = style.plotBackground().getRGB();
            int bg = 0;
            int total = 0;
            Set<Integer> colours = new HashSet<>();
            for (int y = (int) area.getMinY() + 2; y < area.getMaxY() - 2; y++) {
                for (int x = (int) area.getMinX() + 2; x < area.getMaxX() - 2; x++) {
                    int rgb = img.getRGB(x, y);
                    colours.add(rgb);
                    bg += rgb == plotBg ? 1 : 0;
                    total++;
                }
            }
            // the voltage chart is filled bands up to the cell voltage, leaving background only above it
            // (the axis keeps 6 % headroom; measured here ~7 %); the others are mostly background
            double minBg = chart == charts.voltage() ? 0.03 : 0.5;
            assertTrue(bg > minBg * total, name + ": plot background share " + (double) bg / total);
            // lines in several hues, grid, anti-aliased edges: far more than a blank or one-colour plot
            assertTrue(colours.size() > 20, name + ": only " + colours.size() + " colours in the plot");
        }
    }

    @Test
    void pngHasTheRequestedSizeAndNoLeftovers() throws IOException {
        ChartSheet sheet = ChartSheet.of(run, ChartStyle.light());
        Path png = dir.resolve("sheet.png");
        Files.writeString(png, "an older file that the export replaces");
        sheet.export(png, 1200, 800);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(1200, img.getWidth());
        assertEquals(800, img.getHeight());
        assertOnlyFiles(List.of("sheet.png"));
    }

    @Test
    void scaledPngKeepsTheLayoutWithMorePixels() throws IOException {
        ChartSheet sheet = ChartSheet.of(run, ChartStyle.dark());
        Path png = dir.resolve("sheet@2x.png");
        sheet.export(png, 900, 600, 2);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(1800, img.getWidth());
        assertEquals(1200, img.getHeight());
        assertEquals(ChartStyle.dark().paper().getRGB(), img.getRGB(1, 1));
        BufferedImage plain = ChartExport.render(sheet, 900, 600, 1);
        // same layout: where the 1x image has plot background, so has the 2x image at twice the coordinates
        int plotBg = ChartStyle.dark().plotBackground().getRGB();
        int same = 0;
        int checked = 0;
        for (int y = 80; y < 600; y += 7) {
            for (int x = 0; x < 900; x += 7) {
                if (plain.getRGB(x, y) == plotBg) {
                    checked++;
                    same += img.getRGB(2 * x, 2 * y) == plotBg ? 1 : 0;
                }
            }
        }
        // grid lines and curves fall on slightly different pixels at 2x; most background stays background
        assertTrue(checked > 1000 && same > 0.9 * checked, same + " of " + checked);
        assertThrows(IllegalArgumentException.class, () -> sheet.export(png, 900, 600, 5));
    }

    @Test
    void svgIsWellFormedAndCarriesTheTitle() throws Exception {
        ChartSheet sheet = ChartSheet.of(run, ChartStyle.dark());
        Path svg = dir.resolve("sheet.svg");
        sheet.export(svg);
        String text = Files.readString(svg, StandardCharsets.UTF_8);
        assertTrue(text.startsWith("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"), text.substring(0, 60));
        assertTrue(text.contains("<svg"));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        // the file names the SVG 1.0 DTD; do not fetch it over the network while parsing
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document doc = f.newDocumentBuilder().parse(svg.toFile());
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        assertEquals(String.valueOf(ChartSheet.DEFAULT_WIDTH), doc.getDocumentElement().getAttribute("width"));
        assertEquals(String.valueOf(ChartSheet.DEFAULT_HEIGHT), doc.getDocumentElement().getAttribute("height"));
        assertTrue(doc.getDocumentElement().getTextContent().contains(ChartSheet.titleOf(run)));
        String content = doc.getDocumentElement().getTextContent();
        assertTrue(content.contains("Bath temperature"), "chart titles are SVG text");
        // the figures line holds non-ASCII signs: they must survive the UTF-8 round trip
        assertTrue(content.contains("\u00b0C") && content.contains("\u2192") && content.contains("\u00b7"),
                "UTF-8 text kept");
        assertOnlyFiles(List.of("sheet.svg"));
    }

    @Test
    void unknownExtensionIsRefusedBeforeWriting() {
        ChartSheet sheet = ChartSheet.of(run, ChartStyle.light());
        Path pdf = dir.resolve("sheet.gif");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> sheet.export(pdf));
        assertTrue(e.getMessage().contains("sheet.gif") && e.getMessage().contains(".png"), e.getMessage());
        assertOnlyFiles(List.of());
    }

    @Test
    void titleLineCarriesTheKeyFigures() {
        String f = ChartSheet.figuresOf(run.summary());
        assertTrue(f.startsWith("ran its full time"), f);
        assertTrue(f.contains("3 h 0 min") && f.contains("Cu ") && f.contains("current efficiency")
                && f.contains("mean cell voltage") && f.contains("kWh/kg"), f);
    }

    /** Writes the sample sheets that a person looks at after a change of the charts. */
    @Test
    void writesSampleSheets() throws IOException {
        Path target = Path.of("target");
        Files.createDirectories(target);
        ChartSheet light = ChartSheet.of(run, ChartStyle.light());
        light.charts().setReference(reference, "reference: 1.5 A without a voltage limit");
        light.export(target.resolve("chart-sample.png"));
        ChartSheet dark = ChartSheet.of(run, ChartStyle.dark());
        dark.export(target.resolve("chart-sample-dark.png"));
        dark.export(target.resolve("chart-sample.svg"));
        BufferedImage img = ImageIO.read(target.resolve("chart-sample.png").toFile());
        assertEquals(ChartSheet.DEFAULT_WIDTH, img.getWidth());
        assertEquals(new Color(img.getRGB(2, 2)), ChartStyle.light().paper());
    }

    private void assertOnlyFiles(List<String> names) {
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(names, s.map(p -> p.getFileName().toString()).sorted().toList(),
                    "no temporary files may stay behind");
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }
}
