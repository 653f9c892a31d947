package org.cellwright.io;

/**
 * A value that does not parse as a number with a unit of the expected dimension.
 *
 * <p>{@link #column()} is the 1-based column of the offending part within the parsed text, so that a caller
 * who knows where the text sits in a file can point at the exact character.
 */
public final class UnitException extends Exception {

    private static final long serialVersionUID = 1L;

    private final int column;

    /**
     * @param message what is wrong, in plain words
     * @param column 1-based column within the text
     */
    public UnitException(String message, int column) {
        super(message);
        this.column = column;
    }

    /** @return the 1-based column of the offending part within the parsed text */
    public int column() {
        return column;
    }
}
