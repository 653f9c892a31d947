package org.cellwright.cli;

import java.awt.GraphicsEnvironment;
import java.util.concurrent.Callable;

import org.cellwright.ui.CellwrightWindow;

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
                SweepCommand.class, PlanCommand.class, MakeupCommand.class, FitCommand.class, ReportCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure", "2:bad input (file, value or option)"})
public final class Main implements Callable<Integer> {

    /** Exit code for bad input. */
    public static final int BAD_INPUT = 2;
    /** Exit code for an internal failure. */
    public static final int INTERNAL_FAILURE = 1;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Set once the window is open: then {@link #main} leaves the program running until the window closes. */
    private static volatile boolean windowOpen;

    @Override
    public Integer call() {
        if (GraphicsEnvironment.isHeadless()) {
            spec.commandLine().getErr().println("cellwright: there is no display to open the window on;"
                    + " use one of the commands below (or set DISPLAY).");
            spec.commandLine().usage(spec.commandLine().getErr());
            return BAD_INPUT;
        }
        CellwrightWindow.launch();
        windowOpen = true;
        return 0;
    }

    /** @return the configured command line (used by tests and by {@link #main}) */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExitCodeExceptionMapper(e -> e instanceof CommandLine.ParameterException ? BAD_INPUT : INTERNAL_FAILURE);
        return cl;
    }

    public static void main(String[] args) {
        int code = commandLine().execute(args);
        if (code != 0 || !windowOpen) {
            System.exit(code);
        }
    }
}
