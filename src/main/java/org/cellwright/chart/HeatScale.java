package org.cellwright.chart;

import java.awt.Color;
import java.awt.Paint;
import java.io.Serializable;

import org.jfree.chart.renderer.PaintScale;

/**
 * Cellwright's colour scale for heat maps: a sequential ramp of our own from a deep slate blue through teal
 * and moss green to a pale amber, with lightness rising steadily from one end to the other, so that the
 * order of the values reads in grey print and for the common forms of colour-blindness (lightness carries
 * the order; the hue only helps). Values outside the bounds take the end colours; NaN (a failed point, or a
 * figure the run has no value for) takes {@link #missing()}.
 */
public final class HeatScale implements PaintScale, Serializable {

    private static final long serialVersionUID = 1L;

    /** Colour stops, evenly spaced from the lower to the upper bound. */
    private static final Color[] STOPS = {
        new Color(0x1E2A4A), new Color(0x23507A), new Color(0x1F7A8C), new Color(0x3C9D7A),
        new Color(0x86B65A), new Color(0xD3C85C), new Color(0xF6E6A8)};

    private final double lower;
    private final double upper;
    private final Color missing;

    /**
     * @param lower the value drawn in the darkest colour
     * @param upper the value drawn in the lightest colour (above {@code lower}; equal bounds are widened)
     * @param missing the colour of NaN cells
     */
    public HeatScale(double lower, double upper, Color missing) {
        if (!(lower <= upper)) {
            throw new IllegalArgumentException("heat scale bounds must be ordered: " + lower + " > " + upper);
        }
        double pad = lower == upper ? Math.max(Math.abs(lower) * 0.01, 1e-12) : 0;
        this.lower = lower - pad;
        this.upper = upper + pad;
        this.missing = missing;
    }

    @Override
    public double getLowerBound() {
        return lower;
    }

    @Override
    public double getUpperBound() {
        return upper;
    }

    /** @return the colour of cells without a value */
    public Color missing() {
        return missing;
    }

    @Override
    public Paint getPaint(double value) {
        if (Double.isNaN(value)) {
            return missing;
        }
        double f = (value - lower) / (upper - lower);
        f = Math.max(0, Math.min(1, f));
        double pos = f * (STOPS.length - 1);
        int i = Math.min((int) pos, STOPS.length - 2);
        double t = pos - i;
        Color a = STOPS[i];
        Color b = STOPS[i + 1];
        return new Color((int) Math.round(a.getRed() + t * (b.getRed() - a.getRed())),
                (int) Math.round(a.getGreen() + t * (b.getGreen() - a.getGreen())),
                (int) Math.round(a.getBlue() + t * (b.getBlue() - a.getBlue())));
    }

    /**
     * @param c a colour
     * @return its relative luminance (ITU-R BT.709 weights on sRGB-linearised channels), 0 black to 1 white
     */
    static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof HeatScale h && h.lower == lower && h.upper == upper && h.missing.equals(missing);
    }

    @Override
    public int hashCode() {
        return Double.hashCode(lower) * 31 + Double.hashCode(upper);
    }
}
