package org.cellwright.ui;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Species;
import org.cellwright.io.Dimension;
import org.cellwright.io.Problem;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.io.Spelling;
import org.cellwright.io.UnitException;
import org.cellwright.io.UnitParser;
import org.cellwright.sim.CellSimulation;

/**
 * Checks the scenario form: each field as it is typed ({@link #field}: the unit parser and the library's
 * names, with the column of the mistake), and the whole draft ({@link #draft}: written as scenario text and
 * read by the same {@link ScenarioReader} as a file, so the window accepts exactly what the command line
 * accepts), each problem placed beside its field.
 */
final class DraftCheck {

    /**
     * A problem with one field.
     *
     * @param message what is wrong, in plain words
     * @param column 1-based column within the field's text, 0 when it concerns the whole value
     */
    record FieldError(String message, int column) {
        /** @return the message, with the column when there is one */
        String text() {
            return column > 0 ? message + " (at character " + column + ")" : message;
        }
    }

    /**
     * The outcome of checking a whole draft.
     *
     * @param scenario the scenario, or null when there are errors
     * @param fieldErrors errors by field key
     * @param generalErrors errors that belong to no field
     * @param warnings what the reader warns about (the scenario still runs), as "key: message"
     * @param text the scenario text that was read
     */
    record Outcome(Scenario scenario, Map<String, FieldError> fieldErrors, List<String> generalErrors,
                   List<String> warnings, String text) {
        /** @return true when the draft gives a runnable scenario */
        boolean ok() {
            return scenario != null;
        }
    }

    private DraftCheck() {
    }

    /**
     * Checks one field as typed, without the rest of the form.
     *
     * @param key the field key ({@link FormFields}; composition rows use {@link #species} and
     *     {@link #concentration})
     * @param text the text typed
     * @param supply how the supply is set (for the set value's dimension)
     * @param lib the chemistry library
     * @return the problem, if any
     */
    static Optional<FieldError> field(String key, String text, SupplyKind supply, ChemLibrary lib) {
        Optional<FieldSpec> spec = FormFields.find(key);
        if (spec.isEmpty()) {
            return Optional.empty();
        }
        String t = text == null ? "" : text;
        if (t.isBlank()) {
            boolean required = spec.get().required() && !(key.equals(FormFields.SUPPLY_VALUE) && supply == SupplyKind.SCHEDULE);
            return required ? Optional.of(new FieldError("needed, e.g. " + example(key, supply), 0)) : Optional.empty();
        }
        Dimension dim = key.equals(FormFields.SUPPLY_VALUE) ? FormFields.supplyDimension(supply) : spec.get().dimension();
        if (dim != null) {
            try {
                UnitParser.parse(t, dim);
            } catch (UnitException e) {
                return Optional.of(new FieldError(e.getMessage(), e.column()));
            }
            return Optional.empty();
        }
        if (key.endsWith(".material") && lib.findMaterial(t).isEmpty()) {
            List<String> names = lib.materials().stream().map(ElectrodeMaterial::name).toList();
            return Optional.of(new FieldError("no electrode material '" + t.strip() + "' in the library"
                    + Spelling.suggestion(t.strip(), names), 0));
        }
        if (key.equals("run.target") && lib.findMetal(t.strip()).isEmpty()) {
            List<String> symbols = lib.metals().stream().map(Metal::symbol).toList();
            return Optional.of(new FieldError("no metal '" + t.strip() + "' in the library"
                    + Spelling.suggestion(t.strip(), symbols), 0));
        }
        return Optional.empty();
    }

    /**
     * @param name a species as typed in a composition row
     * @param lib the chemistry library
     * @return the problem, if any
     */
    static Optional<FieldError> species(String name, ChemLibrary lib) {
        if (name == null || name.isBlank()) {
            return Optional.of(new FieldError("name the species, e.g. Cu2+", 0));
        }
        if (lib.findSpecies(name.strip()).isEmpty()) {
            List<String> names = lib.species().stream().map(Species::name).toList();
            return Optional.of(new FieldError("no species '" + name.strip() + "' in the library"
                    + Spelling.suggestion(name.strip(), names), 0));
        }
        return Optional.empty();
    }

    /**
     * @param species the row's species as typed
     * @param text the concentration as typed
     * @param lib the chemistry library (molar mass for g/L and the like)
     * @return the problem, if any
     */
    static Optional<FieldError> concentration(String species, String text, ChemLibrary lib) {
        double molarMass = species == null ? Double.NaN
                : lib.findSpecies(species.strip()).map(Species::molarMassKgPerMol).orElse(Double.NaN);
        try {
            double c = UnitParser.concentration(text, molarMass);
            if (c < 0) {
                return Optional.of(new FieldError("a concentration cannot be negative", 1));
            }
        } catch (UnitException e) {
            return Optional.of(new FieldError(e.getMessage(), e.column()));
        }
        return Optional.empty();
    }

    /**
     * Checks the whole draft as the scenario reader reads a file, then checks that the chemistry can run.
     *
     * @param d the draft
     * @param lib the chemistry library
     * @param fileName the file's name, for messages
     * @return the scenario or the problems, each beside its field where it has one
     */
    static Outcome draft(ScenarioDraft d, ChemLibrary lib, String fileName) {
        DraftToml.Text written = DraftToml.write(d);
        Map<String, FieldError> fieldErrors = new LinkedHashMap<>();
        List<String> general = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        Scenario scenario = null;
        try {
            ScenarioReader.Result r = new ScenarioReader(lib).parse(written.text(), fileName, List.of());
            for (Problem p : r.warnings()) {
                String key = fieldOf(p, written);
                FormFields.find(key == null ? "" : key).map(FieldSpec::label)
                        .ifPresentOrElse(label -> warnings.add(label + ": " + p.message()),
                                () -> warnings.add((p.key().isEmpty() ? "" : p.key() + ": ") + p.message()));
            }
            scenario = r.scenario();
            CellSimulation.layout(scenario, lib);
        } catch (ScenarioException e) {
            scenario = null;
            for (Problem p : e.errors()) {
                String key = fieldOf(p, written);
                if (key != null && !fieldErrors.containsKey(key)) {
                    fieldErrors.put(key, new FieldError(p.message(), columnIn(p, written)));
                } else if (key == null) {
                    general.add(p.format());
                }
            }
        } catch (IllegalArgumentException e) {
            scenario = null;
            general.add(e.getMessage());
        }
        return new Outcome(scenario, Map.copyOf(fieldErrors), List.copyOf(general), List.copyOf(warnings),
                written.text());
    }

    /** @return the field a problem belongs to: by the line it was found on, else by its key; null for none */
    static String fieldOf(Problem p, DraftToml.Text written) {
        String byLine = written.keyOfLine().get(p.line());
        if (byLine != null) {
            return byLine;
        }
        String key = p.key();
        if (key.startsWith("supply.") && SupplyKind.ofKey(key.substring("supply.".length())) != null) {
            return FormFields.SUPPLY_VALUE;
        }
        if (key.equals("cell.agitation") || key.equals("cell.diffusion_layer")) {
            return key;
        }
        return FormFields.find(key).isPresent() ? key : null;
    }

    private static int columnIn(Problem p, DraftToml.Text written) {
        Integer start = written.valueColumnOfLine().get(p.line());
        if (start == null || p.column() < start) {
            return 0;
        }
        return p.column() - start + 1;
    }

    private static String example(String key, SupplyKind supply) {
        if (key.equals(FormFields.SUPPLY_VALUE)) {
            return FormFields.supplyDimension(supply).example();
        }
        return FormFields.find(key).map(FieldSpec::example).orElse("");
    }
}
