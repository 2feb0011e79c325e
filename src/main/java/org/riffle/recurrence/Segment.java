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
    /** Bit t set, for t &lt; 64. */
    private static final long[] BIT = new long[64];

    static {
        for (int t = 0; t < 64; t++) {
            BIT[t] = 1L << t;
        }
    }

    /** coords[k][j] = x[from + j + k·τ], the k-th coordinate of every delay vector j (copies). */
    private final double[][] coords;
    private final double[] c0;
    private final double[] c1;
    private final double[] c2;
    private final double[] c3;
    private final int from;
    private final int m;
    private final int tau;
    private final boolean max;
    private final int vectors;

    /** Embeds {@code series[from, to)}; the samples must be finite. */
    Segment(double[] series, int from, int to, Embedding e, RqaParams.Norm norm) {
        this.from = from;
        this.m = e.dimension();
        this.tau = e.delay();
        this.max = norm == RqaParams.Norm.MAX;
        this.vectors = e.vectors(to - from);
        this.coords = new double[m][];
        for (int k = 0; k < m; k++) {
            int a = from + k * tau;
            coords[k] = vectors > 0 ? java.util.Arrays.copyOfRange(series, a, a + vectors) : new double[0];
        }
        this.c0 = coords[0];
        this.c1 = m > 1 ? coords[1] : null;
        this.c2 = m > 2 ? coords[2] : null;
        this.c3 = m > 3 ? coords[3] : null;
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

    /**
     * Fills {@code buf[j0, j1)} (indexed like the vectors, so {@code buf} holds at least j1 values) with the
     * distance values from vector i to vectors j0 … j1 − 1.
     *
     * <p>Every coordinate is read from its own shifted copy at the same index as the store, which is the
     * loop shape the JIT turns into vector instructions: about eight times faster than a scalar loop
     * reading {@code s[q + k·τ]} (measured on this project's 2-core bench machine, Java 17).
     */
    void distances(int i, int j0, int j1, double[] buf) {
        int fused = Math.min(m, 4);
        double a0 = c0[i];
        if (fused == 1) {
            one(a0, j0, j1, buf);
        } else if (fused == 2) {
            two(a0, c1[i], j0, j1, buf);
        } else if (fused == 3) {
            three(a0, c1[i], c2[i], j0, j1, buf);
        } else {
            four(a0, c1[i], c2[i], c3[i], j0, j1, buf);
        }
        for (int k = 4; k < m; k++) {
            double[] c = coords[k];
            double a = c[i];
            if (max) {
                for (int q = j0; q < j1; q++) {
                    buf[q] = Math.max(buf[q], Math.abs(a - c[q]));
                }
            } else {
                for (int q = j0; q < j1; q++) {
                    double d = a - c[q];
                    buf[q] = buf[q] + d * d;
                }
            }
        }
    }

    private void one(double a0, int j0, int j1, double[] buf) {
        double[] x0 = c0;
        if (max) {
            for (int q = j0; q < j1; q++) {
                buf[q] = Math.abs(a0 - x0[q]);
            }
        } else {
            for (int q = j0; q < j1; q++) {
                double d0 = a0 - x0[q];
                buf[q] = d0 * d0;
            }
        }
    }

    private void two(double a0, double a1, int j0, int j1, double[] buf) {
        double[] x0 = c0;
        double[] x1 = c1;
        if (max) {
            for (int q = j0; q < j1; q++) {
                buf[q] = Math.max(Math.abs(a0 - x0[q]), Math.abs(a1 - x1[q]));
            }
        } else {
            for (int q = j0; q < j1; q++) {
                double d0 = a0 - x0[q];
                double d1 = a1 - x1[q];
                buf[q] = d0 * d0 + d1 * d1;
            }
        }
    }

    private void three(double a0, double a1, double a2, int j0, int j1, double[] buf) {
        double[] x0 = c0;
        double[] x1 = c1;
        double[] x2 = c2;
        if (max) {
            for (int q = j0; q < j1; q++) {
                buf[q] = Math.max(Math.max(Math.abs(a0 - x0[q]), Math.abs(a1 - x1[q])), Math.abs(a2 - x2[q]));
            }
        } else {
            for (int q = j0; q < j1; q++) {
                double d0 = a0 - x0[q];
                double d1 = a1 - x1[q];
                double d2 = a2 - x2[q];
                buf[q] = d0 * d0 + d1 * d1 + d2 * d2;
            }
        }
    }

    private void four(double a0, double a1, double a2, double a3, int j0, int j1, double[] buf) {
        double[] x0 = c0;
        double[] x1 = c1;
        double[] x2 = c2;
        double[] x3 = c3;
        if (max) {
            for (int q = j0; q < j1; q++) {
                buf[q] = Math.max(Math.max(Math.abs(a0 - x0[q]), Math.abs(a1 - x1[q])),
                        Math.max(Math.abs(a2 - x2[q]), Math.abs(a3 - x3[q])));
            }
        } else {
            for (int q = j0; q < j1; q++) {
                double d0 = a0 - x0[q];
                double d1 = a1 - x1[q];
                double d2 = a2 - x2[q];
                double d3 = a3 - x3[q];
                buf[q] = d0 * d0 + d1 * d1 + d2 * d2 + d3 * d3;
            }
        }
    }

    /**
     * Sets, in {@code words}, the bit of every j in [j0, j1) whose distance value to vector i is ≤
     * {@code threshold} (j0 a multiple of 64; bits at and past j1 of the last word stay 0); {@code buf}
     * (at least j1 long) receives the distances on the way. A cell recurs exactly when
     * {@code threshold − value} is +0 or positive, which its sign bit tells without a branch.
     */
    void recurrenceBits(int i, int j0, int j1, double[] buf, double threshold, long[] words) {
        if (threshold == Double.POSITIVE_INFINITY) {
            for (int q0 = j0; q0 < j1; q0 += 64) {
                words[q0 >>> 6] = low(j1 - q0);
            }
            return;
        }
        distances(i, j0, j1, buf);
        double t0 = threshold + 0.0;
        for (int q = j0; q < j1; q++) {
            buf[q] = t0 - buf[q];
        }
        long[] bit = BIT;
        for (int q0 = j0; q0 < j1; q0 += 64) {
            int lim = Math.min(64, j1 - q0);
            long far = 0;
            for (int t = 0; t < lim; t++) {
                far |= (Double.doubleToRawLongBits(buf[q0 + t]) >> 63) & bit[t];
            }
            words[q0 >>> 6] = ~far & low(lim);
        }
    }

    /** A word with its lowest {@code count} bits set, 0 &lt; count ≤ 64 (all set for count ≥ 64). */
    private static long low(int count) {
        return count >= 64 ? -1L : (1L << count) - 1;
    }

    /** The distance value between vectors i and j, with the same arithmetic as {@link #distances}. */
    double distance(int i, int j) {
        double acc = 0;
        for (int k = 0; k < m; k++) {
            double d = coords[k][i] - coords[k][j];
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
