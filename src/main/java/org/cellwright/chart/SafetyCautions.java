package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.cellwright.sim.TracePoint;

/**
 * The hazards a scenario and its run raise, for the report: chlorine from an inert anode in a chloride bath,
 * hydrogen from the cathode, acid, a hot bath, nitrogen oxides from an acid nitrate bath, lead, and electrical
 * hazards (high current, a short between the
 * electrodes). Each names what triggers it in this run and what to do, and all defer to local codes, the
 * safety data sheets of the chemicals and the site's own practice.
 */
public final class SafetyCautions {

    /** The closing line of every list of cautions. */
    public static final String DEFERRAL = "These notes do not replace a risk assessment: follow the local codes,"
            + " the safety data sheets of every chemical in the bath, and your site's licensed practice.";

    /** Molar volume of an ideal gas at 0 C and 1 atm (L/mol); CODATA 2018: 22.413 969 54 L/mol. */
    static final double STP_L_PER_MOL = 22.41396954;
    /** Acid from which the bath is treated as corrosive (mol/L H+): pH below about 1.3 (common practice). */
    static final double ACID_MOL_PER_L = 0.05;
    /** Bath temperature from which the bath is hot (C): scalds and hot acid splashes (common practice). */
    static final double HOT_BATH_C = 50;
    /** Nitrate from which a bath counts as a nitrate bath (mol/L NO3-, about 0.6 g/L) (common practice). */
    static final double NITRATE_MOL_PER_L = 0.01;
    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    static final double ZERO_CELSIUS_K = 273.15;
    /** The hazards this class names, as the engine's warnings name them (the rest are notes). */
    static final List<String> HAZARDS = List.of("Chlorine", "Hydrogen", "Acid", "Hot bath", "Nitrate", "Lead",
            "Electrical");
    /** Current from which leads and a short can overheat on a bench (A) (common practice). */
    static final double HIGH_CURRENT_A = 5;
    /** Gas volume below which a gas is not mentioned (L at 0 C, 1 atm): 0.1 mL. */
    static final double TRACE_GAS_L = 1e-4;

    /**
     * One hazard.
     *
     * @param hazard its name ("Chlorine", "Hydrogen", "Acid", "Hot bath", "Nitrate", "Lead", "Electrical")
     * @param trigger what in this scenario or run raises it, with numbers
     * @param advice what to do about it
     */
    public record Caution(String hazard, String trigger, String advice) {
    }

    private SafetyCautions() {
    }

    /**
     * @param r a run
     * @param library the chemistry library (to tell inert from soluble anodes)
     * @return the cautions the run triggers, most acute first
     */
    public static List<Caution> of(RunResult r, ChemLibrary library) {
        RunSummary s = r.summary();
        List<Caution> out = new ArrayList<>();
        double chloride = maxMolPerL(r, "Cl-");
        boolean inertAnode = library.findMaterial(r.scenario().anode().material())
                .map(m -> !m.isSoluble()).orElse(false);
        double cl2 = s.gasMol().getOrDefault("Cl2", 0.0) * STP_L_PER_MOL;
        if (inertAnode && chloride > 0) {
            out.add(new Caution("Chlorine", String.format(Locale.ROOT, "an inert %s anode in a bath with %.3g mol/L of"
                    + " chloride; %s", r.scenario().anode().material(), chloride, cl2 > TRACE_GAS_L
                    ? String.format(Locale.ROOT, "this run gives off about %.3g L of chlorine gas (0 C, 1 atm)", cl2)
                    : "this run gives off hardly any, but more will come once the anode's other reactions run short"),
                    "Chlorine is toxic and corrosive even at low concentrations. Run the cell under an extraction"
                            + " hood or with local exhaust, and keep it away from acids that release more."));
        }
        double h2 = s.gasMol().getOrDefault("H2", 0.0) * STP_L_PER_MOL;
        if (h2 > TRACE_GAS_L) {
            out.add(new Caution("Hydrogen", String.format(Locale.ROOT, "the cathode gives off about %.3g L of"
                    + " hydrogen (0 C, 1 atm) over the run", h2),
                    "Hydrogen burns and explodes in air between about 4 and 75 % by volume. Ventilate the space over"
                            + " the cell and keep flames, sparks and hot surfaces away."));
        }
        double acid = maxMolPerL(r, "H+");
        if (acid >= ACID_MOL_PER_L) {
            out.add(new Caution("Acid", String.format(Locale.ROOT, "up to %.2g mol/L of free acid in the bath", acid),
                    "The bath burns skin and eyes. Wear goggles, acid-resistant gloves and an apron; have an eye-wash"
                            + " and a neutraliser at hand; add acid to water, never water to acid."));
        }
        double hotC = r.trace().stream().mapToDouble(p -> p.state().temperatureK()).max().orElse(0) - ZERO_CELSIUS_K;
        if (hotC >= HOT_BATH_C) {
            out.add(new Caution("Hot bath", String.format(Locale.ROOT, "the bath reaches %.0f C", hotC),
                    "Hot electrolyte scalds, and hot acid splashes burn deeper and give off more fumes than cold."
                            + " Keep the tank covered, wear heat-resistant gloves and a face shield, and let the"
                            + " bath cool before reaching into it."));
        }
        double nitrate = maxMolPerL(r, "NO3-");
        if (nitrate >= NITRATE_MOL_PER_L && acid >= ACID_MOL_PER_L) {
            out.add(new Caution("Nitrate", String.format(Locale.ROOT, "%.2g mol/L of nitrate with up to %.2g mol/L of"
                    + " free acid in the bath", nitrate, acid),
                    "Nitric acid and nitrate baths can give off nitrogen oxides (toxic brown fumes), the more so"
                            + " when hot, concentrated or when metal dissolves in them. Run the cell and any"
                            + " dissolving of metal under fume extraction."));
        }
        boolean leadElectrode = r.scenario().anode().material().startsWith("lead")
                || r.scenario().cathode().material().startsWith("lead");
        double lead = maxMolPerL(r, "Pb2+");
        if (leadElectrode || lead > 0) {
            out.add(new Caution("Lead", leadElectrode ? "a lead or lead-alloy electrode" + (lead > 0
                    ? String.format(Locale.ROOT, " and up to %.2g mol/L of lead in the bath", lead) : "")
                    : String.format(Locale.ROOT, "up to %.2g mol/L of lead in the bath", lead),
                    "Lead compounds are toxic. Collect sludge, spent bath and rinse water as lead-bearing waste,"
                            + " keep them out of drains, and wash hands before eating or drinking."));
        }
        double maxA = r.trace().stream().mapToDouble(p -> p.state().currentA()).max().orElse(0);
        List<String> electrical = new ArrayList<>();
        if (s.shortCircuitS() != null) {
            electrical.add("a dendrite bridges the gap at " + RunClock.format(s.shortCircuitS()));
        } else if (s.shortCircuitForecastS() != null) {
            electrical.add("a dendrite is forecast to bridge the gap at " + RunClock.format(s.shortCircuitForecastS()));
        }
        if (maxA >= HIGH_CURRENT_A) {
            electrical.add(String.format(Locale.ROOT, "up to %.3g A flows", maxA));
        }
        if (!electrical.isEmpty()) {
            out.add(new Caution("Electrical", String.join("; ", electrical),
                    "A short between the electrodes draws the supply's full current and can overheat leads and"
                            + " clamps. Fuse the circuit, insulate bus bars and keep the electrodes from touching."));
        }
        return out;
    }

    /** @return the highest concentration of a species over the run (mol/L), 0 when not tracked */
    private static double maxMolPerL(RunResult r, String species) {
        int j = r.speciesNames().indexOf(species);
        if (j < 0) {
            return 0;
        }
        double max = 0;
        for (TracePoint p : r.trace()) {
            max = Math.max(max, p.state().concentrationsMolPerM3()[j]);
        }
        return max / 1000;
    }

    /**
     * @param r a run
     * @return the run's notes that are not hazards (validity of the data, hydrolysis, precipitation)
     */
    public static List<String> dataNotes(RunResult r) {
        List<String> out = new ArrayList<>();
        for (String w : r.summary().warnings()) {
            String head = w.contains(":") ? w.substring(0, w.indexOf(':')) : "";
            if (!HAZARDS.contains(head)) {
                out.add(w);
            }
        }
        return out;
    }
}
