package org.riffle.log;

import java.util.Arrays;

/**
 * Maps data rows back to file lines without a number per row: rows follow lines one to one except
 * where blank, comment or dropped lines intervene, so only those breaks are stored.
 *
 * <p>Mutable while reading, then only queried; confined to one thread.
 */
final class RowLines {
    private int[] rows = new int[16];
    private long[] lines = new long[16];
    private int n;
    private long expected = -1;

    /** Records that {@code row} was read from {@code line}; rows arrive in order. */
    void note(int row, long line) {
        if (line != expected) {
            if (n == rows.length) {
                rows = Arrays.copyOf(rows, n * 2);
                lines = Arrays.copyOf(lines, n * 2);
            }
            rows[n] = row;
            lines[n] = line;
            n++;
        }
        expected = line + 1;
    }

    /** The 1-based line of {@code row}, 0 when nothing was noted. */
    long line(int row) {
        int i = Arrays.binarySearch(rows, 0, n, row);
        if (i < 0) {
            i = -i - 2;
        }
        return i < 0 ? 0 : lines[i] + (row - rows[i]);
    }
}
