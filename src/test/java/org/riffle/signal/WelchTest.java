package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Welch PSD against analytic results and a slow periodogram oracle written here. */
class WelchTest {
    private static double[] sine(int n, double fs, double amp, double hz, double phase) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = amp * Math.sin(2 * Math.PI * hz * i / fs + phase);
        }
        return x;
    }

    private static double variance(double[] x) {
        double m = 0;
        for (double v : x) {
            m += v;
        }
        m /= x.length;
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return s / x.length;
    }

    /**
     * Parseval (analytic: Σ density·df is the mean windowed power of the mean-removed segments, which for
     * a stationary signal is its variance). Seeded white noise plus two sines, 2^18 samples: the
     * sampling error of the power estimate is about 0.2 % (one sigma), so 1 % is a fair bound.
     */
    @Test
    void integralOfTheDensityIsTheVarianceWithinOnePercent() {
        Random rnd = new Random(42L);
        int n = 1 << 18;
        double fs = 2560;
        double[] x = sine(n, fs, 2.0, 97.3, 0.1);
        double[] y = sine(n, fs, 0.5, 401.9, 1.0);
        for (int i = 0; i < n; i++) {
            x[i] += y[i] + 0.7 * rnd.nextGaussian() + 5;
        }
        Spectrum s = Welch.estimate(x, fs, WelchParams.auto());
        double integral = 0;
        for (int k = 0; k < s.size(); k++) {
            integral += s.density(k) * s.binHz();
        }
        double var = variance(x);
        assertEquals(var, integral, 0.01 * var, "integral of PSD vs variance " + var);
        assertEquals(Math.sqrt(integral), s.bandRms(0, fs / 2), 1e-9, "band RMS over all bins");
    }

    /**
     * A sine of peak amplitude 3 at 123.37 Hz, between bins (analytic: RMS 3/√2; frequency exact). The
     * issue asks for 1 % in amplitude and a tenth of a bin in frequency.
     */
    @Test
    void sineAmplitudeAndFrequencyAreRecovered() {
        double fs = 1000;
        for (double hz : new double[] {123.37, 123.5, 200.0, 61.13}) {
            double[] x = sine(100_000, fs, 3.0, hz, 0.4);
            Spectrum s = Welch.estimate(x, fs, new WelchParams(1024));
            Peak p = s.peaks(1, 0).get(0);
            assertEquals(3 / Math.sqrt(2), p.amplitudeRms(), 0.01 * 3 / Math.sqrt(2), "amplitude at " + hz);
            assertEquals(hz, p.frequencyHz(), 0.1 * s.binHz(), "frequency at " + hz);
        }
    }

    /** Same with a segment length that is not a power of two (zero-padded, log-parabolic interpolation). */
    @Test
    void sineIsRecoveredWithAZeroPaddedSegment() {
        double fs = 1000;
        double hz = 87.77;
        double[] x = sine(50_000, fs, 1.0, hz, 0);
        Spectrum s = Welch.estimate(x, fs, new WelchParams(1000));
        assertEquals(1024, s.fftLength());
        Peak p = s.peaks(1, 0).get(0);
        assertEquals(1 / Math.sqrt(2), p.amplitudeRms(), 0.01 / Math.sqrt(2));
        assertEquals(hz, p.frequencyHz(), 0.1 * fs / 1000, "a tenth of the segment's resolution");
    }

    /** Oracle: each segment's periodogram from the naive DFT, averaged by hand, density scaling. */
    @Test
    void matchesAPeriodogramAveragedByHand() {
        Random rnd = new Random(3L);
        int n = 300;
        int seg = 64;
        double fs = 50;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextGaussian() + Math.cos(i * 0.7);
        }
        double[] w = new double[seg];
        double s2 = 0;
        for (int i = 0; i < seg; i++) {
            w[i] = 0.5 - 0.5 * Math.cos(2 * Math.PI * i / seg);
            s2 += w[i] * w[i];
        }
        double[] want = new double[seg / 2 + 1];
        int count = 0;
        for (int start = 0; start + seg <= n; start += seg / 2) {
            double mean = 0;
            for (int i = 0; i < seg; i++) {
                mean += x[start + i] / seg;
            }
            double[] re = new double[seg];
            for (int i = 0; i < seg; i++) {
                re[i] = (x[start + i] - mean) * w[i];
            }
            double[][] f = FftTest.naiveDft(re, new double[seg], false);
            for (int k = 0; k <= seg / 2; k++) {
                double p = (f[0][k] * f[0][k] + f[1][k] * f[1][k]) / (fs * s2);
                want[k] += (k == 0 || k == seg / 2) ? p : 2 * p;
            }
            count++;
        }
        Spectrum s = Welch.estimate(x, fs, new WelchParams(seg));
        assertEquals(count, s.segments());
        for (int k = 0; k <= seg / 2; k++) {
            assertEquals(want[k] / count, s.density(k), 1e-12, "bin " + k);
        }
    }

    @Test
    void segmentsWithMissingSamplesAreLeftOutAndCounted() {
        double[] x = sine(4096, 1000, 1, 100, 0);
        x[10] = Double.NaN;
        Spectrum s = Welch.estimate(x, 1000, new WelchParams(512));
        assertEquals(1, s.skippedSegments(), "only the first segment holds sample 10");
        assertEquals(14, s.segments());
        assertTrue(s.description().contains("1 with missing samples left out"), s.description());
        assertEquals(1 / Math.sqrt(2), s.peaks(1, 0).get(0).amplitudeRms(), 0.01);
    }

    @Test
    void automaticSegmentIsAPowerOfTwoGivingAtLeastSevenSegments() {
        assertEquals(1 << 16, WelchParams.autoSegment(1_000_000));
        assertEquals(2048, WelchParams.autoSegment(10_000));
        assertEquals(20, WelchParams.autoSegment(20));
        Spectrum s = Welch.estimate(new double[10_000], 100, WelchParams.auto());
        assertTrue(s.segments() >= 7, "segments " + s.segments());
    }

    @Test
    void badArgumentsAreRefusedWithTheirValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Welch.estimate(new double[100], 10, new WelchParams(200)));
        assertEquals("segment length 200 does not fit 100 samples (at least 8 needed)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new WelchParams(4));
        assertEquals("segment length 4 is below the minimum 8 (or 0 for automatic)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Welch.estimate(new double[100], 0, WelchParams.auto()));
        assertEquals("sample rate 0.0 Hz is not positive and finite", e.getMessage());
    }

    @Test
    void peaksAreStrongestFirstAndOneLobeApart() {
        double fs = 1000;
        double[] x = sine(40_000, fs, 1, 50, 0);
        double[] y = sine(40_000, fs, 2, 180, 0);
        double[] z = sine(40_000, fs, 0.5, 181.5, 0);
        for (int i = 0; i < x.length; i++) {
            x[i] += y[i] + z[i];
        }
        List<Peak> peaks = Welch.estimate(x, fs, new WelchParams(1024)).peaks(3, 0);
        assertEquals(180, peaks.get(0).frequencyHz(), 0.5);
        assertEquals(50, peaks.get(1).frequencyHz(), 0.5);
        assertEquals(2, peaks.size(), "the 181.5 Hz line sits inside 180 Hz's lobe (1.5 bins away): " + peaks);
    }
}
