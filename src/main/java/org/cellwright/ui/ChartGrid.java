package org.cellwright.ui;

import java.awt.GridLayout;
import java.awt.event.MouseEvent;
import java.awt.geom.Rectangle2D;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

import javax.swing.JFileChooser;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.cellwright.chart.ChartExport;
import org.cellwright.chart.RunCharts;
import org.cellwright.sim.TracePoint;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.event.ChartProgressEvent;
import org.jfree.chart.event.ChartProgressListener;
import org.jfree.chart.plot.XYPlot;

/**
 * The six run charts in a grid of three by two, each in a chart panel whose tooltip reads the values under
 * the mouse (with units) and whose context menu exports that chart as PNG or SVG.
 */
final class ChartGrid extends JPanel {

    private static final long serialVersionUID = 1L;
    private static final int COLUMNS = 3;
    /** Largest size a chart panel draws at without stretching (px): a 4K screen's width. */
    private static final int MAX_DRAW = 4096;

    private final transient Supplier<List<TracePoint>> shown;
    private final transient Runnable drawn;
    private final List<ChartPanel> panels = new ArrayList<>();
    private transient RunCharts charts;
    private transient java.util.function.Consumer<RunCharts> chartsListener = c -> { };

    /**
     * @param shown the points the charts show now (for the tooltips)
     * @param drawn called each time a chart has finished drawing
     */
    ChartGrid(Supplier<List<TracePoint>> shown, Runnable drawn) {
        super(new GridLayout(0, COLUMNS, 6, 6));
        this.shown = shown;
        this.drawn = drawn;
    }

    /**
     * Shows other charts (replacing the panels).
     *
     * @param c the charts
     */
    void setCharts(RunCharts c) {
        this.charts = c;
        removeAll();
        panels.clear();
        List<JFreeChart> all = c.all();
        ChartProgressListener progress = e -> {
            if (e.getType() == ChartProgressEvent.DRAWING_FINISHED) {
                drawn.run();
            }
        };
        for (int i = 0; i < all.size(); i++) {
            JFreeChart chart = all.get(i);
            chart.addProgressListener(progress);
            ChartPanel p = panel(chart, ChartReadout.Chart.values()[i]);
            panels.add(p);
            add(p);
        }
        chartsListener.accept(c);
        revalidate();
        repaint();
    }

    /** @param l hears of every new set of charts (e.g. to draw a measured log on them) */
    void onNewCharts(java.util.function.Consumer<RunCharts> l) {
        chartsListener = l;
    }

    /** @return how many charts the grid shows */
    int chartCount() {
        return panels.size();
    }

    private ChartPanel panel(JFreeChart chart, ChartReadout.Chart kind) {
        ChartPanel p = new ChartPanel(chart, 400, 300, 80, 60, MAX_DRAW, MAX_DRAW, true, false, true, false, false,
                true, true) {
            private static final long serialVersionUID = 1L;

            @Override
            public String getToolTipText(MouseEvent e) {
                return readout(this, kind, e);
            }
        };
        p.setMouseWheelEnabled(false);
        p.setDomainZoomable(false);
        p.setRangeZoomable(false);
        p.setInitialDelay(250);
        p.setDismissDelay(30000);
        p.setReshowDelay(0);
        p.getPopupMenu().addSeparator();
        JMenuItem export = new JMenuItem("Export this chart (PNG or SVG)...");
        export.addActionListener(e -> exportChart(chart));
        p.getPopupMenu().add(export);
        return p;
    }

    private String readout(ChartPanel p, ChartReadout.Chart kind, MouseEvent e) {
        List<TracePoint> points = shown.get();
        if (points.isEmpty() || charts == null) {
            return null;
        }
        XYPlot plot = p.getChart().getXYPlot();
        Rectangle2D area = p.getScreenDataArea();
        if (!area.contains(e.getPoint())) {
            return null;
        }
        double x = plot.getDomainAxis().java2DToValue(e.getX(), area, plot.getDomainAxisEdge());
        double seconds = x / charts.model().timeScale().fromSeconds(1);
        TracePoint tp = ChartReadout.nearest(points, seconds);
        return ChartReadout.text(kind, tp, charts.model().speciesNames(), charts.model().metalSymbols(), charts.gapM());
    }

    private void exportChart(JFreeChart chart) {
        JFileChooser fc = new JFileChooser();
        fc.setDialogTitle("Export this chart");
        fc.setAcceptAllFileFilterUsed(false);
        FileNameExtensionFilter png = new FileNameExtensionFilter("PNG image", "png");
        FileNameExtensionFilter svg = new FileNameExtensionFilter("SVG drawing", "svg");
        fc.addChoosableFileFilter(png);
        fc.addChoosableFileFilter(svg);
        fc.setSelectedFile(new File(chart.getTitle().getText().toLowerCase(java.util.Locale.ROOT)
                .replaceAll("[^a-z0-9]+", "-") + ".png"));
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = fc.getSelectedFile().toPath();
        String ext = fc.getFileFilter() == svg ? "svg" : "png";
        if (!file.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith("." + ext)) {
            file = file.resolveSibling(file.getFileName() + "." + ext);
        }
        try {
            // The chart is live: draw it here on the event thread, where its data may be read.
            ChartExport.write(chart, 900, 600, ext.equals("png") ? 2 : 1, file);
        } catch (IOException | IllegalArgumentException ex) {
            JOptionPane.showMessageDialog(this, "Cannot write " + file + ": " + ex.getMessage(), "Export",
                    JOptionPane.ERROR_MESSAGE);
        }
    }
}
