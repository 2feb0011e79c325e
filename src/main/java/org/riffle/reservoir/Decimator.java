package org.riffle.reservoir;

/**
 * The analysis rate of a channel: an oversampled channel (one whose autocorrelation needs many samples
 * to reach its first zero) is low-pass filtered and kept every D-th sample, so that one-step prediction
 * is a test of the dynamics and not of smoothness, and long high-rate records cost less.
 *
 * <p>Rate rule: D = ⌊z / 8⌋, where z is the lag of the first zero crossing of the baseline's
 * autocorrelation (a quarter period for an oscillation), clamped to [1, {@code maxFactor}]; after
 * decimation the first zero sits near lag 8 (an oscillation keeps at least 32 samples a period, so
 * its harmonics and impulsive content stay below the new Nyquist frequency). Filter: a linear-phase FIR, a Blackman-windowed sinc with
 * cut-off 0.4/D cycles per sample and 24·D + 1 taps (Oppenheim &amp; Schafer, Discrete-Time Signal
 * Processing, 3rd ed. 2010, sections 7.5 and 4.6: window method and downsampling), centred, so output k
 * stands for input sample k·D. Taps beyond the ends are left out and the rest renormalised to unit
 * gain; an output whose taps touch a missing ({@code NaN}) sample is missing.
 *
 * <p>Stateless and thread-safe.
 */
public final class Decimator {
    /** Taps per unit of decimation factor, on each side. */
    static final int HALF_TAPS_PER_FACTOR = 12;

    private Decimator() {
    }

    /**
     * The decimation factor for a channel whose baseline is {@code x[from, to)}: ⌊z/8⌋ clamped to
     * [1, maxFactor], z the first zero crossing of the autocorrelation (searched up to 8·maxFactor + 8
     * lags on at most the first 20,000 baseline samples; missing samples count as the mean).
     */
    public static int factor(double[] x, int from, int to, int maxFactor) {
        if (maxFactor <= 1) {
            return 1;
        }
        int end = Math.min(to, from + 20_000);
        double mean = 0;
        int n = 0;
        for (int i = from; i < end; i++) {
            if (!Double.isNaN(x[i])) {
                mean += x[i];
                n++;
            }
        }
        if (n < 8) {
            return 1;
        }
        mean /= n;
        int maxLag = Math.min(8 * maxFactor + 8, (end - from) / 2);
        for (int lag = 1; lag <= maxLag; lag++) {
            double r = 0;
            for (int i = from; i + lag < end; i++) {
                double a = x[i];
                double b = x[i + lag];
                if (!Double.isNaN(a) && !Double.isNaN(b)) {
                    r += (a - mean) * (b - mean);
                }
            }
            if (r <= 0) {
                return Math.max(1, Math.min(maxFactor, lag / 8));
            }
        }
        return maxFactor;
    }

    /** The filter taps for factor {@code d}: Blackman-windowed sinc, cut-off 0.4/d, unit DC gain. */
    static double[] taps(int d) {
        int half = HALF_TAPS_PER_FACTOR * d;
        double[] h = new double[2 * half + 1];
        double fc = 0.4 / d;
        double sum = 0;
        for (int j = -half; j <= half; j++) {
            double sinc = j == 0 ? 2 * fc : Math.sin(2 * Math.PI * fc * j) / (Math.PI * j);
            double phase = Math.PI * (j + half) / half;
            double window = 0.42 - 0.5 * Math.cos(phase) + 0.08 * Math.cos(2 * phase);
            h[j + half] = sinc * window;
            sum += h[j + half];
        }
        for (int j = 0; j < h.length; j++) {
            h[j] /= sum;
        }
        return h;
    }

    /** {@code x} filtered and kept every {@code d}-th sample: ⌈n/d⌉ outputs, output k at input k·d. */
    public static double[] decimate(double[] x, int d) {
        if (d < 1) {
            throw new IllegalArgumentException("decimation factor " + d + " must be at least 1");
        }
        if (d == 1) {
            return x.clone();
        }
        double[] h = taps(d);
        int half = h.length / 2;
        int n = x.length;
        double[] out = new double[(n + d - 1) / d];
        for (int k = 0; k < out.length; k++) {
            int centre = k * d;
            int j0 = Math.max(-half, -centre);
            int j1 = Math.min(half, n - 1 - centre);
            double s = 0;
            double g = 0;
            for (int j = j0; j <= j1; j++) {
                double w = h[j + half];
                s += w * x[centre + j];
                g += w;
            }
            out[k] = s / g;
        }
        return out;
    }
}
