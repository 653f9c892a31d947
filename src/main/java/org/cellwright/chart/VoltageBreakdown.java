package org.cellwright.chart;

import java.util.List;
import java.util.function.ToDoubleFunction;

import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * The cell voltage taken apart at the start of a run, averaged over it (in time), and at its end: the
 * equilibrium voltage (current-weighted over each electrode's reactions), the anode and cathode overpotentials (as magnitudes), and the
 * ohmic drops across the solution, the gas in the gap and the contacts. The parts add up to the cell voltage.
 *
 * @param parts the parts in order, each with its values
 * @param cellVoltage the cell voltage at the start, averaged, and at the end (V)
 */
public record VoltageBreakdown(List<Part> parts, double[] cellVoltage) {

    /**
     * One part of the cell voltage.
     *
     * @param name what it is, in words
     * @param start at the start (V)
     * @param mean averaged over the run's time (V)
     * @param end at the end (V)
     */
    public record Part(String name, double start, double mean, double end) {
    }

    /**
     * @param r a run
     * @return its voltage breakdown
     */
    public static VoltageBreakdown of(RunResult r) {
        List<Part> parts = List.of(
                part(r, "equilibrium voltage", InstantState::equilibriumVoltageV),
                part(r, "anode overpotential", s -> Math.abs(s.anodeOverpotentialV())),
                part(r, "cathode overpotential", s -> Math.abs(s.cathodeOverpotentialV())),
                part(r, "ohmic drop, solution", InstantState::ohmicSolutionV),
                part(r, "ohmic drop, gas in the gap", InstantState::ohmicBubblesV),
                part(r, "ohmic drop, contacts and leads", InstantState::ohmicContactsV));
        Part cell = part(r, "cell voltage", InstantState::cellVoltageV);
        return new VoltageBreakdown(parts, new double[] {cell.start(), cell.mean(), cell.end()});
    }

    private static Part part(RunResult r, String name, ToDoubleFunction<InstantState> f) {
        List<TracePoint> t = r.trace();
        double start = f.applyAsDouble(t.get(0).state());
        double end = f.applyAsDouble(t.get(t.size() - 1).state());
        double span = t.get(t.size() - 1).timeS() - t.get(0).timeS();
        if (t.size() < 2 || span <= 0) {
            return new Part(name, start, start, end);
        }
        double area = 0;
        for (int i = 1; i < t.size(); i++) {
            double dt = t.get(i).timeS() - t.get(i - 1).timeS();
            area += 0.5 * dt * (f.applyAsDouble(t.get(i).state()) + f.applyAsDouble(t.get(i - 1).state()));
        }
        return new Part(name, start, area / span, end);
    }
}
