package org.cellwright.io;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.study.LoggedQuantity;

/**
 * The header names of a measured run log: the time column ({@code time_s}, {@code time_min}, {@code time_h})
 * and the quantity columns ({@code current_A}, {@code cell_voltage_V}, {@code deposit_g},
 * {@code c_<species>_g_per_L}; also {@code c_<species>_mol_per_L} and {@code temperature_C}, as the run
 * CSV writes them).
 */
final class RunLogColumns {

    /** Time columns and their length in seconds (source: SI Brochure, 9th ed., table 8: min = 60 s, h = 3600 s). */
    static final List<String> TIME = List.of("time_s", "time_min", "time_h");
    static final double[] TIME_FACTOR = {1, 60, 3600};
    static final List<String> FIXED = List.of("current_A", "cell_voltage_V", "deposit_g", "temperature_C");
    static final List<String> EXAMPLES = List.of("current_A", "cell_voltage_V", "deposit_g", "c_Cu2+_g_per_L",
            "c_Cu2+_mol_per_L", "temperature_C");

    /**
     * A recognised quantity column.
     *
     * @param quantity what it measures
     * @param species the canonical species name of a concentration, else null
     */
    record Quantity(LoggedQuantity quantity, String species) {
    }

    private RunLogColumns() {
    }

    /** @return the index of a time column name in {@link #TIME}, or -1 */
    static int timeIndex(String name) {
        return TIME.indexOf(name);
    }

    /**
     * @param name a header cell
     * @param library where species are looked up
     * @return the quantity it names, or empty when it names none
     * @throws IllegalArgumentException for a concentration column of an unknown species (message says so)
     */
    static Optional<Quantity> quantity(String name, ChemLibrary library) {
        switch (name) {
            case "current_A":
                return Optional.of(new Quantity(LoggedQuantity.CURRENT, null));
            case "cell_voltage_V":
                return Optional.of(new Quantity(LoggedQuantity.CELL_VOLTAGE, null));
            case "deposit_g":
                return Optional.of(new Quantity(LoggedQuantity.DEPOSIT, null));
            case "temperature_C":
                return Optional.of(new Quantity(LoggedQuantity.TEMPERATURE, null));
            default:
                break;
        }
        LoggedQuantity q;
        String raw;
        if (name.startsWith("c_") && name.endsWith("_g_per_L") && name.length() > 10) {
            q = LoggedQuantity.CONCENTRATION_G_PER_L;
            raw = name.substring(2, name.length() - 8);
        } else if (name.startsWith("c_") && name.endsWith("_mol_per_L") && name.length() > 12) {
            q = LoggedQuantity.CONCENTRATION_MOL_PER_L;
            raw = name.substring(2, name.length() - 10);
        } else {
            return Optional.empty();
        }
        Optional<Species> sp = library.findSpecies(raw);
        if (sp.isEmpty()) {
            throw new IllegalArgumentException("unknown species '" + raw + "' in the column name"
                    + Spelling.suggestion(raw, library.species().stream().map(Species::name).toList()));
        }
        return Optional.of(new Quantity(q, sp.get().name()));
    }

    /** @return a hint for a header cell that names no known column */
    static String unknownHint(String name) {
        List<String> known = new java.util.ArrayList<>(TIME);
        known.addAll(FIXED);
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.startsWith("c_")) {
            return "; a concentration column is c_<species>_g_per_L or c_<species>_mol_per_L, e.g. c_Cu2+_g_per_L";
        }
        return Spelling.closest(name, known).map(s -> "; did you mean '" + s + "'?")
                .orElse("; known columns: " + String.join(", ", EXAMPLES));
    }
}
