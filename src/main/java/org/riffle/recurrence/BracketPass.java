package org.riffle.recurrence;

import java.util.List;

/**
 * One streamed pass of {@link RadiusSearch}: counts distance values (as raw bits) below {@code lo},
 * histograms those in [lo, hi) into bins of {@code width} bits, and collects them while they fit.
 *
 * <p>Confined to one thread; passes over tasks are joined with {@link #merge} in task order.
 */
final class BracketPass {
    /** Columns of one row measured at a time, so the distances are read back while in the cache. */
    private static final int BLOCK = 1024;

    final long lo;
    final long hi;
    final long width;
    final long[] hist;
    long below;
    long in;
    long min = Long.MAX_VALUE;
    long max = Long.MIN_VALUE;
    long[] values;
    long count;
    boolean overflow;
    private final long cap;

    BracketPass(long lo, long hi, long width, int bins, long cap) {
        this.lo = lo;
        this.hi = hi;
        this.width = width;
        this.hist = new long[bins];
        this.cap = cap;
        this.values = new long[(int) Math.min(cap, 1024)];
    }

    BracketPass scan(List<Piece> task, int theiler) {
        double[] buf = new double[0];
        for (Piece p : task) {
            Segment seg = p.seg();
            int n = seg.vectors();
            if (buf.length < n) {
                buf = new double[n];
            }
            for (int i = p.rowFrom(); i < p.rowTo(); i++) {
                if ((i & 31) == 0 && Thread.currentThread().isInterrupted()) {
                    throw new java.util.concurrent.CancellationException("recurrence analysis cancelled");
                }
                for (int j0 = i + theiler; j0 < n; j0 += BLOCK) {
                    int j1 = Math.min(n, j0 + BLOCK);
                    seg.distances(i, j0, j1, buf);
                    for (int q = j0; q < j1; q++) {
                        long v = Double.doubleToRawLongBits(buf[q]);
                        if (v < hi) {
                            if (v < lo) {
                                below++;
                            } else {
                                take(v);
                            }
                        }
                    }
                }
            }
        }
        return this;
    }

    private void take(long v) {
        in++;
        hist[(int) ((v - lo) / width)]++;
        min = Math.min(min, v);
        max = Math.max(max, v);
        if (overflow) {
            return;
        }
        if (count == values.length) {
            if (count >= cap) {
                overflow = true;
                values = null;
                return;
            }
            values = java.util.Arrays.copyOf(values, (int) Math.min(cap, 2 * count));
        }
        values[(int) count++] = v;
    }

    void merge(BracketPass p) {
        below += p.below;
        in += p.in;
        for (int k = 0; k < hist.length; k++) {
            hist[k] += p.hist[k];
        }
        min = Math.min(min, p.min);
        max = Math.max(max, p.max);
        if (overflow || p.overflow || count + p.count > cap) {
            overflow = true;
            values = null;
            return;
        }
        if (count + p.count > values.length) {
            values = java.util.Arrays.copyOf(values, (int) (count + p.count));
        }
        System.arraycopy(p.values, 0, values, (int) count, (int) p.count);
        count += p.count;
    }
}
