package org.riffle.bench;

import java.nio.file.Path;
import java.util.List;

/**
 * A benchmark of in-process work timed by wall clock ({@link System#nanoTime()}): the input is built
 * once by {@code setUp}, the work runs on it and returns a check value that is kept so the JIT cannot
 * drop the work. Confined to the harness thread.
 *
 * @param <T> the prepared input
 */
final class Timed<T> implements Benchmark {
    /** Builds the input, untimed. */
    interface SetUp<T> {
        T make(Path workDir) throws Exception;
    }

    /** The measured work; returns a check value. */
    interface Work<T> {
        double run(T input) throws Exception;
    }

    private final String name;
    private final double targetMillis;
    private final SetUp<T> setUp;
    private final Work<T> work;
    private T input;
    private double sink;

    /** @param targetMillis the target median in ms, or {@code NaN} for none */
    Timed(String name, double targetMillis, SetUp<T> setUp, Work<T> work) {
        this.name = name;
        this.targetMillis = targetMillis;
        this.setUp = setUp;
        this.work = work;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public List<Metric> metrics() {
        return List.of(Metric.wallMillis(targetMillis));
    }

    @Override
    public void setUp(Path workDir) throws Exception {
        input = setUp.make(workDir);
    }

    @Override
    public double[] runOnce() throws Exception {
        long t0 = System.nanoTime();
        double check = work.run(input);
        double ms = (System.nanoTime() - t0) / 1e6;
        sink += check;
        return new double[] {ms};
    }

    @Override
    public void tearDown() {
        input = null;
    }

    /** The sum of every check value so far (NaN once any was NaN): read it so the work stays live. */
    double checksum() {
        return sink;
    }
}
