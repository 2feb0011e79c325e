package org.riffle.reservoir;

/**
 * The spectral radius (largest eigenvalue modulus) of a dense real square matrix, computed from all its
 * eigenvalues: Householder reduction to upper Hessenberg form, then the implicit double-shift QR
 * iteration of Francis (Golub &amp; Van Loan, Matrix Computations, 4th ed. 2013, Algorithms 7.4.2,
 * 7.5.1 and 7.5.2), eigenvalues only. Backward stable: the radius is exact to a few units of rounding
 * times the matrix norm, which the tests check against Commons Math's {@code EigenDecomposition} to 1e-9.
 *
 * <p>O(n³) time, O(n²) memory; stateless.
 */
final class SpectralRadius {
    private static final double EPS = 0x1.0p-52;
    private static final int MAX_SWEEPS_PER_EIGENVALUE = 60;

    private SpectralRadius() {
    }

    /** The spectral radius of {@code a} (row-major, square; not modified). */
    static double of(double[][] a) {
        int n = a.length;
        double[][] h = new double[n][];
        for (int i = 0; i < n; i++) {
            if (a[i].length != n) {
                throw new IllegalArgumentException("matrix row " + i + " has " + a[i].length + " entries, not " + n);
            }
            h[i] = a[i].clone();
        }
        toHessenberg(h);
        return largestModulus(h);
    }

    /** Householder vector for {@code x}: {@code v} (overwrites x) and returns β, so (I − βvvᵀ)x = ∓‖x‖e₁. */
    private static double house(double[] x, int len) {
        double norm = 0;
        for (int i = 0; i < len; i++) {
            norm = Math.hypot(norm, x[i]);
        }
        if (norm == 0) {
            return 0;
        }
        double sigma = x[0] >= 0 ? norm : -norm;
        x[0] += sigma;
        double vv = 0;
        for (int i = 0; i < len; i++) {
            vv += x[i] * x[i];
        }
        return 2 / vv;
    }

    /** Golub &amp; Van Loan Algorithm 7.4.2, in place. */
    static void toHessenberg(double[][] a) {
        int n = a.length;
        double[] v = new double[n];
        for (int k = 0; k < n - 2; k++) {
            int len = n - k - 1;
            for (int i = 0; i < len; i++) {
                v[i] = a[k + 1 + i][k];
            }
            double beta = house(v, len);
            if (beta == 0) {
                continue;
            }
            for (int j = k; j < n; j++) {
                double s = 0;
                for (int i = 0; i < len; i++) {
                    s += v[i] * a[k + 1 + i][j];
                }
                s *= beta;
                for (int i = 0; i < len; i++) {
                    a[k + 1 + i][j] -= s * v[i];
                }
            }
            for (int i = 0; i < n; i++) {
                double[] row = a[i];
                double s = 0;
                for (int j = 0; j < len; j++) {
                    s += row[k + 1 + j] * v[j];
                }
                s *= beta;
                for (int j = 0; j < len; j++) {
                    row[k + 1 + j] -= s * v[j];
                }
            }
            for (int i = k + 2; i < n; i++) {
                a[i][k] = 0;
            }
        }
    }

    /** Golub &amp; Van Loan Algorithm 7.5.2 (eigenvalues only) on an upper Hessenberg {@code h}, destroyed. */
    static double largestModulus(double[][] h) {
        int hi = h.length - 1;
        double radius = 0;
        int sweeps = 0;
        while (hi >= 0) {
            int lo = hi;
            while (lo > 0) {
                double s = Math.abs(h[lo - 1][lo - 1]) + Math.abs(h[lo][lo]);
                if (Math.abs(h[lo][lo - 1]) <= EPS * s || h[lo][lo - 1] == 0) {
                    h[lo][lo - 1] = 0;
                    break;
                }
                lo--;
            }
            if (lo == hi) {
                radius = Math.max(radius, Math.abs(h[hi][hi]));
                hi--;
                sweeps = 0;
            } else if (lo == hi - 1) {
                radius = Math.max(radius, twoByTwoRadius(h[hi - 1][hi - 1], h[hi - 1][hi], h[hi][hi - 1], h[hi][hi]));
                hi -= 2;
                sweeps = 0;
            } else {
                if (++sweeps > MAX_SWEEPS_PER_EIGENVALUE) {
                    throw new ArithmeticException("QR iteration did not converge on a " + h.length + "x"
                            + h.length + " matrix");
                }
                francisStep(h, lo, hi, sweeps % 10 == 0);
            }
        }
        return radius;
    }

    /** Largest eigenvalue modulus of [[a, b], [c, d]]. */
    static double twoByTwoRadius(double a, double b, double c, double d) {
        double p = 0.5 * (a - d);
        double disc = p * p + b * c;
        double mid = 0.5 * (a + d);
        if (disc >= 0) {
            double r = Math.sqrt(disc);
            return Math.max(Math.abs(mid + r), Math.abs(mid - r));
        }
        return Math.hypot(mid, Math.sqrt(-disc));
    }

    /**
     * One implicit double-shift step (Golub &amp; Van Loan Algorithm 7.5.1) on the unreduced block
     * {@code h[lo..hi][lo..hi]} (at least 3 × 3). With {@code exceptional}, an ad-hoc shift breaks cycles.
     */
    private static void francisStep(double[][] h, int lo, int hi, boolean exceptional) {
        double s;
        double t;
        if (exceptional) {
            double w = Math.abs(h[hi][hi - 1]) + Math.abs(h[hi - 1][hi - 2]);
            s = 1.5 * w;
            t = w * w;
        } else {
            s = h[hi - 1][hi - 1] + h[hi][hi];
            t = h[hi - 1][hi - 1] * h[hi][hi] - h[hi - 1][hi] * h[hi][hi - 1];
        }
        double[] v = new double[3];
        v[0] = h[lo][lo] * h[lo][lo] + h[lo][lo + 1] * h[lo + 1][lo] - s * h[lo][lo] + t;
        v[1] = h[lo + 1][lo] * (h[lo][lo] + h[lo + 1][lo + 1] - s);
        v[2] = h[lo + 1][lo] * h[lo + 2][lo + 1];
        int n = hi - lo + 1;
        for (int k = 0; k <= n - 3; k++) {
            double beta = house(v, 3);
            int r0 = lo + k;
            if (beta != 0) {
                reflectRows(h, r0, 3, v, beta, lo + Math.max(0, k - 1), hi);
                reflectColumns(h, r0, 3, v, beta, lo, Math.min(lo + k + 3, hi));
            }
            v[0] = h[r0 + 1][r0];
            v[1] = h[r0 + 2][r0];
            v[2] = k < n - 3 ? h[r0 + 3][r0] : 0;
        }
        double beta = house(v, 2);
        if (beta != 0) {
            reflectRows(h, hi - 1, 2, v, beta, hi - 2, hi);
            reflectColumns(h, hi - 1, 2, v, beta, lo, hi);
        }
    }

    /** Rows r0..r0+len−1, columns c0..c1 ← (I − βvvᵀ) · that block. */
    private static void reflectRows(double[][] h, int r0, int len, double[] v, double beta, int c0, int c1) {
        for (int j = c0; j <= c1; j++) {
            double s = 0;
            for (int i = 0; i < len; i++) {
                s += v[i] * h[r0 + i][j];
            }
            s *= beta;
            for (int i = 0; i < len; i++) {
                h[r0 + i][j] -= s * v[i];
            }
        }
    }

    /** Columns c0..c0+len−1, rows r0..r1 ← that block · (I − βvvᵀ). */
    private static void reflectColumns(double[][] h, int c0, int len, double[] v, double beta, int r0, int r1) {
        for (int i = r0; i <= r1; i++) {
            double s = 0;
            for (int j = 0; j < len; j++) {
                s += h[i][c0 + j] * v[j];
            }
            s *= beta;
            for (int j = 0; j < len; j++) {
                h[i][c0 + j] -= s * v[j];
            }
        }
    }
}
