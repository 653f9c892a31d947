package org.cellwright.chart;

import java.awt.geom.Line2D;
import java.util.List;
import java.util.Map;

import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;

/**
 * Paints the series of a chart whose series are named by species or metal (bath composition, deposit): the
 * live run's, the pinned run's and the anolyte's, each in the colour its name gets from {@link SeriesHues},
 * and, when an anolyte is drawn, the legend with one entry for it.
 */
final class NamedSeriesPaint {

    private NamedSeriesPaint() {
    }

    /**
     * Colours series by name ({@link SeriesHues}), over the names of the live run, the reference and the anolyte
     * together, so a species has the same hue in each of them.
     */
    static void paint(XYPlot plot, ChartStyle style, List<String> names, List<String> refNames,
                      List<String> anolyte) {
        Map<String, Integer> slots = SeriesHues.assign(names, refNames);
        XYItemRenderer live = plot.getRenderer(RunPlots.LIVE);
        for (int i = 0; i < names.size(); i++) {
            int slot = slots.get(names.get(i));
            live.setSeriesPaint(i, style.series(slot), false);
            live.setSeriesStroke(i, style.seriesStroke(slot), false);
        }
        XYItemRenderer r = plot.getRenderer(RunPlots.REFERENCE);
        for (int i = 0; i < refNames.size(); i++) {
            int slot = slots.get(refNames.get(i));
            r.setSeriesPaint(i, style.reference(style.series(slot)), false);
            r.setSeriesStroke(i, style.referenceStroke(slot), false);
        }
        XYItemRenderer a = plot.getRenderer(RunPlots.ANOLYTE);
        if (a == null || anolyte.isEmpty()) {
            if (plot.getFixedLegendItems() != null) {
                plot.setFixedLegendItems(null);
            }
            return;
        }
        for (int i = 0; i < anolyte.size(); i++) {
            a.setSeriesPaint(i, style.series(slots.get(anolyte.get(i))), false);
            a.setSeriesStroke(i, style.anolyteStroke(), false);
        }
        // the species' own entries (the catholyte, solid), then one entry saying that dotted is the anolyte
        LegendItemCollection legend = new LegendItemCollection();
        Line2D line = new Line2D.Double(-8, 0, 8, 0);
        for (int i = 0; i < names.size(); i++) {
            int slot = slots.get(names.get(i));
            legend.add(new LegendItem(names.get(i), null, null, null, line, style.seriesStroke(slot),
                    style.series(slot)));
        }
        legend.add(new LegendItem("anolyte (dotted)", null, null, null, line, style.anolyteStroke(), style.text()));
        for (int i = 0; i < legend.getItemCount(); i++) {
            legend.get(i).setLabelFont(style.font(10f, false));
            legend.get(i).setLabelPaint(style.text());
        }
        plot.setFixedLegendItems(legend);
    }

}
