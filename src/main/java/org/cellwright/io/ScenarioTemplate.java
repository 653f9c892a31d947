package org.cellwright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.ScenarioFamily;
import org.tomlj.Toml;
import org.tomlj.TomlParseResult;

/**
 * A scenario file with some keys left free, for a fit: each set of values is applied as {@code --set
 * key=value} options (bare SI numbers) on top of the file and the user's own {@code --set} options, and the
 * scenario is read again, so a fitted value passes the same checks as one written in the file and any numeric
 * key of the scenario can be free.
 *
 * <p>Reading the scenario again costs a fraction of an engine run (measured: 3 to 7 ms against 6 to 40 ms
 * for the shipped scenarios). Free keys are located as {@code (from --free):N:1}, N being the key's
 * place in the list.
 */
public final class ScenarioTemplate implements ScenarioFamily {

    /** File name used in problem locations for the list of free keys. */
    public static final String FROM_FREE = "(from --free)";

    private final String text;
    private final String fileName;
    private final List<String> sets;
    private final ScenarioReader reader;
    private final ScenarioReader.Result base;
    private final List<FreeParameter> parameters;

    private ScenarioTemplate(String text, String fileName, List<String> sets, ScenarioReader reader,
                             ScenarioReader.Result base, List<FreeParameter> parameters) {
        this.text = text;
        this.fileName = fileName;
        this.sets = List.copyOf(sets);
        this.reader = reader;
        this.base = base;
        this.parameters = List.copyOf(parameters);
    }

    /**
     * @param file the scenario file
     * @param sets the user's {@code --set} options
     * @param keys the keys to free, as dotted paths
     * @param library the chemistry library
     * @return the template
     * @throws ScenarioException for a bad file, a bad {@code --set}, or a key that has no numeric value
     */
    public static ScenarioTemplate load(Path file, List<String> sets, List<String> keys, ChemLibrary library)
            throws ScenarioException {
        String name = file.toString();
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(Files.readAllBytes(file))).toString();
        } catch (NoSuchFileException e) {
            throw problem(name, 0, "", "no such file");
        } catch (CharacterCodingException e) {
            throw problem(name, 0, "", "the file is not UTF-8 text");
        } catch (IOException e) {
            throw problem(name, 0, "", "cannot read the file: " + e.getMessage());
        }
        return parse(text, name, sets, keys, library);
    }

    /**
     * @param text the scenario's TOML text
     * @param fileName the name used in problem locations
     * @param sets the user's {@code --set} options
     * @param keys the keys to free, as dotted paths
     * @param library the chemistry library
     * @return the template
     * @throws ScenarioException for a bad scenario, a bad {@code --set}, or a key that has no numeric value
     */
    public static ScenarioTemplate parse(String text, String fileName, List<String> sets, List<String> keys,
                                         ChemLibrary library) throws ScenarioException {
        ScenarioReader reader = new ScenarioReader(library);
        ScenarioReader.Result base = reader.parse(text, fileName, sets);
        List<FreeParameter> params = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        List<String> seen = new ArrayList<>();
        for (int i = 0; i < keys.size(); i++) {
            String key = keys.get(i).strip();
            List<String> path = OverrideApplier.path(key);
            String message = null;
            if (path.size() < 2) {
                message = "not a scenario key; write a dotted path such as cell.diffusion_layer or reaction.H+/H2.i0";
            } else if (path.get(0).equals("run")) {
                message = "run settings are not model parameters; free a value of the bath, electrodes, cell,"
                        + " supply, species or reactions";
            } else if (seen.contains(String.join(".", path))) {
                message = "given twice";
            }
            if (message == null) {
                Optional<Double> start = ScenarioValues.known(path, base.scenario(), library);
                if (start.isEmpty()) {
                    start = written(text, sets, path);
                }
                if (start.isEmpty() || !Double.isFinite(start.get())) {
                    message = "has no numeric value in the scenario to start from; write it in the file or give it"
                            + " with --set " + key + "=...";
                } else {
                    try {
                        FreeParameter p = ScenarioValues.parameter(key, path, start.get());
                        reader.parse(text, fileName, withValues(sets, List.of(p), new double[] {p.start()}));
                        params.add(p);
                    } catch (ScenarioException e) {
                        message = e.problems().stream().filter(Problem::isError).findFirst()
                                .map(Problem::message).orElse("the scenario does not accept this key");
                    } catch (IllegalArgumentException e) {
                        message = e.getMessage();
                    }
                }
            }
            if (message != null) {
                problems.add(new Problem(FROM_FREE, i + 1, 1, key, message, Problem.Severity.ERROR));
            }
            seen.add(String.join(".", path));
        }
        if (keys.isEmpty()) {
            problems.add(new Problem(FROM_FREE, 0, 0, "", "give at least one key to fit, e.g. --free "
                    + "cell.diffusion_layer", Problem.Severity.ERROR));
        }
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        return new ScenarioTemplate(text, fileName, sets, reader, base, params);
    }

    /** The value of a key as written in the file or in a --set option (the last one wins), read as TOML. */
    private static Optional<Double> written(String text, List<String> sets, List<String> path) {
        for (int i = sets.size() - 1; i >= 0; i--) {
            int eq = sets.get(i).indexOf('=');
            if (eq > 0 && OverrideApplier.path(sets.get(i).substring(0, eq)).equals(path)) {
                return number(Toml.parse("v = " + sets.get(i).substring(eq + 1).strip()).get("v"),
                        sets.get(i).substring(eq + 1).strip());
            }
        }
        TomlParseResult toml = Toml.parse(text);
        Object v = toml.hasErrors() ? null : toml.get(path);
        return number(v, null);
    }

    private static Optional<Double> number(Object v, String raw) {
        if (v instanceof Number n) {
            return Optional.of(n.doubleValue());
        }
        String s = v instanceof String str ? str : raw;
        if (s == null) {
            return Optional.empty();
        }
        try {
            return Optional.of(UnitParser.parse(s, "a value", List.of(Dimension.values())).si());
        } catch (UnitException e) {
            return Optional.empty();
        }
    }

    private static ScenarioException problem(String file, int line, String key, String message) {
        return new ScenarioException(List.of(new Problem(file, line, 0, key, message, Problem.Severity.ERROR)));
    }

    /** @return the user's --set options followed by one per free key with its value as a bare SI number */
    private static List<String> withValues(List<String> sets, List<FreeParameter> params, double[] values) {
        List<String> all = new ArrayList<>(sets);
        for (int j = 0; j < params.size(); j++) {
            all.add(setOption(params.get(j).key(), values[j]));
        }
        return all;
    }

    /**
     * @param key a scenario key
     * @param value its value (SI)
     * @return the {@code --set} option text that gives the key that value as a bare SI number
     */
    public static String setOption(String key, double value) {
        // Double.toString is the shortest text that reads back to the same double, and valid TOML ("1.2E-4")
        return key + "=" + Double.toString(value);
    }

    /** @return the scenario as written, with the user's --set options */
    public Scenario base() {
        return base.scenario();
    }

    /** @return the warnings found in the scenario */
    public List<Problem> warnings() {
        return base.warnings();
    }

    /** @return the scenario's file name */
    public String fileName() {
        return fileName;
    }

    @Override
    public List<FreeParameter> parameters() {
        return parameters;
    }

    @Override
    public Scenario at(double[] values) {
        Objects.requireNonNull(values, "values");
        if (values.length != parameters.size()) {
            throw new IllegalArgumentException("expected " + parameters.size() + " values, got " + values.length);
        }
        try {
            return reader.parse(text, fileName, withValues(sets, parameters, values)).scenario();
        } catch (ScenarioException e) {
            throw new IllegalArgumentException(e.problems().stream().filter(Problem::isError).findFirst()
                    .map(Problem::format).orElse("the scenario does not accept these values"), e);
        }
    }
}
