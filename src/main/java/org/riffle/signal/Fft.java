package org.riffle.signal;

/**
 * An iterative radix-2 fast Fourier transform (Cooley &amp; Tukey 1965, Math. Comp. 19:297) for a fixed
 * power-of-two size {@code n}, with a real-input transform of length {@code n} computed through one
 * complex transform of length {@code n/2} (the "two-for-one" packing, e.g. Press et al.,
 * Numerical Recipes, 3rd ed. 2007, §12.3).
 *
 * <p>Convention: forward X[k] = Σ x[j]·exp(−2πi·jk/n), no scaling; the inverse uses the opposite sign
 * and does not divide by n either (callers scale).
 *
 * <p>Not thread-safe: an instance holds scratch arrays. Create one per thread (construction is O(n)).
 */
final class Fft {
    private final int n;
    private final double[] cos;
    private final double[] sin;
    private double[] scratchRe;
    private double[] scratchIm;

    /** A transform of size {@code n}, a power of two ≥ 2. */
    Fft(int n) {
        if (n < 2 || Integer.bitCount(n) != 1) {
            throw new IllegalArgumentException("FFT size " + n + " is not a power of two >= 2");
        }
        this.n = n;
        cos = new double[n / 2];
        sin = new double[n / 2];
        for (int k = 0; k < n / 2; k++) {
            double a = 2 * Math.PI * k / n;
            cos[k] = Math.cos(a);
            sin[k] = Math.sin(a);
        }
    }

    /** The size this instance transforms. */
    int size() {
        return n;
    }

    /** The smallest power of two ≥ {@code m} (and ≥ 2). */
    static int nextPowerOfTwo(int m) {
        if (m > (1 << 30)) {
            throw new IllegalArgumentException("length " + m + " too large for an FFT");
        }
        int p = 2;
        while (p < m) {
            p <<= 1;
        }
        return p;
    }

    /** In-place complex transform of size {@code n}; {@code inverse} flips the exponent's sign. */
    void complex(double[] re, double[] im, boolean inverse) {
        transform(re, im, n, inverse);
    }

    /**
     * Transform of the real sequence {@code x[0, n)}: writes bins 0..n/2 (inclusive) of the spectrum
     * into {@code outRe} and {@code outIm}, each of length at least n/2 + 1. {@code x} is not changed.
     */
    void realForward(double[] x, double[] outRe, double[] outIm) {
        int m = n / 2;
        if (m == 1) {
            outRe[0] = x[0] + x[1];
            outIm[0] = 0;
            outRe[1] = x[0] - x[1];
            outIm[1] = 0;
            return;
        }
        if (scratchRe == null) {
            scratchRe = new double[m];
            scratchIm = new double[m];
        }
        double[] zr = scratchRe;
        double[] zi = scratchIm;
        for (int j = 0; j < m; j++) {
            zr[j] = x[2 * j];
            zi[j] = x[2 * j + 1];
        }
        transform(zr, zi, m, false);
        outRe[0] = zr[0] + zi[0];
        outIm[0] = 0;
        outRe[m] = zr[0] - zi[0];
        outIm[m] = 0;
        for (int k = 1; k < m; k++) {
            double ar = zr[k];
            double ai = zi[k];
            double br = zr[m - k];
            double bi = -zi[m - k];
            double er = 0.5 * (ar + br);
            double ei = 0.5 * (ai + bi);
            // odd part: -i/2 (a - b)
            double or = 0.5 * (ai - bi);
            double oi = -0.5 * (ar - br);
            double wr = cos[k];
            double wi = -sin[k];
            outRe[k] = er + wr * or - wi * oi;
            outIm[k] = ei + wr * oi + wi * or;
        }
    }

    /** Radix-2 decimation in time over the first {@code size} entries; {@code size} divides n. */
    private void transform(double[] re, double[] im, int size, boolean inverse) {
        for (int i = 1, j = 0; i < size; i++) {
            int bit = size >> 1;
            for (; (j & bit) != 0; bit >>= 1) {
                j ^= bit;
            }
            j ^= bit;
            if (i < j) {
                double t = re[i];
                re[i] = re[j];
                re[j] = t;
                t = im[i];
                im[i] = im[j];
                im[j] = t;
            }
        }
        double sign = inverse ? 1 : -1;
        for (int len = 2; len <= size; len <<= 1) {
            int half = len >> 1;
            int step = n / len;
            for (int start = 0; start < size; start += len) {
                for (int k = 0, t = 0; k < half; k++, t += step) {
                    double wr = cos[t];
                    double wi = sign * sin[t];
                    int a = start + k;
                    int b = a + half;
                    double xr = re[b] * wr - im[b] * wi;
                    double xi = re[b] * wi + im[b] * wr;
                    re[b] = re[a] - xr;
                    im[b] = im[a] - xi;
                    re[a] += xr;
                    im[a] += xi;
                }
            }
        }
    }
}
