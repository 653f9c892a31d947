package org.cellwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.function.Supplier;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.Problem;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code check SCENARIO...}: validates scenario files. Prints "file: ok" on standard output for each valid
 * file and every problem (errors and warnings) on standard error as {@code file:line:col: key: message}.
 * Exit code 0 when every file is valid, 2 when any is not, 1 on an internal failure (one line, no stack
 * trace).
 */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        description = "Checks scenario files and reports every problem with its file, line and column.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every file is valid", "1:internal failure", "2:a file is invalid"})
public final class CheckCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "SCENARIO", description = "Scenario files (TOML).")
    List<Path> files = new ArrayList<>();

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "Override a scenario value before checking, e.g. --set supply.current=\"3 A\" (repeatable).")
    List<String> sets = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private final Supplier<ChemLibrary> library;

    /** A check against the built-in chemistry library. */
    public CheckCommand() {
        this(LibraryReader::builtIn);
    }

    /** @param library where the chemistry library comes from (tests pass a fixture) */
    CheckCommand(Supplier<ChemLibrary> library) {
        this.library = Objects.requireNonNull(library, "library");
    }

    @Override
    public Integer call() {
        return CommandRun.of("check", "output").failureMessageOnOneLine().call(spec, this::check);
    }

    private int check(PrintWriter out, PrintWriter err) {
        ScenarioReader reader = new ScenarioReader(library.get());
        boolean invalid = false;
        for (Path file : files) {
            try {
                ScenarioReader.Result result = reader.load(file, sets);
                int n = result.warnings().size();
                out.println(file + ": ok" + (n == 0 ? "" : " (" + n + (n == 1 ? " warning)" : " warnings)")));
                result.warnings().forEach(w -> err.println(w.format()));
            } catch (ScenarioException e) {
                invalid = true;
                for (Problem p : e.problems()) {
                    err.println(p.format());
                }
            }
        }
        return invalid ? Main.BAD_INPUT : 0;
    }
}
