package org.riffle.bench;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.LongSupplier;
import org.riffle.reservoir.Esn;
import org.riffle.reservoir.EsnParams;
import org.riffle.reservoir.OneStepFit;
import org.riffle.reservoir.OneStepTrainer;
import org.riffle.reservoir.Reservoir;
import org.riffle.reservoir.SearchSpace;

/**
 * Benchmarks of the reservoir engine, 200 units (issue 4's speed targets): training including the
 * automatic search on a 20,000-sample baseline (target ≤ 2 s), and running 1,000,000 steps with the
 * readout (target ≤ 1.5 s). Each method does the work once and returns its wall time in nanoseconds;
 * {@link #main} warms up, repeats and prints medians. Inputs are a seeded noisy chaotic map.
 *
 * <p>Stateless.
 */
public final class ReservoirBench {
    /** Units in every benchmark. */
    public static final int UNITS = 200;

    private ReservoirBench() {
    }

    /** The benchmark input: logistic map (r = 3.8) plus 2 % Gaussian noise, standardised. */
    static double[] input(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] u = new double[n];
        double x = 0.3;
        for (int i = 0; i < n; i++) {
            x = 3.8 * x * (1 - x);
            u[i] = (x - 0.6) / 0.25 + 0.02 * rnd.nextGaussian();
        }
        return u;
    }

    /** Trains with the default automatic search on a 20,000-sample baseline; returns nanoseconds. */
    public static long trainWithSearch20k() {
        double[] u = input(20_000, 1);
        long t0 = System.nanoTime();
        OneStepFit fit = OneStepTrainer.train(u, EsnParams.defaults().withUnits(UNITS), SearchSpace.defaults(),
                null);
        long t = System.nanoTime() - t0;
        sink(fit.heldOutMse());
        return t;
    }

    /** Runs a trained 200-unit network over 1,000,000 steps (state update and readout); nanoseconds. */
    public static long run1M() {
        double[] train = input(5_000, 2);
        Reservoir r = Reservoir.build(EsnParams.defaults().withUnits(UNITS));
        Esn esn = Esn.fit(r, train, shift(train), 100);
        double[] u = input(1_000_000, 3);
        long t0 = System.nanoTime();
        double[] err = esn.oneStepErrors(u);
        long t = System.nanoTime() - t0;
        sink(err[err.length - 2]);
        return t;
    }

    private static double[] shift(double[] u) {
        double[] y = Arrays.copyOfRange(u, 1, u.length + 1);
        y[y.length - 1] = Double.NaN;
        return y;
    }

    private static volatile double blackhole;

    private static void sink(double v) {
        blackhole += v;
    }

    /** Median of {@code reps} runs after {@code warm} warm-up runs, in seconds. */
    public static double median(LongSupplier run, int warm, int reps) {
        for (int i = 0; i < warm; i++) {
            run.getAsLong();
        }
        long[] t = new long[reps];
        for (int i = 0; i < reps; i++) {
            t[i] = run.getAsLong();
        }
        Arrays.sort(t);
        return t[reps / 2] / 1e9;
    }

    /** Prints the medians: {@code java -cp target/riffle.jar org.riffle.bench.ReservoirBench}. */
    public static void main(String[] args) {
        System.out.println(String.format(Locale.ROOT, "reservoir train+search 20k, 200 units: median %.3f s",
                median(ReservoirBench::trainWithSearch20k, 2, 5)));
        System.out.println(String.format(Locale.ROOT, "reservoir run 1M steps, 200 units:     median %.3f s",
                median(ReservoirBench::run1M, 2, 5)));
    }
}
