package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.cellwright.study.LogSeries;
import org.cellwright.study.LoggedQuantity;
import org.cellwright.study.MeasuredLog;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading measured run logs: times in any of the three units, blank cells, irregular and short rows,
 * species names in any notation; and every kind of mistake reported at its file, line and column. Expected
 * values are read off the log texts in each test (source: the text above the assertion).
 */
class RunLogReaderTest {

    private final RunLogReader reader = new RunLogReader(LibraryFixture.library());

    private static Problem only(RunLogException e) {
        assertEquals(1, e.problems().size(), e.getMessage());
        return e.problems().get(0);
    }

    @Test
    void readsMinutesBlanksIrregularAndShortRows() throws RunLogException {
        String text = "\uFEFF# bench log, cell 2\n"
                + "time_min, current_A, cell_voltage_V, deposit_g, \"c_Cu++_g_per_L\"\n"
                + "0, 2.00, 2.31, 0, 6.0\n"
                + "1.5, 2.01, 2.52,,\n"
                + "\n"
                + "4, 1.99, 2.90\n"
                + "30.25,2.00,2.92,0.61,4.9\n";
        RunLogReader.Result r = reader.parse(text, "bench.csv");
        assertEquals(List.of(), r.warnings());
        MeasuredLog log = r.log();
        // source: the time_min cells 0, 1.5, 4, 30.25 times 60 s
        assertEquals(List.of(0.0, 90.0, 240.0, 1815.0),
                java.util.Arrays.stream(log.timesS()).boxed().toList());
        assertEquals(4, log.series().size());
        LogSeries dep = log.column("deposit_g");
        assertEquals(LoggedQuantity.DEPOSIT, dep.quantity());
        // source: deposit_g has values in rows 1 and 4 only (row 2 blank, row 3 short)
        assertEquals(2, dep.count());
        assertTrue(Double.isNaN(dep.values()[1]) && Double.isNaN(dep.values()[2]));
        assertEquals(0.61, dep.values()[3], 0.0);
        LogSeries cu = log.column("c_Cu++_g_per_L");
        assertEquals(LoggedQuantity.CONCENTRATION_G_PER_L, cu.quantity());
        // source: Cu++ is another notation of Cu2+ (docs/scenario-format.md, species notation)
        assertEquals("Cu2+", cu.species());
        assertEquals(2.90, log.column("cell_voltage_V").values()[2], 0.0);
        // source: 12 values in the four columns (4 + 4 + 2 + 2)
        assertEquals(12, log.valueCount());
    }

    @Test
    void hoursAndSecondsAndAnUnknownColumnWarns() throws RunLogException {
        RunLogReader.Result r = reader.parse("time_h,cell_voltge_V,temperature_C\n0.5,2.5,25.1\n2,2.6,26.0\n", "h.csv");
        // source: 0.5 h and 2 h in seconds
        assertEquals(1800, r.log().timesS()[0], 0.0);
        assertEquals(7200, r.log().timesS()[1], 0.0);
        assertEquals(1, r.log().series().size());
        Problem w = r.warnings().get(0);
        assertEquals("h.csv:1:8: cell_voltge_V: warning: not a quantity the fit can use; the column is ignored;"
                + " did you mean 'cell_voltage_V'?", w.format());
        RunLogReader.Result s = reader.parse("time_s,deposit_g\n10,0.1\n", "s.csv");
        assertEquals(10, s.log().timesS()[0], 0.0);
    }

    @Test
    void aCellThatIsNotANumberIsLocatedByLineAndColumn() {
        RunLogException e = assertThrows(RunLogException.class,
                () -> reader.parse("time_min,current_A,cell_voltage_V\n0,2.0,2.3\n1,2.0,2.4 V\n", "log.csv"));
        // source: line 3, the third cell starts at column 7
        assertEquals("log.csv:3:7: cell_voltage_V: expected a number or a blank cell, got '2.4 V'", only(e).format());
    }

    @Test
    void timeGoingBackBlankTimeAndNegativeMassAreErrors() {
        RunLogException e = assertThrows(RunLogException.class, () -> reader.parse(
                "time_min,deposit_g\n0,0\n5,0.1\n4,0.2\n,0.3\n6,-0.1\n", "t.csv"));
        List<String> lines = e.problems().stream().map(Problem::format).toList();
        assertEquals(List.of(
                "t.csv:4:1: time_min: the time goes back (4 after a later row); rows must be in time order",
                "t.csv:5:1: time_min: the time is blank; every row needs its time",
                "t.csv:6:3: deposit_g: a mass or concentration cannot be negative, got -0.1"), lines);
    }

    @Test
    void headerMistakes() {
        List<Problem> noTime = assertThrows(RunLogException.class,
                () -> reader.parse("minutes,current_A\n0,2\n", "a.csv")).problems();
        assertEquals("a.csv:1:1: no time column; the header needs one of time_s, time_min or time_h (the first column"
                + " is 'minutes')", noTime.stream().filter(Problem::isError).findFirst().orElseThrow().format());

        Problem species = assertThrows(RunLogException.class,
                () -> reader.parse("time_s,c_Cu3+_g_per_L\n0,2\n", "b.csv")).problems().get(0);
        assertEquals("b.csv:1:8: c_Cu3+_g_per_L: unknown species 'Cu3+' in the column name; did you mean 'Cu2+'?",
                species.format());

        Problem semicolons = only(assertThrows(RunLogException.class,
                () -> reader.parse("time_min;current_A\n0;2,0\n", "c.csv")));
        assertTrue(semicolons.message().contains("separated by ';'"), semicolons.format());

        Problem twice = only(assertThrows(RunLogException.class,
                () -> reader.parse("time_s,c_Cu2+_g_per_L,c_Cu++_g_per_L\n0,1,1\n", "d.csv")));
        // source: the third header cell starts at column 23
        assertEquals("d.csv:1:23: c_Cu++_g_per_L: the same quantity is in an earlier column too", twice.format());
    }

    @Test
    void aRowLongerThanTheHeaderHintsAtADecimalComma() {
        Problem p = only(assertThrows(RunLogException.class,
                () -> reader.parse("time_min,cell_voltage_V\n0,2,31\n", "comma.csv")));
        // source: line 2, the third cell "31" starts at column 5
        assertEquals(2, p.line());
        assertEquals(5, p.column());
        assertTrue(p.message().contains("decimal comma"), p.format());
    }

    @Test
    void emptyAndMissingFiles(@TempDir Path dir) throws Exception {
        Problem empty = only(assertThrows(RunLogException.class, () -> reader.parse("# nothing\n\n", "e.csv")));
        assertTrue(empty.message().contains("empty"), empty.format());
        Problem rows = only(assertThrows(RunLogException.class, () -> reader.parse("time_s,current_A\n", "r.csv")));
        assertTrue(rows.message().contains("no rows"), rows.format());
        Problem missing = only(assertThrows(RunLogException.class, () -> reader.read(dir.resolve("none.csv"))));
        assertTrue(missing.message().contains("no such file"), missing.format());
        Path file = dir.resolve("ok.csv");
        Files.writeString(file, "time_s,current_A\r\n0,2\r\n60,2.1\r\n");
        assertEquals(2, reader.read(file).log().timesS().length);
    }
}
