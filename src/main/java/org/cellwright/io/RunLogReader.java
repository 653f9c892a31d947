package org.cellwright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.LogSeries;
import org.cellwright.study.MeasuredLog;

/**
 * Reads a measured run log: CSV with a header row, a time column ({@code time_s}, {@code time_min} or
 * {@code time_h}) and any of {@code current_A}, {@code cell_voltage_V}, {@code deposit_g},
 * {@code c_<species>_g_per_L} (also {@code c_<species>_mol_per_L}, {@code temperature_C}). Cells are separated
 * by commas and may be quoted; numbers use a decimal point. Blank cells are allowed in every column but time;
 * rows need not be evenly spaced and may be shorter than the header (the missing cells are blank). Lines
 * that are empty or start with {@code #} are skipped.
 *
 * <p>Every problem is reported with file, line, column (1-based character position of the cell) and the
 * column's name: a missing time column, an unknown species, a cell that is not a number, a time that goes
 * back, a negative mass or concentration, a row longer than the header. A header cell that names no known
 * quantity is a warning and its column is ignored.
 */
public final class RunLogReader {

    /** Most errors listed before the reader gives up on a file. */
    static final int MAX_ERRORS = 30;
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private final ChemLibrary library;

    /**
     * A log read without errors, with the warnings found in it.
     *
     * @param log the log
     * @param warnings the warnings, in file order
     */
    public record Result(MeasuredLog log, List<Problem> warnings) {
        public Result {
            Objects.requireNonNull(log, "log");
            warnings = List.copyOf(warnings);
        }
    }

    /** @param library where the species of concentration columns are looked up */
    public RunLogReader(ChemLibrary library) {
        this.library = Objects.requireNonNull(library, "library");
    }

    /**
     * @param file the CSV file
     * @return the log and its warnings
     * @throws RunLogException with every problem, when there is at least one error
     */
    public Result read(Path file) throws RunLogException {
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
        return parse(text, name);
    }

    private static RunLogException fileProblem(String file, String message) {
        return new RunLogException(List.of(new Problem(file, 0, 0, "", message, Problem.Severity.ERROR)));
    }

    /** One header cell: its position and what it holds. */
    private record Column(String name, int index, RunLogColumns.Quantity quantity) {
    }

    /**
     * @param text the CSV text
     * @param fileName the name used in problem locations
     * @return the log and its warnings
     * @throws RunLogException with every problem, when there is at least one error
     */
    public Result parse(String text, String fileName) throws RunLogException {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        ProblemLog log = new ProblemLog();
        String[] lines = text.split("\r?\n|\r", -1);
        int headerLine = -1;
        for (int i = 0; i < lines.length; i++) {
            if (!skipped(lines[i])) {
                headerLine = i;
                break;
            }
        }
        if (headerLine < 0) {
            throw fileProblem(fileName, "the log is empty; it needs a header row such as "
                    + "time_min,current_A,cell_voltage_V and rows of values");
        }
        List<Cell> header = Cell.split(lines[headerLine]);
        if (header.size() == 1 && lines[headerLine].indexOf(';') >= 0) {
            throw new RunLogException(List.of(new Problem(fileName, headerLine + 1, 1, "", "the cells are separated"
                    + " by ';'; write the log with commas between cells and decimal points", Problem.Severity.ERROR)));
        }
        int timeIndex = -1;
        int timeKind = -1;
        List<Column> columns = new ArrayList<>();
        Set<RunLogColumns.Quantity> seen = new HashSet<>();
        for (int c = 0; c < header.size(); c++) {
            Cell cell = header.get(c);
            SourceLocation at = new SourceLocation(fileName, headerLine + 1, cell.column());
            String name = cell.text();
            if (name.isEmpty()) {
                log.error(at, "", "header cell " + (c + 1) + " is empty; every column needs a name");
                continue;
            }
            int t = RunLogColumns.timeIndex(name);
            if (t >= 0) {
                if (timeIndex >= 0) {
                    log.error(at, name, "a second time column; give one of time_s, time_min, time_h");
                } else {
                    timeIndex = c;
                    timeKind = t;
                }
                continue;
            }
            Optional<RunLogColumns.Quantity> q;
            try {
                q = RunLogColumns.quantity(name, library);
            } catch (IllegalArgumentException e) {
                log.error(at, name, e.getMessage());
                continue;
            }
            if (q.isEmpty()) {
                log.warning(at, name, "not a quantity the fit can use; the column is ignored"
                        + RunLogColumns.unknownHint(name));
            } else if (!seen.add(q.get())) {
                log.error(at, name, "the same quantity is in an earlier column too");
            } else {
                columns.add(new Column(name, c, q.get()));
            }
        }
        if (timeIndex < 0) {
            log.error(new SourceLocation(fileName, headerLine + 1, 1), "", "no time column; the header needs one of "
                    + "time_s, time_min or time_h" + (header.isEmpty() || header.get(0).text().isEmpty() ? ""
                    : " (the first column is '" + header.get(0).text() + "')"));
        }
        if (columns.isEmpty() && !log.hasErrors()) {
            log.error(new SourceLocation(fileName, headerLine + 1, 1), "", "no measured column; the header needs at"
                    + " least one of current_A, cell_voltage_V, deposit_g, c_<species>_g_per_L");
        }
        if (log.hasErrors()) {
            throw new RunLogException(log.problems());
        }
        return new Result(rows(lines, headerLine, header.size(), timeIndex, timeKind, columns, fileName, log),
                log.warnings());
    }

    private MeasuredLog rows(String[] lines, int headerLine, int width, int timeIndex, int timeKind,
                             List<Column> columns, String fileName, ProblemLog log) throws RunLogException {
        List<Double> times = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        double lastTime = Double.NEGATIVE_INFINITY;
        int errors = 0;
        for (int i = headerLine + 1; i < lines.length && errors < MAX_ERRORS; i++) {
            if (skipped(lines[i])) {
                continue;
            }
            int lineNo = i + 1;
            List<Cell> cells = Cell.split(lines[i]);
            if (cells.size() > width) {
                log.error(new SourceLocation(fileName, lineNo, cells.get(width).column()), "",
                        "the row has " + cells.size() + " cells but the header " + width
                                + " (a decimal comma? write numbers with a point, 2.5 not 2,5)");
                errors++;
                continue;
            }
            Cell timeCell = timeIndex < cells.size() ? cells.get(timeIndex) : null;
            String timeName = RunLogColumns.TIME.get(timeKind);
            SourceLocation timeAt = new SourceLocation(fileName, lineNo, timeCell == null
                    ? lines[i].length() + 1 : timeCell.column());
            if (timeCell == null || timeCell.text().isEmpty()) {
                log.error(timeAt, timeName, "the time is blank; every row needs its time");
                errors++;
                continue;
            }
            Double t = number(timeCell.text());
            if (t == null) {
                log.error(timeAt, timeName, "expected a number, got '" + timeCell.text() + "'");
                errors++;
                continue;
            }
            double tS = t * RunLogColumns.TIME_FACTOR[timeKind];
            if (tS < 0) {
                log.error(timeAt, timeName, "the time must not be negative, got " + timeCell.text());
                errors++;
                continue;
            }
            if (tS < lastTime) {
                log.error(timeAt, timeName, "the time goes back (" + timeCell.text() + " after a later row); rows"
                        + " must be in time order");
                errors++;
                continue;
            }
            lastTime = tS;
            double[] row = new double[columns.size()];
            Arrays.fill(row, Double.NaN);
            for (int k = 0; k < columns.size(); k++) {
                Column col = columns.get(k);
                if (col.index() >= cells.size() || cells.get(col.index()).text().isEmpty()) {
                    continue;
                }
                Cell cell = cells.get(col.index());
                SourceLocation at = new SourceLocation(fileName, lineNo, cell.column());
                Double v = number(cell.text());
                if (v == null) {
                    log.error(at, col.name(), "expected a number or a blank cell, got '" + cell.text() + "'");
                    errors++;
                } else if (v < 0 && col.quantity().quantity() != org.cellwright.study.LoggedQuantity.CURRENT
                        && col.quantity().quantity() != org.cellwright.study.LoggedQuantity.CELL_VOLTAGE
                        && col.quantity().quantity() != org.cellwright.study.LoggedQuantity.TEMPERATURE) {
                    log.error(at, col.name(), "a mass or concentration cannot be negative, got " + cell.text());
                    errors++;
                } else {
                    row[k] = v;
                }
            }
            times.add(tS);
            values.add(row);
        }
        if (errors >= MAX_ERRORS) {
            log.error(new SourceLocation(fileName, 0, 0), "", "stopped after " + MAX_ERRORS + " errors");
        }
        if (times.isEmpty() && !log.hasErrors()) {
            log.error(new SourceLocation(fileName, headerLine + 1, 1), "", "the log has a header but no rows of values");
        }
        if (log.hasErrors()) {
            throw new RunLogException(log.problems());
        }
        List<LogSeries> series = new ArrayList<>();
        for (int k = 0; k < columns.size(); k++) {
            double[] v = new double[times.size()];
            for (int r = 0; r < v.length; r++) {
                v[r] = values.get(r)[k];
            }
            Column col = columns.get(k);
            LogSeries s = new LogSeries(col.name(), col.quantity().quantity(), col.quantity().species(), v);
            if (s.count() == 0) {
                log.warning(new SourceLocation(fileName, headerLine + 1, 1 + col.index()), col.name(),
                        "the column has no values");
            }
            series.add(s);
        }
        return new MeasuredLog(fileName, times.stream().mapToDouble(Double::doubleValue).toArray(), series);
    }

    private static boolean skipped(String line) {
        String s = line.strip();
        return s.isEmpty() || s.startsWith("#");
    }

    /** @return the number in the text, or null when it is not a plain decimal number */
    static Double number(String text) {
        if (!NUMBER.matcher(text).matches()) {
            return null;
        }
        double v = Double.parseDouble(text);
        return Double.isFinite(v) ? v : null;
    }

    /**
     * One CSV cell: its text (trimmed, quotes removed) and the 1-based column where it starts.
     *
     * @param text the cell's content
     * @param column where the cell starts in its line
     */
    record Cell(String text, int column) {

        /** Splits a line at commas outside double quotes; a doubled quote inside quotes is one quote. */
        static List<Cell> split(String line) {
            List<Cell> out = new ArrayList<>();
            StringBuilder sb = new StringBuilder();
            boolean quoted = false;
            int start = 0;
            for (int i = 0; i <= line.length(); i++) {
                char c = i < line.length() ? line.charAt(i) : ',';
                if (quoted) {
                    if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        sb.append('"');
                        i++;
                    } else if (c == '"') {
                        quoted = false;
                    } else if (i < line.length()) {
                        sb.append(c);
                    }
                } else if (c == ',') {
                    int lead = start;
                    while (lead < i && Character.isWhitespace(line.charAt(lead))) {
                        lead++;
                    }
                    out.add(new Cell(sb.toString().strip(), lead + 1));
                    sb.setLength(0);
                    start = i + 1;
                } else if (c == '"' && sb.toString().isBlank()) {
                    quoted = true;
                    sb.setLength(0);
                } else {
                    sb.append(c);
                }
            }
            return out;
        }
    }
}
