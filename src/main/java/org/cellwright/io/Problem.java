package org.cellwright.io;

import java.util.Comparator;
import java.util.Objects;

/**
 * One thing wrong (or doubtful) in a scenario, located in its file.
 *
 * <p>Values given with {@code --set} are located with {@code file} "(from --set)", {@code line} the number of
 * the {@code --set} option (1 for the first) and {@code column} the column within its "key=value" text.
 *
 * @param file the file name as given by the user, or "(from --set)"
 * @param line 1-based line, 0 when the problem concerns the whole file
 * @param column 1-based column, 0 when unknown
 * @param key the dotted key the problem concerns ("supply.current"), or "" for the whole file
 * @param message what is wrong, in plain words
 * @param severity an error (the scenario cannot run) or a warning (it can, but look)
 */
public record Problem(String file, int line, int column, String key, String message, Severity severity) {

    /** How serious a problem is. */
    public enum Severity {
        /** The scenario cannot be run. */
        ERROR,
        /** The scenario runs, but something looks wrong. */
        WARNING
    }

    /** Orders problems by file, line, column, key. */
    public static final Comparator<Problem> BY_POSITION = Comparator.comparing(Problem::file)
            .thenComparingInt(Problem::line).thenComparingInt(Problem::column).thenComparing(Problem::key);

    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(severity, "severity");
    }

    /** @return true for an error */
    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /**
     * @return the problem as one line, {@code file:line:col: key: message} (warnings say "warning: " before
     *     the message)
     */
    public String format() {
        StringBuilder sb = new StringBuilder(file).append(':').append(line).append(':').append(column).append(": ");
        if (!key.isEmpty()) {
            sb.append(key).append(": ");
        }
        if (severity == Severity.WARNING) {
            sb.append("warning: ");
        }
        return sb.append(message).toString();
    }

    @Override
    public String toString() {
        return format();
    }
}
