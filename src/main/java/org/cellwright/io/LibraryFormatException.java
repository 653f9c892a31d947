package org.cellwright.io;

/**
 * A data file (the chemistry library, or a scenario's chemistry tables) that cannot be read: where and what.
 * The message reads {@code file:line:column: key: problem}, ready for a person.
 */
public final class LibraryFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String sourceName;
    private final int line;
    private final int column;
    private final String key;
    private final String problem;

    /**
     * @param sourceName the file or resource name
     * @param line 1-based line, or 0 when unknown
     * @param column 1-based column, or 0 when unknown
     * @param key the dotted key concerned, or null
     * @param problem what is wrong, in plain words
     */
    public LibraryFormatException(String sourceName, int line, int column, String key, String problem) {
        super(format(sourceName, line, column, key, problem));
        this.sourceName = sourceName;
        this.line = line;
        this.column = column;
        this.key = key;
        this.problem = problem;
    }

    private static String format(String sourceName, int line, int column, String key, String problem) {
        StringBuilder sb = new StringBuilder(sourceName == null ? "(unnamed)" : sourceName);
        if (line > 0) {
            sb.append(':').append(line);
            if (column > 0) {
                sb.append(':').append(column);
            }
        }
        sb.append(": ");
        if (key != null) {
            sb.append(key).append(": ");
        }
        return sb.append(problem).toString();
    }

    /** @return the file or resource name */
    public String sourceName() {
        return sourceName;
    }

    /** @return the 1-based line, 0 when unknown */
    public int line() {
        return line;
    }

    /** @return the 1-based column, 0 when unknown */
    public int column() {
        return column;
    }

    /** @return the dotted key, or null */
    public String key() {
        return key;
    }

    /** @return the problem without the location */
    public String problem() {
        return problem;
    }
}
