package org.cellwright.study;

import java.util.List;
import java.util.Objects;

/**
 * A measured run log: the times of its rows and the columns it holds. Rows need not be evenly spaced; a
 * column may be blank in any row (a deposit weighed now and then, a bath sampled every half hour).
 *
 * @param source where it came from (a file name), for messages
 * @param timesS the rows' times from the start of the run (s), not decreasing
 * @param series the measured columns, each aligned with {@code timesS}
 */
public record MeasuredLog(String source, double[] timesS, List<LogSeries> series) {

    public MeasuredLog {
        Objects.requireNonNull(source, "source");
        timesS = timesS.clone();
        series = List.copyOf(series);
        for (int i = 0; i < timesS.length; i++) {
            if (!(timesS[i] >= 0) || !Double.isFinite(timesS[i]) || (i > 0 && timesS[i] < timesS[i - 1])) {
                throw new IllegalArgumentException(source + ": times must be finite, >= 0 and not decreasing"
                        + " (row " + (i + 1) + ")");
            }
        }
        for (LogSeries s : series) {
            if (s.values().length != timesS.length) {
                throw new IllegalArgumentException(source + ": column " + s.column() + " has "
                        + s.values().length + " rows, the log " + timesS.length);
            }
        }
    }

    /** @return the time of the last row (s), 0 for an empty log */
    public double endS() {
        return timesS.length == 0 ? 0 : timesS[timesS.length - 1];
    }

    /** @return the number of measured values in all columns */
    public int valueCount() {
        return series.stream().mapToInt(LogSeries::count).sum();
    }

    /**
     * @param column a column's name
     * @return that column, or null
     */
    public LogSeries column(String column) {
        return series.stream().filter(s -> s.column().equals(column)).findFirst().orElse(null);
    }
}
