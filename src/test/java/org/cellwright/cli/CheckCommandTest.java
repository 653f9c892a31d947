package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryFixture;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import picocli.CommandLine;

/**
 * {@code cellwright check}: exit codes 0 (valid), 2 (invalid), 1 (internal failure), "file: ok" on standard
 * output, every problem on standard error as file:line:col: key: message, never a stack trace.
 */
class CheckCommandTest {

    private static final String VALID = """
            title = "Copper from a sulfate bleed"
            [electrolyte]
            volume = "2 L"
            temperature = "40 C"
            composition = { "Cu2+" = "0.5 mol/L", "H+" = "1 mol/L", "SO4^2-" = "1 mol/L" }
            [cathode]
            material = "stainless"
            area = "2 dm2"
            [anode]
            material = "lead"
            area = "2 dm2"
            [cell]
            gap = "30 mm"
            [supply]
            current_density = "2 A/dm2"
            [run]
            duration = "2 h"
            stop = ["short", "Cu2+ < 0.05 mol/L"]
            """;

    /** Two errors: a negative volume on line 3 and a misspelt key on line 17. */
    private static final String INVALID = VALID.replace("volume = \"2 L\"", "volume = \"-2 L\"")
            .replace("duration = \"2 h\"", "duraton = \"2 h\"");

    @TempDir
    Path dir;

    private Path valid;
    private Path invalid;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void files() throws IOException {
        valid = Files.writeString(dir.resolve("good.toml"), VALID);
        invalid = Files.writeString(dir.resolve("bad.toml"), INVALID);
    }

    private int run(CommandLine cl, String... args) {
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    private int main(String... args) {
        return run(Main.commandLine(), args);
    }

    private List<String> errLines() {
        return Arrays.stream(err.toString().split("\\R")).filter(l -> !l.isBlank()).toList();
    }

    @Test
    void validFileExitsZero() {
        assertEquals(0, main("check", valid.toString()), err::toString);
        assertEquals(valid + ": ok", out.toString().strip());
        assertEquals("", err.toString());
    }

    @Test
    void invalidFileExitsTwoWithEveryProblemLocated() {
        assertEquals(2, main("check", invalid.toString()));
        assertEquals("", out.toString());
        assertEquals(List.of(
                invalid + ":3:11: electrolyte.volume: must be greater than zero, got '-2 L'",
                invalid + ":16:1: run.duration: missing required value; add e.g. duration = \"4 h\" under [run]",
                invalid + ":17:1: run.duraton: unknown key 'duraton' in [run]; did you mean 'duration'?"), errLines());
        for (String line : errLines()) {
            assertTrue(line.matches(".+\\.toml:\\d+:\\d+: [^:]+: .+"), line);
        }
    }

    @Test
    void oneInvalidAmongSeveralExitsTwoAndStillReportsTheValidOnes() {
        assertEquals(2, main("check", valid.toString(), invalid.toString()));
        assertEquals(valid + ": ok", out.toString().strip());
        assertEquals(3, errLines().size());
    }

    @Test
    void setOptionsAreCheckedToo() {
        assertEquals(2, main("check", "--set", "cell.gap=30 mV", valid.toString()));
        assertEquals(List.of("(from --set):1:13: cell.gap: expected a length, got a voltage 'mV'"), errLines());
    }

    @Test
    void missingFileAndMissingArgumentAreBadInput() {
        assertEquals(2, main("check", dir.resolve("nowhere.toml").toString()));
        assertEquals(List.of(dir.resolve("nowhere.toml") + ":0:0: no such file"), errLines());
        StringWriter usage = new StringWriter();
        CommandLine cl = Main.commandLine();
        cl.setErr(new PrintWriter(usage, true));
        assertEquals(2, cl.execute("check"));
        assertTrue(usage.toString().contains("Missing required parameter"), usage.toString());
    }

    @Test
    void warningsGoToStandardErrorAndTheFileIsStillOk() throws IOException {
        Path warn = Files.writeString(dir.resolve("warn.toml"), VALID.replace("\"SO4^2-\" = \"1 mol/L\"",
                "\"SO4^2-\" = \"0.2 mol/L\""));
        CommandLine cl = new CommandLine(new CheckCommand(LibraryFixture::library));
        assertEquals(0, run(cl, warn.toString()));
        assertEquals(warn + ": ok (1 warning)", out.toString().strip());
        assertEquals(1, errLines().size());
        assertTrue(errLines().get(0).startsWith(warn + ":5:1: electrolyte.composition: warning: the composition is "
                + "not electroneutral"), errLines().get(0));
    }

    @Test
    void anInternalFailureIsOneLineAndExitsOne() {
        Supplier<ChemLibrary> broken = () -> {
            throw new IllegalStateException("built-in library resource is damaged\nat line 3");
        };
        assertEquals(1, run(new CommandLine(new CheckCommand(broken)), valid.toString()));
        assertEquals(List.of("cellwright check: internal failure: built-in library resource is damaged at line 3"),
                errLines());
        assertFalse(err.toString().contains("Exception"));
    }
}
