package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The radix-2 FFT against a naive O(n²) discrete Fourier transform written here from the definition
 * X[k] = Σ x[j]·exp(−2πi·jk/n) (analytic: the definition itself is the oracle).
 */
class FftTest {
    /** Round-off of an n log n transform of unit-scale data stays far below this (empirically ~1e-13). */
    private static final double TOL = 1e-9;

    /** The oracle: the DFT straight from its definition. */
    static double[][] naiveDft(double[] re, double[] im, boolean inverse) {
        int n = re.length;
        double[][] out = new double[2][n];
        double sign = inverse ? 1 : -1;
        for (int k = 0; k < n; k++) {
            double sr = 0;
            double si = 0;
            for (int j = 0; j < n; j++) {
                double a = sign * 2 * Math.PI * ((long) j * k % n) / n;
                sr += re[j] * Math.cos(a) - im[j] * Math.sin(a);
                si += re[j] * Math.sin(a) + im[j] * Math.cos(a);
            }
            out[0][k] = sr;
            out[1][k] = si;
        }
        return out;
    }

    @Test
    void complexTransformMatchesTheNaiveDftForEverySizeUpTo1024() {
        Random rnd = new Random(20261201L);
        for (int n = 2; n <= 1024; n *= 2) {
            for (boolean inverse : new boolean[] {false, true}) {
                double[] re = new double[n];
                double[] im = new double[n];
                for (int i = 0; i < n; i++) {
                    re[i] = rnd.nextGaussian();
                    im[i] = rnd.nextGaussian();
                }
                double[][] want = naiveDft(re, im, inverse);
                new Fft(n).complex(re, im, inverse);
                for (int k = 0; k < n; k++) {
                    assertEquals(want[0][k], re[k], TOL, "n=" + n + " re[" + k + "]");
                    assertEquals(want[1][k], im[k], TOL, "n=" + n + " im[" + k + "]");
                }
            }
        }
    }

    @Test
    void realTransformMatchesTheNaiveDftOnBinsZeroToHalf() {
        Random rnd = new Random(7L);
        for (int n = 2; n <= 2048; n *= 2) {
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = rnd.nextGaussian() + 3;
            }
            double[][] want = naiveDft(x, new double[n], false);
            double[] re = new double[n / 2 + 1];
            double[] im = new double[n / 2 + 1];
            new Fft(n).realForward(x, re, im);
            for (int k = 0; k <= n / 2; k++) {
                assertEquals(want[0][k], re[k], TOL, "n=" + n + " re[" + k + "]");
                assertEquals(want[1][k], im[k], TOL, "n=" + n + " im[" + k + "]");
            }
        }
    }

    @Test
    void forwardThenInverseGivesNTimesTheInput() {
        int n = 1 << 14;
        Random rnd = new Random(11L);
        double[] re = new double[n];
        double[] im = new double[n];
        double[] keep = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = rnd.nextGaussian();
            keep[i] = re[i];
        }
        Fft f = new Fft(n);
        f.complex(re, im, false);
        f.complex(re, im, true);
        for (int i = 0; i < n; i++) {
            assertEquals(keep[i], re[i] / n, 1e-12);
            assertEquals(0, im[i] / n, 1e-12);
        }
    }

    @Test
    void sizeMustBeAPowerOfTwo() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Fft(12));
        assertEquals("FFT size 12 is not a power of two >= 2", e.getMessage());
        assertEquals(16, Fft.nextPowerOfTwo(9));
        assertEquals(16, Fft.nextPowerOfTwo(16));
        assertTrue(Fft.nextPowerOfTwo(1) >= 2);
    }
}
