package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.cellwright.sim.RunSummary;
import org.cellwright.study.ColumnFit;
import org.cellwright.study.FitOutcome;
import org.cellwright.study.FittedParameter;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.LogFitResult;

/**
 * Writes a fit to a measured log as JSON, SI values throughout:
 * {@code {"parameters": {key: {"value": v, "ci95": [lo, hi], ...}}, "rmse": {column: v}, "iterations": n, ...}}.
 * An interval end the data do not bound is null. More keys than the contract's follow: the start values, the
 * standard errors, the statistics, and where the charge went in the fitted run.
 */
public final class FitJsonWriter {

    private FitJsonWriter() {
    }

    /**
     * @param scenario the scenario's name as the user gave it
     * @param r the fit
     * @param starts the free parameters with their starting values
     * @return the fit as an ordered map, ready for JSON
     */
    public static Map<String, Object> fitMap(String scenario, LogFitResult r, List<FreeParameter> starts) {
        FitOutcome o = r.outcome();
        Map<String, Object> m = new LinkedHashMap<>();
        Map<String, Object> params = new LinkedHashMap<>();
        for (int j = 0; j < o.parameters().size(); j++) {
            FittedParameter p = o.parameters().get(j);
            Map<String, Object> pm = new LinkedHashMap<>();
            pm.put("value", p.value());
            List<Double> ci = new ArrayList<>();
            ci.add(finite(p.low()));
            ci.add(finite(p.high()));
            pm.put("ci95", ci);
            pm.put("start", starts.get(j).start());
            pm.put("scale", p.scale().name().toLowerCase(java.util.Locale.ROOT));
            pm.put("standard_error", finite(p.standardError()));
            params.put(p.key(), pm);
        }
        m.put("parameters", params);
        Map<String, Double> rmse = new LinkedHashMap<>();
        r.rmse().forEach((k, v) -> rmse.put(k, finite(v)));
        m.put("rmse", rmse);
        m.put("iterations", o.iterations());
        m.put("converged", o.converged());
        m.put("scenario", scenario);
        m.put("log", r.log().source());
        m.put("engine_runs", o.evaluations());
        m.put("observations", o.observations());
        m.put("degrees_of_freedom", o.degreesOfFreedom());
        m.put("residual_sd", o.residualSd());
        Map<String, Object> cols = new LinkedHashMap<>();
        for (ColumnFit c : r.columns()) {
            Map<String, Object> cm = new LinkedHashMap<>();
            cm.put("values", c.timesS().length);
            cm.put("weight", c.weight());
            cm.put("scale", c.scale());
            cols.put(c.series().column(), cm);
        }
        m.put("columns", cols);
        List<List<Double>> corr = new ArrayList<>();
        for (double[] row : o.correlation()) {
            List<Double> rowList = new ArrayList<>();
            for (double v : row) {
                rowList.add(finite(v));
            }
            corr.add(rowList);
        }
        m.put("correlation", corr);
        RunSummary s = r.fittedRun().summary();
        m.put("fitted_current_efficiency", s.currentEfficiency());
        m.put("fitted_charge_by_reaction_C", s.reactionChargeC());
        m.put("elapsed_s", r.elapsedS());
        return m;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /**
     * @param scenario the scenario's name
     * @param r the fit
     * @param starts the free parameters with their starting values
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(String scenario, LogFitResult r, List<FreeParameter> starts, OutputStream out)
            throws IOException {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        mapper.writeValue(out, fitMap(scenario, r, starts));
        out.write('\n');
        out.flush();
    }
}
