package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.SweepAxisParser;
import org.cellwright.study.SweepAxis;

/**
 * The scenario keys the sweep view offers, each with a range around the scenario's own value, and the
 * reading of what the user typed into a {@link SweepAxis} by the command line's own parser
 * ({@link SweepAxisParser}), so the window accepts the same keys, units and spacings as {@code --vary}.
 */
final class SweepKeys {

    /** Values per axis proposed for a new sweep: a 10 x 10 grid runs in a few seconds on two cores. */
    static final int DEFAULT_N = 10;

    /**
     * One offered key.
     *
     * @param label what the list shows
     * @param key the scenario key, a dotted path as {@code --set} takes it
     * @param from proposed first value, with its unit
     * @param to proposed last value, with its unit
     * @param log true when the values are best spaced on a log scale
     */
    record Choice(String label, String key, String from, String to, boolean log) {
        @Override
        public String toString() {
            return label;
        }
    }

    private SweepKeys() {
    }

    /**
     * @param s the scenario the sweep starts from
     * @param lib the chemistry (molar masses, to offer concentrations in g/L)
     * @return the common keys with ranges around the scenario's values: supply current density and current,
     *     gap, each species' start concentration, temperature, diffusion layer (agitation), run time
     */
    static List<Choice> of(Scenario s, ChemLibrary lib) {
        List<Choice> out = new ArrayList<>();
        double area = s.cathode().areaM2();
        double amps = s.supply().mode() == ControlMode.CURRENT && s.supply().schedule().isEmpty()
                ? s.supply().currentA() : 100 * area;
        // A/m2 to A/dm2: 1 dm2 = 0.01 m2
        double density = amps / area / 100;
        out.add(new Choice("Current density (A/dm2)", "supply.current_density", num(density / 2) + " A/dm2",
                num(density * 2) + " A/dm2", false));
        out.add(new Choice("Current (A)", "supply.current", num(amps / 2) + " A", num(amps * 2) + " A", false));
        double gapMm = s.cell().gapM() * 1000;
        out.add(new Choice("Gap (mm)", "cell.gap", num(gapMm / 2) + " mm", num(gapMm * 2) + " mm", false));
        for (Map.Entry<String, Double> e : s.electrolyte().compositionMolPerM3().entrySet()) {
            if (!(e.getValue() > 0) || chargeOf(e.getKey()) <= 0) {
                continue;
            }
            double molar = lib.findSpecies(e.getKey()).map(Species::molarMassKgPerMol).orElse(Double.NaN);
            String key = "electrolyte.composition.\"" + e.getKey() + "\"";
            String label = "Start concentration of " + e.getKey();
            if (Double.isFinite(molar)) {
                // mol/m3 times kg/mol is kg/m3, which is g/L
                double gPerL = e.getValue() * molar;
                out.add(new Choice(label + " (g/L)", key, num(gPerL / 2) + " g/L", num(gPerL * 1.5) + " g/L", false));
            } else {
                double molL = e.getValue() / 1000;
                out.add(new Choice(label + " (mol/L)", key, num(molL / 2) + " mol/L", num(molL * 1.5) + " mol/L",
                        false));
            }
        }
        double celsius = s.electrolyte().temperatureK() - 273.15;
        out.add(new Choice("Temperature (C)", "electrolyte.temperature", num(Math.max(5, celsius - 10)) + " C",
                num(Math.min(90, celsius + 30)) + " C", false));
        double um = s.cell().agitation().diffusionLayerM() * 1e6;
        out.add(new Choice("Diffusion layer: agitation (um)", "cell.diffusion_layer",
                num(Math.max(5, um / 10)) + " um", num(Math.min(1000, um * 2)) + " um", true));
        double hours = s.run().durationS() / 3600;
        out.add(new Choice("Run time (h)", "run.duration", num(hours / 4) + " h", num(hours * 1.5) + " h", false));
        return out;
    }

    /** @return the charge number written in a species name's ending ("Sn2+" 2, "Cl-" -1, "H2O" 0) */
    private static int chargeOf(String species) {
        String n = species.strip();
        if (n.endsWith("+") || n.endsWith("-")) {
            int sign = n.endsWith("+") ? 1 : -1;
            int k = n.length() - 1;
            int digits = k;
            while (digits > 0 && Character.isDigit(n.charAt(digits - 1))) {
                digits--;
            }
            return sign * (digits < k ? Integer.parseInt(n.substring(digits, k)) : 1);
        }
        return 0;
    }

    /**
     * Reads one axis as the user gave it.
     *
     * @param key the scenario key
     * @param from first value with its unit ("10 mm"; a bare number takes the other end's unit)
     * @param to last value with its unit
     * @param n how many values, 2 or more
     * @param log true to space them on a log scale
     * @return the axis
     * @throws IllegalArgumentException with a message for people (no command-line option named)
     */
    static SweepAxis axis(String key, String from, String to, int n, boolean log) {
        String k = key == null ? "" : key.strip();
        if (k.isEmpty()) {
            throw new IllegalArgumentException("choose a key or type one (e.g. cell.gap)");
        }
        if (from.isBlank() || to.isBlank()) {
            throw new IllegalArgumentException(k + ": give the first and the last value, with units");
        }
        String option = k + "=" + from.strip() + ":" + to.strip() + ":" + n + (log ? ":log" : "");
        try {
            return SweepAxisParser.parse(option);
        } catch (IllegalArgumentException e) {
            String prefix = "--vary " + option + ": ";
            String m = e.getMessage() == null ? "not a range" : e.getMessage();
            throw new IllegalArgumentException(k + ": " + (m.startsWith(prefix) ? m.substring(prefix.length()) : m), e);
        }
    }

    /** @return a value with three significant digits, no trailing zeros ("0.25", "120", "1.5e-05") */
    static String num(double v) {
        String s = String.format(Locale.ROOT, "%.3g", v);
        if (s.contains("e")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
