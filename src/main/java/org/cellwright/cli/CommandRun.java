package org.cellwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.RunLogException;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;

import picocli.CommandLine.Model.CommandSpec;

/**
 * How one command of the command line runs: it gets the command's standard output and error, turns what can go
 * wrong into the exit codes of {@link Main} and a one-line message on standard error (never a stack trace), and
 * flushes both writers at the end.
 *
 * <ul>
 *   <li>a {@link ScenarioException} or {@link RunLogException}: every problem on its own line
 *       ({@code file:line:col: key: message}), exit 2;</li>
 *   <li>an {@link IOException} (an output that cannot be written): {@code cellwright NAME: cannot write WHAT:
 *       reason}, exit 2;</li>
 *   <li>any other {@link RuntimeException}: {@code cellwright NAME: internal failure: ...}, exit 1.</li>
 * </ul>
 */
final class CommandRun {

    /** What a command does once its writers are set up; returns its exit code. */
    @FunctionalInterface
    interface Body {
        int run(PrintWriter out, PrintWriter err) throws IOException, ScenarioException, RunLogException;
    }

    private final String name;
    private final String output;
    private final Function<RuntimeException, String> failure;

    private CommandRun(String name, String output, Function<RuntimeException, String> failure) {
        this.name = name;
        this.output = output;
        this.failure = failure;
    }

    /**
     * @param name   the command's name as typed ({@code run}, {@code plan}...)
     * @param output what an {@link IOException} failed to write, for the message ("output" or a file name)
     * @return a run that reports an internal failure as the exception's {@code toString()}
     */
    static CommandRun of(String name, String output) {
        return new CommandRun(name, output, RuntimeException::toString);
    }

    /** @return this run, reporting an internal failure by its message alone, folded onto one line */
    CommandRun failureMessageOnOneLine() {
        return new CommandRun(name, output, CommandRun::oneLine);
    }

    /** Runs {@code body} with the writers of {@code spec}'s command line; see the class comment for the codes. */
    int call(CommandSpec spec, Body body) {
        return call(spec.commandLine().getOut(), spec.commandLine().getErr(), body);
    }

    /** Runs {@code body} with these writers; see the class comment for the exit codes. */
    int call(PrintWriter out, PrintWriter err, Body body) {
        try {
            return body.run(out, err);
        } catch (ScenarioException e) {
            e.problems().forEach(p -> err.println(p.format()));
            return Main.BAD_INPUT;
        } catch (RunLogException e) {
            e.problems().forEach(p -> err.println(p.format()));
            return Main.BAD_INPUT;
        } catch (IOException e) {
            err.println("cellwright " + name + ": cannot write " + output + ": " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (RuntimeException e) {
            err.println("cellwright " + name + ": internal failure: " + failure.apply(e));
            return Main.INTERNAL_FAILURE;
        } finally {
            out.flush();
            err.flush();
        }
    }

    /**
     * Reads a scenario with its {@code --set} overrides and prints its warnings on {@code err}.
     *
     * @throws ScenarioException with every problem found (the run prints them and exits with 2)
     */
    static ScenarioReader.Result scenario(ChemLibrary lib, Path file, List<String> sets, PrintWriter err)
            throws ScenarioException {
        ScenarioReader.Result read = new ScenarioReader(lib).load(file, sets);
        read.warnings().forEach(p -> err.println(p.format()));
        return read;
    }

    /**
     * @return whether a chart file's name picks a format ({@code .png} or {@code .svg}); when not, says so on
     *         {@code err} for option {@code --chart} of this command
     */
    boolean chartNameOk(Path chart, PrintWriter err) {
        if (chart == null || chart.toString().endsWith(".png") || chart.toString().endsWith(".svg")) {
            return true;
        }
        err.println("cellwright " + name + ": --chart " + chart + ": the file must end in .png or .svg");
        return false;
    }

    private static String oneLine(Throwable e) {
        String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return message.replaceAll("\\s*\\R\\s*", " ");
    }
}
