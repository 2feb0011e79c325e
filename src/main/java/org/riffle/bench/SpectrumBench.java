package org.riffle.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import org.riffle.signal.Spectrum;
import org.riffle.signal.Welch;
import org.riffle.signal.WelchParams;

/**
 * Benchmark of the Welch spectrum: a 1,000,000-sample channel (seeded noise plus a line, 5120 Hz) with
 * the automatic segment (65,536 samples, 29 segments). Target: at most 0.1 s a spectrum. Plain
 * wall-clock timing: warm-up runs first, then the best and the median of the timed runs.
 *
 * <p>Run: {@code java -cp target/riffle.jar org.riffle.bench.SpectrumBench [samples] [runs]}.
 */
public final class SpectrumBench {
    /** Samples in the benchmark channel. */
    public static final int SAMPLES = 1_000_000;

    private SpectrumBench() {
    }

    /**
     * Seconds per Welch spectrum of {@code samples} samples over {@code runs} timed runs: {best wall, median
     * wall, best thread CPU, median thread CPU}. CPU time is the fairer figure on a shared machine.
     */
    public static double[] welchSeconds(int samples, int runs) {
        Random rnd = new Random(20261201L);
        double[] x = new double[samples];
        for (int i = 0; i < samples; i++) {
            x[i] = Math.sin(2 * Math.PI * 49.7 * i / 5120.0) + 0.3 * rnd.nextGaussian();
        }
        double sink = 0;
        for (int i = 0; i < 5; i++) {
            sink += Welch.estimate(x, 5120, WelchParams.auto()).density(100);
        }
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        double[] t = new double[runs];
        double[] cpu = new double[runs];
        for (int i = 0; i < runs; i++) {
            long c0 = mx.getCurrentThreadCpuTime();
            long start = System.nanoTime();
            Spectrum s = Welch.estimate(x, 5120, WelchParams.auto());
            t[i] = (System.nanoTime() - start) / 1e9;
            cpu[i] = (mx.getCurrentThreadCpuTime() - c0) / 1e9;
            sink += s.density(100);
        }
        Arrays.sort(t);
        Arrays.sort(cpu);
        if (Double.isNaN(sink)) {
            throw new IllegalStateException("benchmark produced NaN");
        }
        return new double[] {t[0], t[runs / 2], cpu[0], cpu[runs / 2]};
    }

    public static void main(String[] args) {
        int samples = args.length > 0 ? Integer.parseInt(args[0]) : SAMPLES;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 20;
        double[] t = welchSeconds(samples, runs);
        System.out.println(String.format(Locale.ROOT, "welch %d samples: wall best %.4f s, median %.4f s; thread "
                + "CPU best %.4f s, median %.4f s; %d runs (target <= 0.1 s)", samples, t[0], t[1], t[2], t[3], runs));
    }
}
