package org.cellwright.chart;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.logging.Level;
import java.util.logging.Logger;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawerDefaultFonts;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.util.Matrix;
import org.jfree.chart.ui.Drawable;

/**
 * Lays text, tables and drawings down A4 pages of a PDFBox document, top to bottom, starting a new page when
 * the next block does not fit. Text uses the standard Helvetica fonts (no font file needed); characters
 * outside their WinAnsi encoding are replaced by the nearest plain ones. Drawings (charts) go in as vector
 * form objects through {@code PdfBoxGraphics2D}, their text as Helvetica.
 */
final class PdfPages implements AutoCloseable {

    static final float MARGIN = 50;
    /**
     * PDFBox logs a warning (through java.util.logging) each time a standard font is drawn with a metric-
     * compatible system font in its place: hundreds of lines on the user's terminal for one report. The
     * substitution is intended, so only its errors are shown. Held here so the logger is not collected.
     */
    private static final Logger FONT_LOG = quietFontLog();
    static final PDFont REGULAR = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    static final PDFont BOLD = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    static final PDFont ITALIC = new PDType1Font(Standard14Fonts.FontName.HELVETICA_OBLIQUE);

    private final PDDocument doc;
    private PDPageContentStream cs;
    private float y;
    private int pages;

    PdfPages(PDDocument doc) {
        this.doc = doc;
    }

    /** @return the usable width of a page (pt) */
    private static Logger quietFontLog() {
        Logger log = Logger.getLogger("org.apache.pdfbox.pdmodel.font");
        log.setLevel(Level.SEVERE);
        return log;
    }

    static float width() {
        return PDRectangle.A4.getWidth() - 2 * MARGIN;
    }

    /** Makes sure {@code height} points are free below the cursor, else starts a new page. */
    void need(float height) throws IOException {
        if (cs == null || y - height < MARGIN) {
            newPage();
        }
    }

    private void newPage() throws IOException {
        if (cs != null) {
            cs.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        cs = new PDPageContentStream(doc, page);
        pages++;
        y = PDRectangle.A4.getHeight() - MARGIN;
        footer();
    }

    private void footer() throws IOException {
        cs.beginText();
        cs.setFont(REGULAR, 7.5f);
        cs.setNonStrokingColor(new Color(0x5b6570));
        cs.newLineAtOffset(MARGIN, MARGIN / 2);
        cs.showText("Cellwright run report, page " + pages);
        cs.endText();
    }

    /** Moves the cursor down. */
    void space(float pt) {
        y -= pt;
    }

    /**
     * Writes wrapped text.
     *
     * @param text the text
     * @param font the font
     * @param size the size (pt)
     * @param colour the colour
     * @param indent left indent (pt)
     */
    void paragraph(String text, PDFont font, float size, Color colour, float indent) throws IOException {
        List<String> lines = wrap(plain(text), font, size, width() - indent);
        float lead = size * 1.35f;
        for (String line : lines) {
            need(lead);
            y -= lead;
            cs.beginText();
            cs.setFont(font, size);
            cs.setNonStrokingColor(colour);
            cs.newLineAtOffset(MARGIN + indent, y + size * 0.3f);
            cs.showText(line);
            cs.endText();
        }
    }

    /** A heading with a rule under it, kept together with the next 60 pt. */
    void heading(String text) throws IOException {
        need(80);
        space(10);
        paragraph(text, BOLD, 12.5f, new Color(0x0b6fae), 0);
        cs.setStrokingColor(new Color(0x0b6fae));
        cs.setLineWidth(1.2f);
        cs.moveTo(MARGIN, y - 2);
        cs.lineTo(MARGIN + width(), y - 2);
        cs.stroke();
        space(6);
    }

    /** Two-column rows: the label in grey, the value wrapped beside it. */
    void table(List<RunReport.Row> rows, float labelWidth, float size) throws IOException {
        float lead = size * 1.35f;
        for (RunReport.Row r : rows) {
            List<String> values = wrap(plain(r.value()), REGULAR, size, width() - labelWidth);
            List<String> labels = wrap(plain(r.label()), REGULAR, size, labelWidth - 8);
            int n = Math.max(values.size(), labels.size());
            need(n * lead + 2);
            for (int i = 0; i < n; i++) {
                y -= lead;
                if (i < labels.size()) {
                    text(labels.get(i), REGULAR, size, new Color(0x5b6570), MARGIN);
                }
                if (i < values.size()) {
                    text(values.get(i), REGULAR, size, Color.BLACK, MARGIN + labelWidth);
                }
            }
            y -= 2;
        }
    }

    /** Cells at given x offsets on one line. */
    void cells(List<String> texts, float[] xs, PDFont font, float size) throws IOException {
        float lead = size * 1.4f;
        need(lead);
        y -= lead;
        for (int i = 0; i < texts.size(); i++) {
            text(plain(texts.get(i)), font, size, Color.BLACK, MARGIN + xs[i]);
        }
    }

    /** A filled band behind the next {@code height} points (a caution's background). */
    void band(float height, Color fill, Color edge) throws IOException {
        need(height);
        cs.setNonStrokingColor(fill);
        cs.addRect(MARGIN, y - height, width(), height);
        cs.fill();
        cs.setNonStrokingColor(edge);
        cs.addRect(MARGIN, y - height, 4, height);
        cs.fill();
    }

    /** @return the height (pt) a wrapped paragraph takes */
    static float height(String text, PDFont font, float size, float indent) throws IOException {
        return wrap(plain(text), font, size, width() - indent).size() * size * 1.35f;
    }

    private void text(String s, PDFont font, float size, Color colour, float x) throws IOException {
        cs.beginText();
        cs.setFont(font, size);
        cs.setNonStrokingColor(colour);
        cs.newLineAtOffset(x, y + size * 0.3f);
        cs.showText(s);
        cs.endText();
    }

    /**
     * Draws a drawing (a chart) as vector graphics.
     *
     * @param d the drawing
     * @param w its layout width (px)
     * @param h its layout height (px)
     * @param x left edge on the page, from the margin (pt)
     * @param scale points per layout pixel
     * @param newRow true to take the height from the cursor (the drawing starts a row)
     */
    void drawing(Drawable d, int w, int h, float x, float scale, boolean newRow) throws IOException {
        if (newRow) {
            need(h * scale + 6);
            y -= h * scale + 6;
        }
        PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, w, h);
        g.setFontTextDrawer(new PdfBoxGraphics2DFontTextDrawerDefaultFonts());
        d.draw(g, new Rectangle2D.Double(0, 0, w, h));
        g.dispose();
        cs.saveGraphicsState();
        cs.transform(new Matrix(scale, 0, 0, scale, MARGIN + x, y));
        cs.drawForm(g.getXFormObject());
        cs.restoreGraphicsState();
    }

    /** Breaks text into lines no wider than {@code width} points (at spaces; over-long words are cut). */
    static List<String> wrap(String text, PDFont font, float size, float width) throws IOException {
        List<String> out = new ArrayList<>();
        for (String para : text.split("\n")) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" ")) {
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (font.getStringWidth(candidate) / 1000 * size <= width || line.length() == 0) {
                    line.setLength(0);
                    line.append(candidate);
                } else {
                    out.add(line.toString());
                    line.setLength(0);
                    line.append(word);
                }
            }
            out.add(line.toString());
        }
        return out;
    }

    /** @return the text with characters outside WinAnsi replaced (arrows, subscripts, Greek letters) */
    static String plain(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\u2192' -> sb.append("->");
                case '\u2264' -> sb.append("<=");
                case '\u2265' -> sb.append(">=");
                case '\u2248' -> sb.append("~");
                case '\u2212' -> sb.append('-');
                case '\u03bc' -> sb.append('\u00b5');
                case '\u00b7', '\u00b0', '\u00b5', '\u00b2', '\u00b3', '\u2013', '\u2014', '\u2019', '\u201c', '\u201d',
                     '\u2026', '\u00d7', '\u00f7', '\u00e9', '\u00fc', '\u00f6', '\u00e4' -> sb.append(c);
                case '\t' -> sb.append("    ");
                default -> sb.append(c < 0x20 && c != '\n' ? ' ' : c > 0xff ? '?' : c);
            }
        }
        return sb.toString();
    }

    @Override
    public void close() throws IOException {
        if (cs != null) {
            cs.close();
            cs = null;
        }
    }
}
