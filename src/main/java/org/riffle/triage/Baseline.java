package org.riffle.triage;

import java.util.Objects;

/**
 * The span a channel is judged against: rows {@code [fromRow, toRow)} of the judged log, or of a separate
 * baseline log of the same asset. Immutable.
 *
 * @param fromRow first row (inclusive)
 * @param toRow last row (exclusive)
 * @param description how it was chosen, ready to print, e.g. {@code "first 25 % (rows 0-2500)"}
 * @param sameLog true when the rows are rows of the judged log, false for a separate baseline log
 */
public record Baseline(int fromRow, int toRow, String description, boolean sameLog) {
    public Baseline {
        Objects.requireNonNull(description, "description");
        if (fromRow < 0 || toRow <= fromRow) {
            throw new IllegalArgumentException("baseline rows " + fromRow + ":" + toRow + " are empty or negative");
        }
    }

    /** Rows of the judged log. */
    public Baseline(int fromRow, int toRow, String description) {
        this(fromRow, toRow, description, true);
    }

    /** The default baseline: the first quarter of {@code rows} rows. */
    public static Baseline firstQuarter(int rows) {
        int to = Math.max(1, rows / 4);
        return new Baseline(0, to, "first 25 % (rows 0-" + to + ")");
    }

    /** All {@code rows} rows of a separate baseline log {@code file}. */
    public static Baseline separateLog(String file, int rows) {
        return new Baseline(0, Math.max(1, rows), "baseline log " + file + " (rows 0-" + rows + ")", false);
    }

    /** True when row {@code row} of the judged log lies in the baseline. */
    public boolean contains(int row) {
        return sameLog && row >= fromRow && row < toRow;
    }
}
