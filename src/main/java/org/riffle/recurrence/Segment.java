package org.riffle.recurrence;

import org.riffle.embed.Embedding;

/**
 * One run of samples, delay-embedded: computes distances between its delay vectors one row at a time.
 * A "distance value" here is the squared Euclidean distance {@code Σ_k (x_i[k] − x_j[k])²} summed in
 * ascending k (so a brute-force √ of the same sum agrees bit for bit), or the maximum norm
 * {@code max_k |x_i[k] − x_j[k]|}. Both are non-negative doubles, so their raw IEEE bits order them.
 *
 * <p>Immutable (holds its own copy of the samples); thread-safe.
 */
final class Segment {
    private final double[] s;
    private final int from;
    private final int m;
    private final int tau;
    private final boolean max;
    private final int vectors;

    /** Embeds {@code series[from, to)}; the samples must be finite. */
    Segment(double[] series, int from, int to, Embedding e, RqaParams.Norm norm) {
        this.s = java.util.Arrays.copyOfRange(series, from, to);
        this.from = from;
        this.m = e.dimension();
        this.tau = e.delay();
        this.max = norm == RqaParams.Norm.MAX;
        this.vectors = e.vectors(to - from);
    }

    /** N, the number of delay vectors. */
    int vectors() {
        return vectors;
    }

    /** First sample of the run in the caller's series. */
    int from() {
        return from;
    }

    /** Rows of the upper triangle that can hold a cell, plus one empty row that closes every line. */
    int rows(int theiler) {
        return vectors >= theiler ? vectors - theiler + 1 : 0;
    }

    /** Cells of the upper triangle with j − i ≥ w. */
    long upperCells(int theiler) {
        long k = Math.max(0, vectors - theiler);
        return k * (k + 1) / 2;
    }

    /** Eligible cells of the full matrix: N² minus the band |i − j| &lt; w. */
    long eligible(int theiler) {
        return 2 * upperCells(theiler);
    }

    /** Cells of the upper triangle in rows [0, row). */
    long cellsBefore(int row, int theiler) {
        long k = Math.max(0, vectors - theiler);
        long r = Math.min(row, k);
        return r * k - r * (r - 1) / 2;
    }

    /** Fills {@code buf[0, j1 − j0)} with the distance values from vector i to vectors j0 … j1 − 1. */
    void distances(int i, int j0, int j1, double[] buf) {
        partial(i, j0, j1, m, buf);
    }

    /**
     * Sets, in {@code words}, the bit of every j in [j0, j1) whose distance value to vector i is ≤ the
     * threshold whose raw bits plus one are {@code tb1} (j0 a multiple of 64; bits at and past j1 of the
     * last word stay 0). The last coordinate is added and compared in one pass, word by word, with the
     * same arithmetic as {@link #distances}; {@code buf} holds the partial sums.
     */
    void recurrenceBits(int i, int j0, int j1, double[] buf, long tb1, long[] words) {
        if (m >= 2 && m <= 4) {
            for (int q0 = j0; q0 < j1; q0 += 64) {
                words[q0 >>> 6] = word(i, q0, Math.min(64, j1 - q0), tb1);
            }
            return;
        }
        int len = j1 - j0;
        int last = m - 1;
        if (last > 0) {
            partial(i, j0, j1, last, buf);
        }
        int off = last * tau;
        double b = s[i + off];
        int base = j0 + off;
        for (int q0 = 0; q0 < len; q0 += 64) {
            int lim = Math.min(64, len - q0);
            long bits = 0;
            for (int t = 0; t < lim; t++) {
                int q = q0 + t;
                double d = b - s[base + q];
                double v;
                if (max) {
                    d = Math.abs(d);
                    v = last == 0 || d > buf[q] ? d : buf[q];
                } else {
                    v = last == 0 ? d * d : buf[q] + d * d;
                }
                bits |= ((Double.doubleToRawLongBits(v) - tb1) >>> 63) << t;
            }
            words[(j0 + q0) >>> 6] = bits;
        }
    }

    /**
     * The recurrence bits of cells (i, j0 + t), t &lt; lim ≤ 64, for m = 2, 3 or 4: each cell's distance
     * is computed whole in registers (same arithmetic and order as {@link #distances}), which is about a
     * fifth faster than summing coordinate by coordinate through a buffer.
     */
    private long word(int i, int j0, int lim, long tb1) {
        int t1 = tau;
        int t2 = m > 2 ? 2 * tau : tau;
        int t3 = m > 3 ? 3 * tau : t2;
        double a0 = s[i];
        double a1 = s[i + t1];
        double a2 = s[i + t2];
        double a3 = s[i + t3];
        long bits = 0;
        if (max) {
            for (int t = 0; t < lim; t++) {
                int q = j0 + t;
                double v = Math.abs(a0 - s[q]);
                double d = Math.abs(a1 - s[q + t1]);
                v = d > v ? d : v;
                if (m > 2) {
                    d = Math.abs(a2 - s[q + t2]);
                    v = d > v ? d : v;
                }
                if (m > 3) {
                    d = Math.abs(a3 - s[q + t3]);
                    v = d > v ? d : v;
                }
                bits |= ((Double.doubleToRawLongBits(v) - tb1) >>> 63) << t;
            }
        } else if (m == 2) {
            for (int t = 0; t < lim; t++) {
                int q = j0 + t;
                double d0 = a0 - s[q];
                double d1 = a1 - s[q + t1];
                double v = d0 * d0 + d1 * d1;
                bits |= ((Double.doubleToRawLongBits(v) - tb1) >>> 63) << t;
            }
        } else if (m == 3) {
            for (int t = 0; t < lim; t++) {
                int q = j0 + t;
                double d0 = a0 - s[q];
                double d1 = a1 - s[q + t1];
                double d2 = a2 - s[q + t2];
                double v = d0 * d0 + d1 * d1 + d2 * d2;
                bits |= ((Double.doubleToRawLongBits(v) - tb1) >>> 63) << t;
            }
        } else {
            for (int t = 0; t < lim; t++) {
                int q = j0 + t;
                double d0 = a0 - s[q];
                double d1 = a1 - s[q + t1];
                double d2 = a2 - s[q + t2];
                double d3 = a3 - s[q + t3];
                double v = d0 * d0 + d1 * d1 + d2 * d2 + d3 * d3;
                bits |= ((Double.doubleToRawLongBits(v) - tb1) >>> 63) << t;
            }
        }
        return bits;
    }

    /** {@code buf[0, j1 − j0)} = distance values over the first {@code coords} coordinates. */
    private void partial(int i, int j0, int j1, int coords, double[] buf) {
        int len = j1 - j0;
        double a = s[i];
        if (max) {
            for (int q = 0; q < len; q++) {
                buf[q] = Math.abs(a - s[j0 + q]);
            }
        } else {
            for (int q = 0; q < len; q++) {
                double d = a - s[j0 + q];
                buf[q] = d * d;
            }
        }
        for (int k = 1; k < coords; k++) {
            int off = k * tau;
            double b = s[i + off];
            int base = j0 + off;
            if (max) {
                for (int q = 0; q < len; q++) {
                    double d = Math.abs(b - s[base + q]);
                    buf[q] = d > buf[q] ? d : buf[q];
                }
            } else {
                for (int q = 0; q < len; q++) {
                    double d = b - s[base + q];
                    buf[q] += d * d;
                }
            }
        }
    }

    /** The distance value between vectors i and j, with the same arithmetic as {@link #distances}. */
    double distance(int i, int j) {
        double acc = 0;
        for (int k = 0; k < m; k++) {
            double d = s[i + k * tau] - s[j + k * tau];
            if (max) {
                d = Math.abs(d);
                acc = d > acc ? d : acc;
            } else {
                acc = k == 0 ? d * d : acc + d * d;
            }
        }
        return acc;
    }

    /** The distance value as a distance in the channel's unit (√ for Euclidean). */
    double toDistance(double value) {
        return max ? value : Math.sqrt(value);
    }

    /**
     * The largest distance value v with toDistance(v) ≤ ε: cells recur exactly when their value ≤ this.
     * For the maximum norm that is ε itself; for Euclidean, the largest double whose correctly rounded
     * square root is ≤ ε.
     */
    double valueThreshold(double epsilon) {
        if (max) {
            return epsilon;
        }
        double c = epsilon * epsilon;
        while (c > 0 && Math.sqrt(c) > epsilon) {
            c = Math.nextDown(c);
        }
        while (c < Double.MAX_VALUE && Math.sqrt(Math.nextUp(c)) <= epsilon) {
            c = Math.nextUp(c);
        }
        return c;
    }
}
