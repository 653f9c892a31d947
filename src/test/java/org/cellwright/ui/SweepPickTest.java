package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.SweepCharts;
import org.cellwright.io.ScenarioVariants;
import org.cellwright.study.Cancellation;
import org.cellwright.study.ScenarioRunner;
import org.cellwright.study.StudyProgress;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The sweep view's logic without a screen: the keys it offers, what it reads from the typed ranges, and the
 * way from a clicked heat-map cell or line point to the grid point and to a form draft holding exactly that
 * point's scenario. Runs small sweeps of the tin scenario cut to one hour (a few runs of about 20 ms).
 */
class SweepPickTest {

    /** The tin scenario cut to one hour, as the form holds it. */
    private static ScenarioDraft base() throws Exception {
        ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
        ScenarioDraft d = ScenarioDraft.parse(t.text(), t.fileName());
        d.set("run.duration", "1 h");
        return d;
    }

    private static SweepResult sweep(ScenarioDraft base, List<SweepAxis> axes) throws Exception {
        DraftCheck.Outcome o = DraftCheck.draft(base, TinRun.lib(), "tin.toml");
        assertTrue(o.ok(), "the base draft checks out: " + o.generalErrors() + o.fieldErrors());
        ScenarioVariants v = ScenarioVariants.ofText(TinRun.lib(), o.text(), "tin.toml", List.of(), axes);
        return new Sweep(axes, v, ScenarioRunner.engine(TinRun.lib())).run(2, StudyProgress.NONE, Cancellation.none());
    }

    @Test
    void offersTheCommonKeysAroundTheScenarioValues() {
        List<SweepKeys.Choice> keys = SweepKeys.of(TinRun.scenario(), TinRun.lib());
        SweepKeys.Choice density = keys.stream().filter(k -> k.key().equals("supply.current_density")).findFirst()
                .orElseThrow();
        // source: the tin template sets current_density = "2 A/dm2"; the range is half to twice that
        assertEquals("1 A/dm2", density.from());
        assertEquals("4 A/dm2", density.to());
        SweepKeys.Choice tin = keys.stream().filter(k -> k.key().equals("electrolyte.composition.\"Sn2+\""))
                .findFirst().orElseThrow();
        // source: the tin template's "Sn2+" = "25 g/L"; half to one and a half times
        assertEquals("12.5 g/L", tin.from());
        assertEquals("37.5 g/L", tin.to());
        assertTrue(keys.stream().noneMatch(k -> k.key().contains("Cl-")), "anions are not offered: " + keys);
        assertTrue(keys.stream().anyMatch(k -> k.key().equals("cell.diffusion_layer") && k.log()));
        assertTrue(keys.stream().anyMatch(k -> k.key().equals("run.duration")));
        assertTrue(keys.stream().anyMatch(k -> k.key().equals("electrolyte.temperature")));
    }

    @Test
    void readsTypedRangesWithTheCommandLineParser() {
        SweepAxis a = SweepKeys.axis("cell.gap", "10 mm", "6 cm", 6, false);
        // ends in two units of one dimension are written in TO's unit (docs/studies.md)
        assertEquals("cm", a.unit());
        assertEquals(6, a.size());
        // 10 mm to 6 cm in 6 values: 1, 2, ... 6 cm, i.e. 0.01 to 0.06 m
        for (int k = 0; k < 6; k++) {
            assertEquals(0.01 * (k + 1), a.values().get(k).si(), 1e-12);
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SweepKeys.axis("cell.gap", "10 mm", "2 A", 3, false));
        assertTrue(e.getMessage().startsWith("cell.gap: "), e.getMessage());
        assertFalse(e.getMessage().contains("--vary"), "no command-line option in the window: " + e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SweepKeys.axis(" ", "1", "2", 3, false));
    }

    @Test
    void aClickedHeatMapCellGivesItsPointAndADraftOfItsScenario() throws Exception {
        ScenarioDraft base = base();
        List<SweepAxis> axes = List.of(SweepKeys.axis("cell.gap", "20 mm", "40 mm", 3, false),
                SweepKeys.axis("supply.current_density", "1 A/dm2", "3 A/dm2", 2, false));
        SweepResult r = sweep(base, axes);
        assertEquals(6, r.okCount());
        org.jfree.chart.plot.XYPlot plot = SweepCharts.of(r, SummaryFigure.EFFICIENCY, null, ChartStyle.light())
                .getXYPlot();
        XYDataset data = plot.getDataset();
        assertEquals(6, data.getItemCount(0));
        for (int i = 0; i < 6; i++) {
            SweepPoint p = SweepPick.at(r, data, 0, i);
            assertSame(r.points().get(i), p);
            // the cell drawn at (x, y) is the point with those values: gap in mm across, A/dm2 up
            assertEquals(p.point().values().get(0).number(), data.getXValue(0, i), 1e-9);
            assertEquals(p.point().values().get(1).number(), data.getYValue(0, i), 1e-9);
            // the outline drawn round a chosen cell is that cell: 10 mm wide (20, 30, 40 mm), 2 A/dm2 high
            java.awt.geom.Rectangle2D cell = SweepPick.outline(plot, r, p).getBounds2D();
            assertEquals(p.point().values().get(0).number(), cell.getCenterX(), 1e-9);
            assertEquals(p.point().values().get(1).number(), cell.getCenterY(), 1e-9);
            assertEquals(10, cell.getWidth(), 1e-9);
            assertEquals(2, cell.getHeight(), 1e-9);
            ScenarioDraft d = SweepPick.draftOf(base, p, axes, TinRun.lib(), "tin.toml");
            DraftCheck.Outcome o = DraftCheck.draft(d, TinRun.lib(), "tin.toml");
            assertEquals(p.scenario(), o.scenario(), "the form's draft reads back to the point's scenario");
            assertEquals(p.point().values().get(0).text(), d.get("cell.gap"), "typed into the gap field");
            assertEquals(SupplyKind.CURRENT_DENSITY, d.supplyKind(), "the supply stays a current density");
            assertEquals(p.point().values().get(1).text(), d.get(FormFields.SUPPLY_VALUE));
            // 1 dm2 cathode: the point's current density in A/dm2 is its current in A
            assertEquals(p.point().values().get(1).number(), o.scenario().supply().currentA(), 1e-9);
        }
        assertEquals("30 mm", base.get("cell.gap"), "the base draft is not changed");
        assertNull(SweepPick.at(r, data, 0, 6), "past the last item");
    }

    @Test
    void aClickedPointOfADescendingLineGivesThePointOfThatValue() throws Exception {
        ScenarioDraft base = base();
        List<SweepAxis> axes = List.of(SweepKeys.axis("cell.gap", "40 mm", "20 mm", 3, false));
        SweepResult r = sweep(base, axes);
        XYDataset data = SweepCharts.of(r, SummaryFigure.VOLTAGE_MEAN, null, ChartStyle.light()).getXYPlot()
                .getDataset();
        for (int i = 0; i < data.getItemCount(0); i++) {
            SweepPoint p = SweepPick.at(r, data, 0, i);
            assertNotNull(p);
            // the line's items are sorted by x; each maps to the point of its own gap
            assertEquals(data.getXValue(0, i), p.point().values().get(0).number(), 1e-9);
            assertEquals(data.getYValue(0, i), SummaryFigure.VOLTAGE_MEAN.display(p.summary()), 1e-9);
        }
    }

    @Test
    void aKeyWithoutAFieldLoadsTheWrittenScenario() throws Exception {
        ScenarioDraft base = base();
        List<SweepAxis> axes = List.of(SweepKeys.axis("deposit.short_resistance", "10 mohm", "50 mohm", 2, false));
        SweepResult r = sweep(base, axes);
        SweepPoint p = r.points().get(1);
        assertNull(SweepPick.typed(base, p, axes), "the form has no field for the short's resistance");
        ScenarioDraft d = SweepPick.draftOf(base, p, axes, TinRun.lib(), "tin.toml");
        assertEquals(p.scenario(), DraftCheck.draft(d, TinRun.lib(), "tin.toml").scenario());
        // 50 mohm
        assertEquals(0.05, p.scenario().deposit().shortResistanceOhm(), 1e-15);
    }

    @Test
    void aPointOfAFineRangeGoesIntoTheFormWithFourDigits() throws Exception {
        ScenarioDraft base = base();
        // 10 to 60 mm in 10 values: steps of 5.5556 mm; 0.5 to 4 A/dm2 in 10 values: steps of 0.38889 A/dm2
        List<SweepAxis> axes = List.of(SweepKeys.axis("cell.gap", "10 mm", "60 mm", 10, false),
                SweepKeys.axis("supply.current_density", "0.5 A/dm2", "4 A/dm2", 10, false));
        ScenarioVariants v = ScenarioVariants.ofText(TinRun.lib(), DraftCheck.draft(base, TinRun.lib(), "tin.toml")
                .text(), "tin.toml", List.of(), axes);
        // the point at index 5 across and 2 up: gap 37.7778 mm as the sweep writes it, 1.27778 A/dm2
        List<SweepPoint> one = new Sweep(axes, v, ScenarioRunner.engine(TinRun.lib()))
                .run(2, StudyProgress.NONE, Cancellation.none()).points().stream()
                .filter(p -> Math.abs(p.point().values().get(0).si() - 0.0377778) < 1e-6
                        && Math.abs(p.point().values().get(1).si() * 0.01 - 1.27778) < 1e-4).toList();
        assertEquals(1, one.size());
        SweepPoint p = one.get(0);
        assertEquals("37.7778 mm", p.point().values().get(0).text());
        ScenarioDraft d = SweepPick.draftOf(base, p, axes, TinRun.lib(), "tin.toml");
        assertEquals("37.78 mm", d.get("cell.gap"));
        assertEquals("1.278 A/dm2", d.get(FormFields.SUPPLY_VALUE));
        DraftCheck.Outcome o = DraftCheck.draft(d, TinRun.lib(), "tin.toml");
        // four significant digits move a value by at most half a unit in the fourth digit: 5e-4 relative
        assertEquals(p.scenario().cell().gapM(), o.scenario().cell().gapM(), 5e-4 * p.scenario().cell().gapM());
        assertEquals(p.scenario().supply().currentA(), o.scenario().supply().currentA(),
                5e-4 * p.scenario().supply().currentA());
    }
}
