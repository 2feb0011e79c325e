package org.riffle.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import org.riffle.recurrence.Trend;

/**
 * Benchmarks of the RQA engine for the speed targets of the recurrence issue: m = 3, τ = 2, RR ≈ 5 %,
 * all measures; N = 2,000 / 10,000 / 20,000 / 100,000 vectors with a given radius and with the
 * target-rate search; a 1,000,000-sample windowed trend with W = 1,000, S = 500. Wall-clock medians of
 * repeated runs after warm-up runs. The signal is invented: two incommensurate sines plus seeded noise.
 *
 * <p>Static methods for the bench harness; {@link #main} prints every case.
 */
public final class RqaBench {
    /** Embedding and lines of every case. */
    public static final RqaParams PARAMS = new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN,
            RqaParams.Threshold.rate(0.05), 2, 2, 1);

    private RqaBench() {
    }

    /** One case: its name, the median and fastest wall-clock seconds, and a check value (RR). */
    public record Case(String name, double medianSeconds, double minSeconds, double rr) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%-44s median %8.4f s  min %8.4f s  RR %.4f", name, medianSeconds,
                    minSeconds, rr);
        }
    }

    /** The bench signal: {@code n} samples, seed fixed. */
    public static double[] signal(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(0.05 * i) + 0.5 * Math.sin(0.0173 * i) + 0.1 * (rnd.nextDouble() - 0.5);
        }
        return x;
    }

    /** N vectors with the radius given (chosen once, untimed, for RR ≈ 5 %). */
    public static Case givenRadius(int vectors, int warmups, int runs, int threads) {
        double[] x = signal(vectors + 4, 1);
        Rqa rqa = new Rqa(threads);
        double eps = rqa.analyse(x, 0, x.length, PARAMS).radius();
        RqaParams p = PARAMS.withThreshold(RqaParams.Threshold.radius(eps));
        return time("N = " + vectors + ", given radius", warmups, runs, () -> rqa.analyse(x, 0, x.length, p).rr());
    }

    /** N vectors with the exact target-rate search (5 %) included. */
    public static Case targetRate(int vectors, int warmups, int runs, int threads) {
        double[] x = signal(vectors + 4, 1);
        Rqa rqa = new Rqa(threads);
        return time("N = " + vectors + ", target-rate search", warmups, runs,
                () -> rqa.analyse(x, 0, x.length, PARAMS).rr());
    }

    /** The windowed trend of {@code samples} samples, baseline the first 25 %, target rate 5 %. */
    public static Case trend(int samples, int window, int step, int warmups, int runs, int threads) {
        double[] x = signal(samples, 2);
        Rqa rqa = new Rqa(threads);
        return time("trend " + samples + " samples, W = " + window + ", S = " + step, warmups, runs, () -> {
            Trend t = rqa.trend(x, 0, samples / 4, window, step, PARAMS, null);
            return t.windows().stream().mapToDouble(RqaResult::rr).average().orElse(Double.NaN);
        });
    }

    private interface Run {
        double go();
    }

    private static Case time(String name, int warmups, int runs, Run r) {
        double check = Double.NaN;
        for (int k = 0; k < warmups; k++) {
            check = r.go();
        }
        double[] t = new double[Math.max(1, runs)];
        for (int k = 0; k < t.length; k++) {
            long t0 = System.nanoTime();
            check = r.go();
            t[k] = (System.nanoTime() - t0) / 1e9;
        }
        Arrays.sort(t);
        return new Case(name, t[t.length / 2], t[0], check);
    }

    /** Every case of the issue, on every core. Pass {@code --large} to include N = 100,000. */
    public static List<Case> all(boolean large) {
        int threads = Runtime.getRuntime().availableProcessors();
        List<Case> out = new ArrayList<>();
        for (int n : new int[] {2_000, 10_000, 20_000}) {
            out.add(givenRadius(n, 3, 9, threads));
            out.add(targetRate(n, 3, 9, threads));
        }
        out.add(trend(1_000_000, 1_000, 500, 1, 5, threads));
        if (large) {
            out.add(givenRadius(100_000, 0, 1, threads));
            out.add(targetRate(100_000, 0, 1, threads));
        }
        return out;
    }

    public static void main(String[] args) {
        boolean large = Arrays.asList(args).contains("--large");
        System.out.println("cores: " + Runtime.getRuntime().availableProcessors() + ", max heap: "
                + Runtime.getRuntime().maxMemory() / (1 << 20) + " MB");
        for (Case c : all(large)) {
            System.out.println(c);
        }
    }
}
