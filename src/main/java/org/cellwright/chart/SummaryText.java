package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;

/**
 * A run's summary as plain text for people, with units: what the command line prints and the window shows.
 */
public final class SummaryText {

    /** Molar volume of an ideal gas at 0 C and 1 atm (L/mol), CODATA 2018. */
    private static final double STP_L_PER_MOL = 22.41396954;

    private SummaryText() {
    }

    /**
     * @param label the scenario's name (file)
     * @param r the run
     * @return the summary, one figure per line
     */
    public static List<String> lines(String label, RunResult r) {
        RunSummary s = r.summary();
        List<String> out = new ArrayList<>();
        out.add(r.scenario().title().isBlank() ? label : r.scenario().title() + "  (" + label + ")");
        out.add(String.format(Locale.ROOT, "  ended            %s after %s", stopWords(s.stopReason()),
                RunClock.format(s.durationS())));
        out.add(String.format(Locale.ROOT, "  charge           %.4g A h (%.4g C)", s.chargeC() / 3600, s.chargeC()));
        StringBuilder dep = new StringBuilder();
        for (Map.Entry<String, Double> e : s.depositKg().entrySet()) {
            if (e.getValue() <= 0) {
                continue;
            }
            if (dep.length() > 0) {
                dep.append(", ");
            }
            dep.append(e.getKey()).append(' ').append(mass(e.getValue()));
        }
        out.add("  deposit          " + (dep.length() == 0 ? "none" : dep.toString())
                + String.format(Locale.ROOT, "  (total %.4g g)", s.depositTotalKg() * 1000));
        if (s.depositKg().values().stream().filter(kg -> kg > 0).count() > 1) {
            StringBuilder pur = new StringBuilder();
            s.purity().forEach((m, f) -> {
                if (f > 0) {
                    pur.append(pur.length() == 0 ? "" : ", ").append(m).append(' ').append(massFraction(f));
                }
            });
            out.add("  purity           " + pur);
        }
        if (s.targetMetal() != null) {
            out.add(String.format(Locale.ROOT, "  current eff.     %.1f %% (for %s, whole run)", s.currentEfficiency() * 100,
                    s.targetMetal()));
            out.add(Double.isFinite(s.specificEnergyJPerKg())
                    ? String.format(Locale.ROOT, "  specific energy  %.3g kWh/kg %s", s.specificEnergyJPerKg() / 3.6e6,
                    s.targetMetal())
                    : "  specific energy  - (no " + s.targetMetal() + " deposited)");
        }
        out.add(String.format(Locale.ROOT, "  energy           %.4g W h", s.energyJ() / 3600));
        out.add(String.format(Locale.ROOT, "  cell voltage     %.3f V at start, %.3f V at end, mean %.3f V, max %.3f V",
                s.cellVoltageStartV(), s.cellVoltageEndV(), s.cellVoltageMeanV(), s.cellVoltageMaxV()));
        out.add(String.format(Locale.ROOT, "  temperature      %.1f C at start, %.1f C at end, max %.1f C",
                s.temperatureStartK() - 273.15, s.temperatureEndK() - 273.15, s.temperatureMaxK() - 273.15));
        StringBuilder gas = new StringBuilder();
        s.gasMol().forEach((g, mol) -> {
            if (mol * STP_L_PER_MOL >= 1e-6) { // below a microlitre is no gas anyone will see
                gas.append(gas.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.3g L", g,
                        mol * STP_L_PER_MOL));
            }
        });
        out.add("  gas (0 C, 1 atm) " + (gas.length() == 0 ? "none" : gas));
        StringBuilder conc = new StringBuilder();
        s.finalConcentrationMolPerM3().forEach((sp, c) -> {
            if (c > 1e-6) {
                conc.append(conc.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.4g", sp, c / 1000));
            }
        });
        boolean divided = !s.finalAnolyteConcentrationMolPerM3().isEmpty();
        out.add((divided ? "  final catholyte  " : "  final bath       ") + conc + " mol/L");
        if (divided) {
            StringBuilder an = new StringBuilder();
            s.finalAnolyteConcentrationMolPerM3().forEach((sp, c) -> {
                if (c > 1e-6) {
                    an.append(an.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.4g", sp, c / 1000));
                }
            });
            out.add("  final anolyte    " + an + " mol/L");
        }
        StringBuilder corr = new StringBuilder();
        s.corrodedKg().forEach((m, kg) -> {
            if (kg * 1000 >= 5e-4) {
                corr.append(corr.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.4g g", m, kg * 1000));
            }
        });
        if (corr.length() > 0) {
            out.add("  redissolved      " + corr + " (oxidants took electrons from the deposit)");
        }
        out.add("  where the charge went");
        out.addAll(ChargeShares.lines(r));
        if (s.shortCircuitS() != null) {
            out.add("  short circuit    at " + RunClock.format(s.shortCircuitS()));
        } else if (s.shortCircuitForecastS() != null) {
            out.add("  short forecast   at " + RunClock.format(s.shortCircuitForecastS())
                    + " (if the end conditions held)");
        }
        if (s.morphologyFinal() != null) {
            out.add("  deposit form     " + s.morphologyFinal());
        }
        if (!r.events().isEmpty()) {
            out.add("  events");
            for (RunEvent e : r.events()) {
                out.add("    " + e.message());
            }
        }
        if (!s.warnings().isEmpty()) {
            out.add("  cautions and notes");
            for (String w : s.warnings()) {
                out.add("    ! " + w);
            }
            out.add("    Cellwright is a planning aid: follow local codes, safety data sheets and licensed practice.");
        }
        return out;
    }

    private static String stopWords(String reason) {
        return switch (reason) {
            case "end" -> "at the set duration";
            case "short_circuit" -> "by a short circuit";
            case "target" -> "at a stop target";
            case "voltage_limit" -> "at the stop voltage";
            case "temperature_limit" -> "at the stop temperature";
            default -> reason;
        };
    }

    /**
     * A deposit mass in the unit that reads best: g down to 10 mg, then mg, then ug.
     *
     * @param kg mass (kg)
     * @return e.g. "8021 g", "3.55 mg", "0.42 ug"
     */
    public static String mass(double kg) {
        double g = kg * 1000;
        if (g >= 0.01) {
            return String.format(Locale.ROOT, "%.4g g", g);
        }
        if (g >= 1e-5) {
            return String.format(Locale.ROOT, "%.3g mg", g * 1000);
        }
        return String.format(Locale.ROOT, "%.2g ug", g * 1e6);
    }

    /**
     * A mass fraction of a deposit: per cent with three decimals, traces in ppm, a nearly pure metal as
     * "> 99.999 %" rather than a rounded 100.000 %.
     *
     * @param f mass fraction (0..1)
     * @return the fraction in words a refiner reads
     */
    public static String massFraction(double f) {
        if (f >= 1 - 1e-5 && f < 1) {
            return "> 99.999 %";
        }
        if (f < 1e-5) {
            return String.format(Locale.ROOT, "%.2g ppm", f * 1e6);
        }
        return String.format(Locale.ROOT, "%.3f %%", f * 100);
    }
}
