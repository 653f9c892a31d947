package org.cellwright.study;

import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.ScenarioChemistry;
import org.cellwright.sim.TracePoint;

/**
 * A logged quantity as the engine computed it over a run: its values at the run's output times, read the
 * way the log measures it, and linear interpolation at any time within the run.
 *
 * @param timesS the run's output times (s), increasing
 * @param values the quantity at those times, in the log's unit
 */
public record ModelCurve(double[] timesS, double[] values) {

    /**
     * @param run a finished run
     * @param series the logged column to read
     * @param library the chemistry the run used (the scenario's overrides are applied here)
     * @return the curve
     * @throws IllegalArgumentException when the run does not track the column's species
     */
    public static ModelCurve of(RunResult run, LogSeries series, ChemLibrary library) {
        int species = -1;
        double molarMass = Double.NaN;
        if (series.quantity().isConcentration()) {
            species = run.speciesNames().indexOf(series.species());
            if (species < 0) {
                throw new IllegalArgumentException("the log has " + series.column() + " but the scenario's bath has no "
                        + series.species() + " (it tracks " + String.join(", ", run.speciesNames()) + ")");
            }
            molarMass = ScenarioChemistry.apply(library, run.scenario()).findSpecies(series.species())
                    .map(Species::molarMassKgPerMol).orElse(Double.NaN);
        }
        List<TracePoint> trace = run.trace();
        double[] t = new double[trace.size()];
        double[] v = new double[trace.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = trace.get(i).timeS();
            v[i] = series.quantity().read(trace.get(i), species, molarMass);
        }
        return new ModelCurve(t, v);
    }

    /**
     * @param tS a time within the run (s); times a hair beyond its ends take the end values
     * @return the quantity at that time, interpolated linearly between output points
     * @throws IllegalArgumentException when the time lies outside the run
     */
    public double at(double tS) {
        int n = timesS.length;
        double slack = 1e-9 * Math.max(1, timesS[n - 1]);
        if (tS < timesS[0] - slack || tS > timesS[n - 1] + slack) {
            throw new IllegalArgumentException("time " + tS + " s lies outside the run (0 to " + timesS[n - 1] + " s)");
        }
        int hi = java.util.Arrays.binarySearch(timesS, tS);
        if (hi >= 0) {
            return values[hi];
        }
        hi = -hi - 1;
        if (hi == 0) {
            return values[0];
        }
        if (hi >= n) {
            return values[n - 1];
        }
        double f = (tS - timesS[hi - 1]) / (timesS[hi] - timesS[hi - 1]);
        return values[hi - 1] + f * (values[hi] - values[hi - 1]);
    }
}
