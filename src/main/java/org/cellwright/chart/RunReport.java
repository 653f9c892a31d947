package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.cellwright.sim.ScenarioChemistry;

/**
 * What a run report says, in the order it says it, independent of the format ({@link HtmlReport},
 * {@link PdfReport}): the key figures, the safety cautions, the charts, the voltage breakdown, where the
 * charge went, the forecast of a short and of the deposit's form, the events, notes on the data, and the
 * inputs with their units.
 *
 * @param title the scenario's title (or "Cellwright run")
 * @param source the scenario's file name
 * @param notes the scenario's notes ("" when none)
 * @param figures the key figures
 * @param cautions the hazards the run raises
 * @param breakdown the cell voltage taken apart
 * @param charge where the charge went, labelled
 * @param forecast the short-circuit and deposit-form forecast
 * @param events what happened, with times
 * @param dataNotes notes on the validity of the data and on hydrolysis or precipitation
 * @param inputs the inputs with their units
 * @param scenarioText the scenario as TOML, with units
 * @param run the run (for the charts)
 */
public record RunReport(String title, String source, String notes, List<Row> figures,
                        List<SafetyCautions.Caution> cautions, VoltageBreakdown breakdown, List<Row> charge,
                        List<Row> forecast, List<Row> events, List<String> dataNotes, List<Row> inputs,
                        String scenarioText, RunResult run) {

    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    private static final double ZERO_CELSIUS_K = 273.15;
    /** The words shown where a model has not produced a value. */
    public static final String NOT_COMPUTED = "not computed";

    /**
     * A labelled value of a table.
     *
     * @param label what it is
     * @param value its value with unit
     */
    public record Row(String label, String value) {
    }

    /**
     * @param source the scenario's file name
     * @param r the run
     * @param library the chemistry library
     * @return the report's content
     */
    public static RunReport of(String source, RunResult r, ChemLibrary library) {
        Scenario sc = r.scenario();
        List<Row> charge = FitText.chargeRows(r);
        List<Row> events = new ArrayList<>();
        for (RunEvent e : r.events()) {
            events.add(new Row(RunClock.format(e.timeS()), e.message()));
        }
        return new RunReport(ChartSheet.titleOf(r), source, sc.notes().strip(), figures(r.summary()),
                SafetyCautions.of(r, library), VoltageBreakdown.of(r), charge, forecast(r.summary()), events,
                SafetyCautions.dataNotes(r), inputs(sc, library), ScenarioWriter.write(sc, library), r);
    }

    /** @return four significant digits without trailing zeros ("1.2", "0.02527", "3.71e-05") */
    static String g4(double v) {
        return ParameterUnit.number(v);
    }

    private static List<Row> figures(RunSummary s) {
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("ended", ending(s.stopReason()) + " after " + RunClock.format(s.durationS())));
        rows.add(new Row("charge passed", f("%s A h (%.0f C)", g4(s.chargeC() / 3600), s.chargeC())));
        StringBuilder dep = new StringBuilder();
        s.depositKg().forEach((m, kg) -> {
            if (kg > 0) {
                dep.append(dep.length() == 0 ? "" : ", ").append(m + " " + SummaryText.mass(kg));
            }
        });
        rows.add(new Row("deposit", dep.length() == 0 ? "none" : dep.toString()));
        if (s.depositKg().values().stream().filter(kg -> kg > 0).count() > 1) {
            StringBuilder pur = new StringBuilder();
            s.purity().forEach((m, x) -> {
                if (x > 0) {
                    pur.append(pur.length() == 0 ? "" : ", ").append(m + " " + SummaryText.massFraction(x));
                }
            });
            rows.add(new Row("purity of the deposit", pur.toString()));
        }
        if (s.targetMetal() != null) {
            rows.add(new Row("current efficiency", f("%.1f %% for %s over the run", 100 * s.currentEfficiency(),
                    s.targetMetal())));
            rows.add(new Row("specific energy", Double.isFinite(s.specificEnergyJPerKg())
                    ? f("%.3g kWh per kg of %s", s.specificEnergyJPerKg() / 3.6e6, s.targetMetal())
                    : "- (no " + s.targetMetal() + " deposited)"));
        }
        rows.add(new Row("energy drawn", g4(s.energyJ() / 3600) + " W h"));
        rows.add(new Row("cell voltage", f("%.3f V at the start, %.3f V mean, %.3f V at the end, %.3f V highest",
                s.cellVoltageStartV(), s.cellVoltageMeanV(), s.cellVoltageEndV(), s.cellVoltageMaxV())));
        rows.add(new Row("bath temperature", f("%.1f C at the start, %.1f C at the end, %.1f C highest",
                s.temperatureStartK() - ZERO_CELSIUS_K, s.temperatureEndK() - ZERO_CELSIUS_K,
                s.temperatureMaxK() - ZERO_CELSIUS_K)));
        StringBuilder gas = new StringBuilder();
        s.gasMol().forEach((g, mol) -> gas.append(gas.length() == 0 ? "" : ", ")
                .append(f("%s %.3g L", g, mol * SafetyCautions.STP_L_PER_MOL)));
        rows.add(new Row("gas given off (0 C, 1 atm)", gas.toString()));
        StringBuilder conc = new StringBuilder();
        s.finalConcentrationMolPerM3().forEach((sp, c) -> {
            if (c > 1e-6) {
                conc.append(conc.length() == 0 ? "" : ", ").append(sp + " " + g4(c / 1000));
            }
        });
        rows.add(new Row("bath at the end (mol/L)", conc.toString()));
        return rows;
    }

    private static List<Row> forecast(RunSummary s) {
        List<Row> rows = new ArrayList<>();
        boolean depositModel = s.morphologyFinal() != null;
        String shortText;
        if (s.shortCircuitS() != null) {
            shortText = "the cell shorted at " + RunClock.format(s.shortCircuitS());
        } else if (s.shortCircuitForecastS() != null) {
            shortText = "forecast at " + RunClock.format(s.shortCircuitForecastS());
        } else {
            shortText = depositModel ? "none foreseen within the run" : NOT_COMPUTED;
        }
        rows.add(new Row("short circuit by dendrites", shortText));
        rows.add(new Row("deposit form at the end", depositModel ? s.morphologyFinal() : NOT_COMPUTED));
        return rows;
    }

    private static String ending(String reason) {
        return switch (reason) {
            case "end" -> "ran its full time";
            case "short_circuit" -> "stopped by a short circuit";
            case "target" -> "stopped at a stop target";
            case "voltage_limit" -> "stopped at the stop voltage";
            case "temperature_limit" -> "stopped at the stop temperature";
            default -> "stopped: " + reason.replace('_', ' ');
        };
    }

    private static List<Row> inputs(Scenario sc, ChemLibrary library) {
        ChemLibrary chem = ScenarioChemistry.apply(library, sc);
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("bath volume", g4(sc.electrolyte().volumeM3() * 1000) + " L"));
        rows.add(new Row("bath temperature at the start", g4(sc.electrolyte().temperatureK() - ZERO_CELSIUS_K) + " C"));
        for (Map.Entry<String, Double> e : sc.electrolyte().compositionMolPerM3().entrySet()) {
            double m = chem.findSpecies(e.getKey()).map(Species::molarMassKgPerMol).orElse(Double.NaN);
            rows.add(new Row(e.getKey(), Double.isFinite(m) ? g4(e.getValue() * m) + " g/L ("
                    + g4(e.getValue() / 1000) + " mol/L)" : g4(e.getValue() / 1000) + " mol/L"));
        }
        Double k = sc.electrolyte().conductivitySPerM();
        rows.add(new Row("conductivity", k == null ? "computed from the composition" : g4(k * 10) + " mS/cm"));
        rows.add(new Row("cathode", sc.cathode().material() + ", " + g4(sc.cathode().areaM2() * 100) + " dm2"));
        rows.add(new Row("anode", sc.anode().material() + ", " + g4(sc.anode().areaM2() * 100) + " dm2"));
        rows.add(new Row("gap", g4(sc.cell().gapM() * 1000) + " mm"));
        String preset = sc.cell().agitation().preset();
        rows.add(new Row("agitation", (preset == null ? "set directly" : preset)
                + ", diffusion layer " + g4(sc.cell().agitation().diffusionLayerM() * 1e6) + " um"));
        rows.add(new Row("ambient", g4(sc.cell().ambientK() - ZERO_CELSIUS_K) + " C"));
        rows.add(new Row("contact resistance", g4(sc.cell().contactResistanceOhm() * 1000) + " mohm"));
        rows.add(new Row("heat loss", sc.cell().heatLossWPerK() == null ? "estimated from the volume"
                : g4(sc.cell().heatLossWPerK()) + " W/K"));
        rows.add(new Row("supply", supply(sc)));
        rows.add(new Row("duration", RunClock.format(sc.run().durationS())
                + ", recorded every " + RunClock.format(sc.run().outputIntervalS())));
        List<String> stops = new ArrayList<>();
        for (StopCondition c : sc.run().stops()) {
            stops.add(stop(c, chem));
        }
        rows.add(new Row("stop conditions", stops.isEmpty() ? "none" : String.join("; ", stops)));
        rows.add(new Row("target metal", sc.run().targetMetal() == null ? "the default" : sc.run().targetMetal()));
        for (SpeciesOverride o : sc.speciesOverrides()) {
            rows.add(new Row("species " + o.name(), "changed in the scenario (see the file)"));
        }
        for (ReactionOverride o : sc.reactionOverrides()) {
            List<String> what = new ArrayList<>();
            if (o.e0V() != null) {
                what.add("e0 " + g4(o.e0V()) + " V");
            }
            if (o.i0APerM2() != null) {
                what.add("i0 " + g4(o.i0APerM2()) + " A/m2");
            }
            if (o.material() != null) {
                what.add("on " + o.material());
            }
            rows.add(new Row("reaction " + o.name(), what.isEmpty() ? "changed in the scenario" : String.join(", ", what)));
        }
        return rows;
    }

    private static String supply(Scenario sc) {
        var s = sc.supply();
        String limit = s.mode() == ControlMode.CURRENT
                ? (Double.isFinite(s.voltageLimitV()) ? ", voltage limit " + g4(s.voltageLimitV()) + " V" : "")
                : (Double.isFinite(s.currentLimitA()) ? ", current limit " + g4(s.currentLimitA()) + " A" : "");
        if (!s.schedule().isEmpty()) {
            List<String> pts = new ArrayList<>();
            for (SetPoint p : s.schedule()) {
                pts.add(RunClock.format(p.atS()) + (p.ramp() ? " ramp to " : " ")
                        + g4(p.value()) + (s.mode() == ControlMode.CURRENT ? " A" : " V"));
            }
            return "schedule: " + String.join(", ", pts) + limit;
        }
        return s.mode() == ControlMode.CURRENT
                ? "constant current " + g4(s.currentA()) + " A (" + g4(s.currentA() / sc.cathode().areaM2() / 100)
                + " A/dm2)"
                + limit
                : "constant voltage " + g4(s.voltageV()) + " V" + limit;
    }

    private static String stop(StopCondition c, ChemLibrary chem) {
        if (c instanceof StopCondition.ShortCircuit) {
            return "a short circuit";
        } else if (c instanceof StopCondition.SpeciesBelow b) {
            double m = chem.findSpecies(b.species()).map(Species::molarMassKgPerMol).orElse(Double.NaN);
            return b.species() + " below " + (Double.isFinite(m) ? g4(b.molPerM3() * m) + " g/L ("
                    + g4(b.molPerM3() / 1000) + " mol/L)" : g4(b.molPerM3() / 1000) + " mol/L");
        } else if (c instanceof StopCondition.TemperatureAbove t) {
            return "bath above " + g4(t.kelvin() - ZERO_CELSIUS_K) + " C";
        } else if (c instanceof StopCondition.VoltageAbove v) {
            return "cell voltage above " + g4(v.volts()) + " V";
        } else if (c instanceof StopCondition.DepositAbove d) {
            return d.metal() + " deposit above " + g4(d.kg() * 1000) + " g";
        }
        return c.toString();
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
