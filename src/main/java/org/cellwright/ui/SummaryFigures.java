package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.chart.ChargeShares;
import org.cellwright.chart.SummaryText;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;

/**
 * A run's key figures for the summary panel, each with its unit and a tooltip saying how it is reckoned:
 * how the run ended, deposit, current efficiency, specific energy, time to short, deposit form, cell voltage,
 * temperature, charge, energy, gas, and where the charge went.
 */
final class SummaryFigures {

    /** Molar volume of an ideal gas at 0 C and 1 atm (L/mol); source: CODATA 2018, 22.413 969 54 L/mol. */
    static final double STP_L_PER_MOL = 22.41396954;

    /**
     * One line of the summary.
     *
     * @param label what it is
     * @param value the figure with its unit
     * @param tooltip how it is reckoned
     */
    record Figure(String label, String value, String tooltip) {
    }

    private SummaryFigures() {
    }

    /**
     * @param r a run
     * @return its figures, most telling first
     */
    static List<Figure> of(RunResult r) {
        RunSummary s = r.summary();
        List<Figure> out = new ArrayList<>();
        out.add(new Figure("Ended", ended(s), "Why and when the run stopped."));
        StringBuilder dep = new StringBuilder();
        for (Map.Entry<String, Double> e : s.depositKg().entrySet()) {
            if (e.getValue() > 0 || e.getKey().equals(s.targetMetal())) {
                dep.append(dep.length() == 0 ? "" : ", ").append(e.getKey()).append(' ')
                        .append(SummaryText.mass(e.getValue()));
            }
        }
        out.add(new Figure("Deposit", dep.length() == 0 ? "none" : dep.toString(),
                "Metal deposited on the cathode, from the charge each deposition reaction passed (Faraday's law)."));
        if (s.depositKg().values().stream().filter(kg -> kg > 0).count() > 1 && s.targetMetal() != null) {
            out.add(new Figure("Purity", SummaryText.massFraction(s.purity().getOrDefault(s.targetMetal(), 0.0))
                    + " " + s.targetMetal(),
                    "Mass share of the target metal in the deposit."));
        }
        if (s.targetMetal() != null) {
            out.add(new Figure("Current efficiency", String.format(Locale.ROOT, "%.1f %%", 100 * s.currentEfficiency()),
                    "Share of the whole run's charge that deposited " + s.targetMetal() + "."));
            out.add(new Figure("Specific energy", Double.isFinite(s.specificEnergyJPerKg())
                    ? String.format(Locale.ROOT, "%.3g kWh/kg", s.specificEnergyJPerKg() / 3.6e6) : "- (no deposit)",
                    "Electrical energy drawn per kilogram of " + s.targetMetal() + " deposited (1 kWh = 3.6 MJ)."));
        }
        out.add(new Figure("Short circuit", shortText(s),
                "When a dendrite tip, growing from the cathode, reaches the anode; a forecast extrapolates the tip's"
                        + " growth at the end of the run."));
        out.add(new Figure("Deposit form", s.morphologyFinal() == null ? "not assessed" : s.morphologyFinal(),
                "The deposit's likely form at the end, from how close the deposition runs to its limiting current."));
        out.add(new Figure("Cell voltage", String.format(Locale.ROOT, "%.2f V mean (%.2f to %.2f V, max %.2f V)",
                s.cellVoltageMeanV(), s.cellVoltageStartV(), s.cellVoltageEndV(), s.cellVoltageMaxV()),
                "Voltage at the supply terminals: time-averaged, at the start, at the end and the highest."));
        out.add(new Figure("Temperature", String.format(Locale.ROOT, "%.1f to %.1f C (max %.1f C)",
                s.temperatureStartK() - 273.15, s.temperatureEndK() - 273.15, s.temperatureMaxK() - 273.15),
                "Bath temperature from the heat balance: Joule and reaction heat against losses to the air."));
        out.add(new Figure("Charge", String.format(Locale.ROOT, "%.4g A h", s.chargeC() / 3600),
                "Charge passed (1 A h = 3600 C)."));
        out.add(new Figure("Energy", String.format(Locale.ROOT, "%.4g W h", s.energyJ() / 3600),
                "Electrical energy drawn from the supply (1 W h = 3600 J)."));
        StringBuilder gas = new StringBuilder();
        s.gasMol().forEach((g, mol) -> {
            if (mol * STP_L_PER_MOL >= 1e-4) {
                gas.append(gas.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.3g L", g,
                        mol * STP_L_PER_MOL));
            }
        });
        out.add(new Figure("Gas given off", gas.length() == 0 ? "none" : gas.toString(),
                "Volume at 0 C and 1 atm (22.414 L/mol, CODATA 2018)."));
        return out;
    }

    /**
     * @param r a run
     * @return where the charge went, one line per electrode ("cathode: depositing Sn 61.0 %, ...")
     */
    static List<String> chargeShares(RunResult r) {
        List<String> out = new ArrayList<>();
        for (String line : ChargeShares.lines(r)) {
            String t = line.strip();
            int space = t.indexOf(' ');
            String words = space > 0 ? t.substring(0, space) + ": " + t.substring(space).strip() : t;
            // a number stays on the line of its unit
            out.add(words.replace(" %", "\u00a0%"));
        }
        return out;
    }

    private static String ended(RunSummary s) {
        String why = switch (s.stopReason()) {
            case "end" -> "at the set duration";
            case "short_circuit" -> "by a short circuit";
            case "target" -> "at a stop target";
            case "voltage_limit" -> "at the stop voltage";
            case "temperature_limit" -> "at the stop temperature";
            default -> s.stopReason();
        };
        return why + ", after " + RunClock.format(s.durationS());
    }

    private static String shortText(RunSummary s) {
        if (s.shortCircuitS() != null) {
            return "at " + RunClock.format(s.shortCircuitS());
        }
        if (s.shortCircuitForecastS() != null) {
            return "forecast at " + RunClock.format(s.shortCircuitForecastS());
        }
        return "none foreseen";
    }
}
