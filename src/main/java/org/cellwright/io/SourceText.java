package org.cellwright.io;

import org.tomlj.TomlPosition;

/**
 * The text a TOML tree was parsed from, used to turn tomlj's key positions into the positions of values
 * (so that an error can point at the unit inside {@code "3 Q"}) and to skip separators tomlj counts into
 * array elements.
 */
final class SourceText {

    private final String file;
    private final String[] lines;
    private final int fixedLine;
    private final int columnShift;

    /**
     * @param file the file name for locations
     * @param text the parsed text
     * @param fixedLine when > 0, the line every location gets (for --set values)
     * @param columnShift added to every column (for --set values parsed behind a prefix)
     */
    SourceText(String file, String text, int fixedLine, int columnShift) {
        this.file = file;
        this.lines = text.split("\r?\n", -1);
        this.fixedLine = fixedLine;
        this.columnShift = columnShift;
    }

    /** @return a text read from a file */
    static SourceText ofFile(String file, String text) {
        return new SourceText(file, text, 0, 0);
    }

    String file() {
        return file;
    }

    /** @return the location of a tomlj position */
    SourceLocation at(TomlPosition p) {
        return p == null ? new SourceLocation(file, 0, 0) : loc(p.line(), p.column());
    }

    private SourceLocation loc(int line, int column) {
        return new SourceLocation(file, fixedLine > 0 ? fixedLine : line, column + columnShift);
    }

    private String line(int line) {
        return line >= 1 && line <= lines.length ? lines[line - 1] : "";
    }

    /**
     * Finds the first character of the value of a {@code key = value} pair; inside the quotes for a string.
     *
     * @param p tomlj's position of the key
     * @return the value's location, or the key's when the line does not show one
     */
    SourceLocation valueStart(TomlPosition p) {
        String s = line(p.line());
        int i = skipKey(s, p.column() - 1);
        if (i < 0) {
            return at(p);
        }
        i = skipBlanks(s, i + 1);
        return loc(p.line(), contentColumn(s, i));
    }

    /**
     * Finds the first character of an array element; tomlj places elements after the first at the comma
     * before them.
     *
     * @param p tomlj's position of the element
     * @return the element's location, inside the quotes for a string
     */
    SourceLocation elementStart(TomlPosition p) {
        int line = p.line();
        int i = p.column() - 1;
        while (line <= lines.length) {
            String s = line(line);
            while (i < s.length()) {
                char c = s.charAt(i);
                if (c == '#') {
                    i = s.length();
                } else if (c == ',' || c == '[' || Character.isWhitespace(c)) {
                    i++;
                } else {
                    return loc(line, contentColumn(s, i));
                }
            }
            line++;
            i = 0;
        }
        return at(p);
    }

    private static int skipKey(String s, int from) {
        int i = Math.max(from, 0);
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == '"' || c == '\'') {
                int close = s.indexOf(c, i + 1);
                if (close < 0) {
                    return -1;
                }
                i = close + 1;
            } else if (c == '=') {
                return i;
            } else {
                i++;
            }
        }
        return -1;
    }

    private static int skipBlanks(String s, int from) {
        int i = from;
        while (i < s.length() && (s.charAt(i) == ' ' || s.charAt(i) == '\t')) {
            i++;
        }
        return i;
    }

    /** @return the 1-based column of the value's content: after the opening quote(s) of a string */
    private static int contentColumn(String s, int i) {
        if (i < s.length() && (s.charAt(i) == '"' || s.charAt(i) == '\'')) {
            char q = s.charAt(i);
            boolean triple = s.startsWith(String.valueOf(q).repeat(3), i);
            return i + (triple ? 3 : 1) + 1;
        }
        return i + 1;
    }
}
