package org.cellwright.ui;

import java.util.List;
import java.util.Locale;

import org.cellwright.chart.RunChartModel;
import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.TracePoint;

/**
 * What a chart's tooltip says at the time under the mouse: the values of that chart's curves at the nearest
 * recorded point, with units, and where they come from.
 */
final class ChartReadout {

    /** The six charts, in the order of {@code RunCharts.all()}. */
    enum Chart { COMPOSITION, VOLTAGE, CURRENT, DEPOSIT, TEMPERATURE, DENDRITE }

    private ChartReadout() {
    }

    /**
     * @param trace the points shown, in time order (not empty)
     * @param timeS a time (s)
     * @return the shown point nearest that time
     */
    static TracePoint nearest(List<TracePoint> trace, double timeS) {
        int lo = 0;
        int hi = trace.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (trace.get(mid).timeS() < timeS) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        if (lo > 0 && Math.abs(trace.get(lo - 1).timeS() - timeS) <= Math.abs(trace.get(lo).timeS() - timeS)) {
            return trace.get(lo - 1);
        }
        return trace.get(lo);
    }

    /**
     * @param chart which chart
     * @param p the point
     * @param species the species names, in the order of the concentrations
     * @param metals the metal symbols, in the order of the deposits
     * @param gapM the gap (m)
     * @return the tooltip, as simple HTML
     */
    static String text(Chart chart, TracePoint p, List<String> species, List<String> metals, double gapM) {
        InstantState s = p.state();
        StringBuilder sb = new StringBuilder("<html><b>at ").append(RunClock.format(s.timeS())).append("</b><br>");
        switch (chart) {
            case COMPOSITION -> {
                double[] c = s.concentrationsMolPerM3();
                for (int i = 0; i < c.length && i < species.size(); i++) {
                    sb.append(String.format(Locale.ROOT, "%s: %.4g mol/L<br>", species.get(i), c[i] / 1000));
                }
                double[] a = s.anolyteConcentrationsMolPerM3();
                for (int i = 0; a != null && i < a.length && i < species.size(); i++) {
                    if (a[i] >= 1e-3) {
                        sb.append(String.format(Locale.ROOT, "%s in the anolyte: %.4g mol/L<br>", species.get(i),
                                a[i] / 1000));
                    }
                }
                sb.append(source("bulk concentrations from the species balances"));
            }
            case VOLTAGE -> {
                double[] parts = RunChartModel.voltageParts(s);
                sb.append(String.format(Locale.ROOT, "cell voltage: %.3f V<br>", s.cellVoltageV()));
                for (int i = 0; i < parts.length; i++) {
                    sb.append(String.format(Locale.ROOT, "%s: %.3f V<br>", RunChartModel.VOLTAGE_PARTS.get(i), parts[i]));
                }
                sb.append(s.supplyLimited() ? "the supply holds its limit<br>" : "");
                sb.append(source("Nernst equilibrium, Butler-Volmer overpotentials, ohmic drop with Bruggeman bubbles"));
            }
            case CURRENT -> {
                sb.append(String.format(Locale.ROOT, "current: %.4g A<br>", s.currentA()));
                sb.append(String.format(Locale.ROOT, "efficiency now: %.1f %%<br>", 100 * s.targetEfficiency()));
                sb.append(String.format(Locale.ROOT, "efficiency so far: %.1f %%<br>", 100 * p.cumulativeEfficiency()));
                sb.append(String.format(Locale.ROOT, "at %.0f %% of the limiting current<br>", 100 * s.targetLimitRatio()));
                sb.append(source("share of the current that deposits the target metal"));
            }
            case DEPOSIT -> {
                double[] kg = p.depositKg();
                for (int i = 0; i < kg.length && i < metals.size(); i++) {
                    sb.append(String.format(Locale.ROOT, "%s: %.4g g<br>", metals.get(i), kg[i] * 1000));
                }
                sb.append(source("Faraday's law on each deposition reaction's charge"));
            }
            case TEMPERATURE -> {
                sb.append(String.format(Locale.ROOT, "bath: %.2f C<br>", s.temperatureK() - 273.15));
                sb.append(String.format(Locale.ROOT, "conductivity: %.4g S/m<br>", s.conductivitySPerM()));
                sb.append(source("heat balance: Joule and reaction heat against losses to the air"));
            }
            case DENDRITE -> {
                // below a picometre the tip is nothing: no minus sign from round-off
                double tipMm = s.dendriteHeightM() < 1e-12 ? 0 : s.dendriteHeightM() * 1000;
                sb.append("tip height: ").append(WhatIf.digits(tipMm)).append(" mm<br>");
                sb.append("gap: ").append(WhatIf.digits(gapM * 1000)).append(" mm<br>");
                sb.append(source("the engine's deposit model"));
            }
        }
        return sb.append("</html>").toString();
    }

    private static String source(String what) {
        return "<i>" + what + " (docs/model.md)</i>";
    }
}
