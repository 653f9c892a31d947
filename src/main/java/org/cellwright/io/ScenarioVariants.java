package org.cellwright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.AxisValue;
import org.cellwright.study.GridPoint;
import org.cellwright.study.PointScenarios;
import org.cellwright.study.SweepAxis;

/**
 * The scenarios of a sweep: a base scenario file read once, and for each grid point the same text read again
 * with the point's values added as {@code --set key=value} options after the user's own. Reading the TOML
 * text costs well under a millisecond against several milliseconds for a run (measured for the shipped
 * scenarios), so the values go through exactly the checks of a value written in the file.
 */
public final class ScenarioVariants implements PointScenarios {

    private final ScenarioReader reader;
    private final String text;
    private final String fileName;
    private final List<String> baseSets;
    private final List<SweepAxis> axes;
    private final ScenarioReader.Result base;

    private ScenarioVariants(ChemLibrary library, String text, String fileName, List<String> baseSets,
                             List<SweepAxis> axes) throws ScenarioException {
        this.reader = new ScenarioReader(library);
        this.text = text;
        this.fileName = fileName;
        this.baseSets = List.copyOf(baseSets);
        this.axes = List.copyOf(axes);
        this.base = reader.parse(text, fileName, this.baseSets);
    }

    /**
     * Reads the base file and checks it with the user's own {@code --set} options.
     *
     * @param library the chemistry
     * @param file the base scenario
     * @param baseSets the user's {@code --set} options, applied before each point's values
     * @param axes the varied keys, in the order of the grid point's values
     * @return the variants
     * @throws ScenarioException when the file cannot be read or the base scenario is invalid
     */
    public static ScenarioVariants of(ChemLibrary library, Path file, List<String> baseSets, List<SweepAxis> axes)
            throws ScenarioException {
        String name = file.toString();
        try {
            String text = StandardCharsets.UTF_8.newDecoder()
                    .decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file))).toString();
            return new ScenarioVariants(library, text, name, baseSets, axes);
        } catch (NoSuchFileException e) {
            throw new ScenarioException(List.of(new Problem(name, 0, 0, "", "no such file", Problem.Severity.ERROR)));
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new ScenarioException(List.of(new Problem(name, 0, 0, "", "the file is not UTF-8 text",
                    Problem.Severity.ERROR)));
        } catch (IOException e) {
            throw new ScenarioException(List.of(new Problem(name, 0, 0, "", "cannot read the file: " + e.getMessage(),
                    Problem.Severity.ERROR)));
        }
    }

    /**
     * The variants of scenario text held in memory (the window's form, as the scenario reader reads it).
     *
     * @param library the chemistry
     * @param text the base scenario's TOML text
     * @param name the name problems are reported under
     * @param baseSets {@code key=value} options applied before each point's values
     * @param axes the varied keys, in the order of the grid point's values
     * @return the variants
     * @throws ScenarioException when the base scenario is invalid
     */
    public static ScenarioVariants ofText(ChemLibrary library, String text, String name, List<String> baseSets,
                                          List<SweepAxis> axes) throws ScenarioException {
        return new ScenarioVariants(library, text, name, baseSets, axes);
    }

    /** @return the base scenario (with the user's {@code --set} options) and its warnings */
    public ScenarioReader.Result base() {
        return base;
    }

    /**
     * @param point a grid point
     * @return the {@code key=value} options that set its values, in axis order
     */
    public List<String> setsOf(GridPoint point) {
        List<String> sets = new ArrayList<>();
        for (int a = 0; a < axes.size(); a++) {
            sets.add(axes.get(a).key() + "=" + tomlValue(point.values().get(a)));
        }
        return sets;
    }

    @Override
    public Scenario scenarioAt(GridPoint point) {
        Objects.requireNonNull(point, "point");
        List<String> sets = new ArrayList<>(baseSets);
        sets.addAll(setsOf(point));
        try {
            return reader.parse(text, fileName, sets).scenario();
        } catch (ScenarioException e) {
            throw new IllegalArgumentException(e.errors().stream()
                    .map(p -> p.key().isEmpty() ? p.message() : p.key() + ": " + p.message())
                    .distinct().collect(Collectors.joining("; ")));
        }
    }

    /** A value as TOML: numbers with a unit and words as strings, bare numbers as numbers. */
    static String tomlValue(AxisValue v) {
        String t = v.text();
        if (t.startsWith("\"") || t.startsWith("'") || t.startsWith("[") || t.startsWith("{")
                || t.equals("true") || t.equals("false")) {
            return t;
        }
        try {
            Double.parseDouble(t);
            return t;
        } catch (NumberFormatException e) {
            return "\"" + t.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
        }
    }
}
