package org.riffle.bench;

import java.util.Random;
import org.riffle.signal.Welch;
import org.riffle.signal.WelchParams;

/**
 * Workload of the Welch spectrum: a channel of seeded noise plus a line at 49.7 Hz, sampled at
 * 5120 Hz, with the automatic segment (65,536 samples, 29 segments at 1,000,000 samples). Target:
 * at most 0.1 s a spectrum of 1,000,000 samples. Stateless; the harness times the benchmark.
 */
final class SpectrumBench {
    /** Sample rate of the benchmark channel, Hz. */
    static final double RATE = 5120;

    private SpectrumBench() {
    }

    /** The benchmark channel: {@code samples} samples, seed fixed. */
    static double[] channel(int samples) {
        Random rnd = new Random(20261201L);
        double[] x = new double[samples];
        for (int i = 0; i < samples; i++) {
            x[i] = Math.sin(2 * Math.PI * 49.7 * i / RATE) + 0.3 * rnd.nextGaussian();
        }
        return x;
    }

    /** One Welch spectrum of {@code samples} samples per run. */
    static Benchmark welch(int samples) {
        return new Timed<double[]>("Welch PSD " + Sizes.count(samples) + " samples", samples == 1_000_000 ? 100
                : Double.NaN, dir -> channel(samples), x -> Welch.estimate(x, RATE, WelchParams.auto()).density(100));
    }
}
