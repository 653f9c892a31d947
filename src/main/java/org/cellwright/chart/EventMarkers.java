package org.cellwright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;

import org.cellwright.sim.RunEvent;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.LengthAdjustmentType;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;

/**
 * Vertical lines at the times of run events, with short labels. The end of the run gets no line (the
 * axis ends there). Labels closer than {@link #MIN_LABEL_GAP} of the time span to the previous label are
 * left off, so neighbouring events do not print over each other; their lines stay. Successive labels step
 * down a line, and labels near the right end stand to the left of their line.
 */
final class EventMarkers {

    /** Least distance between two labelled events, as a share of the time span (common practice: ~8 %). */
    static final double MIN_LABEL_GAP = 0.08;
    /**
     * Share of the time span at the right end of the axis in which a label is drawn to the left of its line,
     * so that it is not cut off by the plot's edge (a label is about 12 % of a small chart's width).
     */
    static final double RIGHT_EDGE_SHARE = 0.15;
    /** Height of one label line (px): a 9.5 pt label and a little air. */
    static final double LABEL_LINE_PX = 12;
    /** Label lines used before starting again from the top. */
    static final int LABEL_LINES = 3;

    private EventMarkers() {
    }

    /**
     * @param kind an event kind
     * @return the few words printed at its line, or null when the kind gets no line
     */
    static String shortLabel(RunEvent.Kind kind) {
        return switch (kind) {
            case VOLTAGE_LIMIT_ENTERED -> "at V limit";
            case VOLTAGE_LIMIT_LEFT -> "off V limit";
            case CURRENT_LIMIT_ENTERED -> "at I limit";
            case CURRENT_LIMIT_LEFT -> "off I limit";
            case NEAR_LIMITING_CURRENT -> "near i lim";
            case BELOW_LIMITING_CURRENT -> "below i lim";
            case SPECIES_TARGET -> "conc. reached";
            case DEPOSIT_TARGET -> "mass reached";
            case TEMPERATURE_LIMIT -> "T stop";
            case VOLTAGE_STOP -> "V stop";
            case SHORT_CIRCUIT -> "short";
            case SCHEDULE_STEP -> "step";
            case END -> null;
        };
    }

    /**
     * @param events the run's events in time order
     * @param scale the time unit of the axis
     * @param spanS the time span of the axis (s)
     * @param style colours and fonts
     * @param labelled true to print labels (false for charts that share the labels of another)
     * @return one marker per event that gets a line
     */
    static List<ValueMarker> of(List<RunEvent> events, TimeScale scale, double spanS, ChartStyle style,
                                boolean labelled) {
        List<ValueMarker> markers = new ArrayList<>();
        double lastLabelS = Double.NEGATIVE_INFINITY;
        int labels = 0;
        Color line = style.event();
        for (RunEvent e : events) {
            String label = shortLabel(e.kind());
            if (label == null) {
                continue;
            }
            ValueMarker m = new ValueMarker(scale.fromSeconds(e.timeS()), line,
                    new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {3f, 3f}, 0f));
            // near the end of the axis a label goes to the left of its line, where it has room
            boolean leftOfLine = e.timeS() > (1 - RIGHT_EDGE_SHARE) * spanS;
            if (labelled && e.timeS() - lastLabelS >= MIN_LABEL_GAP * spanS) {
                m.setLabel(label);
                m.setLabelFont(style.font(9.5f, false));
                m.setLabelPaint(style.mutedText());
                m.setLabelBackgroundColor(new Color(0, 0, 0, 0));
                m.setLabelAnchor(leftOfLine ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
                m.setLabelTextAnchor(leftOfLine ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
                // successive labels step down a line (three lines, then from the top again), so that two
                // labels close in time, or one left and one right of their lines, do not print over each other
                m.setLabelOffset(new RectangleInsets(2 + LABEL_LINE_PX * (labels % LABEL_LINES), 3, 2, 3));
                labels++;
                m.setLabelOffsetType(LengthAdjustmentType.EXPAND);
                lastLabelS = e.timeS();
            }
            markers.add(m);
        }
        return markers;
    }
}
