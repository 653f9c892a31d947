package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;

import org.junit.jupiter.api.Test;

/**
 * The line palette stays readable: every hue stands out from the plot background, and every two hues stay
 * apart for normal vision and for deuteranopes and protanopes, in the light and the dark look.
 */
class ChartPaletteTest {

    /**
     * Dichromat simulation matrices on linear RGB, severity 1 (source: G. M. Machado, M. M. Oliveira,
     * L. A. F. Fernandes, "A Physiologically-based Model for Simulation of Color Vision Deficiency", IEEE TVCG
     * 15(6), 2009, table of matrices; from memory).
     */
    private static final double[][] PROTANOPIA = {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216},
            {-0.003882, -0.048116, 1.051998}};
    private static final double[][] DEUTERANOPIA = {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413},
            {-0.011820, 0.042940, 0.968881}};

    /**
     * Smallest CIEDE2000 difference between two hues under any of the three visions. About 2 is a just
     * noticeable difference for large patches; thin lines need several times that, and 7 keeps the worst pair
     * (vermillion and olive for deuteranopes) apart while the palette keeps eight hues. The previous palette
     * had 1.6 for that pair.
     */
    private static final double MIN_DE = 7;
    /** Non-text contrast against the background (source: WCAG 2.1, success criterion 1.4.11: 3:1). */
    private static final double MIN_CONTRAST = 3;

    @Test
    void ciede2000MatchesThePublishedTestPairs() {
        // source: G. Sharma, W. Wu, E. N. Dalal, "The CIEDE2000 color-difference formula: implementation notes,
        // supplementary test data", Color Res. Appl. 30(1), 2005, table 1, pairs 1, 7 and 17 (from memory)
        assertEquals(2.0425, de2000(new double[] {50, 2.6772, -79.7751}, new double[] {50, 0, -82.7485}), 1e-4);
        assertEquals(2.3669, de2000(new double[] {50, 0, 0}, new double[] {50, -1, 2}), 1e-4);
        assertEquals(27.1492, de2000(new double[] {50, 2.5, 0}, new double[] {73, 25, -18}), 1e-4);
    }

    @Test
    void everyTwoHuesStayApartForCommonColourVisions() {
        for (ChartStyle style : new ChartStyle[] {ChartStyle.light(), ChartStyle.dark()}) {
            for (int i = 0; i < style.hueCount(); i++) {
                double contrast = contrast(style.series(i), style.plotBackground());
                assertTrue(contrast >= MIN_CONTRAST, (style.isDark() ? "dark" : "light") + " hue " + i
                        + ": contrast " + contrast);
                for (int j = i + 1; j < style.hueCount(); j++) {
                    for (double[][] vision : new double[][][] {null, DEUTERANOPIA, PROTANOPIA}) {
                        double de = de2000(lab(style.series(i), vision), lab(style.series(j), vision));
                        assertTrue(de >= MIN_DE, (style.isDark() ? "dark" : "light") + " hues " + i + " and " + j
                                + (vision == null ? "" : vision == DEUTERANOPIA ? " (deuteranopia)" : " (protanopia)")
                                + ": dE00 " + de);
                    }
                }
            }
        }
    }

    private static double linear(int c) {
        double v = c / 255.0;
        // source: IEC 61966-2-1 (sRGB) transfer function
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    private static double luminance(Color c) {
        // source: WCAG 2.1, definition of relative luminance
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double contrast(Color a, Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    /** CIELAB (D65) of a colour, seen through a dichromat matrix when one is given. */
    private static double[] lab(Color c, double[][] vision) {
        double[] rgb = {linear(c.getRed()), linear(c.getGreen()), linear(c.getBlue())};
        if (vision != null) {
            double[] s = new double[3];
            for (int i = 0; i < 3; i++) {
                s[i] = Math.min(1, Math.max(0, vision[i][0] * rgb[0] + vision[i][1] * rgb[1] + vision[i][2] * rgb[2]));
            }
            rgb = s;
        }
        // source: IEC 61966-2-1, linear sRGB to XYZ; CIE 15:2004, XYZ to L*a*b* with the D65 white
        double x = (0.4124 * rgb[0] + 0.3576 * rgb[1] + 0.1805 * rgb[2]) / 0.95047;
        double y = 0.2126 * rgb[0] + 0.7152 * rgb[1] + 0.0722 * rgb[2];
        double z = (0.0193 * rgb[0] + 0.1192 * rgb[1] + 0.9505 * rgb[2]) / 1.08883;
        double fx = f(x);
        double fy = f(y);
        double fz = f(z);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    private static double f(double t) {
        double d = 6.0 / 29;
        return t > d * d * d ? Math.cbrt(t) : t / (3 * d * d) + 4.0 / 29;
    }

    /** CIEDE2000 colour difference (source: CIE 142-2001; Sharma, Wu and Dalal 2005, equations 1-22). */
    static double de2000(double[] p, double[] q) {
        double c1 = Math.hypot(p[1], p[2]);
        double c2 = Math.hypot(q[1], q[2]);
        double cb7 = Math.pow((c1 + c2) / 2, 7);
        double g = 0.5 * (1 - Math.sqrt(cb7 / (cb7 + Math.pow(25, 7))));
        double a1 = (1 + g) * p[1];
        double a2 = (1 + g) * q[1];
        double c1p = Math.hypot(a1, p[2]);
        double c2p = Math.hypot(a2, q[2]);
        double h1 = c1p == 0 ? 0 : (Math.toDegrees(Math.atan2(p[2], a1)) + 360) % 360;
        double h2 = c2p == 0 ? 0 : (Math.toDegrees(Math.atan2(q[2], a2)) + 360) % 360;
        double dl = q[0] - p[0];
        double dc = c2p - c1p;
        double dh = 0;
        if (c1p * c2p != 0) {
            dh = h2 - h1;
            dh = dh > 180 ? dh - 360 : dh < -180 ? dh + 360 : dh;
        }
        double dH = 2 * Math.sqrt(c1p * c2p) * Math.sin(Math.toRadians(dh / 2));
        double lb = (p[0] + q[0]) / 2;
        double cbp = (c1p + c2p) / 2;
        double hb;
        if (c1p * c2p == 0) {
            hb = h1 + h2;
        } else if (Math.abs(h1 - h2) <= 180) {
            hb = (h1 + h2) / 2;
        } else {
            hb = h1 + h2 < 360 ? (h1 + h2 + 360) / 2 : (h1 + h2 - 360) / 2;
        }
        double t = 1 - 0.17 * Math.cos(Math.toRadians(hb - 30)) + 0.24 * Math.cos(Math.toRadians(2 * hb))
                + 0.32 * Math.cos(Math.toRadians(3 * hb + 6)) - 0.20 * Math.cos(Math.toRadians(4 * hb - 63));
        double dTheta = 30 * Math.exp(-Math.pow((hb - 275) / 25, 2));
        double cbp7 = Math.pow(cbp, 7);
        double rc = 2 * Math.sqrt(cbp7 / (cbp7 + Math.pow(25, 7)));
        double sl = 1 + 0.015 * (lb - 50) * (lb - 50) / Math.sqrt(20 + (lb - 50) * (lb - 50));
        double sc = 1 + 0.045 * cbp;
        double sh = 1 + 0.015 * cbp * t;
        double rt = -Math.sin(Math.toRadians(2 * dTheta)) * rc;
        return Math.sqrt(Math.pow(dl / sl, 2) + Math.pow(dc / sc, 2) + Math.pow(dH / sh, 2)
                + rt * (dc / sc) * (dH / sh));
    }
}
