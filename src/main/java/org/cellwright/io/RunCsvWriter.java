package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * Writes a run's time series as CSV: one row per output interval, the contract's columns first
 * ({@code time_s, current_A, cell_voltage_V, cathode_potential_V, anode_potential_V, ohmic_drop_V,
 * current_efficiency, current_efficiency_cumulative, deposit_g, temperature_C, dendrite_height_mm}), then
 * one {@code c_<species>_mol_per_L} per species and one {@code i_<electrode>_<couple>_A} per reaction, then
 * the voltage breakdown, conductivity, gas fraction and the deposit of each metal, then the deposit's growth:
 * {@code morphology} (compact, rough, dendritic, powdery; empty while the target metal does not deposit),
 * {@code limit_ratio} (the target metal's partial current over its limiting current, which sets the form),
 * {@code deposit_thickness_um}, {@code gap_mm} (against which {@code dendrite_height_mm} is read) and
 * {@code shorted}; in a two-compartment cell last one {@code c_anolyte_<species>_mol_per_L} per species (the
 * {@code c_} columns are then the catholyte).
 */
public final class RunCsvWriter {

    private RunCsvWriter() {
    }

    /** @return the header columns of a run's CSV */
    public static List<String> header(RunResult r) {
        List<String> h = new ArrayList<>(List.of("time_s", "current_A", "cell_voltage_V", "cathode_potential_V",
                "anode_potential_V", "ohmic_drop_V", "current_efficiency", "current_efficiency_cumulative",
                "deposit_g", "temperature_C", "dendrite_height_mm"));
        for (String s : r.speciesNames()) {
            h.add("c_" + s + "_mol_per_L");
        }
        for (String s : r.cathodeReactions()) {
            h.add("i_cathode_" + s + "_A");
        }
        for (String s : r.anodeReactions()) {
            h.add("i_anode_" + s + "_A");
        }
        h.addAll(List.of("equilibrium_voltage_V", "anode_overpotential_V", "cathode_overpotential_V",
                "ohmic_solution_V", "ohmic_bubbles_V", "ohmic_contacts_V", "conductivity_S_per_m", "void_fraction"));
        for (String m : r.metalSymbols()) {
            h.add("deposit_" + m + "_g");
        }
        h.addAll(List.of("morphology", "limit_ratio", "deposit_thickness_um", "gap_mm", "shorted"));
        if (r.scenario().cell().compartments().twoCompartments()) {
            for (String s : r.speciesNames()) {
                h.add("c_anolyte_" + s + "_mol_per_L");
            }
        }
        return h;
    }

    /**
     * @param r the run
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(RunResult r, OutputStream out) throws IOException {
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        w.write(String.join(",", header(r)));
        w.write('\n');
        StringBuilder sb = new StringBuilder(512);
        for (TracePoint p : r.trace()) {
            sb.setLength(0);
            InstantState s = p.state();
            num(sb, p.timeS());
            num(sb, s.currentA());
            num(sb, s.cellVoltageV());
            num(sb, s.cathodePotentialV());
            num(sb, s.anodePotentialV());
            num(sb, s.ohmicDropV());
            num(sb, s.targetEfficiency());
            num(sb, p.cumulativeEfficiency());
            num(sb, p.depositTotalKg() * 1000);
            num(sb, s.temperatureK() - 273.15);
            num(sb, s.dendriteHeightM() * 1000);
            for (double c : s.concentrationsMolPerM3()) {
                num(sb, c / 1000);
            }
            for (double i : s.cathodeCurrentsA()) {
                num(sb, i);
            }
            for (double i : s.anodeCurrentsA()) {
                num(sb, i);
            }
            num(sb, s.equilibriumVoltageV());
            num(sb, s.anodeOverpotentialV());
            num(sb, s.cathodeOverpotentialV());
            num(sb, s.ohmicSolutionV());
            num(sb, s.ohmicBubblesV());
            num(sb, s.ohmicContactsV());
            num(sb, s.conductivitySPerM());
            num(sb, s.voidFraction());
            for (double kg : p.depositKg()) {
                num(sb, kg * 1000);
            }
            sb.append(s.morphology() == null ? "" : s.morphology()).append(',');
            num(sb, s.targetLimitRatio());
            num(sb, s.depositThicknessM() * 1e6);
            num(sb, r.scenario().cell().gapM() * 1000);
            sb.append(s.shorted() ? '1' : '0').append(',');
            if (s.anolyteConcentrationsMolPerM3() != null) {
                for (double c : s.anolyteConcentrationsMolPerM3()) {
                    num(sb, c / 1000);
                }
            }
            sb.setLength(sb.length() - 1);
            sb.append('\n');
            w.write(sb.toString());
        }
        w.flush();
    }

    private static void num(StringBuilder sb, double v) {
        sb.append(Double.isFinite(v) ? String.format(Locale.ROOT, "%.8g", v) : "").append(',');
    }
}
