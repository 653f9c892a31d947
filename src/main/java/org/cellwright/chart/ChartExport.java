package org.cellwright.chart;

import java.awt.Dimension;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;

import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.cellwright.io.AtomicFile;
import org.jfree.chart.ui.Drawable;
import org.w3c.dom.Document;

/**
 * Writes anything drawable (a chart, a {@link ChartSheet}) to PNG or SVG, chosen by the file's extension.
 *
 * <p>SVG goes through Apache Batik's {@code SVGGraphics2D} (Apache-2.0) on a DOM document made by the
 * JDK's own XML parser (Batik's {@code GenericDOMImplementation} lives in batik-dom, which the build does
 * not carry; the generator accepts any DOM). The file is streamed as UTF-8.
 *
 * <p>Every export writes a temporary file in the target's folder and then renames it onto the target,
 * atomically where the file system allows, so no reader ever sees a half-written file.
 */
public final class ChartExport {

    private static final String SVG_NS = "http://www.w3.org/2000/svg";
    /** Largest PNG scale accepted: 4x a 1800 x 1200 sheet is already 7200 x 4800 pixels (~140 MB in memory). */
    public static final double MAX_SCALE = 4;

    /** File kinds the export understands. */
    public enum Format {
        /** Portable Network Graphics, a bitmap of exactly the requested size. */
        PNG,
        /** Scalable Vector Graphics, the requested size as its canvas. */
        SVG
    }

    private ChartExport() {
    }

    /**
     * @param file a file name
     * @return the format its extension names
     * @throws IllegalArgumentException when the extension is neither .png nor .svg (message names the file)
     */
    public static Format formatOf(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".png")) {
            return Format.PNG;
        }
        if (name.endsWith(".svg")) {
            return Format.SVG;
        }
        throw new IllegalArgumentException("cannot tell the chart format of '" + file
                + "': the file name must end in .png or .svg");
    }

    /**
     * Writes {@code drawing} at {@code width} x {@code height} to {@code file}, as PNG or SVG by extension.
     *
     * @param drawing what to draw
     * @param width width (px)
     * @param height height (px)
     * @param file the target; its folder must exist
     * @throws IOException when the file cannot be written
     * @throws IllegalArgumentException for an unknown extension or a size below 1 px
     */
    public static void write(Drawable drawing, int width, int height, Path file) throws IOException {
        write(drawing, width, height, 1, file);
    }

    /**
     * Writes {@code drawing} laid out at {@code width} x {@code height} to {@code file}, as PNG or SVG by
     * extension. A PNG gets {@code scale} times as many pixels each way (2 for a sharp image on a HiDPI
     * screen or in print) with the same layout; an SVG is vector and ignores the scale.
     *
     * @param drawing what to draw
     * @param width layout width (px)
     * @param height layout height (px)
     * @param scale pixels per layout pixel of a PNG, from 1 to {@link #MAX_SCALE}
     * @param file the target; its folder must exist
     * @throws IOException when the file cannot be written
     * @throws IllegalArgumentException for an unknown extension, a size below 1 px or a scale out of range
     */
    public static void write(Drawable drawing, int width, int height, double scale, Path file) throws IOException {
        Format f = formatOf(file);
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("chart size must be at least 1 x 1 px, got " + width + " x " + height);
        }
        if (!(scale >= 1 && scale <= MAX_SCALE)) {
            throw new IllegalArgumentException("chart scale must be between 1 and " + MAX_SCALE + ", got " + scale);
        }
        AtomicFile.write(file, out -> {
            if (f == Format.PNG) {
                writePng(drawing, width, height, scale, out);
            } else {
                writeSvg(drawing, width, height, out);
            }
        });
    }

    /**
     * @param drawing what to draw
     * @param width layout width (px)
     * @param height layout height (px)
     * @param scale pixels per layout pixel
     * @return the drawing rendered on an opaque image of {@code round(width * scale)} x
     *     {@code round(height * scale)} pixels
     */
    public static BufferedImage render(Drawable drawing, int width, int height, double scale) {
        BufferedImage img = new BufferedImage((int) Math.round(width * scale), (int) Math.round(height * scale),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.scale(scale, scale);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            drawing.draw(g, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            g.dispose();
        }
        return img;
    }

    /**
     * Writes a PNG of {@code round(width * scale)} x {@code round(height * scale)} pixels.
     *
     * @param drawing what to draw
     * @param width layout width (px)
     * @param height layout height (px)
     * @param scale pixels per layout pixel
     * @param out where to write; left open
     * @throws IOException when writing fails
     */
    public static void writePng(Drawable drawing, int width, int height, double scale, OutputStream out)
            throws IOException {
        if (!ImageIO.write(render(drawing, width, height, scale), "png", out)) {
            throw new IOException("no PNG writer available in this Java runtime");
        }
    }

    /**
     * Writes an SVG document with a {@code width} x {@code height} canvas, UTF-8 encoded.
     *
     * @param drawing what to draw
     * @param width width (px)
     * @param height height (px)
     * @param out where to write; flushed, left open
     * @throws IOException when writing fails
     */
    public static void writeSvg(Drawable drawing, int width, int height, OutputStream out) throws IOException {
        Document doc;
        try {
            DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
            dbf.setNamespaceAware(true);
            doc = dbf.newDocumentBuilder().getDOMImplementation().createDocument(SVG_NS, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IOException("no XML document builder available: " + e.getMessage(), e);
        }
        SVGGeneratorContext ctx = SVGGeneratorContext.createDefault(doc);
        ctx.setComment("Cellwright chart");
        ctx.setEmbeddedFontsOn(false);
        SVGGraphics2D g = new SVGGraphics2D(ctx, false);
        g.setSVGCanvasSize(new Dimension(width, height));
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        drawing.draw(g, new Rectangle2D.Double(0, 0, width, height));
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        g.stream(w, true);
        w.flush();
        g.dispose();
    }
}
