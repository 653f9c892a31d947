package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;

import org.cellwright.io.LibraryReader;
import org.cellwright.io.Problem;
import org.cellwright.io.RunLogException;
import org.cellwright.io.ScenarioException;
import org.junit.jupiter.api.Test;

/**
 * {@link CommandRun}, the frame every command runs in: the exit codes of {@link Main} (0 ok, 2 bad input, 1
 * internal failure), one line per problem or failure on standard error, no stack trace, and both writers
 * flushed whatever happens.
 */
class CommandRunTest {

    private final StringWriter outText = new StringWriter();
    private final StringWriter errText = new StringWriter();
    private final FlushCount outFlushes = new FlushCount(outText);
    private final FlushCount errFlushes = new FlushCount(errText);
    private final PrintWriter out = new PrintWriter(outFlushes);
    private final PrintWriter err = new PrintWriter(errFlushes);

    private static final Problem BAD_GAP = new Problem("cell.toml", 12, 7, "cell.gap", "must be above 0 m, got -3 mm",
            Problem.Severity.ERROR);

    @Test
    void theBodysOwnCodeIsReturnedAndBothWritersAreFlushed() {
        int code = CommandRun.of("run", "output").call(out, err, (o, e) -> {
            o.print("figures");
            return 0;
        });
        assertEquals(0, code);
        assertEquals("figures", outText.toString());
        assertEquals("", errText.toString());
        assertTrue(outFlushes.count > 0 && errFlushes.count > 0, "both writers flushed");
        assertEquals(Main.BAD_INPUT, CommandRun.of("run", "output").call(out, err, (o, e) -> Main.BAD_INPUT));
    }

    @Test
    void scenarioProblemsArePrintedOnePerLineWithExitTwo() {
        Problem second = new Problem("cell.toml", 20, 1, "run.duraton", "unknown key; did you mean run.duration?",
                Problem.Severity.ERROR);
        int code = throwing(CommandRun.of("plan", "plan.toml"), new ScenarioException(List.of(BAD_GAP, second)));
        assertEquals(Main.BAD_INPUT, code);
        assertEquals(List.of("cell.toml:12:7: cell.gap: must be above 0 m, got -3 mm",
                "cell.toml:20:1: run.duraton: unknown key; did you mean run.duration?"), lines(errText));
        assertEquals("", outText.toString());
    }

    @Test
    void runLogProblemsArePrintedWithExitTwo() {
        Problem column = new Problem("log.csv", 1, 14, "", "unknown column 'voltage'", Problem.Severity.ERROR);
        int code = throwing(CommandRun.of("fit", "output"), new RunLogException(List.of(column)));
        assertEquals(Main.BAD_INPUT, code);
        assertEquals(List.of("log.csv:1:14: unknown column 'voltage'"), lines(errText));
    }

    @Test
    void anOutputThatCannotBeWrittenIsBadInputNamingWhat() {
        int code = throwing(CommandRun.of("report", "out/r.pdf"), new IOException("out/r.pdf: no such dir"));
        assertEquals(Main.BAD_INPUT, code);
        assertEquals(List.of("cellwright report: cannot write out/r.pdf: out/r.pdf: no such dir"),
                lines(errText));
        assertTrue(errFlushes.count > 0);
    }

    @Test
    void anyOtherFailureIsInternalWithExitOneAndNoStackTrace() {
        int code = throwing(CommandRun.of("sweep", "output"), new IllegalStateException("grid lost"));
        assertEquals(Main.INTERNAL_FAILURE, code);
        assertEquals(List.of("cellwright sweep: internal failure: java.lang.IllegalStateException: grid lost"),
                lines(errText));
        assertFalse(errText.toString().contains("\tat "), "no stack trace");
    }

    @Test
    void failureMessageOnOneLineFoldsTheMessage() {
        CommandRun check = CommandRun.of("check", "output").failureMessageOnOneLine();
        int code = throwing(check, new IllegalStateException("library damaged\n  at line 3"));
        assertEquals(Main.INTERNAL_FAILURE, code);
        assertEquals(List.of("cellwright check: internal failure: library damaged at line 3"), lines(errText));
        throwing(check, new NullPointerException());
        assertEquals("cellwright check: internal failure: NullPointerException", lines(errText).get(1));
    }

    @Test
    void chartNamesMustPickAFormat() {
        CommandRun run = CommandRun.of("run", "output");
        assertTrue(run.chartNameOk(null, err), "no chart asked for");
        assertTrue(run.chartNameOk(Path.of("a.png"), err));
        assertTrue(run.chartNameOk(Path.of("a.svg"), err));
        assertEquals("", errText.toString());
        assertFalse(run.chartNameOk(Path.of("a.jpg"), err));
        err.flush();
        assertEquals(List.of("cellwright run: --chart a.jpg: the file must end in .png or .svg"), lines(errText));
    }

    @Test
    void scenarioIsReadWithItsOverridesAndAnUnreadableOneGivesExitTwo() {
        // the shipped copper scenario has gap = "40 mm"; the override must win
        Path file = Path.of("scenarios", "copper-etchant-bleed.toml");
        double[] gap = new double[1];
        int ok = CommandRun.of("run", "output").call(out, err, (o, e) -> {
            gap[0] = CommandRun.scenario(LibraryReader.builtIn(), file, List.of("cell.gap=20 mm"), e)
                    .scenario().cell().gapM();
            return 0;
        });
        assertEquals(0, ok);
        assertEquals(0.020, gap[0], 1e-12, "the --set override is applied");
        int bad = CommandRun.of("run", "output").call(out, err, (o, e) -> {
            CommandRun.scenario(LibraryReader.builtIn(), file, List.of("cell.gap=-20 mm"), e);
            return 0;
        });
        assertEquals(Main.BAD_INPUT, bad);
        assertTrue(errText.toString().contains("cell.gap"), errText.toString());
    }

    /** @return the exit code of a run whose body throws {@code thrown} */
    private int throwing(CommandRun run, Exception thrown) {
        return run.call(out, err, (o, e) -> {
            if (thrown instanceof ScenarioException se) {
                throw se;
            }
            if (thrown instanceof RunLogException le) {
                throw le;
            }
            if (thrown instanceof IOException io) {
                throw io;
            }
            throw (RuntimeException) thrown;
        });
    }

    private static List<String> lines(StringWriter w) {
        return w.toString().lines().toList();
    }

    /** Counts flushes of the writer it wraps. */
    private static final class FlushCount extends Writer {
        private final Writer target;
        int count;

        FlushCount(Writer target) {
            this.target = target;
        }

        @Override
        public void write(char[] cbuf, int off, int len) throws IOException {
            target.write(cbuf, off, len);
        }

        @Override
        public void flush() throws IOException {
            count++;
            target.flush();
        }

        @Override
        public void close() throws IOException {
            target.close();
        }
    }
}
