package org.cellwright.ui;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.study.AxisValue;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.data.xy.XYDataset;

/**
 * From a click on the sweep chart to the grid point under it, and from the point to a form draft that holds
 * its scenario: the base draft with the point's values typed into their fields (so the form keeps the user's
 * units and supply kind), or, for a key the form has no field for, the point's scenario as written by the
 * scenario writer. Values with more digits than a person would type ("37.7778 mm" of a 10-value range) go
 * into the form rounded to four significant digits ({@link FormRounding}), so the draft reads back to the
 * point's scenario up to that rounding (exactly, for values that need no more digits).
 */
final class SweepPick {

    private SweepPick() {
    }

    /**
     * @param r the sweep shown
     * @param data the chart's dataset that was clicked
     * @param series the series clicked
     * @param item the item clicked
     * @return the grid point: in a heat map item i of series 0 is grid point i; on a line the point whose value
     *     lies at the item's x; null when nothing matches
     */
    static SweepPoint at(SweepResult r, XYDataset data, int series, int item) {
        if (series != 0 || item < 0 || item >= data.getItemCount(series)) {
            return null;
        }
        if (r.axes().size() == 2) {
            return item < r.points().size() ? r.points().get(item) : null;
        }
        SweepAxis a = r.axes().get(0);
        double x = data.getXValue(series, item);
        // the line is drawn to scale for evenly spaced numbers, else one step per value (see SweepCharts.line)
        boolean toScale = a.numeric() && !a.logarithmic();
        int best = -1;
        double gap = Double.POSITIVE_INFINITY;
        for (int k = 0; k < a.size(); k++) {
            double v = toScale ? a.values().get(k).number() : k;
            if (Math.abs(v - x) < gap) {
                gap = Math.abs(v - x);
                best = k;
            }
        }
        return best < 0 ? null : r.at(best);
    }

    /**
     * @param p a point
     * @param axes the sweep's axes
     * @return its values in words ("cell.gap = 25 mm, supply.current_density = 2 A/dm2")
     */
    static String describe(SweepPoint p, List<SweepAxis> axes) {
        List<String> parts = new ArrayList<>();
        for (int a = 0; a < axes.size(); a++) {
            parts.add(axes.get(a).key() + " = " + p.point().values().get(a).text());
        }
        return String.join(", ", parts);
    }

    /**
     * @param plot the sweep chart's plot
     * @param r the sweep it shows
     * @param p a point of it
     * @return in data coordinates, the outline of the point's cell (heat map), or a small ring around its
     *     marker (line)
     */
    static Shape outline(XYPlot plot, SweepResult r, SweepPoint p) {
        XYDataset data = plot.getDataset();
        int item = p.point().index();
        if (r.axes().size() == 1) {
            for (int i = 0; i < data.getItemCount(0); i++) {
                if (at(r, data, 0, i) == p) {
                    item = i;
                }
            }
        }
        double x = data.getXValue(0, item);
        double y = data.getYValue(0, item);
        if (plot.getRenderer() instanceof XYBlockRenderer b) {
            return new Rectangle2D.Double(x - b.getBlockWidth() / 2, y - b.getBlockHeight() / 2, b.getBlockWidth(),
                    b.getBlockHeight());
        }
        double w = plot.getDomainAxis().getRange().getLength() / 60;
        double h = plot.getRangeAxis().getRange().getLength() / 40;
        return new Ellipse2D.Double(x - w, y - h, 2 * w, 2 * h);
    }

    /**
     * @param r the sweep
     * @param f the figure shown
     * @param p the point under the mouse, or null
     * @return the tooltip: the point's values, its figure with unit (or why it has none), and what a click does
     */
    static String tooltip(SweepResult r, SummaryFigure f, SweepPoint p) {
        if (p == null) {
            return null;
        }
        double v = f.toDisplay(p.si(f));
        return "<html>" + describe(p, r.axes()) + "<br>" + f.description() + ": "
                + (Double.isFinite(v) ? SweepKeys.num(v) + " " + f.displayUnit() : "no value")
                + (p.message() == null ? "" : "<br>" + p.message()) + "<br><i>click to load this run</i></html>";
    }

    /**
     * @param base the form's draft the sweep started from (not changed)
     * @param p a point that has a scenario
     * @param axes the sweep's axes
     * @param lib the chemistry
     * @param name the scenario's name (for problems)
     * @return a draft whose scenario is the point's
     * @throws IllegalArgumentException when the point has no scenario (its values were invalid)
     */
    static ScenarioDraft draftOf(ScenarioDraft base, SweepPoint p, List<SweepAxis> axes, ChemLibrary lib, String name) {
        Scenario target = p.scenario();
        if (target == null) {
            throw new IllegalArgumentException("this point has no scenario: " + p.message());
        }
        ScenarioDraft d = typed(base, p, axes);
        if (d != null) {
            DraftCheck.Outcome o = DraftCheck.draft(d, lib, name);
            if (o.ok() && o.scenario().equals(target)) {
                ScenarioDraft rounded = typed(base, p, axes, true);
                return DraftCheck.draft(rounded, lib, name).ok() ? rounded : d;
            }
        }
        try {
            String text = ScenarioWriter.write(target, lib);
            ScenarioDraft written = ScenarioDraft.parse(text, name);
            FormRounding.derived(written);
            return DraftCheck.draft(written, lib, name).ok() ? written : ScenarioDraft.parse(text, name);
        } catch (ScenarioException e) {
            throw new IllegalStateException("the scenario writer wrote text that does not read: " + e.getMessage(), e);
        }
    }

    /** @return the base draft with the point's values in their fields, as the sweep wrote them, or null when a key has no field */
    static ScenarioDraft typed(ScenarioDraft base, SweepPoint p, List<SweepAxis> axes) {
        return typed(base, p, axes, false);
    }

    /**
     * @return the base draft with the point's values in their fields (rounded for the form when {@code round}),
     *     or null when a key has no field
     */
    static ScenarioDraft typed(ScenarioDraft base, SweepPoint p, List<SweepAxis> axes, boolean round) {
        ScenarioDraft d = base.copy();
        for (int a = 0; a < axes.size(); a++) {
            if (!type(d, axes.get(a).key(), p.point().values().get(a), round)) {
                return null;
            }
        }
        return d;
    }

    private static boolean type(ScenarioDraft d, String key, AxisValue v, boolean round) {
        String composition = "electrolyte.composition.";
        String field = key.startsWith(composition) ? FormFields.COMPOSITION
                : key.startsWith("supply.") && SupplyKind.ofKey(key.substring("supply.".length())) != null
                ? FormFields.SUPPLY_VALUE : key;
        String text = round ? FormRounding.sweepValue(field, v.text()) : v.text();
        if (key.startsWith("supply.")) {
            SupplyKind kind = SupplyKind.ofKey(key.substring("supply.".length()));
            if (kind == null || kind == SupplyKind.SCHEDULE) {
                return FormFields.find(key).map(f -> set(d, key, text)).orElse(false);
            }
            d.setSupplyKind(kind);
            d.set(FormFields.SUPPLY_VALUE, text);
            return true;
        } else if (key.equals(FormFields.DIFFUSION_LAYER)) {
            d.set(FormFields.AGITATION, "");
            d.set(FormFields.DIFFUSION_LAYER, text);
            return true;
        } else if (key.equals(FormFields.AGITATION)) {
            d.set(FormFields.AGITATION, text);
            d.set(FormFields.DIFFUSION_LAYER, "");
            return true;
        } else if (key.startsWith(composition)) {
            String species = key.substring(composition.length()).strip();
            if (species.length() >= 2 && species.startsWith("\"") && species.endsWith("\"")) {
                species = species.substring(1, species.length() - 1);
            }
            d.setConcentration(species, text);
            return true;
        }
        return FormFields.find(key).map(f -> set(d, key, text)).orElse(false);
    }

    private static boolean set(ScenarioDraft d, String key, String text) {
        d.set(key, text);
        return true;
    }
}
