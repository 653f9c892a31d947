package org.cellwright.study;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.cellwright.sim.RunResult;

/**
 * A scenario fitted to a measured log: the parameters, each column beside the fitted model, and the fitted
 * run itself (whose partial currents say where the charge went).
 *
 * @param log the measured log
 * @param outcome the fitted values, intervals and statistics
 * @param columns each measured column beside the model, in log order
 * @param fittedScenario the scenario at the fitted values, run over the log's span
 * @param fittedRun its run
 * @param elapsedS wall-clock time of the fit (s)
 */
public record LogFitResult(MeasuredLog log, FitOutcome outcome, List<ColumnFit> columns, Scenario fittedScenario,
                           RunResult fittedRun, double elapsedS) {

    public LogFitResult {
        columns = List.copyOf(columns);
    }

    /** @return root mean square residual of each column in its own unit, in log order */
    public Map<String, Double> rmse() {
        Map<String, Double> m = new LinkedHashMap<>();
        columns.forEach(c -> m.put(c.series().column(), c.rmse()));
        return m;
    }
}
