package org.riffle.bench;

import java.util.SplittableRandom;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import org.riffle.recurrence.Trend;

/**
 * Workloads of the RQA engine for the speed targets of the recurrence issue: m = 3, τ = 2, RR ≈ 5 %,
 * all measures; N vectors with a given radius and with the target-rate search; a windowed trend.
 * Targets: N = 10,000 in ≤ 0.08 s (given radius) and ≤ 0.2 s (search), N = 20,000 in at most four
 * times those, the 1,000,000-sample trend (W = 1,000, S = 500) in ≤ 2 s. The signal is invented: two
 * incommensurate sines plus seeded noise. Stateless; the harness times the benchmarks.
 */
final class RqaBench {
    /** Embedding and lines of every case. */
    static final RqaParams PARAMS = new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN,
            RqaParams.Threshold.rate(0.05), 2, 2, 1);

    private RqaBench() {
    }

    /** The bench signal: {@code n} samples, seed fixed. */
    static double[] signal(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(0.05 * i) + 0.5 * Math.sin(0.0173 * i) + 0.1 * (rnd.nextDouble() - 0.5);
        }
        return x;
    }

    /** Target in ms for N vectors: 80 ms (given radius) or 200 ms (search) at 10,000, four times at 20,000. */
    static double targetMillis(int vectors, boolean search) {
        double base = search ? 200 : 80;
        return switch (vectors) {
            case 10_000 -> base;
            case 20_000 -> 4 * base;
            default -> Double.NaN;
        };
    }

    /** A signal and the parameters with the radius fixed for it. */
    private record Given(double[] x, RqaParams params) {
    }

    /** N vectors with the radius given (chosen once, untimed, for RR ≈ 5 %). */
    static Benchmark givenRadius(int vectors, int threads) {
        Rqa rqa = new Rqa(threads);
        return new Timed<Given>("RQA N = " + Sizes.count(vectors) + ", given radius",
                targetMillis(vectors, false), dir -> {
                    double[] x = signal(vectors + 4, 1);
                    double eps = rqa.analyse(x, 0, x.length, PARAMS).radius();
                    return new Given(x, PARAMS.withThreshold(RqaParams.Threshold.radius(eps)));
                }, g -> rqa.analyse(g.x(), 0, g.x().length, g.params()).rr());
    }

    /** N vectors with the exact target-rate search (5 %) included. */
    static Benchmark targetRate(int vectors, int threads) {
        Rqa rqa = new Rqa(threads);
        return new Timed<double[]>("RQA N = " + Sizes.count(vectors) + ", target-rate search",
                targetMillis(vectors, true), dir -> signal(vectors + 4, 1),
                x -> rqa.analyse(x, 0, x.length, PARAMS).rr());
    }

    /** The windowed trend of {@code samples} samples, baseline the first 25 %, target rate 5 %. */
    static Benchmark trend(int samples, int window, int step, int threads) {
        Rqa rqa = new Rqa(threads);
        return new Timed<double[]>("RQA trend " + Sizes.count(samples) + " samples, W = " + window + ", S = "
                + step, samples == 1_000_000 ? 2_000 : Double.NaN, dir -> signal(samples, 2), x -> {
                    Trend t = rqa.trend(x, 0, samples / 4, window, step, PARAMS, null);
                    return t.windows().stream().mapToDouble(RqaResult::rr).average().orElse(Double.NaN);
                });
    }
}
