package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.cellwright.study.Percentiles;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.UncertainInput;

/**
 * Writes the summary JSON of a run with a spread study: the nominal run's summary ({@link RunJsonWriter}),
 * plus a {@code spread} object: {@code samples}, {@code ran}, {@code seed}, the {@code inputs} sampled with
 * their distributions, {@code failures}, and for each figure its {@code p5}, {@code p50} and {@code p95} under
 * the key and unit the summary uses ({@code specific_energy_kWh_per_kg}, {@code current_efficiency} as a
 * fraction, {@code target_deposit_g}, {@code cell_voltage_mean_V}, ...).
 */
public final class SpreadJsonWriter {

    private record Key(String name, DoubleUnaryOperator fromSi) {
    }

    private static final Map<SummaryFigure, Key> KEYS = Map.of(
            SummaryFigure.SPECIFIC_ENERGY, new Key("specific_energy_kWh_per_kg", v -> v / 3.6e6),
            SummaryFigure.EFFICIENCY, new Key("current_efficiency", v -> v),
            SummaryFigure.DEPOSIT, new Key("target_deposit_g", v -> v * 1000),
            SummaryFigure.PURITY, new Key("target_purity", v -> v),
            SummaryFigure.VOLTAGE_MEAN, new Key("cell_voltage_mean_V", v -> v),
            SummaryFigure.VOLTAGE_MAX, new Key("cell_voltage_max_V", v -> v),
            SummaryFigure.ENERGY, new Key("energy_Wh", v -> v / 3600),
            SummaryFigure.DURATION, new Key("duration_s", v -> v),
            SummaryFigure.TEMPERATURE_MAX, new Key("temperature_max_C", v -> v - 273.15));

    private SpreadJsonWriter() {
    }

    /**
     * @param s the study
     * @return the {@code spread} object as an ordered map
     */
    public static Map<String, Object> spreadMap(SpreadResult s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("samples", s.samples());
        m.put("ran", s.ran());
        m.put("seed", s.seed());
        List<Map<String, Object>> inputs = new ArrayList<>();
        for (UncertainInput in : UncertainInput.values()) {
            Map<String, Object> i = new LinkedHashMap<>();
            i.put("input", in.description());
            i.put("distribution", in.distribution());
            inputs.add(i);
        }
        m.put("inputs", inputs);
        m.put("failures", s.failures());
        Map<String, Object> figures = new LinkedHashMap<>();
        for (SummaryFigure f : SummaryFigure.values()) {
            Key k = KEYS.get(f);
            Percentiles p = s.figures().get(f);
            Map<String, Object> v = new LinkedHashMap<>();
            v.put("p5", finite(k.fromSi().applyAsDouble(p.p5())));
            v.put("p50", finite(k.fromSi().applyAsDouble(p.p50())));
            v.put("p95", finite(k.fromSi().applyAsDouble(p.p95())));
            figures.put(k.name(), v);
        }
        m.put("figures", figures);
        return m;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /**
     * @param label the scenario's name
     * @param s the study
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(String label, SpreadResult s, OutputStream out) throws IOException {
        Map<String, Object> m = RunJsonWriter.summaryMap(label, s.nominal());
        m.put("spread", spreadMap(s));
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        mapper.writeValue(out, m);
        out.write('\n');
        out.flush();
    }
}
