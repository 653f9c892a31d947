package org.cellwright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.CellSetup;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.chem.ChemLibrary;
import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;

/**
 * Reads a scenario file (TOML, values with units; see docs/scenario-format.md) into a validated
 * {@link Scenario} in SI units, resolving species and electrode materials through a {@link ChemLibrary}.
 *
 * <p>Every problem is collected, each with file, line, column and key, and all are reported together in a
 * {@link ScenarioException}; reading never stops at the first. {@code --set key=value} options are applied
 * to the TOML before it is resolved, and checked the same way (see {@link OverrideApplier}).
 */
public final class ScenarioReader {

    static final Set<String> ROOT_KEYS = Set.of("title", "notes", "electrolyte", "cathode", "anode", "cell",
            "supply", "run", "species", "reaction", "deposit");

    private final ChemLibrary library;

    /**
     * A scenario read without errors, with the warnings found in it.
     *
     * @param scenario the scenario
     * @param warnings the warnings, in file order
     */
    public record Result(Scenario scenario, List<Problem> warnings) {
        public Result {
            Objects.requireNonNull(scenario, "scenario");
            warnings = List.copyOf(warnings);
        }
    }

    /** @param library the chemistry that species, materials, metals and reactions are resolved in */
    public ScenarioReader(ChemLibrary library) {
        this.library = Objects.requireNonNull(library, "library");
    }

    /** @return the scenario in {@code file} */
    public Scenario read(Path file) throws ScenarioException {
        return load(file, List.of()).scenario();
    }

    /** @return the scenario in {@code file}, with {@code --set} options applied */
    public Scenario read(Path file, List<String> sets) throws ScenarioException {
        return load(file, sets).scenario();
    }

    /**
     * Reads a scenario file.
     *
     * @param file the file
     * @param sets {@code key=value} overrides, in order
     * @return the scenario and its warnings
     * @throws ScenarioException with every problem, when there is at least one error
     */
    public Result load(Path file, List<String> sets) throws ScenarioException {
        String name = file.toString();
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(Files.readAllBytes(file))).toString();
        } catch (NoSuchFileException e) {
            throw fileProblem(name, "no such file");
        } catch (CharacterCodingException e) {
            throw fileProblem(name, "the file is not UTF-8 text");
        } catch (IOException e) {
            throw fileProblem(name, "cannot read the file: " + e.getMessage());
        }
        return parse(text, name, sets);
    }

    /**
     * Reads scenario text.
     *
     * @param text the TOML text
     * @param fileName the name used in problem locations
     * @param sets {@code key=value} overrides, in order
     * @return the scenario and its warnings
     * @throws ScenarioException with every problem, when there is at least one error
     */
    public Result parse(String text, String fileName, List<String> sets) throws ScenarioException {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        ProblemLog log = new ProblemLog();
        TomlParseResult parsed = Toml.parse(text);
        if (parsed.hasErrors()) {
            for (TomlParseError e : parsed.errors()) {
                var p = e.position();
                log.error(new SourceLocation(fileName, p == null ? 0 : p.line(), p == null ? 0 : p.column()), "",
                        "TOML syntax: " + e.getMessage());
            }
            throw new ScenarioException(log.problems());
        }
        TomlNode.Table root = TomlNode.of(parsed, new SourceLocation(fileName, 0, 0),
                SourceText.ofFile(fileName, text));
        OverrideApplier.apply(root, sets, log);
        Optional<Scenario> scenario;
        try {
            scenario = resolve(new SectionReader(root, "", log));
        } catch (IllegalArgumentException e) {
            // a range the checks above should have caught; still reported as bad input, not a crash
            log.error(new SourceLocation(fileName, 0, 0), "", e.getMessage());
            scenario = Optional.empty();
        }
        if (log.hasErrors() || scenario.isEmpty()) {
            throw new ScenarioException(log.problems());
        }
        return new Result(scenario.get(), log.warnings());
    }

    private Optional<Scenario> resolve(SectionReader root) {
        root.allowOnly(ROOT_KEYS);
        String title = root.string("title").orElse("");
        String notes = root.string("notes").orElse("");
        OverrideReader overrides = new OverrideReader(library);
        List<SpeciesOverride> speciesOverrides = overrides.species(root);
        SpeciesResolver species = new SpeciesResolver(library, speciesOverrides);
        ElectrolyteReader electrolyteReader = new ElectrolyteReader(species);
        Optional<Electrolyte> electrolyte = electrolyteReader.read(root);
        Optional<java.util.Map<String, Double>> anolyte = electrolyteReader.anolyte(root);
        CellReader cellReader = new CellReader(library);
        Optional<Electrode> cathode = cellReader.electrode(root, "cathode");
        Optional<Electrode> anode = cellReader.electrode(root, "anode");
        double bathK = electrolyte.map(Electrolyte::temperatureK).orElse(Double.NaN);
        Optional<CellSetup> cell = cellReader.cell(root, bathK,
                electrolyte.map(Electrolyte::volumeM3).orElse(Double.NaN), anolyte);
        Optional<PowerSupply> supply = new SupplyReader().read(root, cathode.map(Electrode::areaM2).orElse(Double.NaN));
        Optional<RunSettings> run = new RunReader(library, species).read(root, electrolyte);
        List<ReactionOverride> reactionOverrides = overrides.reactions(root);
        Optional<DepositSettings> deposit = DepositReader.read(root);
        if (root.log().hasErrors() || electrolyte.isEmpty() || cathode.isEmpty() || anode.isEmpty()
                || cell.isEmpty() || supply.isEmpty() || run.isEmpty() || deposit.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Scenario(title, notes, electrolyte.get(), cathode.get(), anode.get(), cell.get(),
                supply.get(), run.get(), speciesOverrides, reactionOverrides, deposit.get()));
    }

    private static ScenarioException fileProblem(String file, String message) {
        return new ScenarioException(List.of(new Problem(file, 0, 0, "", message, Problem.Severity.ERROR)));
    }
}
