package org.riffle.recurrence;

import java.util.List;

/**
 * Joins the line counts of consecutive bands of rows, in band order, into the counts of the whole upper
 * triangle. A run open at the bottom of one band is carried into the next: it ends there (is recorded
 * with its full length), or spans that band too and is carried on. The counts are integers, so the result
 * is the same however the rows were split.
 *
 * <p>Confined to one thread.
 */
final class LineMerge {
    final long[] diagHist;
    final long[] vertHist;
    long recurrent;

    private LineMerge(int n) {
        diagHist = new long[n + 1];
        vertHist = new long[n + 1];
    }

    private LineMerge(LineScan whole) {
        diagHist = whole.diagHist;
        vertHist = whole.vertHist;
        recurrent = whole.recurrent;
    }

    /** Merges {@code bands}, given top to bottom. */
    static LineMerge of(List<LineScan> bands, int vectors) {
        if (bands.size() == 1 && bands.get(0).topDiag == null && bands.get(0).botDiag == null) {
            return new LineMerge(bands.get(0)); // one band of the whole triangle: nothing to join
        }
        LineMerge m = new LineMerge(vectors);
        int[] carryDiag = new int[vectors + 1];
        int[] carryCol = new int[vectors + 1];
        for (LineScan s : bands) {
            if (s.topDiag != null) {
                join(s.topDiag, carryDiag, m.diagHist);
                join(s.topCol, carryCol, m.vertHist);
            }
            add(m.diagHist, s.diagHist);
            add(m.vertHist, s.vertHist);
            m.recurrent += s.recurrent;
            if (s.botDiag != null) {
                carry(s.botDiag, carryDiag);
                carry(s.botCol, carryCol);
            }
        }
        flush(carryDiag, m.diagHist);
        flush(carryCol, m.vertHist);
        return m;
    }

    private static void join(int[] top, int[] carry, long[] hist) {
        for (int x = 0; x < top.length; x++) {
            int t = top[x];
            if (t > 0) {
                hist[carry[x] + t]++;
                carry[x] = 0;
            } else if (t < 0) {
                carry[x] -= t;
            } else if (carry[x] > 0) {
                hist[carry[x]]++;
                carry[x] = 0;
            }
        }
    }

    private static void carry(int[] bottom, int[] carry) {
        for (int x = 0; x < bottom.length; x++) {
            if (bottom[x] > 0) {
                carry[x] = bottom[x];
            }
        }
    }

    private static void flush(int[] carry, long[] hist) {
        for (int c : carry) {
            if (c > 0) {
                hist[c]++;
            }
        }
    }

    private static void add(long[] into, long[] from) {
        for (int k = 0; k < into.length; k++) {
            into[k] += from[k];
        }
    }
}
