package org.cellwright.io;

/**
 * Where a key or value sits: a file (or "(from --set)") and a 1-based line and column.
 *
 * @param file file name as given, or "(from --set)"
 * @param line 1-based line (for --set: the number of the option)
 * @param column 1-based column
 */
public record SourceLocation(String file, int line, int column) {

    /** The file name used for values given on the command line with --set. */
    public static final String FROM_SET = "(from --set)";

    /** @return the location {@code offset} characters to the right on the same line */
    public SourceLocation shifted(int offset) {
        return new SourceLocation(file, line, column + offset);
    }
}
