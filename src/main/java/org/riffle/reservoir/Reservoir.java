package org.riffle.reservoir;

import java.util.Arrays;
import java.util.concurrent.CancellationException;

/**
 * A seeded sparse reservoir: the recurrent matrix W (exactly {@link EsnParams#connections()} entries per
 * row, stored row-wise as primitive arrays), the input and bias weights, and the leaky-tanh state update
 * of {@link EsnParams}. W is drawn once from the seed and rescaled by target radius / actual radius, the
 * actual radius computed from all eigenvalues ({@link SpectralRadius}); rebuilding with another radius,
 * leak or scaling but the same seed, size and sparsity reuses the draw and its eigenvalues.
 *
 * <p>The activation is tanh evaluated as Lambert's continued fraction truncated to a [7/6] rational
 * function and clamped to ±1 beyond |v| = 4.97 (absolute error below 1e-4, slope never above 1; tested
 * against {@link Math#tanh}): plain arithmetic, so results are bit-identical on every JVM and thread.
 *
 * <p>Immutable and thread-safe; the state arrays passed to {@link #step} belong to the caller.
 */
public final class Reservoir {
    /** |v| beyond which the rational tanh reaches 1 and is clamped. */
    static final double TANH_CLAMP = 4.971786;

    private final EsnParams params;
    private final int[] cols;
    private final double[] raw;
    private final double rawRadius;
    private final double[] rawIn;
    private final double[] rawBias;
    private final double[] w;
    private final double[] win;
    private final double[] bias;

    private Reservoir(EsnParams params, int[] cols, double[] raw, double rawRadius, double[] rawIn,
                      double[] rawBias) {
        this.params = params;
        this.cols = cols;
        this.raw = raw;
        this.rawRadius = rawRadius;
        this.rawIn = rawIn;
        this.rawBias = rawBias;
        double scale = params.spectralRadius() / rawRadius;
        this.w = new double[raw.length];
        for (int k = 0; k < raw.length; k++) {
            w[k] = raw[k] * scale;
        }
        int n = params.units();
        this.win = new double[n];
        this.bias = new double[n];
        for (int i = 0; i < n; i++) {
            win[i] = rawIn[i] * params.inputScaling();
            bias[i] = rawBias[i] * params.biasScaling();
        }
    }

    /** Draws the reservoir of {@code params} from its seed. */
    public static Reservoir build(EsnParams params) {
        int n = params.units();
        int c = params.connections();
        Rng rng = new Rng(params.seed());
        int[] cols = new int[n * c];
        double[] raw = new double[n * c];
        int[] pool = new int[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                pool[j] = j;
            }
            for (int k = 0; k < c; k++) {
                int pick = k + rng.nextInt(n - k);
                int col = pool[pick];
                pool[pick] = pool[k];
                pool[k] = col;
            }
            Arrays.sort(pool, 0, c);
            for (int k = 0; k < c; k++) {
                cols[i * c + k] = pool[k];
                raw[i * c + k] = rng.nextSigned();
            }
        }
        double[] rawIn = new double[n];
        double[] rawBias = new double[n];
        for (int i = 0; i < n; i++) {
            rawIn[i] = rng.nextSigned();
            rawBias[i] = rng.nextSigned();
        }
        double radius = SpectralRadius.of(dense(n, c, cols, raw));
        if (!(radius > 1e-12)) {
            throw new IllegalArgumentException("reservoir seed " + params.seed() + " with " + n + " units and "
                    + c + " connections draws a nilpotent matrix (spectral radius " + radius
                    + "); choose another seed or more connections");
        }
        return new Reservoir(params, cols, raw, radius, rawIn, rawBias);
    }

    /** This reservoir's draw with other settings; redraws only when seed, size or sparsity change. */
    public Reservoir with(EsnParams other) {
        if (!params.sameStructure(other)) {
            return build(other);
        }
        return new Reservoir(other, cols, raw, rawRadius, rawIn, rawBias);
    }

    public EsnParams params() {
        return params;
    }

    /** Number of units N. */
    public int units() {
        return params.units();
    }

    /** The spectral radius of the drawn W before rescaling. */
    public double unscaledRadius() {
        return rawRadius;
    }

    /** W as a dense N × N matrix (a new array; for checks). */
    public double[][] denseMatrix() {
        return dense(params.units(), params.connections(), cols, w);
    }

    private static double[][] dense(int n, int c, int[] cols, double[] vals) {
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = i * c; k < (i + 1) * c; k++) {
                m[i][cols[k]] = vals[k];
            }
        }
        return m;
    }

    /**
     * One update of state {@code x} (length N, overwritten) under input {@code u}; {@code pre} is
     * scratch of length N.
     */
    public void step(double[] x, double[] pre, double u) {
        int n = win.length;
        int c = params.connections();
        int[] cl = cols;
        double[] wl = w;
        for (int i = 0, k = 0; i < n; i++) {
            double s = bias[i] + win[i] * u;
            for (int end = k + c; k < end; k++) {
                s += wl[k] * x[cl[k]];
            }
            pre[i] = s;
        }
        double alpha = params.leak();
        double keep = 1 - alpha;
        for (int i = 0; i < n; i++) {
            x[i] = keep * x[i] + alpha * tanh(pre[i]);
        }
    }

    /**
     * The activation: tanh as a [7/6] rational function (Lambert's continued fraction), clamped to ±1
     * for |v| ≥ {@link #TANH_CLAMP}.
     */
    static double tanh(double v) {
        double y = Math.max(-TANH_CLAMP, Math.min(TANH_CLAMP, v));
        double y2 = y * y;
        double num = y * (135135 + y2 * (17325 + y2 * (378 + y2)));
        double den = 135135 + y2 * (62370 + y2 * (3150 + 28 * y2));
        return Math.max(-1, Math.min(1, num / den));
    }

    /**
     * Steps needed for two copies started from the zero state and from a seeded random state in
     * [−1, 1]^N to agree to {@code tolerance} (largest component difference) under {@code input} from its
     * start: the echo state property (Jaeger 2001) observed on this input. NaN inputs are skipped.
     *
     * @return the number of steps, or −1 when they still differ after {@code maxSteps} or the input ends
     * @throws CancellationException when the thread is interrupted
     */
    public int convergenceSteps(double[] input, int maxSteps, double tolerance) {
        int n = units();
        double[] a = new double[n];
        double[] b = new double[n];
        Rng rng = new Rng(params.seed() ^ 0x5DEECE66DL);
        for (int i = 0; i < n; i++) {
            b[i] = rng.nextSigned();
        }
        double[] pre = new double[n];
        int steps = 0;
        for (int t = 0; t < input.length && steps < maxSteps; t++) {
            if (Double.isNaN(input[t])) {
                continue;
            }
            step(a, pre, input[t]);
            step(b, pre, input[t]);
            steps++;
            double d = 0;
            for (int i = 0; i < n; i++) {
                d = Math.max(d, Math.abs(a[i] - b[i]));
            }
            if (d < tolerance) {
                return steps;
            }
            if ((steps & 1023) == 0 && Thread.currentThread().isInterrupted()) {
                throw new CancellationException("reservoir run cancelled");
            }
        }
        return -1;
    }

    /** A 64-bit fingerprint of W, W_in and the bias exactly as used (to check a rebuilt reservoir). */
    public long fingerprint() {
        long h = 1125899906842597L;
        for (double[] arr : new double[][] {w, win, bias}) {
            for (double v : arr) {
                h = 31 * h + Double.doubleToLongBits(v);
            }
        }
        for (int c : cols) {
            h = 31 * h + c;
        }
        return h;
    }
}
