package org.riffle.signal;

import java.util.Arrays;

/**
 * Welch's averaged-periodogram estimate of the power spectral density (Welch 1967, IEEE Trans. Audio
 * Electroacoust. 15:70), computed as scipy.signal.welch computes it with its defaults: periodic Hann
 * window, 50 % overlap (step = segment − ⌊segment/2⌋), each segment's mean removed, one-sided, mean of
 * the segments' periodograms. Segments start at sample 0; a tail shorter than one step is left out.
 * Segments that hold a missing ({@code NaN}) sample are left out and counted, never filled.
 *
 * <p>Stateless and thread-safe; each call allocates its own buffers.
 */
public final class Welch {
    private Welch() {
    }

    /** The spectrum of all of {@code x}, sampled at {@code sampleRateHz}. */
    public static Spectrum estimate(double[] x, double sampleRateHz, WelchParams params) {
        return estimate(x, 0, x.length, sampleRateHz, params);
    }

    /**
     * The spectrum of {@code x[from, to)}. When every segment holds a missing sample the result has
     * {@link Spectrum#segments()} 0 and {@code NaN} densities.
     *
     * @throws IllegalArgumentException when the rate is not positive or the run is shorter than a segment
     */
    public static Spectrum estimate(double[] x, int from, int to, double sampleRateHz, WelchParams params) {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate " + sampleRateHz + " Hz is not positive and finite");
        }
        int n = to - from;
        int seg = params.segmentFor(n);
        if (seg > n || seg < WelchParams.MIN_SEGMENT) {
            throw new IllegalArgumentException("segment length " + seg + " does not fit " + n
                    + " samples (at least " + WelchParams.MIN_SEGMENT + " needed)");
        }
        int nfft = Fft.nextPowerOfTwo(seg);
        double[] w = hann(seg);
        double s1 = 0;
        double s2 = 0;
        for (double v : w) {
            s1 += v;
            s2 += v * v;
        }
        int step = seg - seg / 2;
        int count = (n - seg) / step + 1;
        Fft fft = new Fft(nfft);
        double[] buf = new double[nfft];
        double[] re = new double[nfft / 2 + 1];
        double[] im = new double[nfft / 2 + 1];
        double[] acc = new double[nfft / 2 + 1];
        int used = 0;
        for (int s = 0; s < count; s++) {
            if (window(x, from + s * step, seg, w, buf)) {
                fft.realForward(buf, re, im);
                for (int k = 0; k < acc.length; k++) {
                    acc[k] += re[k] * re[k] + im[k] * im[k];
                }
                used++;
            }
        }
        if (used == 0) {
            Arrays.fill(acc, Double.NaN);
        } else {
            double scale = 1.0 / (sampleRateHz * s2 * used);
            for (int k = 0; k < acc.length; k++) {
                boolean edge = k == 0 || k == acc.length - 1;
                acc[k] *= edge ? scale : 2 * scale;
            }
        }
        double enbw = sampleRateHz * s2 / (s1 * s1);
        return new Spectrum(sampleRateHz, seg, nfft, used, count - used, enbw, acc);
    }

    /** The periodic Hann window of length {@code n}: w[i] = ½ − ½·cos(2πi/n). */
    static double[] hann(int n) {
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 0.5 - 0.5 * Math.cos(2 * Math.PI * i / n);
        }
        return w;
    }

    /** Writes the windowed, mean-removed segment into {@code buf}; false when it holds a NaN. */
    private static boolean window(double[] x, int start, int seg, double[] w, double[] buf) {
        double sum = 0;
        for (int i = 0; i < seg; i++) {
            sum += x[start + i];
        }
        if (Double.isNaN(sum)) {
            return false;
        }
        double mean = sum / seg;
        for (int i = 0; i < seg; i++) {
            buf[i] = (x[start + i] - mean) * w[i];
        }
        return true;
    }
}
