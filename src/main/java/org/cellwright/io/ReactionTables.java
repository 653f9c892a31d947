package org.cellwright.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.ReactionEquation;
import org.cellwright.chem.Species;

/**
 * Reads {@code [reaction."Ox/Red"]} and {@code [homogeneous."name"]} tables of a chemistry data file against
 * the species, metals and materials already read. Same conventions as {@link LibraryReader}.
 */
final class ReactionTables {

    private static final Set<String> REACTION_KEYS = Set.of("note", "equation", "e0", "de0dt", "i0", "alpha_a",
            "alpha_c", "on", "requires");
    /** Keys that carry a {@code _source}: the numbers, and the species a reaction requires. */
    private static final Set<String> REACTION_SOURCED = Set.of("e0", "de0dt", "i0", "alpha_a", "alpha_c", "requires");
    private static final Set<String> KINETICS_KEYS = Set.of("note", "i0", "alpha_a", "alpha_c");
    private static final Set<String> KINETICS_NUMBERS = Set.of("i0", "alpha_a", "alpha_c");
    private static final Set<String> HOMOGENEOUS_KEYS = Set.of("note", "equation", "rate_constant", "orders");
    private static final Set<String> HOMOGENEOUS_NUMBERS = Set.of("rate_constant", "orders");

    private final ChemLibrary vocabulary;

    ReactionTables(ChemLibrary vocabulary) {
        this.vocabulary = vocabulary;
    }

    ElectrodeReaction electrode(DataTable t, String couple) throws LibraryFormatException {
        t.allowOnly(REACTION_KEYS, REACTION_SOURCED);
        String equationText = t.string("equation");
        ReactionEquation equation;
        try {
            equation = ReactionEquation.parseElectrode(equationText, vocabulary);
        } catch (IllegalArgumentException e) {
            throw t.error("equation", e.getMessage());
        }
        String name = checkCouple(t, couple, equation);
        Map<String, String> sources = new LinkedHashMap<>();
        double e0 = t.quantity("e0", LibraryUnits.POTENTIAL, "V");
        sources.put("e0", t.source("e0"));
        double dE0dT = 0;
        if (t.has("de0dt")) {
            dE0dT = t.quantity("de0dt", LibraryUnits.POTENTIAL_PER_KELVIN, "mV/K");
            sources.put("de0dt", t.source("de0dt"));
        } else {
            sources.put("de0dt", "not given: taken as 0");
        }
        Kinetics kinetics = kinetics(t);
        sources.put("i0", t.source("i0"));
        sources.put("alpha_a", t.source("alpha_a"));
        sources.put("alpha_c", t.source("alpha_c"));
        if (t.has("note")) {
            sources.put("note", t.string("note"));
        }
        List<String> requires = new ArrayList<>();
        for (String ligand : t.strings("requires")) {
            requires.add(vocabulary.findSpecies(ligand).map(Species::name).orElseThrow(
                    () -> t.error("requires", "unknown species '" + ligand + "' (not in the [species] tables)")));
        }
        if (!requires.isEmpty()) {
            sources.put("requires", t.source("requires"));
        }
        Map<String, Kinetics> byMaterial = new LinkedHashMap<>();
        if (t.has("on")) {
            DataTable on = t.table("on");
            for (String materialName : on.keys()) {
                Optional<ElectrodeMaterial> material = vocabulary.findMaterial(materialName);
                if (material.isEmpty()) {
                    throw on.error(materialName, "unknown electrode material (not in the [material] tables)");
                }
                DataTable k = on.table(materialName);
                k.allowOnly(KINETICS_KEYS, KINETICS_NUMBERS);
                if (byMaterial.put(material.get().name(), kinetics(k)) != null) {
                    throw on.error(materialName, "kinetics for material " + material.get().name() + " given twice");
                }
            }
        }
        try {
            return new ElectrodeReaction(name, equation.text(), equation.electrons(), equation.participants(), e0,
                    dE0dT, kinetics, byMaterial, sources, requires);
        } catch (IllegalArgumentException e) {
            throw t.error(null, e.getMessage());
        }
    }

    private Kinetics kinetics(DataTable t) throws LibraryFormatException {
        double i0 = t.quantity("i0", LibraryUnits.CURRENT_DENSITY, "A/m2");
        double alphaA = t.quantity("alpha_a", LibraryUnits.NONE, "(no unit)");
        double alphaC = t.quantity("alpha_c", LibraryUnits.NONE, "(no unit)");
        String si = t.source("i0");
        String sa = t.source("alpha_a");
        String sc = t.source("alpha_c");
        String source;
        if (si.equals(sa) && sa.equals(sc)) {
            source = si;
        } else if (sa.equals(sc)) {
            source = "i0: " + si + "; alpha_a, alpha_c: " + sa;
        } else {
            source = "i0: " + si + "; alpha_a: " + sa + "; alpha_c: " + sc;
        }
        try {
            return new Kinetics(i0, alphaA, alphaC, source);
        } catch (IllegalArgumentException e) {
            throw t.error(null, e.getMessage());
        }
    }

    /** Checks that "Ox/Red" names a participant of each side and returns the couple in canonical notation. */
    private String checkCouple(DataTable t, String couple, ReactionEquation equation) throws LibraryFormatException {
        int slash = couple.indexOf('/');
        if (slash <= 0 || slash == couple.length() - 1 || couple.indexOf('/', slash + 1) >= 0) {
            throw t.error(null, "a reaction is named by its couple 'Ox/Red', e.g. \"Cu2+/Cu\", not '" + couple + "'");
        }
        String ox = participantName(couple.substring(0, slash).strip());
        String red = participantName(couple.substring(slash + 1).strip());
        if (!(equation.coefficientOf(ox) < 0)) {
            throw t.error("equation", "the oxidised form '" + couple.substring(0, slash)
                    + "' of the couple is not on the left side of the equation");
        }
        if (!(equation.coefficientOf(red) > 0)) {
            throw t.error("equation", "the reduced form '" + couple.substring(slash + 1)
                    + "' of the couple is not on the right side of the equation");
        }
        return vocabulary.canonicalCouple(couple).orElse(couple);
    }

    private String participantName(String written) {
        String base = written;
        for (String suffix : new String[] {"(aq)", "(g)", "(s)", "(l)"}) {
            if (base.toLowerCase(Locale.ROOT).endsWith(suffix)) {
                base = base.substring(0, base.length() - suffix.length()).strip();
            }
        }
        return vocabulary.findSpecies(base).map(Species::name).orElse(base);
    }

    HomogeneousReaction homogeneous(DataTable t, String name) throws LibraryFormatException {
        t.allowOnly(HOMOGENEOUS_KEYS, HOMOGENEOUS_NUMBERS);
        String equationText = t.string("equation");
        ReactionEquation equation;
        try {
            equation = ReactionEquation.parseHomogeneous(equationText, vocabulary);
        } catch (IllegalArgumentException e) {
            throw t.error("equation", e.getMessage());
        }
        Map<String, Double> orders = new LinkedHashMap<>();
        String ordersSource;
        if (t.has("orders")) {
            DataTable o = t.table("orders");
            for (String written : o.keys()) {
                String species = participantName(written);
                boolean reactant = equation.participants().stream()
                        .anyMatch(p -> p.name().equals(species) && p.coefficient() < 0 && p.phase() == Phase.DISSOLVED);
                if (!reactant) {
                    throw o.error(written, "is not a dissolved reactant of " + equationText);
                }
                double order = o.plainNumber(written);
                if (!(order >= 0)) {
                    throw o.error(written, "reaction order must be >= 0");
                }
                orders.put(species, order);
            }
            ordersSource = t.source("orders");
        } else {
            for (Participant p : equation.participants()) {
                if (p.coefficient() < 0 && p.phase() == Phase.DISSOLVED) {
                    orders.put(p.name(), -p.coefficient());
                }
            }
            ordersSource = "mass action: orders equal to the stoichiometric coefficients of the reactants";
        }
        double overall = orders.values().stream().mapToDouble(Double::doubleValue).sum();
        if (overall != Math.rint(overall)) {
            throw t.error("orders", "the overall order must be a whole number to give the rate constant a unit");
        }
        double k = t.quantity("rate_constant", LibraryUnits.rateConstant((int) overall),
                overall == 1 ? "s-1" : overall == 2 ? "L/mol/s" : "L" + ((int) overall - 1) + "/mol"
                        + ((int) overall - 1) + "/s");
        String source = t.source("rate_constant") + "; orders: " + ordersSource;
        try {
            return new HomogeneousReaction(name, equation.text(), equation.participants(), k, orders, source);
        } catch (IllegalArgumentException e) {
            throw t.error(null, e.getMessage());
        }
    }
}
