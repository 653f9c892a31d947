package org.cellwright.ui;

import java.util.List;

import org.cellwright.chart.RunCharts;
import org.cellwright.sim.TracePoint;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;

/**
 * Holds the value axes of the charts still while a run plays back: the run is computed before it plays, so
 * each axis is set once to the range of the whole run (and of a pinned reference) instead of growing, and the
 * curves grow into a steady frame. The dendrite chart keeps its own axis (it always shows the gap).
 */
final class SteadyAxes {

    private SteadyAxes() {
    }

    /**
     * Fixes every value axis to the range the whole run needs, then empties the charts for the playback.
     *
     * @param charts the charts (on the event thread)
     * @param run the whole run's points
     */
    static void freeze(RunCharts charts, List<TracePoint> run) {
        release(charts);
        charts.model().replaceWith(run);
        for (JFreeChart c : charts.all()) {
            if (c != charts.dendrite()) {
                ValueAxis a = c.getXYPlot().getRangeAxis(0);
                a.setRange(a.getRange(), true, true);
            }
        }
        charts.model().clear();
    }

    /**
     * Lets every value axis follow its data again.
     *
     * @param charts the charts (on the event thread)
     */
    static void release(RunCharts charts) {
        for (JFreeChart c : charts.all()) {
            if (c != charts.dendrite()) {
                ValueAxis a = c.getXYPlot().getRangeAxis(0);
                if (!a.isAutoRange()) {
                    a.setAutoRange(true);
                }
            }
        }
    }

    /**
     * @param charts the charts
     * @return true when the value axes are held still
     */
    static boolean frozen(RunCharts charts) {
        return charts.all().stream().filter(c -> c != charts.dendrite())
                .noneMatch(c -> c.getXYPlot().getRangeAxis(0).isAutoRange());
    }
}
