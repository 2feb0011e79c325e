package org.riffle.log;

/**
 * A fault in the time base found while reading: reported, never "fixed".
 *
 * @param kind what kind of fault
 * @param row 0-based data row where it was seen (the later row of the pair)
 * @param line 1-based line in the file, 0 when not from a text file
 * @param stepSeconds the step from the previous row in seconds (negative for a backward step)
 */
public record TimeIssue(Kind kind, int row, long line, double stepSeconds) {
    /** Kinds of time-base fault. */
    public enum Kind {
        /** A step well above the median step. */
        GAP,
        /** The same timestamp as the previous row. */
        DUPLICATE,
        /** Earlier than the previous row. */
        BACKWARD
    }
}
