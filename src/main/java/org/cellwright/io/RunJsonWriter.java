package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;

/**
 * Writes a run's summary as JSON with the keys of the contract (SI units in the key names), plus the event
 * log and the charge passed by each electrode reaction.
 */
public final class RunJsonWriter {

    /** Molar volume of an ideal gas at 0 C and 1 atm (L/mol), CODATA 2018. */
    static final double STP_L_PER_MOL = 22.41396954;
    /** Molar volume of an ideal gas at 25 C and 1 atm (L/mol), from R T / p with CODATA 2018 R. */
    static final double ROOM_L_PER_MOL = 24.46536;

    private RunJsonWriter() {
    }

    /**
     * @param label the scenario's name as the user gave it (file name)
     * @param r the run
     * @return the summary as an ordered map, ready for JSON
     */
    public static Map<String, Object> summaryMap(String label, RunResult r) {
        RunSummary s = r.summary();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("scenario", label);
        m.put("title", r.scenario().title());
        m.put("stop_reason", s.stopReason());
        m.put("duration_s", s.durationS());
        m.put("charge_C", s.chargeC());
        m.put("charge_Ah", s.chargeC() / 3600);
        m.put("target_metal", s.targetMetal());
        m.put("deposit_g", scaled(s.depositKg(), 1000));
        m.put("deposit_total_g", s.depositTotalKg() * 1000);
        m.put("deposit_corroded_g", scaled(s.corrodedKg(), 1000));
        m.put("purity", s.purity());
        m.put("current_efficiency", s.currentEfficiency());
        m.put("energy_Wh", s.energyJ() / 3600);
        m.put("specific_energy_kWh_per_kg", finite(s.specificEnergyJPerKg() / 3.6e6));
        m.put("cell_voltage_V", ordered("start", s.cellVoltageStartV(), "end", s.cellVoltageEndV(),
                "mean", s.cellVoltageMeanV(), "max", s.cellVoltageMaxV()));
        m.put("final_concentration_mol_per_L", scaled(s.finalConcentrationMolPerM3(), 1e-3));
        if (!s.finalAnolyteConcentrationMolPerM3().isEmpty()) {
            m.put("final_anolyte_concentration_mol_per_L", scaled(s.finalAnolyteConcentrationMolPerM3(), 1e-3));
        }
        m.put("gas_L", scaled(s.gasMol(), STP_L_PER_MOL));
        m.put("gas_L_at_25C", scaled(s.gasMol(), ROOM_L_PER_MOL));
        m.put("short_circuit_s", s.shortCircuitS());
        m.put("short_circuit_forecast_s", s.shortCircuitForecastS());
        m.put("morphology_final", s.morphologyFinal());
        m.put("compartments", r.scenario().cell().compartments().kind().key());
        m.put("temperature_C", ordered("start", s.temperatureStartK() - 273.15, "end", s.temperatureEndK() - 273.15,
                "max", s.temperatureMaxK() - 273.15));
        m.put("charge_by_reaction_C", s.reactionChargeC());
        m.put("warnings", s.warnings());
        List<Map<String, Object>> events = r.events().stream().map(RunJsonWriter::event).toList();
        m.put("events", events);
        return m;
    }

    private static Map<String, Object> event(RunEvent e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("time_s", e.timeS());
        m.put("kind", e.kind().name().toLowerCase(java.util.Locale.ROOT));
        m.put("message", e.message());
        return m;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    private static Map<String, Double> scaled(Map<String, Double> in, double factor) {
        Map<String, Double> out = new LinkedHashMap<>();
        in.forEach((k, v) -> out.put(k, v * factor));
        return out;
    }

    private static Map<String, Double> ordered(Object... kv) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            out.put((String) kv[i], (Double) kv[i + 1]);
        }
        return out;
    }

    /**
     * @param label the scenario's name
     * @param r the run
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(String label, RunResult r, OutputStream out) throws IOException {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        mapper.writeValue(out, summaryMap(label, r));
        out.write('\n');
        out.flush();
    }
}
