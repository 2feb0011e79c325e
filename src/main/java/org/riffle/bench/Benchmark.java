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

    /** True for slow end-to-end runs (a child JVM): the harness does at most 1 warm-up and 3 runs. */
    default boolean heavy() {
        return false;
    }

    /** Generates or loads the input under {@code workDir}; not timed. */
    void setUp(Path workDir) throws Exception;

    /** The measured work, once; one value per metric. Must consume its result so the JIT cannot drop it. */
    double[] runOnce() throws Exception;

    /** Releases what setUp took (big arrays), so the next benchmark starts clean. */
    default void tearDown() {
    }
}
