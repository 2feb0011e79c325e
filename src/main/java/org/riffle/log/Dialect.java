package org.riffle.log;

/**
 * How a delimited text log is laid out, as detected or given: the field delimiter, the decimal mark,
 * whether fields were quoted, how many lines came before the table, and whether the table has a header
 * row and a units row under it. Immutable.
 *
 * @param delimiter the field delimiter: {@code ','}, {@code ';'}, {@code '\t'}, or {@link #WHITESPACE}
 *     for columns aligned with runs of spaces or tabs
 * @param decimalComma true when numbers use a decimal comma
 * @param quoted true when quoted fields were seen in the first part of the file
 * @param skippedLines lines before the table (preamble, comments, blank lines)
 * @param header true when the table starts with a row of names
 * @param unitsRow true when a row of units follows the names
 */
public record Dialect(char delimiter, boolean decimalComma, boolean quoted, int skippedLines, boolean header,
                      boolean unitsRow) {
    /** The delimiter value that stands for runs of spaces or tabs. */
    public static final char WHITESPACE = ' ';

    public Dialect {
        if (delimiter != ',' && delimiter != ';' && delimiter != '\t' && delimiter != WHITESPACE
                && delimiter != '|') {
            throw new IllegalArgumentException("delimiter " + name(delimiter) + " is not one of , ; tab | whitespace");
        }
        if (decimalComma && delimiter == ',') {
            throw new IllegalArgumentException("decimal comma clashes with delimiter ','");
        }
        if (skippedLines < 0) {
            throw new IllegalArgumentException("skipped lines " + skippedLines + " is negative");
        }
    }

    /** A short description, e.g. {@code "csv ';' decimal ',' units row"}. */
    public String describe() {
        StringBuilder sb = new StringBuilder(delimiter == WHITESPACE ? "text whitespace-aligned"
                : "csv " + name(delimiter));
        if (decimalComma) {
            sb.append(" decimal ','");
        }
        if (!header) {
            sb.append(" no header");
        }
        if (unitsRow) {
            sb.append(" units row");
        }
        if (skippedLines > 0) {
            sb.append(" after ").append(skippedLines).append(skippedLines == 1 ? " line" : " lines");
        }
        return sb.toString();
    }

    /** How a delimiter is written in messages: {@code ','}, {@code tab}, {@code whitespace}. */
    static String name(char delimiter) {
        if (delimiter == '\t') {
            return "tab";
        }
        return delimiter == WHITESPACE ? "whitespace" : "'" + delimiter + "'";
    }
}
