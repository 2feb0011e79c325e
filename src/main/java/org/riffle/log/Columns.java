package org.riffle.log;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The growing storage of one reading pass: a {@code float[]} per column (4 bytes a cell, {@code NaN} for
 * a missing one), a {@code double[]} of seconds when the log has time, and for each column the count of
 * text cells with their first distinct values, so a mostly-text column can become a {@link TextChannel}.
 * Arrays grow by half when full; {@link #trim()} cuts them to the row count at the end.
 *
 * <p>Mutable; confined to the reading thread.
 */
final class Columns {
    /** Distinct values kept for a text column. */
    static final int DISTINCT_CAP = 64;
    /** Most rows an array can hold. */
    static final int MAX_ROWS = Integer.MAX_VALUE - 16;

    final float[][] values;
    double[] seconds;
    int rows;
    private final int[] textCells;
    private final List<Set<String>> distinct = new ArrayList<>();

    private int capacity;

    /** Storage for the columns whose {@code stored} flag is set (the others hold time), and seconds if timed. */
    Columns(boolean[] stored, boolean timed, int capacity) {
        int columns = stored.length;
        this.capacity = Math.max(16, capacity);
        values = new float[columns][];
        for (int j = 0; j < columns; j++) {
            values[j] = stored[j] ? new float[this.capacity] : null;
        }
        seconds = timed ? new double[this.capacity] : null;
        textCells = new int[columns];
        for (int j = 0; j < columns; j++) {
            distinct.add(new LinkedHashSet<>());
        }
    }

    /** Makes room for row {@link #rows}, growing to at most {@code limit} rows; false when full at the limit. */
    boolean ensureRoom(int limit) {
        if (rows < capacity) {
            return true;
        }
        if (capacity >= Math.min(limit, MAX_ROWS)) {
            return false;
        }
        int grown = (int) Math.min(Math.min(limit, MAX_ROWS), capacity + (capacity >> 1) + 16L);
        for (int j = 0; j < values.length; j++) {
            if (values[j] != null) {
                values[j] = Arrays.copyOf(values[j], grown);
            }
        }
        capacity = grown;
        if (seconds != null) {
            seconds = Arrays.copyOf(seconds, grown);
        }
        return true;
    }

    /**
     * Counts a text cell in column {@code j} and remembers it while fewer than the cap are known;
     * {@code null} counts a repeat of a cell already offered.
     */
    void text(int j, String cell) {
        textCells[j]++;
        Set<String> d = distinct.get(j);
        if (cell != null && d.size() < DISTINCT_CAP) {
            d.add(cell);
        }
    }

    int textCells(int j) {
        return textCells[j];
    }

    List<String> distinct(int j) {
        return List.copyOf(distinct.get(j));
    }

    /**
     * Keeps rows {@code [0, head)} and {@code [tailFrom, tailFrom + tail)}, back to back, in arrays of
     * exactly {@code head + tail} rows (a reading pass turning to its reduced form).
     */
    void keep(int head, int tailFrom, int tail) {
        int n = head + tail;
        for (int j = 0; j < values.length; j++) {
            if (values[j] != null) {
                System.arraycopy(values[j], tailFrom, values[j], head, tail);
                values[j] = Arrays.copyOf(values[j], n);
            }
        }
        if (seconds != null) {
            System.arraycopy(seconds, tailFrom, seconds, head, tail);
            seconds = Arrays.copyOf(seconds, n);
        }
        rows = n;
        capacity = n;
    }

    /**
     * Cuts every array to {@link #rows} when more than a sixteenth of it is unused (the rows grew past
     * the first estimate); a smaller slack, the usual one of an estimate from the file's size, is kept,
     * since the copy is tens of megabytes of fresh memory for a long log (the channels and the time base
     * hold the row count). Every array is {@code capacity} long.
     */
    void trim() {
        if (capacity - rows <= rows / 16) {
            return;
        }
        for (int j = 0; j < values.length; j++) {
            if (values[j] != null) {
                values[j] = Arrays.copyOf(values[j], rows);
            }
        }
        if (seconds != null) {
            seconds = Arrays.copyOf(seconds, rows);
        }
        capacity = rows;
    }
}
