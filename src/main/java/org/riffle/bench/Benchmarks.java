package org.riffle.bench;

import java.util.ArrayList;
import java.util.List;

/**
 * The registry: every benchmark of issue 9 in run order, at the given sizes. Add a benchmark by
 * adding one line here (the workload lives beside its engine's other benchmarks in this package).
 * Stateless.
 */
final class Benchmarks {
    /** RQA sizes from which a case runs in a child JVM with a 512 MB heap (issue 3's memory bound). */
    static final int LARGE_RQA = 50_000;

    private Benchmarks() {
    }

    /** Every benchmark at {@code sizes}, engines on {@code threads} threads. */
    static List<Benchmark> all(Sizes sizes, int threads) {
        List<Benchmark> all = new ArrayList<>();
        all.add(ReadBench.read(sizes.rows()));
        for (int n : sizes.rqaVectors()) {
            if (n >= LARGE_RQA) {
                all.add(new LargeRqaBench(n, false, 512, threads));
                all.add(new LargeRqaBench(n, true, 512, threads));
            } else {
                all.add(RqaBench.givenRadius(n, threads));
                all.add(RqaBench.targetRate(n, threads));
            }
        }
        all.add(RqaBench.trend(sizes.trendSamples(), 1_000, 500, threads));
        all.add(ReservoirBench.trainWithSearch(sizes.trainSamples()));
        all.add(ReservoirBench.run(sizes.runSteps()));
        all.add(SpectrumBench.welch(sizes.welchSamples()));
        all.add(new ReportBench(sizes.rows()));
        all.add(new ScreenChildBench(0));
        all.add(new ScreenChildBench(sizes.rows()));
        return all;
    }
}
