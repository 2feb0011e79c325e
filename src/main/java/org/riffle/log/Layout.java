package org.riffle.log;

import java.util.List;

/**
 * What sniffing found out about a delimited log, for the reading pass: the dialect, where the data
 * starts, each column's name, unit and role, and how the time column reads.
 *
 * <p>Immutable by convention: the arrays are never changed after sniffing (package-private type).
 *
 * @param dialect delimiter, decimal mark, header and units rows
 * @param dataLine 1-based line number of the first line after the header (and units row)
 * @param names column names, one per column, unique and non-empty
 * @param units column units, {@code ""} when none
 * @param roles what each column is, one of the role constants
 * @param order how the numbers of a date are ordered (for {@link #STAMP} and {@link #DATE} columns)
 * @param timeScale seconds per unit of a {@link #NUMBER_TIME} column (1 for seconds, 0.001 for ms)
 * @param absoluteTime true when the time column gives wall-clock times (dates or epoch numbers)
 * @param timeText how time was read, e.g. {@code "time 'Timestamp' ISO 8601"}, {@code ""} when none
 * @param preamble the lines before the table, as read
 * @param notes things noticed while sniffing, each one line
 */
record Layout(Dialect dialect, long dataLine, String[] names, String[] units, byte[] roles, Stamps.Order order,
              double timeScale, boolean absoluteTime, String timeText, List<String> preamble, List<String> notes) {
    /** A numeric (or text) channel. */
    static final byte VALUE = 0;
    /** Date, optionally with a time of day. */
    static final byte STAMP = 1;
    /** The date half of a split date and time. */
    static final byte DATE = 2;
    /** A time of day (alone, or the time half of a split date and time). */
    static final byte TIME_OF_DAY = 3;
    /** A number of seconds (or milliseconds): elapsed or since the epoch. */
    static final byte NUMBER_TIME = 4;

    /** Number of columns. */
    int columns() {
        return names.length;
    }

    /** True when some column carries time. */
    boolean hasTime() {
        for (byte r : roles) {
            if (r != VALUE) {
                return true;
            }
        }
        return false;
    }

    /** Number of columns that hold values (numbers or text), not time. */
    int valueColumns() {
        int n = 0;
        for (byte r : roles) {
            n += r == VALUE ? 1 : 0;
        }
        return n;
    }
}
