package org.cellwright.cli;

import java.util.concurrent.Callable;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Entry point: with no arguments opens the desktop window; otherwise runs a headless command.
 *
 * <p>Exit codes: 0 success, 1 internal failure, 2 bad input (file, value or option).
 */
@Command(name = "cellwright",
        mixinStandardHelpOptions = true,
        versionProvider = VersionInfo.class,
        description = "Simulates an electrolytic cell: depletion, competing electrode reactions, mass transfer,"
                + " ohmic loss, heating and the deposit.",
        subcommands = {CommandLine.HelpCommand.class, RunCommand.class, CheckCommand.class, LibraryCommand.class,
                FitCommand.class, ReportCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure", "2:bad input (file, value or option)"})
public final class Main implements Callable<Integer> {

    /** Exit code for bad input. */
    public static final int BAD_INPUT = 2;
    /** Exit code for an internal failure. */
    public static final int INTERNAL_FAILURE = 1;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return 0;
    }

    /** @return the configured command line (used by tests and by {@link #main}) */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExitCodeExceptionMapper(e -> e instanceof CommandLine.ParameterException ? BAD_INPUT : INTERNAL_FAILURE);
        return cl;
    }

    public static void main(String[] args) {
        System.exit(commandLine().execute(args));
    }
}
