package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.HashSet;
import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunResult;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.junit.jupiter.api.Test;

/**
 * Species and metals keep their colour by name: in every run, a pinned run, the anolyte of a divided cell
 * and the exports, and no two series of one chart share a hue while the palette has hues left.
 */
class SeriesHuesTest {

    /** The tracked species of the shipped scenarios, in the engine's order (from their CSV headers). */
    private static final List<List<String>> SHIPPED_BATHS = List.of(
            List.of("Cu2+", "H+", "Fe2+", "Fe3+", "SO4^2-", "OH-"),
            List.of("Cu2+", "H+", "SO4^2-", "OH-"),
            List.of("Ag+", "H+", "NO3-", "OH-"),
            List.of("Sn2+", "Fe2+", "H+", "Cl-", "OH-", "Sn4+", "Fe3+", "Cl2"),
            List.of("Zn2+", "H+", "SO4^2-", "OH-"));

    @Test
    void everyShippedBathGetsItsPreferredAndDistinctHues() {
        for (List<String> bath : SHIPPED_BATHS) {
            Map<String, Integer> slots = SeriesHues.assign(bath);
            assertEquals(bath, List.copyOf(slots.keySet()), "in the order given");
            assertEquals(bath.size(), new HashSet<>(slots.values()).size(), "distinct hues: " + slots);
            for (String s : bath) {
                assertEquals(SeriesHues.PREFERRED.get(s), slots.get(s), s + " in " + bath);
            }
        }
        // the user's report: H+ and a copper ion in similar orange and gold; H+ is vermillion, copper ions blue/sky
        Map<String, Integer> copper = SeriesHues.assign(List.of("Cu2+", "Cu+", "H+", "SO4^2-"));
        assertEquals(1, copper.get("H+"));
        assertEquals(5, copper.get("Cu+"));
    }

    @Test
    void aSpeciesKeepsItsHueFromBathToBath() {
        // H+ is vermillion and OH- graphite whatever else is in the bath
        for (List<String> bath : SHIPPED_BATHS) {
            assertEquals(1, SeriesHues.assign(bath).get("H+"));
            assertEquals(7, SeriesHues.assign(bath).get("OH-"));
        }
        // the order the engine lists the species in does not matter
        assertEquals(SeriesHues.assign(List.of("Sn2+", "H+", "Cl-")).get("Cl-"),
                SeriesHues.assign(List.of("Cl-", "H+", "Sn2+")).get("Cl-"));
    }

    @Test
    void twoSpeciesThatPreferOneHueDoNotShareIt() {
        // copper in a tin liquor: both metal ions prefer blue; tin claims it first, copper takes a free hue
        Map<String, Integer> s = SeriesHues.assign(List.of("Sn2+", "Cu2+", "H+", "Cl-"));
        assertEquals(0, s.get("Sn2+"));
        assertNotEquals(0, s.get("Cu2+"));
        assertEquals(4, new HashSet<>(s.values()).size());
        // an unknown species takes a free hue too
        Map<String, Integer> u = SeriesHues.assign(List.of("Sn2+", "H+", "Xy3+"));
        assertEquals(3, new HashSet<>(u.values()).size(), u.toString());
    }

    @Test
    void pinningARunNeverRecoloursTheLiveSeries() {
        List<String> tin = List.of("Sn2+", "Fe2+", "H+", "Cl-", "OH-", "Sn4+", "Fe3+", "Cl2");
        // sulfate prefers green, which tin's chloride holds; copper prefers blue, which tin(II) holds
        Map<String, Integer> both = SeriesHues.assign(tin, List.of("Cu2+", "H+", "SO4^2-", "OH-"));
        for (String s : tin) {
            assertEquals(SeriesHues.assign(tin).get(s), both.get(s), s);
        }
        assertEquals(10, new HashSet<>(both.values()).size(), both.toString());
        assertTrue(both.get("Cu2+") >= 8 && both.get("SO4^2-") >= 8, both.toString());
        // with hues left, a pinned-only species takes its own preferred hue
        assertEquals(2, SeriesHues.assign(List.of("Cu2+", "H+"), List.of("SO4^2-")).get("SO4^2-"));
    }

    @Test
    void beyondEightSeriesAHueRepeatsWithAnotherStroke() {
        List<String> many = List.of("Sn2+", "Sn4+", "Fe2+", "Fe3+", "H+", "Cl-", "OH-", "Cl2", "Cu2+", "Pb2+");
        Map<String, Integer> s = SeriesHues.assign(many);
        assertEquals(many.size(), new HashSet<>(s.values()).size(), "every slot its own: " + s);
        ChartStyle style = ChartStyle.light();
        for (String n : many) {
            int slot = s.get(n);
            BasicStroke stroke = (BasicStroke) style.seriesStroke(slot);
            assertEquals(slot >= style.hueCount(), stroke.getDashArray() != null, n + " slot " + slot);
        }
        // the repeated strokes are neither the reference's dashes nor the anolyte's dots
        float[] repeat = ((BasicStroke) style.seriesStroke(8)).getDashArray();
        assertFalse(java.util.Arrays.equals(repeat, ((BasicStroke) style.referenceStroke()).getDashArray()));
        assertFalse(java.util.Arrays.equals(repeat, ((BasicStroke) style.anolyteStroke()).getDashArray()));
    }

    @Test
    void thePinnedRunDrawsEachSpeciesInItsOwnFadedHue() {
        // a copper run pinned under a tin run: the charts share no species but H+, SO4/Cl- and OH-
        RunResult tin = ReportFixture.run("tin-stripping-liquor.toml", "run.duration=\"20 min\"");
        RunResult copper = ReportFixture.run("copper-plating-rundown.toml", "run.duration=\"20 min\"");
        for (ChartStyle style : new ChartStyle[] {ChartStyle.light(), ChartStyle.dark()}) {
            RunCharts c = RunCharts.of(tin, style);
            c.setReference(copper, "copper");
            XYPlot p = c.concentrations().getXYPlot();
            for (int i = 0; i < copper.speciesNames().size(); i++) {
                String s = copper.speciesNames().get(i);
                Color ref = (Color) p.getRenderer(RunPlots.REFERENCE).getSeriesPaint(i);
                assertEquals(style.reference(c.speciesColour(s)), ref, s);
                int live = tin.speciesNames().indexOf(s);
                if (live >= 0) {
                    assertEquals(c.speciesColour(s), p.getRenderer(RunPlots.LIVE).getSeriesPaint(live), s);
                }
            }
            // no two pinned series look alike: each differs from every other in colour or in stroke (the
            // tin bath takes all eight hues, so copper's Cu2+ and SO4^2- repeat one with another dash)
            XYItemRenderer ref = p.getRenderer(RunPlots.REFERENCE);
            for (int i = 0; i < copper.speciesNames().size(); i++) {
                for (int j = i + 1; j < copper.speciesNames().size(); j++) {
                    assertFalse(ref.getSeriesPaint(i).equals(ref.getSeriesPaint(j))
                            && ref.getSeriesStroke(i).equals(ref.getSeriesStroke(j)),
                            copper.speciesNames().get(i) + " and " + copper.speciesNames().get(j));
                }
            }
            // tin's own colours do not depend on the pinned run for species both runs hold
            assertEquals(RunCharts.of(tin, style).speciesColour("H+"), c.speciesColour("H+"));
            assertEquals(RunCharts.of(tin, style).speciesColour("Sn2+"), c.speciesColour("Sn2+"));
        }
    }

    @Test
    void theAnolyteOfADividedCellIsDrawnDottedInItsSpeciesColours() {
        // source: scenarios/tin-divided-cell.toml: anolyte of Fe2+ 45 g/L, H+ 1 mol/L, Cl- 2.612 mol/L; the
        // graphite anode oxidises Fe2+ to Fe3+ there
        RunResult r = ReportFixture.run("tin-divided-cell.toml", "run.duration=\"1 h\"");
        RunCharts c = RunCharts.of(r, ChartStyle.light());
        List<String> anolyte = c.model().anolyteSpecies();
        assertTrue(anolyte.containsAll(List.of("Fe2+", "Fe3+", "H+", "Cl-")), anolyte.toString());
        assertFalse(anolyte.contains("Sn2+"), "no tin crosses the anion membrane: " + anolyte);
        XYPlot p = c.concentrations().getXYPlot();
        assertNotNull(p.getDataset(RunPlots.ANOLYTE));
        assertEquals(anolyte.size(), p.getDataset(RunPlots.ANOLYTE).getSeriesCount());
        int fe2 = anolyte.indexOf("Fe2+");
        // 45 g/L of Fe2+ at the start: 45 / 55.845 = 0.806 mol/L (source: IUPAC 2021 standard atomic weight of Fe)
        assertEquals(0.806, p.getDataset(RunPlots.ANOLYTE).getYValue(fe2, 0), 0.002);
        for (int i = 0; i < anolyte.size(); i++) {
            assertEquals(c.speciesColour(anolyte.get(i)), p.getRenderer(RunPlots.ANOLYTE).getSeriesPaint(i));
            assertEquals(ChartStyle.light().anolyteStroke(), p.getRenderer(RunPlots.ANOLYTE).getSeriesStroke(i));
        }
        LegendItemCollection legend = p.getLegendItems();
        assertEquals(r.speciesNames().size() + 1, legend.getItemCount(), "each species once, then the anolyte");
        assertEquals("anolyte (dotted)", legend.get(legend.getItemCount() - 1).getLabel());
        // an undivided cell has no anolyte series and its usual legend
        RunCharts plain = RunCharts.of(ReportFixture.run("tin-stripping-liquor.toml", "run.duration=\"20 min\""),
                ChartStyle.light());
        assertTrue(plain.model().anolyteSpecies().isEmpty());
        assertEquals(null, plain.concentrations().getXYPlot().getDataset(RunPlots.ANOLYTE));
    }
}
