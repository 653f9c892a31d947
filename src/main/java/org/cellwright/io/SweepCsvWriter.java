package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.sim.RunSummary;
import org.cellwright.study.AxisValue;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;

/**
 * Writes a sweep as CSV (RFC 4180 quoting), one row per grid point in grid order: the point's values as
 * given ("25 mm") and in SI ({@code <key>_SI}, the SI unit of the value's dimension: m, A/m2, K, kg/m3 for
 * g/L, ...; empty for words), then how it went ({@code status}: ok, invalid, failed, not_run) and the run's
 * figures under the names of the run summary JSON, and a {@code message} saying why a point failed.
 */
public final class SweepCsvWriter {

    /** Figure columns after the varied keys and the status. */
    static final List<String> FIGURES = List.of("stop_reason", "duration_s", "charge_Ah", "target_metal",
            "target_deposit_g", "deposit_total_g", "target_purity", "current_efficiency",
            "specific_energy_kWh_per_kg", "energy_Wh", "cell_voltage_start_V", "cell_voltage_mean_V",
            "cell_voltage_max_V", "cell_voltage_end_V", "temperature_max_C", "short_circuit_s",
            "short_circuit_forecast_s", "morphology_final");

    private SweepCsvWriter() {
    }

    /** @return the header columns for these axes */
    public static List<String> header(List<SweepAxis> axes) {
        List<String> h = new ArrayList<>();
        h.add("run");
        for (SweepAxis a : axes) {
            h.add(a.key());
            h.add(a.key() + "_SI");
        }
        h.add("status");
        h.addAll(FIGURES);
        h.add("message");
        return h;
    }

    /**
     * @param result the sweep
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(SweepResult result, OutputStream out) throws IOException {
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        w.write(String.join(",", header(result.axes()).stream().map(SweepCsvWriter::field).toList()));
        w.write('\n');
        for (SweepPoint p : result.points()) {
            List<String> row = new ArrayList<>();
            row.add(Integer.toString(p.point().index() + 1));
            for (AxisValue v : p.point().values()) {
                row.add(field(v.text()));
                row.add(num(v.si()));
            }
            row.add(p.status().name().toLowerCase(Locale.ROOT));
            row.addAll(figures(p.summary()));
            row.add(p.message() == null ? "" : field(p.message()));
            w.write(String.join(",", row));
            w.write('\n');
        }
        w.flush();
    }

    private static List<String> figures(RunSummary s) {
        List<String> f = new ArrayList<>();
        if (s == null) {
            for (int i = 0; i < FIGURES.size(); i++) {
                f.add("");
            }
            return f;
        }
        String target = s.targetMetal();
        f.add(s.stopReason());
        f.add(num(s.durationS()));
        f.add(num(s.chargeC() / 3600));
        f.add(target == null ? "" : target);
        f.add(target == null ? "" : num(s.depositKg().getOrDefault(target, 0.0) * 1000));
        f.add(num(s.depositTotalKg() * 1000));
        f.add(target == null || !(s.depositTotalKg() > 0) ? "" : num(s.purity().getOrDefault(target, 0.0)));
        f.add(target == null ? "" : num(s.currentEfficiency()));
        f.add(num(s.specificEnergyJPerKg() / 3.6e6));
        f.add(num(s.energyJ() / 3600));
        f.add(num(s.cellVoltageStartV()));
        f.add(num(s.cellVoltageMeanV()));
        f.add(num(s.cellVoltageMaxV()));
        f.add(num(s.cellVoltageEndV()));
        f.add(num(s.temperatureMaxK() - 273.15));
        f.add(s.shortCircuitS() == null ? "" : num(s.shortCircuitS()));
        f.add(s.shortCircuitForecastS() == null ? "" : num(s.shortCircuitForecastS()));
        f.add(s.morphologyFinal() == null ? "" : s.morphologyFinal());
        return f;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.8g", v) : "";
    }

    /** A CSV field, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    static String field(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }
}
