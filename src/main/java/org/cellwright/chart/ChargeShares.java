package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Metal;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.sim.PlainWords;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.ScenarioChemistry;

/**
 * Where the charge went: each electrode reaction's share of the charge passed, largest first, in plain
 * words ("cathode: depositing Sn 61 %, hydrogen 27 %, reducing Sn4+ back to Sn2+ 12 %").
 */
public final class ChargeShares {

    /** Words of the charge that passed through a dendrite short circuit instead of the bath. */
    public static final String SHORT = "through the dendrite short";
    /**
     * Share of the charge below which what the reactions leave unaccounted is taken as the integrator's
     * rounding, not a short's bypass (common practice: far above the 1e-10 seen in runs, far below 0.1 %).
     */
    static final double SHORT_SLACK = 1e-6;

    /** Words of the part of a cathode's charge that went into redissolving its own deposit. */
    public static final String CORROSION = "redissolving the %s deposit";

    private ChargeShares() {
    }

    /**
     * One part of an electrode's charge over a run.
     *
     * @param electrode "cathode" or "anode"
     * @param words what the charge did, in plain words ("depositing Cu", "hydrogen")
     * @param chargeC the charge (C), positive in the electrode's own direction (a reduction at the cathode, an
     *     oxidation at the anode), negative against it (the deposit redissolving at the cathode)
     * @param share {@code chargeC} over the charge passed; an electrode's shares sum to 1
     * @param corrosion true for the deposit redissolving (corrosion of the deposit by an oxidant in the bath)
     */
    public record Part(String electrode, String words, double chargeC, double share, boolean corrosion) {
    }

    /**
     * Each electrode's charge split by what it did, merged by plain words, largest first. The charge of a
     * metal's deposition is its gross charge; what the bath's oxidants took back from the deposit (the run's
     * redissolved mass, at the charge number of the metal's main deposition reaction) is a part of its own
     * with a negative charge, so that an electrode's parts still sum to the charge passed (Kirchhoff: the
     * partial currents of an electrode sum to the cell current). After a dendrite short the current passes
     * through the dendrite: that charge is a part of its own ({@link #SHORT}).
     *
     * @param r a run
     * @param library the chemistry library it ran with (the scenario's changes are applied here)
     * @return the cathode's parts, then the anode's
     */
    public static List<Part> parts(RunResult r, ChemLibrary library) {
        double q = r.summary().chargeC();
        ChemLibrary chem = ScenarioChemistry.apply(library, r.scenario());
        List<Part> out = new ArrayList<>();
        for (String electrode : new String[] {"cathode", "anode"}) {
            double sign = electrode.equals("cathode") ? -1 : 1;
            Map<String, Double> byWords = new java.util.LinkedHashMap<>();
            Map<String, Double> corrosion = new java.util.LinkedHashMap<>();
            Map<String, String> mainDeposition = new java.util.HashMap<>();
            Map<String, Double> mainCharge = new java.util.HashMap<>();
            for (Map.Entry<String, Double> e : r.summary().reactionChargeC().entrySet()) {
                if (!e.getKey().startsWith(electrode + ":")) {
                    continue;
                }
                String couple = e.getKey().substring(electrode.length() + 1);
                double c = sign * e.getValue();
                byWords.merge(PlainWords.of(couple, e.getValue() < 0), c, Double::sum);
                Optional<ElectrodeReaction> rx = chem.findReaction(couple);
                Optional<String> metal = rx.flatMap(ElectrodeReaction::depositedMetal);
                if (sign < 0 && metal.isPresent() && Math.abs(c) > mainCharge.getOrDefault(metal.get(), -1.0)) {
                    mainCharge.put(metal.get(), Math.abs(c));
                    mainDeposition.put(metal.get(), couple);
                }
            }
            for (Map.Entry<String, String> d : mainDeposition.entrySet()) {
                double kg = r.summary().corrodedKg().getOrDefault(d.getKey(), 0.0);
                Optional<Metal> metal = chem.findMetal(d.getKey());
                Optional<ElectrodeReaction> rx = chem.findReaction(d.getValue());
                if (kg > 0 && metal.isPresent() && rx.isPresent()) {
                    double c = kg / metal.get().molarMassKgPerMol() * rx.get().n() * PhysicalConstants.FARADAY;
                    byWords.merge(PlainWords.of(d.getValue(), true), c, Double::sum);
                    corrosion.put(String.format(CORROSION, d.getKey()), -c);
                }
            }
            List<Part> parts = new ArrayList<>();
            byWords.forEach((w, c) -> parts.add(new Part(electrode, w, c, q > 0 ? c / q : 0, false)));
            corrosion.forEach((w, c) -> parts.add(new Part(electrode, w, c, q > 0 ? c / q : 0, true)));
            double reacted = parts.stream().mapToDouble(Part::chargeC).sum();
            if (r.summary().shortCircuitS() != null && q - reacted > SHORT_SLACK * q) {
                // once shorted, the current passes through the dendrite and drives no reaction
                parts.add(new Part(electrode, SHORT, q - reacted, (q - reacted) / q, false));
            }
            parts.sort((a, b) -> Double.compare(b.chargeC(), a.chargeC()));
            out.addAll(parts);
        }
        return out;
    }

    /**
     * @param r a run
     * @return one line per electrode, shares above 0.05 % of the charge
     */
    public static List<String> lines(RunResult r) {
        double q = r.summary().chargeC();
        List<String> out = new ArrayList<>();
        for (String electrode : new String[] {"cathode", "anode"}) {
            List<Map.Entry<String, Double>> parts = new ArrayList<>();
            for (Map.Entry<String, Double> e : r.summary().reactionChargeC().entrySet()) {
                if (e.getKey().startsWith(electrode + ":")) {
                    parts.add(e);
                }
            }
            Map<String, Double> byWords = new java.util.LinkedHashMap<>();
            for (Map.Entry<String, Double> e : parts) {
                String couple = e.getKey().substring(electrode.length() + 1);
                String words = org.cellwright.sim.PlainWords.of(couple, e.getValue() < 0);
                byWords.merge(words, q > 0 ? Math.abs(e.getValue()) / q : 0, Double::sum);
            }
            List<Map.Entry<String, Double>> shares = new ArrayList<>(byWords.entrySet());
            shares.sort((a, b) -> Double.compare(b.getValue(), a.getValue()));
            StringBuilder sb = new StringBuilder();
            for (Map.Entry<String, Double> e : shares) {
                if (e.getValue() < 5e-4) {
                    continue;
                }
                sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey())
                        .append(String.format(Locale.ROOT, " %.1f %%", e.getValue() * 100));
            }
            out.add(String.format(Locale.ROOT, "    %-8s %s", electrode, sb.length() == 0 ? "-" : sb.toString()));
        }
        return out;
    }
}
