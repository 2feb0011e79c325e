package org.riffle.recurrence;

import java.util.Arrays;

/**
 * The obvious, slow RQA: the whole N × N recurrence matrix as booleans, every line walked along every
 * diagonal and every column. Written from the definitions of Marwan, Romano, Thiel &amp; Kurths 2007
 * (Physics Reports 438:237, §3) with the conventions of the issue: distance ≤ ε recurs; cells with
 * |i − j| &lt; w are excluded everywhere; both triangles counted; lines at the border keep their length.
 * Shares no code with the engine.
 */
final class BruteForce {
    final int n;
    final boolean[][] r;
    final long recurrent;
    final long eligible;
    /** Diagonal line lengths of the full matrix: diag[l] = number of lines of length l. */
    final long[] diag;
    /** Vertical line lengths of the full matrix. */
    final long[] vert;

    private BruteForce(int n, boolean[][] r, long recurrent, long eligible, long[] diag, long[] vert) {
        this.n = n;
        this.r = r;
        this.recurrent = recurrent;
        this.eligible = eligible;
        this.diag = diag;
        this.vert = vert;
    }

    /** Distance between delay vectors i and j of x (Euclidean: √ of the sum of squares in ascending k). */
    static double distance(double[] x, int m, int tau, boolean maxNorm, int i, int j) {
        double acc = 0;
        for (int k = 0; k < m; k++) {
            double d = x[i + k * tau] - x[j + k * tau];
            acc = maxNorm ? Math.max(acc, Math.abs(d)) : acc + d * d;
        }
        return maxNorm ? acc : Math.sqrt(acc);
    }

    static BruteForce of(double[] x, int m, int tau, boolean maxNorm, double eps, int w) {
        int n = x.length - (m - 1) * tau;
        boolean[][] r = new boolean[n][n];
        long rec = 0;
        long elig = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (Math.abs(i - j) >= w) {
                    elig++;
                    r[i][j] = distance(x, m, tau, maxNorm, i, j) <= eps;
                    rec += r[i][j] ? 1 : 0;
                }
            }
        }
        long[] diag = new long[n + 1];
        for (int d = -(n - 1); d <= n - 1; d++) {
            int run = 0;
            for (int i = Math.max(0, -d); i < Math.min(n, n - d); i++) {
                if (r[i][i + d]) {
                    run++;
                } else if (run > 0) {
                    diag[run]++;
                    run = 0;
                }
            }
            if (run > 0) {
                diag[run]++;
            }
        }
        long[] vert = new long[n + 1];
        for (int j = 0; j < n; j++) {
            int run = 0;
            for (int i = 0; i < n; i++) {
                if (r[i][j]) {
                    run++;
                } else if (run > 0) {
                    vert[run]++;
                    run = 0;
                }
            }
            if (run > 0) {
                vert[run]++;
            }
        }
        return new BruteForce(n, r, rec, elig, diag, vert);
    }

    /** The k-th smallest eligible distance of the full matrix, k = ceil(q · eligible). */
    static double kthDistance(double[] x, int m, int tau, boolean maxNorm, int w, double q) {
        int n = x.length - (m - 1) * tau;
        double[] all = new double[n * n];
        int c = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (Math.abs(i - j) >= w) {
                    all[c++] = distance(x, m, tau, maxNorm, i, j);
                }
            }
        }
        double[] d = Arrays.copyOf(all, c);
        Arrays.sort(d);
        long k = Math.min(c, Math.max(1, (long) Math.ceil(q * c)));
        return d[(int) k - 1];
    }

    double rr() {
        return eligible > 0 ? (double) recurrent / eligible : Double.NaN;
    }

    /** Points on lines of length ≥ min over all recurrent points. */
    static double share(long[] h, int min, long recurrent) {
        long pts = 0;
        for (int l = min; l < h.length; l++) {
            pts += l * h[l];
        }
        return recurrent > 0 ? (double) pts / recurrent : Double.NaN;
    }

    static double meanLength(long[] h, int min) {
        long pts = 0;
        long cnt = 0;
        for (int l = min; l < h.length; l++) {
            pts += l * h[l];
            cnt += h[l];
        }
        return cnt > 0 ? (double) pts / cnt : Double.NaN;
    }

    static int longest(long[] h, int min) {
        for (int l = h.length - 1; l >= min; l--) {
            if (h[l] > 0) {
                return l;
            }
        }
        return 0;
    }

    static double entropy(long[] h, int min) {
        long cnt = 0;
        for (int l = min; l < h.length; l++) {
            cnt += h[l];
        }
        if (cnt == 0) {
            return Double.NaN;
        }
        double e = 0;
        for (int l = min; l < h.length; l++) {
            if (h[l] > 0) {
                double p = (double) h[l] / cnt;
                e -= p * Math.log(p);
            }
        }
        return e;
    }
}
