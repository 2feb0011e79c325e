package org.riffle.signal;

import java.util.Locale;

/**
 * The envelope spectrum for impulsive bearing faults: band-pass the signal around a structural
 * resonance, take the analytic signal by FFT (Hilbert transform: zero the negative frequencies, double
 * the positive ones), square its magnitude, and estimate the spectrum of that squared envelope (Randall
 * &amp; Antoni 2011, "Rolling element bearing diagnostics — a tutorial", Mech. Syst. Signal Process.
 * 25:485, §3: squared envelope spectrum of a band chosen by spectral kurtosis).
 *
 * <p>The whole run is transformed at once, zero-padded to the next power of two (the filter is an
 * ideal brick wall on that grid; the padding adds a little edge effect at both ends). The squared
 * envelope is in unit², so envelope-spectrum amplitudes are in unit² RMS.
 *
 * <p>Stateless and thread-safe.
 */
public final class Envelope {
    /** Band selection looks at no more than this many samples from the start. */
    static final int KURTOSIS_SAMPLES = 1 << 16;

    private Envelope() {
    }

    /** The squared-envelope spectrum of {@code x[from, to)} band-passed to {@code band}. */
    public static Spectrum spectrum(double[] x, int from, int to, double sampleRateHz, Band band,
                                    WelchParams params) {
        double[][] a = analytic(x, from, to, sampleRateHz, band.loHz(), band.hiHz());
        double[] sq = new double[to - from];
        for (int i = 0; i < sq.length; i++) {
            sq[i] = a[0][i] * a[0][i] + a[1][i] * a[1][i];
        }
        return Welch.estimate(sq, sampleRateHz, params);
    }

    /**
     * The band among [k·fs/16, (k+2)·fs/16], k = 1..5, whose analytic signal has the highest spectral
     * kurtosis K = ⟨|a|⁴⟩/⟨|a|²⟩² − 2 (Randall &amp; Antoni 2011, §3.2; a coarse one-level version of
     * their kurtogram), judged on the first {@value #KURTOSIS_SAMPLES} samples at most.
     */
    public static Band chooseBand(double[] x, int from, int to, double sampleRateHz) {
        int end = Math.min(to, from + KURTOSIS_SAMPLES);
        double best = Double.NEGATIVE_INFINITY;
        int bestK = 1;
        for (int k = 1; k <= 5; k++) {
            double[][] a = analytic(x, from, end, sampleRateHz, k * sampleRateHz / 16, (k + 2) * sampleRateHz / 16);
            double m2 = 0;
            double m4 = 0;
            for (int i = 0; i < end - from; i++) {
                double p = a[0][i] * a[0][i] + a[1][i] * a[1][i];
                m2 += p;
                m4 += p * p;
            }
            int n = end - from;
            double sk = m2 > 0 ? (m4 / n) / ((m2 / n) * (m2 / n)) - 2 : Double.NEGATIVE_INFINITY;
            if (sk > best) {
                best = sk;
                bestK = k;
            }
        }
        return new Band(bestK * sampleRateHz / 16, (bestK + 2) * sampleRateHz / 16,
                String.format(Locale.ROOT, "highest spectral kurtosis (%.3g) of 5 bands fs/8 wide", best));
    }

    /**
     * The analytic signal of {@code x[from, to)} restricted to [loHz, hiHz]: {@code [re, im]}, each of
     * length to − from. With the full band (0 to fs/2) this is scipy.signal.hilbert for power-of-two
     * lengths.
     */
    static double[][] analytic(double[] x, int from, int to, double sampleRateHz, double loHz, double hiHz) {
        int n = to - from;
        int len = Fft.nextPowerOfTwo(n);
        double[] re = new double[len];
        double[] im = new double[len];
        System.arraycopy(x, from, re, 0, n);
        Fft fft = new Fft(len);
        fft.complex(re, im, false);
        double df = sampleRateHz / len;
        for (int k = 0; k < len; k++) {
            double gain;
            if (k > len / 2) {
                gain = 0;
            } else {
                double f = k * df;
                boolean in = f >= loHz - 1e-9 && f <= hiHz + 1e-9;
                gain = !in ? 0 : (k == 0 || k == len / 2) ? 1 : 2;
            }
            re[k] *= gain / len;
            im[k] *= gain / len;
        }
        fft.complex(re, im, true);
        double[] outRe = new double[n];
        double[] outIm = new double[n];
        System.arraycopy(re, 0, outRe, 0, n);
        System.arraycopy(im, 0, outIm, 0, n);
        return new double[][] {outRe, outIm};
    }
}
