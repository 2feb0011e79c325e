package org.riffle.reservoir;

/**
 * Sufficient statistics of a linear least-squares problem y ≈ w·z: the Gram matrix Σ z zᵀ (upper
 * triangle, row-major d × d), Σ y z, Σ y² and the count, accumulated row by row. Holds everything a ridge
 * fit and its validation error need, so that cross-validation folds are sums and differences of these.
 *
 * <p>The ridge solution (Hoerl &amp; Kennard 1970, Technometrics 12:55) minimises
 * (1/n)·Σ(y − w·z)² + λ·Σ_{j≥1} w_j², i.e. solves (G/n + λP)·w = b/n with P = diag(0, 1, …, 1): the
 * first coefficient (the bias, z₀ = 1) is not penalised. Solved by Cholesky factorisation.
 *
 * <p>Mutable, confined to one thread.
 */
final class Gram {
    private static final int BLOCK = 16;

    final int dim;
    final double[] g;
    final double[] b;
    double yy;
    long count;
    private final double[] pendingZ;
    private final double[] pendingY;
    private int pending;

    Gram(int dim) {
        this.dim = dim;
        this.g = new double[dim * dim];
        this.b = new double[dim];
        this.pendingZ = new double[BLOCK * dim];
        this.pendingY = new double[BLOCK];
    }

    /** Adds one row {@code z} (length dim) with target {@code y}. */
    void add(double[] z, double y) {
        System.arraycopy(z, 0, pendingZ, pending * dim, dim);
        pendingY[pending++] = y;
        if (pending == BLOCK) {
            flush();
        }
    }

    /** Folds buffered rows in; rows are applied in arrival order so sums are reproducible. */
    void flush() {
        int d = dim;
        for (int r = 0; r < pending; r++) {
            int off = r * d;
            double y = pendingY[r];
            yy += y * y;
            for (int i = 0; i < d; i++) {
                b[i] += y * pendingZ[off + i];
            }
        }
        for (int i = 0; i < d; i++) {
            int row = i * d;
            for (int r = 0; r < pending; r++) {
                int off = r * d;
                double zi = pendingZ[off + i];
                for (int j = i; j < d; j++) {
                    g[row + j] += zi * pendingZ[off + j];
                }
            }
        }
        count += pending;
        pending = 0;
    }

    /** this += sign · other (both flushed). */
    void accumulate(Gram other, double sign) {
        flush();
        other.flush();
        for (int k = 0; k < g.length; k++) {
            g[k] += sign * other.g[k];
        }
        for (int k = 0; k < dim; k++) {
            b[k] += sign * other.b[k];
        }
        yy += sign * other.yy;
        count += sign > 0 ? other.count : -other.count;
    }

    /** A flushed copy. */
    Gram copy() {
        flush();
        Gram c = new Gram(dim);
        System.arraycopy(g, 0, c.g, 0, g.length);
        System.arraycopy(b, 0, c.b, 0, dim);
        c.yy = yy;
        c.count = count;
        return c;
    }

    /**
     * The ridge weights for penalty {@code lambda} per sample (bias unpenalised).
     *
     * @throws IllegalStateException when there are no rows or the system is singular
     */
    double[] solve(double lambda) {
        flush();
        if (count <= 0) {
            throw new IllegalStateException("no training rows for the readout");
        }
        int d = dim;
        double inv = 1.0 / count;
        double[] a = new double[d * d];
        for (int i = 0; i < d; i++) {
            for (int j = i; j < d; j++) {
                a[i * d + j] = g[i * d + j] * inv;
            }
            if (i > 0) {
                a[i * d + i] += lambda;
            }
        }
        double[] rhs = new double[d];
        for (int i = 0; i < d; i++) {
            rhs[i] = b[i] * inv;
        }
        return choleskySolve(a, rhs, d);
    }

    /** Solves A·w = rhs for symmetric positive definite A given by its upper triangle (overwritten). */
    static double[] choleskySolve(double[] a, double[] rhs, int d) {
        // A = Rᵀ R with R upper triangular, right-looking so that inner loops run along rows
        for (int i = 0; i < d; i++) {
            double s = a[i * d + i];
            if (!(s > 0)) {
                throw new IllegalStateException("readout system is singular (pivot " + s + " at " + i
                        + "); a larger ridge penalty is needed");
            }
            double rii = Math.sqrt(s);
            a[i * d + i] = rii;
            double inv = 1 / rii;
            for (int j = i + 1; j < d; j++) {
                a[i * d + j] *= inv;
            }
            for (int j = i + 1; j < d; j++) {
                double rij = a[i * d + j];
                int row = j * d;
                int src = i * d;
                for (int l = j; l < d; l++) {
                    a[row + l] -= rij * a[src + l];
                }
            }
        }
        double[] y = new double[d];
        for (int i = 0; i < d; i++) {
            double t = rhs[i];
            for (int k = 0; k < i; k++) {
                t -= a[k * d + i] * y[k];
            }
            y[i] = t / a[i * d + i];
        }
        double[] w = new double[d];
        for (int i = d - 1; i >= 0; i--) {
            double t = y[i];
            for (int k = i + 1; k < d; k++) {
                t -= a[i * d + k] * w[k];
            }
            w[i] = t / a[i * d + i];
        }
        return w;
    }

    /** Σ (y − w·z)² over the accumulated rows, from the sums: yy − 2w·b + wᵀGw. */
    double sse(double[] w) {
        flush();
        int d = dim;
        double quad = 0;
        for (int i = 0; i < d; i++) {
            double wi = w[i];
            quad += wi * wi * g[i * d + i];
            double off = 0;
            for (int j = i + 1; j < d; j++) {
                off += g[i * d + j] * w[j];
            }
            quad += 2 * wi * off;
        }
        double lin = 0;
        for (int i = 0; i < d; i++) {
            lin += w[i] * b[i];
        }
        return Math.max(0, yy - 2 * lin + quad);
    }
}
