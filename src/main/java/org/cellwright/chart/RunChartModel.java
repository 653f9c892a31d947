package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;
import org.jfree.data.general.AbstractDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalDataItem;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The plotted data of one run, in display units: time in the model's {@link TimeScale}, concentrations in
 * mol/L, voltages in V, current in A, efficiencies in %, deposits in g, temperature in degrees C, dendrite
 * height in mm.
 *
 * <p>Made to grow while a run plays: {@link #append(List)} adds a batch of points without notifying and
 * then fires one change event per dataset, so a chart redraws once per batch, not once per point. Like
 * every JFreeChart dataset it must be changed on the Swing event thread when it is shown in a window.
 *
 * <p>The cell voltage is broken down into a stack of bands (see {@link #VOLTAGE_PARTS}): each band runs
 * from the sum of the parts below it to that sum plus its own part, so the top of the last band is the sum
 * of all parts, which equals the cell voltage when the engine's breakdown is complete.
 */
public final class RunChartModel {

    /** The parts of the cell voltage, bottom to top of the stack. */
    public static final List<String> VOLTAGE_PARTS = List.of("equilibrium voltage", "anode overpotential",
            "|cathode overpotential|", "ohmic drop, solution", "ohmic drop, bubbles", "contacts and leads");

    /** mol/m3 per mol/L. */
    private static final double MOL_PER_M3_PER_MOL_PER_L = 1000.0;
    /**
     * Smallest highest concentration (mol/m3, i.e. 1 umol/L) for which an anolyte species gets a line: below it
     * the line would lie on the axis of a chart in mol/L.
     */
    static final double ANOLYTE_SHOWN_MOL_PER_M3 = 1e-3;
    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    private static final double ZERO_CELSIUS_K = 273.15;

    private final TimeScale timeScale;
    private final List<String> speciesNames;
    private final List<String> metalSymbols;
    private final List<String> anolyteSpecies;
    private final int[] anolyteIndex;
    private final XYSeriesCollection concentrations = new XYSeriesCollection();
    private final XYSeriesCollection anolyte = new XYSeriesCollection();
    private final YIntervalSeriesCollection voltageParts = new YIntervalSeriesCollection();
    private final XYSeriesCollection cellVoltage = new XYSeriesCollection();
    private final XYSeriesCollection current = new XYSeriesCollection();
    private final XYSeriesCollection efficiency = new XYSeriesCollection();
    private final XYSeriesCollection deposit = new XYSeriesCollection();
    private final XYSeriesCollection temperature = new XYSeriesCollection();
    private final XYSeriesCollection dendrite = new XYSeriesCollection();
    private final List<AbstractDataset> all = List.of(concentrations, anolyte, voltageParts, cellVoltage, current,
            efficiency, deposit, temperature, dendrite);
    private double lastTimeS = Double.NEGATIVE_INFINITY;
    private int points;

    /**
     * An empty model, ready to be appended to.
     *
     * @param timeScale the unit of the time axis
     * @param speciesNames the tracked species, in the order of {@link InstantState#concentrationsMolPerM3()}
     * @param metalSymbols the depositable metals, in the order of {@link TracePoint#depositKg()}
     */
    public RunChartModel(TimeScale timeScale, List<String> speciesNames, List<String> metalSymbols) {
        this(timeScale, speciesNames, metalSymbols, List.of());
    }

    /**
     * An empty model of a divided cell, ready to be appended to.
     *
     * @param timeScale the unit of the time axis
     * @param speciesNames the tracked species, in the order of {@link InstantState#concentrationsMolPerM3()}
     * @param metalSymbols the depositable metals, in the order of {@link TracePoint#depositKg()}
     * @param anolyteSpecies the species of {@code speciesNames} whose anolyte concentration gets a line (empty
     *     for an undivided cell), see {@link #anolyteSpeciesOf(RunResult)}
     */
    public RunChartModel(TimeScale timeScale, List<String> speciesNames, List<String> metalSymbols,
                         List<String> anolyteSpecies) {
        this.timeScale = timeScale;
        this.speciesNames = List.copyOf(speciesNames);
        this.metalSymbols = List.copyOf(metalSymbols);
        this.anolyteSpecies = List.copyOf(anolyteSpecies);
        this.anolyteIndex = new int[this.anolyteSpecies.size()];
        for (String s : this.speciesNames) {
            concentrations.addSeries(new XYSeries(s));
        }
        for (int i = 0; i < anolyteIndex.length; i++) {
            anolyteIndex[i] = this.speciesNames.indexOf(this.anolyteSpecies.get(i));
            if (anolyteIndex[i] < 0) {
                throw new IllegalArgumentException("anolyte species " + this.anolyteSpecies.get(i)
                        + " is not one of " + this.speciesNames);
            }
            anolyte.addSeries(new XYSeries(this.anolyteSpecies.get(i) + " (anolyte)"));
        }
        for (String part : VOLTAGE_PARTS) {
            voltageParts.addSeries(new YIntervalSeries(part));
        }
        cellVoltage.addSeries(new XYSeries("cell voltage"));
        current.addSeries(new XYSeries("current"));
        efficiency.addSeries(new XYSeries("instantaneous efficiency"));
        efficiency.addSeries(new XYSeries("cumulative efficiency"));
        efficiency.addSeries(new XYSeries("share of limiting current"));
        for (String m : this.metalSymbols) {
            deposit.addSeries(new XYSeries(m));
        }
        temperature.addSeries(new XYSeries("bath"));
        dendrite.addSeries(new XYSeries("tip height"));
    }

    /**
     * An empty model for playing back a finished run point by point: same species and metals, time unit
     * chosen from {@link #plannedSpanOf} so that it matches {@link RunCharts#live}'s axis.
     *
     * @param result the run
     * @return the empty model
     */
    public static RunChartModel emptyFor(RunResult result) {
        return new RunChartModel(TimeScale.forSpan(plannedSpanOf(result)), result.speciesNames(),
                result.metalSymbols(), anolyteSpeciesOf(result));
    }

    /**
     * @param result a run
     * @return the species whose anolyte concentration reaches 1 umol/L at some time of the run, in the order of
     *     {@link RunResult#speciesNames()}; empty for an undivided cell
     */
    public static List<String> anolyteSpeciesOf(RunResult result) {
        List<String> names = result.speciesNames();
        double[] max = new double[names.size()];
        boolean divided = false;
        for (TracePoint p : result.trace()) {
            double[] a = p.state().anolyteConcentrationsMolPerM3();
            if (a != null) {
                divided = true;
                for (int j = 0; j < a.length && j < max.length; j++) {
                    max[j] = Math.max(max[j], a[j]);
                }
            }
        }
        List<String> shown = new ArrayList<>();
        for (int j = 0; divided && j < max.length; j++) {
            if (max[j] >= ANOLYTE_SHOWN_MOL_PER_M3) {
                shown.add(names.get(j));
            }
        }
        return shown;
    }

    /**
     * @param result a finished run
     * @return a model holding all of its points, time unit chosen from the run's actual duration
     */
    public static RunChartModel of(RunResult result) {
        return of(result, TimeScale.forSpan(result.summary().durationS()));
    }

    /**
     * @param result a finished run
     * @param timeScale the time unit to use (e.g. that of the run it is compared with)
     * @return a model holding all of its points in that unit
     */
    public static RunChartModel of(RunResult result, TimeScale timeScale) {
        RunChartModel m = new RunChartModel(timeScale, result.speciesNames(), result.metalSymbols(),
                anolyteSpeciesOf(result));
        m.append(result.trace());
        return m;
    }

    /**
     * @param result a run
     * @return the span a live or replayed view of it shows (s): the longer of the planned and the actual
     *     duration
     */
    public static double plannedSpanOf(RunResult result) {
        return Math.max(result.scenario().run().durationS(), result.summary().durationS());
    }

    /**
     * Appends points (which must follow the points already held in time) and notifies each dataset once.
     * Points at or before the last one held are skipped, so a listener that resends a point does no harm.
     *
     * @param batch the next points of the run
     */
    public void append(List<TracePoint> batch) {
        if (batch.isEmpty()) {
            return;
        }
        addAll(batch);
        fireAll();
    }

    /**
     * Replaces every point with {@code trace} (e.g. to scrub back in time) and notifies each dataset once.
     *
     * @param trace the points to show
     */
    public void replaceWith(List<TracePoint> trace) {
        for (AbstractDataset d : all) {
            d.setNotify(false);
        }
        clearSeries();
        addAll(trace);
        fireAll();
    }

    /** Removes every point, notifying each dataset once. */
    public void clear() {
        replaceWith(List.of());
    }

    private void clearSeries() {
        for (XYSeriesCollection c : List.of(concentrations, anolyte, cellVoltage, current, efficiency, deposit, temperature,
                dendrite)) {
            for (int i = 0; i < c.getSeriesCount(); i++) {
                c.getSeries(i).clear();
            }
        }
        for (int i = 0; i < voltageParts.getSeriesCount(); i++) {
            voltageParts.getSeries(i).clear();
        }
        lastTimeS = Double.NEGATIVE_INFINITY;
        points = 0;
    }

    private void addAll(List<TracePoint> batch) {
        for (TracePoint p : batch) {
            if (p.timeS() > lastTimeS) {
                add(p);
                lastTimeS = p.timeS();
                points++;
            }
        }
    }

    private void fireAll() {
        for (AbstractDataset d : all) {
            d.setNotify(true);
        }
    }

    private void add(TracePoint p) {
        InstantState s = p.state();
        double x = timeScale.fromSeconds(s.timeS());
        double[] c = s.concentrationsMolPerM3();
        for (int j = 0; j < c.length && j < concentrations.getSeriesCount(); j++) {
            concentrations.getSeries(j).add(x, c[j] / MOL_PER_M3_PER_MOL_PER_L, false);
        }
        double[] a = s.anolyteConcentrationsMolPerM3();
        for (int k = 0; a != null && k < anolyteIndex.length; k++) {
            if (anolyteIndex[k] < a.length) {
                anolyte.getSeries(k).add(x, a[anolyteIndex[k]] / MOL_PER_M3_PER_MOL_PER_L, false);
            }
        }
        double[] parts = voltageParts(s);
        double below = 0;
        for (int k = 0; k < parts.length; k++) {
            double top = below + parts[k];
            voltageParts.getSeries(k).add(new YIntervalDataItem(x, top, below, top), false);
            below = top;
        }
        cellVoltage.getSeries(0).add(x, s.cellVoltageV(), false);
        current.getSeries(0).add(x, s.currentA(), false);
        if (s.currentA() > 0) {
            efficiency.getSeries(0).add(x, 100 * s.targetEfficiency(), false);
        }
        if (p.chargeC() > 0) {
            efficiency.getSeries(1).add(x, 100 * p.cumulativeEfficiency(), false);
        }
        if (s.currentA() > 0 && !s.shorted()) {
            efficiency.getSeries(2).add(x, 100 * s.targetLimitRatio(), false);
        }
        double[] kg = p.depositKg();
        for (int m = 0; m < kg.length && m < deposit.getSeriesCount(); m++) {
            deposit.getSeries(m).add(x, kg[m] * 1000, false);
        }
        temperature.getSeries(0).add(x, s.temperatureK() - ZERO_CELSIUS_K, false);
        dendrite.getSeries(0).add(x, s.dendriteHeightM() * 1000, false);
    }

    /**
     * The parts of the cell voltage at one instant, in the order of {@link #VOLTAGE_PARTS} (V). The cathode
     * overpotential enters with its sign turned (it is negative while the cathode reduces), the equilibrium
     * voltage keeps its sign (it can be negative, e.g. when the cathode reduces a strong oxidant).
     *
     * @param s the instant
     * @return equilibrium voltage, anode overpotential, minus the cathode overpotential, ohmic drop in the
     *     solution, extra drop from bubbles, drop across contacts and leads
     */
    public static double[] voltageParts(InstantState s) {
        return new double[] {s.equilibriumVoltageV(), s.anodeOverpotentialV(), -s.cathodeOverpotentialV(),
                s.ohmicSolutionV(), s.ohmicBubblesV(), s.ohmicContactsV()};
    }

    /** @return the unit of the time axis */
    public TimeScale timeScale() {
        return timeScale;
    }

    /** @return the tracked species, one concentration series each */
    public List<String> speciesNames() {
        return speciesNames;
    }

    /** @return the species drawn for the anolyte of a divided cell (empty when undivided) */
    public List<String> anolyteSpecies() {
        return anolyteSpecies;
    }

    /**
     * @return the anolyte's concentration of each of {@link #anolyteSpecies()} (mol/L), one series each, keyed
     *     "Fe2+ (anolyte)"; no series for an undivided cell
     */
    public XYSeriesCollection anolyte() {
        return anolyte;
    }

    /** @return the depositable metals, one deposit series each */
    public List<String> metalSymbols() {
        return metalSymbols;
    }

    /** @return how many points the model holds */
    public int pointCount() {
        return points;
    }

    /** @return the time of the last point held (s), or negative infinity when empty */
    public double lastTimeS() {
        return lastTimeS;
    }

    /** @return concentration of each species (mol/L), one series per species */
    public XYSeriesCollection concentrations() {
        return concentrations;
    }

    /** @return the stacked voltage parts (V): series k runs from the sum of parts below k to that plus part k */
    public YIntervalSeriesCollection voltageParts() {
        return voltageParts;
    }

    /** @return the cell voltage (V) */
    public XYSeriesCollection cellVoltage() {
        return cellVoltage;
    }

    /** @return the current (A) */
    public XYSeriesCollection current() {
        return current;
    }

    /**
     * @return instantaneous (series 0) and cumulative (series 1) current efficiency (%), and the target metal's
     *     partial current as a share of its limiting current (series 2, %; it sets the deposit's form); an
     *     instant without current, or without charge passed yet, has no efficiency and gets no point
     */
    public XYSeriesCollection efficiency() {
        return efficiency;
    }

    /** @return deposit of each metal (g), one series per metal */
    public XYSeriesCollection deposit() {
        return deposit;
    }

    /** @return bath temperature (degrees C) */
    public XYSeriesCollection temperature() {
        return temperature;
    }

    /** @return dendrite tip height above the cathode (mm) */
    public XYSeriesCollection dendrite() {
        return dendrite;
    }

    /** @return every dataset of the model (for listeners) */
    public List<AbstractDataset> datasets() {
        return new ArrayList<>(all);
    }
}
