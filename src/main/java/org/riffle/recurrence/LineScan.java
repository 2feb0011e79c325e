package org.riffle.recurrence;

import java.util.concurrent.CancellationException;

/**
 * Scans a band of rows [a, b) of the upper triangle (j − i ≥ w) of one segment's recurrence matrix and
 * counts its lines, holding only O(N) state: two rows of recurrence bits and the first row of the open run
 * on each diagonal and each column. Each row is computed as bits (64 cells a word), then, with word-wide
 * bit operations, so that the work is per line rather than per recurrent cell:
 * <ul>
 * <li>a diagonal run ends where the previous row's bit j − 1 is set and this row's bit j is not;</li>
 * <li>a column run (the upper part of a vertical line) ends where the previous row's bit j is set and this
 *     row's is not (the Theiler band clears it, which is how the band cuts vertical lines);</li>
 * <li>a run of set bits within a row is, by symmetry, the lower part of the vertical line in column i.</li>
 * </ul>
 * Runs that reach the band's first row from above, or are still open after its last row, are handed to
 * {@link LineMerge} as top and bottom pieces so that bands scanned on different threads join exactly.
 *
 * <p>Confined to one thread.
 */
final class LineScan {
    private static final int BLOCK = 512;

    final long[] diagHist;
    final long[] vertHist;
    final int[] topDiag;
    final int[] topCol;
    final int[] botDiag;
    final int[] botCol;
    long recurrent;

    private final Segment seg;
    private final int w;
    private final int n;
    private final int words;
    private final double threshold;
    private final int a;
    private final int b;
    private final boolean openTop;
    private final boolean openBottom;
    /** First row of the run open on each diagonal j − i, and on each column j. */
    private final int[] diag;
    private final int[] col;
    private final double[] buf;
    private final PlotMarks plot;
    private long[] cur;
    private long[] prev;

    /**
     * @param valueThreshold cells with distance value ≤ this recur (see {@link Segment#valueThreshold})
     * @param rowsTotal rows of the whole triangle, {@link Segment#rows}
     * @param plot thumbnail marks to set, or {@code null}
     */
    LineScan(Segment seg, int theiler, double valueThreshold, int a, int b, int rowsTotal, PlotMarks plot) {
        this.seg = seg;
        this.w = theiler;
        this.n = seg.vectors();
        this.words = (n >>> 6) + 1;
        this.threshold = valueThreshold;
        this.a = a;
        this.b = b;
        this.openTop = a > 0;
        this.openBottom = b < rowsTotal;
        this.diag = new int[n + 1];
        this.col = new int[n + 1];
        this.diagHist = new long[n + 1];
        this.vertHist = new long[n + 1];
        this.topDiag = openTop ? new int[n + 1] : null;
        this.topCol = openTop ? new int[n + 1] : null;
        this.botDiag = openBottom ? new int[n + 1] : null;
        this.botCol = openBottom ? new int[n + 1] : null;
        this.plot = plot;
        this.cur = new long[words];
        this.buf = new double[n];
        this.prev = new long[words];
    }

    /** Adds this band's thumbnail counts to {@code into}. */
    void addInto(PlotMarks into) {
        if (plot != null) {
            into.add(plot);
        }
    }

    /** Scans rows [a, b). */
    LineScan run() {
        for (int i = a; i < b; i++) {
            if ((i & 31) == 0 && Thread.currentThread().isInterrupted()) {
                throw new CancellationException("recurrence analysis cancelled");
            }
            fillBits(i);
            columnsAndDiagonals(i);
            rowRuns(i);
            if (plot != null) {
                mark(i);
            }
            long[] t = prev;
            prev = cur;
            cur = t;
        }
        if (openBottom) {
            closeBottom();
        }
        return this;
    }

    /** Row i's recurrence bits into {@code cur}, words from one before the previous row's first. */
    private void fillBits(int i) {
        int jStart = i + w;
        int ws = Math.max(0, ((i - 1 + w) >>> 6) - 1);
        if (jStart >= n) {
            java.util.Arrays.fill(cur, ws, words, 0L);
            return;
        }
        int j0 = jStart & ~63;
        java.util.Arrays.fill(cur, ws, j0 >>> 6, 0L);
        for (int blk = j0; blk < n; blk += BLOCK) {
            seg.recurrenceBits(i, blk, Math.min(n, blk + BLOCK), buf, threshold, cur);
        }
        cur[j0 >>> 6] &= -1L << (jStart & 63);
        java.util.Arrays.fill(cur, ((n - 1) >>> 6) + 1, words, 0L);
    }

    /**
     * Compares row i with row i − 1, word by word: records the diagonal and column runs that ended in row
     * i − 1 (length = i − their first row) and notes the first row of the runs that begin in row i. The
     * work is per line, not per recurrent cell.
     */
    private void columnsAndDiagonals(int i) {
        for (int k = (i - 1 + w) >>> 6; k < words; k++) {
            long p = prev[k];
            long c = cur[k];
            long sp = (p << 1) | (k > 0 ? prev[k - 1] >>> 63 : 0L);
            if ((c | sp | p) == 0) {
                continue; // nothing begins or ends here: most words, at a low recurrence rate
            }
            recurrent += Long.bitCount(c);
            int base = k << 6;
            for (long e = sp & ~c; e != 0; e &= e - 1) {
                int d = base + Long.numberOfTrailingZeros(e) - i;
                int first = diag[d];
                if (openTop && first == a) {
                    topDiag[d] = i - first;
                } else {
                    diagHist[i - first]++;
                }
            }
            for (long e = c & ~sp; e != 0; e &= e - 1) {
                diag[base + Long.numberOfTrailingZeros(e) - i] = i;
            }
            for (long e = p & ~c; e != 0; e &= e - 1) {
                int j = base + Long.numberOfTrailingZeros(e);
                int first = col[j];
                if (openTop && first == a) {
                    topCol[j] = i - first;
                } else {
                    vertHist[i - first]++;
                }
            }
            for (long e = c & ~p; e != 0; e &= e - 1) {
                col[base + Long.numberOfTrailingZeros(e)] = i;
            }
        }
    }

    /**
     * Records row i's own runs of recurrent cells: by symmetry, the lower parts of the vertical lines in
     * column i. A run's first and last cells are found with shifts, a run may span words.
     */
    private void rowRuns(int i) {
        int open = -1;
        for (int k = (i + w) >>> 6; k < words; k++) {
            long c = cur[k];
            if (c == 0) {
                continue;
            }
            long before = k > 0 ? cur[k - 1] >>> 63 : 0L;
            long after = k + 1 < words ? cur[k + 1] << 63 : 0L;
            long firsts = c & ~((c << 1) | before);
            long lasts = c & ~((c >>> 1) | after);
            int base = k << 6;
            for (; lasts != 0; lasts &= lasts - 1) {
                int last = Long.numberOfTrailingZeros(lasts);
                if (firsts != 0 && Long.numberOfTrailingZeros(firsts) <= last) {
                    open = base + Long.numberOfTrailingZeros(firsts);
                    firsts &= firsts - 1;
                }
                vertHist[base + last - open + 1]++;
            }
            if (firsts != 0) {
                open = base + Long.numberOfTrailingZeros(firsts);
            }
        }
    }

    /** Counts row i's recurrent cells in the thumbnail. */
    private void mark(int i) {
        for (int k = (i + w) >>> 6; k < words; k++) {
            for (long c = cur[k]; c != 0; c &= c - 1) {
                plot.mark(i, (k << 6) | Long.numberOfTrailingZeros(c));
            }
        }
    }

    /** Hands the runs still open after the last row to the merge; negative top length = spans the band. */
    private void closeBottom() {
        int i = b - 1;
        for (int k = (i + w) >>> 6; k < words; k++) {
            long c = prev[k];
            while (c != 0) {
                int j = (k << 6) | Long.numberOfTrailingZeros(c);
                int d = j - i;
                if (openTop && diag[d] == a) {
                    topDiag[d] = -(b - a);
                } else {
                    botDiag[d] = b - diag[d];
                }
                if (openTop && col[j] == a) {
                    topCol[j] = -(b - a);
                } else {
                    botCol[j] = b - col[j];
                }
                c &= c - 1;
            }
        }
    }
}
