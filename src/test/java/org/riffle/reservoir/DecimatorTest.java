package org.riffle.reservoir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DecimatorTest {
    private static double[] sine(int n, double cyclesPerSample, double phase) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(2 * Math.PI * cyclesPerSample * i + phase);
        }
        return x;
    }

    private static double rms(double[] x, int from, int to) {
        double s = 0;
        for (int i = from; i < to; i++) {
            s += x[i] * x[i];
        }
        return Math.sqrt(s / (to - from));
    }

    @Test
    void passbandSinePassesAndOutputKStandsForInputKd() {
        // analytic: a linear-phase FIR with unit DC gain passes a tone well inside the passband with gain
        // within 1e-3 of 1 and no delay (Blackman window ripple about 2e-4, Oppenheim & Schafer table 7.2)
        int d = 5;
        double f = 0.1 / d;
        double[] x = sine(20_000, f, 0.3);
        double[] y = Decimator.decimate(x, d);
        assertEquals(4000, y.length);
        for (int k = 100; k < y.length - 100; k++) {
            Close.within(x[k * d], y[k], 1e-3, "decimated sample " + k);
        }
    }

    @Test
    void toneAboveTheNewNyquistIsSuppressedBy60dB() {
        // analytic: Blackman window stopband attenuation about 74 dB (Oppenheim & Schafer table 7.2);
        // 24·d + 1 taps put the transition band within 0.4/d ± 0.11/d, so 0.6/d is in the stopband
        int d = 4;
        double[] x = sine(40_000, 0.6 / d, 0.0);
        double[] y = Decimator.decimate(x, d);
        double gain = rms(y, 100, y.length - 100) / rms(x, 0, x.length);
        assertTrue(gain < 1e-3, "stopband gain " + gain);
    }

    @Test
    void factorIsAnEighthOfTheFirstAutocorrelationZero() {
        // analytic: the autocorrelation of a sine of period P crosses zero first at P/4; D = (P/4)/8
        assertEquals(5, Decimator.factor(sine(20_000, 1.0 / 160, 0), 0, 20_000, 64));
        assertEquals(3, Decimator.factor(sine(20_000, 1.0 / 160, 0), 0, 20_000, 3));
        double[] noise = new double[5000];
        java.util.SplittableRandom r = new java.util.SplittableRandom(1);
        for (int i = 0; i < noise.length; i++) {
            noise[i] = r.nextGaussian();
        }
        assertEquals(1, Decimator.factor(noise, 0, noise.length, 64), "white noise is not oversampled");
    }

    @Test
    void aMissingSampleMakesItsNeighbourhoodMissingNotInterpolated() {
        double[] x = sine(2000, 0.01, 0);
        x[1000] = Double.NaN;
        double[] y = Decimator.decimate(x, 2);
        assertTrue(Double.isNaN(y[500]));
        assertTrue(Double.isNaN(y[500 - 12]) && Double.isNaN(y[500 + 12]));
        assertTrue(!Double.isNaN(y[500 - 13]) && !Double.isNaN(y[500 + 13]));
    }
}
