package org.riffle.bench;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.riffle.reservoir.Esn;
import org.riffle.reservoir.EsnParams;
import org.riffle.reservoir.OneStepTrainer;
import org.riffle.reservoir.Reservoir;
import org.riffle.reservoir.SearchSpace;

/**
 * Workloads of the reservoir engine, 200 units (issue 4's speed targets): training including the
 * automatic search on a 20,000-sample baseline (target ≤ 2 s), and running 1,000,000 steps with the
 * readout (target ≤ 1.5 s). Inputs are a seeded noisy chaotic map. Stateless; the harness times the
 * benchmarks.
 */
final class ReservoirBench {
    /** Units in every benchmark. */
    static final int UNITS = 200;

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

    /** Training with the default automatic search on a baseline of {@code samples} samples. */
    static Benchmark trainWithSearch(int samples) {
        return new Timed<double[]>("reservoir train + search, " + Sizes.count(samples) + " samples, " + UNITS
                + " units", samples == 20_000 ? 2_000 : Double.NaN, dir -> input(samples, 1),
                u -> OneStepTrainer.train(u, EsnParams.defaults().withUnits(UNITS), SearchSpace.defaults(), null)
                        .heldOutMse());
    }

    /** A trained network (fitted untimed on 5,000 samples) run over {@code steps} steps with the readout. */
    static Benchmark run(int steps) {
        return new Timed<Trained>("reservoir run " + Sizes.count(steps) + " steps, " + UNITS + " units",
                steps == 1_000_000 ? 1_500 : Double.NaN, dir -> {
                    double[] train = input(5_000, 2);
                    Reservoir r = Reservoir.build(EsnParams.defaults().withUnits(UNITS));
                    return new Trained(Esn.fit(r, train, shift(train), 100), input(steps, 3));
                }, t -> {
                    double[] err = t.esn().oneStepErrors(t.input());
                    return err[err.length - 2];
                });
    }

    /** A fitted network and the input to run it over. */
    private record Trained(Esn esn, double[] input) {
    }

    private static double[] shift(double[] u) {
        double[] y = Arrays.copyOfRange(u, 1, u.length + 1);
        y[y.length - 1] = Double.NaN;
        return y;
    }
}
