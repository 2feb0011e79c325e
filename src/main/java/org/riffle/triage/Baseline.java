package org.riffle.triage;

import java.util.Objects;

/**
 * The span a channel is judged against: rows {@code [fromRow, toRow)} of the log, or a separate
 * baseline log. Immutable.
 *
 * @param fromRow first row (inclusive)
 * @param toRow last row (exclusive)
 * @param description how it was chosen, ready to print, e.g. {@code "first 25 % (rows 0-2500)"}
 */
public record Baseline(int fromRow, int toRow, String description) {
    public Baseline {
        Objects.requireNonNull(description, "description");
        if (fromRow < 0 || toRow <= fromRow) {
            throw new IllegalArgumentException("baseline rows " + fromRow + ":" + toRow + " are empty or negative");
        }
    }

    /** The default baseline: the first quarter of {@code rows} rows. */
    public static Baseline firstQuarter(int rows) {
        int to = Math.max(1, rows / 4);
        return new Baseline(0, to, "first 25 % (rows 0-" + to + ")");
    }
}
