package org.riffle.bench;

import java.nio.file.Path;
import java.util.List;

/**
 * One benchmark: prepares its input once (untimed), then does the measured work once per call of
 * {@link #runOnce}, which returns one value per {@link #metrics() metric}. The harness does the
 * warm-ups, the repetitions and the medians. Implementations are confined to the harness thread.
 */
interface Benchmark {
    /** Short unique name, e.g. {@code "read CSV 1M x 8"}. */
    String name();

    /** What {@link #runOnce} returns, in that order, each with its target. */
    List<Metric> metrics();

    /** The most warm-ups worth doing (slow benchmarks keep the whole harness under 10 minutes). */
    default int maxWarmups() {
        return Integer.MAX_VALUE;
    }

    /** The most measured runs worth doing. */
    default int maxRuns() {
        return Integer.MAX_VALUE;
    }

    /** Generates or loads the input under {@code workDir}; not timed. */
    void setUp(Path workDir) throws Exception;

    /** The measured work, once; one value per metric. Must consume its result so the JIT cannot drop it. */
    double[] runOnce() throws Exception;

    /** Releases what setUp took (big arrays), so the next benchmark starts clean. */
    default void tearDown() {
    }
}
