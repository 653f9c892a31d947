package org.cellwright.sim;

import java.util.List;

import org.cellwright.cell.Scenario;

/**
 * The outcome of one run: the time series at the output interval, the event log and the summary.
 *
 * @param scenario the scenario that was run
 * @param speciesNames the tracked species, in the order of the concentration arrays
 * @param metalSymbols the depositable metals, in the order of the deposit arrays
 * @param cathodeReactions the cathode reactions, in the order of the partial-current arrays
 * @param anodeReactions the anode reactions, likewise
 * @param trace the time series
 * @param events what happened, in time order
 * @param summary the figures
 * @param finalState the state vector at the end (for conservation checks)
 * @param rhsEvaluations how many times the rates were evaluated (cost)
 */
public record RunResult(Scenario scenario, List<String> speciesNames, List<String> metalSymbols,
                        List<String> cathodeReactions, List<String> anodeReactions, List<TracePoint> trace,
                        List<RunEvent> events, RunSummary summary, double[] finalState, long rhsEvaluations) {
}
