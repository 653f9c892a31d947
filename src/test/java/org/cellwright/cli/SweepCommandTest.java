package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sweep command as a user calls it: table, chart, failed points, exit codes, progress only on a terminal. */
class SweepCommandTest {

    private static final String COPPER = Path.of("scenarios", "copper-etchant-bleed.toml").toString();

    @Test
    void twoKeysGiveOneRowPerRunAndAHeatMap(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("grid.csv");
        Path png = dir.resolve("grid.png");
        CliRun r = CliRun.of("sweep", COPPER, "--vary", "cell.gap=20mm:60mm:3", "--vary",
                "supply.current_density=1:3 A/dm2:3", "--set", "run.duration=\"1 h\"", "--out", csv.toString(),
                "--chart", png.toString(), "--figure", "efficiency");
        assertEquals(0, r.code(), r.err());
        List<String> lines = Files.readAllLines(csv);
        assertEquals(10, lines.size());
        // source: SI prefixes and 1 dm2 = 0.01 m2: 20 mm = 0.02 m, 1 A/dm2 = 100 A/m2; 1 h = 3600 s
        assertTrue(lines.get(1).startsWith("1,20 mm,0.020000000,1 A/dm2,100.00000,ok,end,3600.0000,"), lines.get(1));
        assertTrue(r.out().startsWith("9 runs in "), r.out());
        assertTrue(r.out().contains("highest current efficiency"), r.out());
        assertEquals(SweepCommand.CHART_WIDTH, ImageIO.read(png.toFile()).getWidth());
        // no terminal in a test: no progress line on standard error
        assertFalse(r.err().contains("runs\r") || r.err().contains("\r"), r.err());
    }

    @Test
    void pointsMadeInvalidByTheGridAreReportedNotFatal(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("gap.csv");
        CliRun r = CliRun.of("sweep", COPPER, "--vary", "cell.gap=-20mm:20mm:3", "--set", "run.duration=\"20 min\"",
                "--out", csv.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.err().contains("run 1 (cell.gap=-20 mm) is invalid: cell.gap:"), r.err());
        List<String> lines = Files.readAllLines(csv);
        assertTrue(lines.get(1).contains(",invalid,"), lines.get(1));
        assertTrue(lines.get(3).contains(",ok,"), lines.get(3));
        assertTrue(r.out().contains("1 ran, 2 invalid, 0 failed"), r.out());
    }

    @Test
    void whenNoPointCanRunTheExitCodeIsTwo(@TempDir Path dir) {
        CliRun r = CliRun.of("sweep", COPPER, "--vary", "cell.gap=-20mm:-10mm:2", "--out",
                dir.resolve("x.csv").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("no point of the grid could run"), r.err());
    }

    @Test
    void badOptionsAndFilesAreBadInputWithoutOutput(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("out.csv");
        assertEquals(2, CliRun.of("sweep", COPPER, "--vary", "cell.gap=20mm", "--out", csv.toString()).code());
        CliRun fig = CliRun.of("sweep", COPPER, "--vary", "cell.gap=20mm:30mm:2", "--figure", "speed", "--out",
                csv.toString());
        assertEquals(2, fig.code());
        assertTrue(fig.err().contains("specific-energy, efficiency"), fig.err());
        assertEquals(2, CliRun.of("sweep", COPPER, "--vary", "cell.gap=20mm:30mm:2", "--chart",
                dir.resolve("c.gif").toString(), "--out", csv.toString()).code());
        assertEquals(2, CliRun.of("sweep", dir.resolve("none.toml").toString(), "--vary", "cell.gap=20mm:30mm:2",
                "--out", csv.toString()).code());
        assertEquals(2, CliRun.of("sweep", COPPER, "--out", csv.toString()).code());
        CliRun three = CliRun.of("sweep", COPPER, "--vary", "cell.gap=20mm:30mm:2", "--vary", "supply.current=1:2 A:2",
                "--vary", "electrolyte.volume=1:2 L:2", "--out", csv.toString());
        assertEquals(2, three.code());
        assertFalse(three.err().contains("Exception"), three.err());
        try (var files = Files.list(dir)) {
            assertEquals(0, files.count());
        }
    }

    @Test
    void progressIsARewrittenLineOnATerminalAndNothingElsewhere() {
        StringWriter tty = new StringWriter();
        ProgressLine p = new ProgressLine(new PrintWriter(tty), "sweep", true);
        p.progress(400, 400);
        p.finish();
        assertTrue(tty.toString().startsWith("\rsweep: 400/400 runs\r"), tty.toString());
        StringWriter log = new StringWriter();
        ProgressLine q = new ProgressLine(new PrintWriter(log), "sweep", false);
        q.progress(1, 2);
        q.progress(2, 2);
        q.finish();
        assertEquals("", log.toString());
    }
}
