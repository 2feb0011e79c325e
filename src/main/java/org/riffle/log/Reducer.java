package org.riffle.log;

/**
 * The reduced form of a reading pass that has filled the memory it may use (see {@link Reduction}). Takes
 * over the full columns at that moment and keeps {@code keep} rows of them: the first half as the head
 * (the start of the log), the second half, the latest rows read, as a ring that always holds the latest
 * rows; every row, those already read included, goes into the {@link Blocks}. The pass keeps writing each row into {@code cols.rows}, which
 * this class points at the ring slot to overwrite next; {@link #finish()} turns the ring back into file
 * order.
 *
 * <p>Mutable; confined to the reading thread.
 */
final class Reducer {
    private final Columns cols;
    private final Blocks blocks;
    private final RowLines headLines;
    private final int head;
    private final int tail;
    private final long[] tailLines;
    private long tailSeen;

    /**
     * Starts reducing: {@code cols} is full at {@code cols.rows} rows, read from the lines in
     * {@code lines}; {@code keep} of them (at most all, at least 2) stay at full resolution.
     */
    Reducer(Columns cols, RowLines lines, int[] valueColumns, int blockCapacity, int keep) {
        int cap = cols.rows;
        int kept = Math.max(2, Math.min(cap, keep));
        this.cols = cols;
        this.head = kept / 2;
        this.tail = kept - head;
        this.blocks = new Blocks(valueColumns, blockCapacity);
        for (int r = 0; r < cap; r++) {
            blocks.add(cols.values, r);
        }
        this.headLines = lines;
        this.tailLines = new long[tail];
        for (int k = 0; k < tail; k++) {
            tailLines[k] = lines.line(cap - tail + k);
        }
        cols.keep(head, cap - tail, tail);
        this.tailSeen = tail;
        cols.rows = head;
    }

    /** Counts the row just written at {@code cols.rows}, read from {@code line}, and moves to the next slot. */
    void commit(long line) {
        int s = cols.rows;
        blocks.add(cols.values, s);
        tailLines[s - head] = line;
        tailSeen++;
        cols.rows = head + (int) (tailSeen % tail);
    }

    /** Rows of the whole log committed so far. */
    long rows() {
        return blocks.rows();
    }

    int head() {
        return head;
    }

    /** The first log row of the tail. */
    long tailFrom() {
        return blocks.rows() - tail;
    }

    Blocks blocks() {
        return blocks;
    }

    /** Puts the ring in file order and sets the row count to the rows kept; returns their lines. */
    RowLines finish() {
        int r = (int) (tailSeen % tail);
        for (float[] v : cols.values) {
            if (v != null) {
                rotate(v, r);
            }
        }
        if (cols.seconds != null) {
            rotate(cols.seconds, r);
        }
        rotate(tailLines, r);
        cols.rows = head + tail;
        RowLines out = new RowLines();
        for (int i = 0; i < head; i++) {
            out.note(i, headLines.line(i));
        }
        for (int k = 0; k < tail; k++) {
            out.note(head + k, tailLines[k]);
        }
        return out;
    }

    /** Rotates {@code a[head, head + tail)} left by {@code r} (three reversals, no extra memory). */
    private void rotate(float[] a, int r) {
        reverse(a, head, head + r);
        reverse(a, head + r, head + tail);
        reverse(a, head, head + tail);
    }

    private void rotate(double[] a, int r) {
        reverse(a, head, head + r);
        reverse(a, head + r, head + tail);
        reverse(a, head, head + tail);
    }

    private static void rotate(long[] a, int r) {
        reverse(a, 0, r);
        reverse(a, r, a.length);
        reverse(a, 0, a.length);
    }

    private static void reverse(float[] a, int from, int to) {
        for (int i = from, j = to - 1; i < j; i++, j--) {
            float x = a[i];
            a[i] = a[j];
            a[j] = x;
        }
    }

    private static void reverse(double[] a, int from, int to) {
        for (int i = from, j = to - 1; i < j; i++, j--) {
            double x = a[i];
            a[i] = a[j];
            a[j] = x;
        }
    }

    private static void reverse(long[] a, int from, int to) {
        for (int i = from, j = to - 1; i < j; i++, j--) {
            long x = a[i];
            a[i] = a[j];
            a[j] = x;
        }
    }
}
