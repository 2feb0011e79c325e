package org.riffle.triage;

import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;

/**
 * Synthetic channels of our own for the calibration and detection checks: stationary signals of several
 * kinds, and the same signals with a change from sample {@code change} on. Every generator is seeded.
 */
final class Scenarios {
    private Scenarios() {
    }

    /** A one-channel recording at 1 Hz. */
    static Recording recording(String name, double[] x) {
        float[] f = new float[x.length];
        for (int i = 0; i < x.length; i++) {
            f[i] = (float) x[i];
        }
        return new Recording(new SourceFacts(name + ".csv", 0, "synthetic", "UTF-8", List.of(), List.of()),
                TimeBase.regular(x.length, 1.0, null), List.of(new Channel(name, "", f)), List.of(), List.of());
    }

    /** Logistic map x ← r·x·(1 − x) (chaotic at r = 3.8), plus Gaussian noise of {@code noise}. */
    static double[] logistic(int n, double r, double noise, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] out = new double[n];
        double x = 0.3;
        for (int i = 0; i < 500; i++) {
            x = r * x * (1 - x);
        }
        for (int i = 0; i < n; i++) {
            x = r * x * (1 - x);
            out[i] = x + noise * rnd.nextGaussian();
        }
        return out;
    }

    /** Logistic map whose parameter moves from r0 to r1 at {@code change}, each part standardised to the first. */
    static double[] logisticParameterMove(int n, int change, double r0, double r1, long seed) {
        double[] a = logistic(change, r0, 0.01, seed);
        double[] b = logistic(n - change, r1, 0.01, seed + 1);
        double[] ma = meanStd(a);
        double[] mb = meanStd(b);
        double[] out = new double[n];
        System.arraycopy(a, 0, out, 0, change);
        for (int i = 0; i < b.length; i++) {
            out[change + i] = ma[0] + (b[i] - mb[0]) / mb[1] * ma[1];
        }
        return out;
    }

    /** The x coordinate of the Hénon map (a = 1.4, b = 0.3), after 1000 transient steps. */
    static double[] henon(int n) {
        double[] out = new double[n];
        double x = 0.1;
        double y = 0.1;
        for (int i = 0; i < 1000 + n; i++) {
            double nx = 1 - 1.4 * x * x + y;
            y = 0.3 * x;
            x = nx;
            if (i >= 1000) {
                out[i - 1000] = x;
            }
        }
        return out;
    }

    /** AR(1) coloured noise x ← φx + σ·e. */
    static double[] ar1(int n, double phi, double sigma, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] out = new double[n];
        double x = 0;
        for (int i = 0; i < n; i++) {
            x = phi * x + sigma * rnd.nextGaussian();
            out[i] = x;
        }
        return out;
    }

    /** Sine of {@code period} samples plus Gaussian noise. */
    static double[] sineNoise(int n, double period, double noise, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = Math.sin(2 * Math.PI * i / period) + noise * rnd.nextGaussian();
        }
        return out;
    }

    /** A vibration-like waveform: shaft line, its second harmonic, a gear-mesh-like line, broadband noise. */
    static double[] vibration(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = Math.sin(2 * Math.PI * i / 40.0) + 0.5 * Math.sin(2 * Math.PI * i / 20.0 + 0.4)
                    + 0.2 * Math.sin(2 * Math.PI * i / 7.3) + 0.3 * rnd.nextGaussian();
        }
        return out;
    }

    /**
     * Adds short decaying ringing bursts (amplitude {@code a}, decay 2 samples, ringing period 3.1 samples)
     * every {@code every} samples from {@code change} on, like the impacts of a bearing defect.
     */
    static double[] withBursts(double[] x, int change, int every, double a, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] out = x.clone();
        for (int start = change + rnd.nextInt(every); start < x.length; start += every) {
            for (int j = 0; j < 12 && start + j < x.length; j++) {
                out[start + j] += a * Math.exp(-j / 2.0) * Math.sin(2 * Math.PI * j / 3.1);
            }
        }
        return out;
    }

    /**
     * From {@code change} on, the signal is replaced by a phase-randomised surrogate of itself (Theiler et
     * al. 1992, Physica D 58:77): same amplitude spectrum, so the same mean, variance and autocorrelation,
     * but random phases (a linear Gaussian process). The replaced part must have a power-of-2 length.
     */
    static double[] withSurrogate(double[] x, int change, long seed) {
        int m = x.length - change;
        double[] part = new double[m];
        System.arraycopy(x, change, part, 0, m);
        FastFourierTransformer fft = new FastFourierTransformer(DftNormalization.STANDARD);
        Complex[] spec = fft.transform(part, TransformType.FORWARD);
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int k = 1; k < m / 2; k++) {
            double phase = 2 * Math.PI * rnd.nextDouble();
            Complex c = Complex.valueOf(spec[k].abs() * Math.cos(phase), spec[k].abs() * Math.sin(phase));
            spec[k] = c;
            spec[m - k] = c.conjugate();
        }
        Complex[] back = fft.transform(spec, TransformType.INVERSE);
        double[] out = x.clone();
        for (int i = 0; i < m; i++) {
            out[change + i] = back[i].getReal();
        }
        return out;
    }

    /** Adds {@code step} from {@code change} on. */
    static double[] withStep(double[] x, int change, double step) {
        double[] out = x.clone();
        for (int i = change; i < x.length; i++) {
            out[i] += step;
        }
        return out;
    }

    /** Adds a ramp from 0 at {@code change} to {@code end} at the last sample. */
    static double[] withDrift(double[] x, int change, double end) {
        double[] out = x.clone();
        for (int i = change; i < x.length; i++) {
            out[i] += end * (i - change) / (x.length - 1.0 - change);
        }
        return out;
    }

    /** Multiplies the deviation from {@code centre} by {@code factor} from {@code change} on. */
    static double[] withGain(double[] x, int change, double centre, double factor) {
        double[] out = x.clone();
        for (int i = change; i < x.length; i++) {
            out[i] = centre + (x[i] - centre) * factor;
        }
        return out;
    }

    /** {mean, sample std}. */
    static double[] meanStd(double[] x) {
        double m = 0;
        for (double v : x) {
            m += v;
        }
        m /= x.length;
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return new double[] {m, Math.sqrt(s / (x.length - 1))};
    }
}
