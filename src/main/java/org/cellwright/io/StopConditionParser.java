package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Metal;

/**
 * Reads the stop conditions of {@code run.stop}:
 * <ul>
 *   <li>{@code "short"} (also "short circuit"): stop when a dendrite bridges the gap;</li>
 *   <li>{@code "Sn2+ < 2 g/L"}: stop when a dissolved species falls below a concentration;</li>
 *   <li>{@code "T > 60 C"} (or "temperature"): stop when the bath gets warmer than a temperature;</li>
 *   <li>{@code "U > 8 V"} (or "V", "voltage"): stop when the cell voltage rises above a value;</li>
 *   <li>{@code "Sn > 100 g"}: stop when the deposit of a metal reaches a mass.</li>
 * </ul>
 * Errors carry the 1-based column within the condition's text.
 */
final class StopConditionParser {

    private static final Set<String> SHORT = Set.of("short", "short circuit", "short_circuit", "short-circuit");
    private static final Set<String> TEMPERATURE = Set.of("t", "temperature");
    private static final Set<String> VOLTAGE = Set.of("u", "v", "voltage", "cell_voltage");
    private static final String FORMS = "write e.g. \"short\", \"Sn2+ < 2 g/L\", \"T > 60 C\", \"U > 8 V\" or "
            + "\"Sn > 100 g\"";

    private final ChemLibrary library;
    private final SpeciesResolver species;

    StopConditionParser(ChemLibrary library, SpeciesResolver species) {
        this.library = library;
        this.species = species;
    }

    /**
     * @param text the condition as written
     * @return the stop condition, thresholds in SI units
     * @throws UnitException when it does not parse; the column points into {@code text}
     */
    StopCondition parse(String text) throws UnitException {
        String t = text.strip();
        if (SHORT.contains(t.toLowerCase(Locale.ROOT))) {
            return new StopCondition.ShortCircuit();
        }
        int op = indexOfOperator(text);
        if (op < 0) {
            throw new UnitException("cannot read the stop condition '" + t + "'; " + FORMS, column(text, 0));
        }
        boolean below = text.charAt(op) == '<';
        int rhsStart = op + 1 < text.length() && text.charAt(op + 1) == '=' ? op + 2 : op + 1;
        String lhs = text.substring(0, op).strip();
        String rhs = text.substring(rhsStart);
        int lhsColumn = column(text, 0);
        if (lhs.isEmpty()) {
            throw new UnitException("the stop condition needs a quantity before '" + text.charAt(op) + "'; " + FORMS,
                    op + 1);
        }
        String word = lhs.toLowerCase(Locale.ROOT);
        if (TEMPERATURE.contains(word)) {
            requireAbove(below, "a temperature stop", "T > 60 C", op);
            double k = rhs(rhs, rhsStart, r -> UnitParser.parse(r, Dimension.TEMPERATURE).si());
            if (!Range.LIQUID_WATER.contains(k)) {
                throw new UnitException("the temperature " + Range.LIQUID_WATER.words(), column(text, rhsStart));
            }
            return new StopCondition.TemperatureAbove(k);
        }
        if (VOLTAGE.contains(word)) {
            requireAbove(below, "a voltage stop", "U > 8 V", op);
            double v = rhs(rhs, rhsStart, r -> UnitParser.parse(r, Dimension.VOLTAGE).si());
            return new StopCondition.VoltageAbove(positive(v, "the voltage", text, rhsStart));
        }
        if (library.findMetal(lhs).isPresent()) {
            requireAbove(below, "a deposit stop", lhs + " > 100 g", op);
            double kg = rhs(rhs, rhsStart, r -> UnitParser.parse(r, Dimension.MASS).si());
            return new StopCondition.DepositAbove(lhs, positive(kg, "the mass", text, rhsStart));
        }
        var name = species.canonical(lhs);
        if (name.isPresent()) {
            if (!below) {
                throw new UnitException("a species stop is written '" + lhs + " < 2 g/L': the run stops when it "
                        + "falls below", op + 1);
            }
            double c = rhs(rhs, rhsStart, r -> UnitParser.concentration(r, species.molarMassKgPerMol(name.get())));
            if (!(c >= 0)) {
                throw new UnitException("the concentration must not be negative", column(text, rhsStart));
            }
            return new StopCondition.SpeciesBelow(name.get(), c);
        }
        List<String> names = new ArrayList<>(species.names());
        library.metals().stream().map(Metal::symbol).forEach(names::add);
        throw new UnitException("unknown species or metal '" + lhs + "'" + Spelling.closest(lhs, names)
                .map(s -> "; did you mean '" + s + "'?").orElse("; " + FORMS), lhsColumn);
    }

    /** Parses the right-hand side, moving error columns from the side's text into the condition's. */
    private static double rhs(String rhs, int rhsStart, RhsParser parser) throws UnitException {
        try {
            return parser.parse(rhs);
        } catch (UnitException e) {
            throw new UnitException(e.getMessage(), rhsStart + e.column());
        }
    }

    @FunctionalInterface
    private interface RhsParser {
        double parse(String rhs) throws UnitException;
    }

    private static void requireAbove(boolean below, String what, String example, int op) throws UnitException {
        if (below) {
            throw new UnitException(what + " is written '" + example + "': the run stops when it rises above",
                    op + 1);
        }
    }

    private static double positive(double v, String what, String text, int rhsStart) throws UnitException {
        if (!(v > 0)) {
            throw new UnitException(what + " must be greater than zero", column(text, rhsStart));
        }
        return v;
    }

    private static int indexOfOperator(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '<' || text.charAt(i) == '>') {
                return i;
            }
        }
        return -1;
    }

    /** @return the 1-based column of the first non-blank character at or after {@code from} */
    private static int column(String text, int from) {
        int i = from;
        while (i < text.length() && Character.isWhitespace(text.charAt(i))) {
            i++;
        }
        return i + 1;
    }
}
