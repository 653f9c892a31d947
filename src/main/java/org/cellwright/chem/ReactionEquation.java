package org.cellwright.chem;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A reaction equation read from its written form, with signed stoichiometry and checked charge and element
 * balance. Pure: it reads nothing but the text and the species and metals of a {@link ChemLibrary}.
 *
 * <p>Electrode reactions are written as reductions, {@code "O2 + 4H+ + 4e- = 2H2O"}: electrons on the left,
 * {@code =} (or {@code <=>}) between the sides. Homogeneous reactions use {@code ->}:
 * {@code "2Fe3+ + Sn2+ -> 2Fe2+ + Sn4+"}. Terms are separated by a {@code +} with a space before it, so
 * that the charge signs of {@code "H+ + e-"} are not taken for separators; a coefficient may precede a term
 * ({@code 2H2O}, {@code 2 H2O}).
 *
 * <p>Phases: {@code H2O} is water; in an electrode reaction {@code H2}, {@code O2} and {@code Cl2} are gases;
 * a metal symbol of the library is a solid; a species of the library (any accepted notation) is dissolved.
 * In a homogeneous reaction dissolved species win over gases (dissolved {@code Cl2}). A suffix {@code (aq)},
 * {@code (g)}, {@code (s)} or {@code (l)} forces the phase: {@code Cl2(aq) + 2e- = 2Cl-}.
 *
 * <p>Checks: charge balance {@code sum(nu_i z_i) + n = 0} with the signs of {@link Participant} (oxidised
 * side negative), and element balance when the composition of every participant is known.
 *
 * @param text the equation as written
 * @param electrons electrons transferred, n (0 for a homogeneous reaction)
 * @param participants signed stoichiometry: left side negative, right side positive; no electrons
 */
public record ReactionEquation(String text, int electrons, List<Participant> participants) {

    private static final Set<String> GASES = Set.of("H2", "O2", "Cl2", "N2", "CO2");
    private static final Pattern COEFFICIENT = Pattern.compile("^(\\d+(?:\\.\\d+)?)?\\s*(.*)$");
    private static final Pattern ELEMENT = Pattern.compile("([A-Z][a-z]?)(\\d*)");
    private static final Pattern TERM_SEPARATOR = Pattern.compile("(?<=\\s)\\+");

    public ReactionEquation {
        participants = List.copyOf(participants);
    }

    /**
     * Reads an electrode reaction written as a reduction, {@code Ox + n e- = Red}.
     *
     * @param text the equation
     * @param library the species and metals that may appear
     * @return the parsed equation, {@code electrons > 0}
     * @throws IllegalArgumentException with a plain message when the text cannot be read or does not balance
     */
    public static ReactionEquation parseElectrode(String text, ChemLibrary library) {
        return parse(text, library, true);
    }

    /**
     * Reads a homogeneous reaction {@code reactants -> products} (no electrons).
     *
     * @param text the equation
     * @param library the species and metals that may appear
     * @return the parsed equation, {@code electrons == 0}
     * @throws IllegalArgumentException with a plain message when the text cannot be read or does not balance
     */
    public static ReactionEquation parseHomogeneous(String text, ChemLibrary library) {
        return parse(text, library, false);
    }

    /** @return the signed coefficient of the participant with this name, or 0 when it does not take part */
    public double coefficientOf(String name) {
        return participants.stream().filter(p -> p.name().equals(name)).mapToDouble(Participant::coefficient).sum();
    }

    private static ReactionEquation parse(String raw, ChemLibrary library, boolean electrode) {
        if (raw == null || raw.isBlank()) {
            throw new IllegalArgumentException("the equation is empty");
        }
        String text = raw.strip().replace('\u2212', '-').replace("\u2192", "->").replace("\u21cc", "<=>");
        String[] sides = splitSides(text, electrode);
        Map<String, Term> merged = new LinkedHashMap<>();
        int[] electrons = new int[2];
        for (int side = 0; side < 2; side++) {
            if (sides[side].isBlank()) {
                throw new IllegalArgumentException("'" + raw + "': the " + (side == 0 ? "left" : "right")
                        + " side is empty");
            }
            for (String termText : TERM_SEPARATOR.split(sides[side])) {
                readTerm(raw, termText.strip(), side, library, electrode, merged, electrons);
            }
        }
        if (electrode) {
            if (electrons[1] > 0) {
                throw new IllegalArgumentException("'" + raw + "': electrons on the right side; write the"
                        + " reaction as a reduction, 'Ox + n e- = Red'");
            }
            if (electrons[0] == 0) {
                throw new IllegalArgumentException("'" + raw + "': no electrons; an electrode reaction is written"
                        + " 'Ox + n e- = Red', e.g. 'Cu2+ + 2e- = Cu'");
            }
        } else if (electrons[0] + electrons[1] > 0) {
            throw new IllegalArgumentException("'" + raw + "': electrons in a homogeneous reaction");
        }
        List<Term> terms = merged.values().stream().filter(t -> Math.abs(t.coefficient) > 1e-12).toList();
        if (terms.stream().noneMatch(t -> t.coefficient < 0) || terms.stream().noneMatch(t -> t.coefficient > 0)) {
            throw new IllegalArgumentException("'" + raw + "': both sides must keep at least one participant");
        }
        int n = electrons[0];
        checkCharge(raw, terms, n);
        checkElements(raw, terms);
        List<Participant> participants = terms.stream()
                .map(t -> new Participant(t.name, t.coefficient, t.phase)).toList();
        return new ReactionEquation(raw.strip(), n, participants);
    }

    private static String[] splitSides(String text, boolean electrode) {
        if (electrode && text.contains("->")) {
            throw new IllegalArgumentException("'" + text + "': an electrode reaction is written with '=',"
                    + " as a reduction 'Ox + n e- = Red'");
        }
        String[] separators = electrode ? new String[] {"<=>", "="} : new String[] {"->", "<=>", "="};
        for (String sep : separators) {
            int at = text.indexOf(sep);
            if (at >= 0) {
                if (text.indexOf(sep, at + sep.length()) >= 0) {
                    throw new IllegalArgumentException("'" + text + "': '" + sep + "' appears more than once");
                }
                return new String[] {text.substring(0, at), text.substring(at + sep.length())};
            }
        }
        throw new IllegalArgumentException("'" + text + "': no " + (electrode
                ? "'=' between the sides (an electrode reaction is written 'Ox + n e- = Red')"
                : "'->' between reactants and products"));
    }

    private static void readTerm(String raw, String termText, int side, ChemLibrary library, boolean electrode,
                                 Map<String, Term> merged, int[] electrons) {
        if (termText.isEmpty()) {
            throw new IllegalArgumentException("'" + raw + "': a term is missing between two '+'");
        }
        Matcher m = COEFFICIENT.matcher(termText);
        if (!m.matches() || m.group(2).isBlank()) {
            throw new IllegalArgumentException("'" + raw + "': cannot read the term '" + termText + "'");
        }
        double coefficient = m.group(1) == null ? 1.0 : Double.parseDouble(m.group(1));
        if (coefficient <= 0) {
            throw new IllegalArgumentException("'" + raw + "': coefficient of '" + termText + "' must be > 0");
        }
        String name = m.group(2).strip();
        if (name.equals("e-") || name.equals("e")) {
            if (coefficient != Math.rint(coefficient)) {
                throw new IllegalArgumentException("'" + raw + "': the number of electrons must be a whole number");
            }
            electrons[side] += (int) coefficient;
            return;
        }
        Term resolved = resolve(raw, name, library, electrode);
        double signed = side == 0 ? -coefficient : coefficient;
        Term existing = merged.get(resolved.key());
        if (existing == null) {
            resolved.coefficient = signed;
            merged.put(resolved.key(), resolved);
        } else {
            existing.coefficient += signed;
        }
    }

    private static Term resolve(String raw, String written, ChemLibrary library, boolean electrode) {
        String name = written;
        Phase forced = null;
        String lower = written.toLowerCase(Locale.ROOT);
        for (var suffix : Map.of("(aq)", Phase.DISSOLVED, "(g)", Phase.GAS, "(s)", Phase.SOLID,
                "(l)", Phase.WATER).entrySet()) {
            if (lower.endsWith(suffix.getKey())) {
                forced = suffix.getValue();
                name = written.substring(0, written.length() - suffix.getKey().length()).strip();
            }
        }
        if (name.equals("H2O") && (forced == null || forced == Phase.WATER)) {
            return new Term("H2O", Phase.WATER, 0, formula("H2O"));
        }
        Optional<Species> species = library.findSpecies(name);
        boolean gasName = GASES.contains(name);
        if (forced == Phase.GAS || (forced == null && gasName && (electrode || species.isEmpty()))) {
            if (!gasName) {
                throw new IllegalArgumentException("'" + raw + "': '" + written + "' is not a known gas");
            }
            return new Term(name, Phase.GAS, 0, formula(name));
        }
        if (forced == null || forced == Phase.SOLID) {
            Optional<Metal> metal = library.findMetal(name);
            if (metal.isPresent()) {
                return new Term(name, Phase.SOLID, 0, Map.of(name, 1.0));
            }
            if (forced == Phase.SOLID) {
                throw new IllegalArgumentException("'" + raw + "': '" + written + "' is not a metal of the library");
            }
        }
        if (species.isPresent()) {
            Species s = species.get();
            Map<String, Double> elements = new TreeMap<>();
            s.elements().forEach((k, v) -> elements.put(k, v.doubleValue()));
            return new Term(s.name(), Phase.DISSOLVED, s.charge(), elements.isEmpty() ? null : elements);
        }
        throw new IllegalArgumentException("'" + raw + "': unknown species '" + written
                + "' (not in the library; a scenario may add it with a [species.\"" + name + "\"] table)");
    }

    private static Map<String, Double> formula(String formula) {
        Map<String, Double> out = new TreeMap<>();
        Matcher m = ELEMENT.matcher(formula);
        while (m.find()) {
            out.merge(m.group(1), m.group(2).isEmpty() ? 1.0 : Double.parseDouble(m.group(2)), Double::sum);
        }
        return out;
    }

    private static void checkCharge(String raw, List<Term> terms, int n) {
        double left = -n;
        double right = 0;
        for (Term t : terms) {
            if (t.coefficient < 0) {
                left += -t.coefficient * t.charge;
            } else {
                right += t.coefficient * t.charge;
            }
        }
        if (Math.abs(left - right) > 1e-9) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "'%s': charge does not balance: %s on the left%s, %s on the right", raw, signed(left),
                    n > 0 ? " (electrons included)" : "", signed(right)));
        }
    }

    private static void checkElements(String raw, List<Term> terms) {
        if (terms.stream().anyMatch(t -> t.elements == null)) {
            return;
        }
        Map<String, Double> net = new TreeMap<>();
        for (Term t : terms) {
            t.elements.forEach((el, count) -> net.merge(el, count * t.coefficient, Double::sum));
        }
        Set<String> unbalanced = new TreeSet<>();
        net.forEach((el, sum) -> {
            if (Math.abs(sum) > 1e-9) {
                unbalanced.add(el);
            }
        });
        if (!unbalanced.isEmpty()) {
            List<String> parts = new ArrayList<>();
            for (String el : unbalanced) {
                double left = 0;
                double right = 0;
                for (Term t : terms) {
                    double count = t.elements.getOrDefault(el, 0.0) * t.coefficient;
                    if (count < 0) {
                        left -= count;
                    } else {
                        right += count;
                    }
                }
                parts.add(String.format(Locale.ROOT, "%s %s on the left, %s on the right", el, plain(left),
                        plain(right)));
            }
            throw new IllegalArgumentException("'" + raw + "': elements do not balance: " + String.join("; ", parts));
        }
    }

    private static String signed(double q) {
        return (q > 0 ? "+" : "") + plain(q);
    }

    private static String plain(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    /** A participant while the equation is read. */
    private static final class Term {
        final String name;
        final Phase phase;
        final int charge;
        final Map<String, Double> elements;
        double coefficient;

        Term(String name, Phase phase, int charge, Map<String, Double> elements) {
            this.name = name;
            this.phase = phase;
            this.charge = charge;
            this.elements = elements;
        }

        String key() {
            return name + "|" + phase;
        }
    }
}
