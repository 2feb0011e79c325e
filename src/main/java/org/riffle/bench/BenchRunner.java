package org.riffle.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Runs benchmarks one after another: set-up (untimed), {@code warmups} unmeasured runs so the JIT
 * settles, then {@code runs} measured runs; prints one markdown table row per metric with the median,
 * min and max, the target and the verdict. A benchmark may cap its warm-ups and runs (the child
 * JVM runs: 1 and 3; RQA at N = 100,000: 0 and 1). Confined to the calling thread.
 */
public final class BenchRunner {
    private final int warmups;
    private final int runs;
    private final boolean targetsApply;
    private final PrintWriter out;

    /**
     * @param warmups unmeasured runs before measuring, at least 0
     * @param runs measured runs, at least 1
     * @param targetsApply false for small sizes: verdicts print as "-"
     * @param out where progress and the table go
     */
    BenchRunner(int warmups, int runs, boolean targetsApply, PrintWriter out) {
        if (warmups < 0 || runs < 1) {
            throw new IllegalArgumentException("warmups " + warmups + " and runs " + runs
                    + ": need warmups >= 0 and runs >= 1");
        }
        this.warmups = warmups;
        this.runs = runs;
        this.targetsApply = targetsApply;
        this.out = out;
    }

    /**
     * Runs every benchmark (issue sizes, or small ones when {@code quick}) whose name contains
     * {@code filter}, with inputs generated in {@code workDir}, and prints the table to {@code out}.
     *
     * @return how many metrics missed their target
     */
    public static int runAll(boolean quick, int warmups, int runs, String filter, Path workDir, PrintWriter out)
            throws Exception {
        Sizes sizes = quick ? Sizes.small() : Sizes.full();
        int threads = Runtime.getRuntime().availableProcessors();
        List<Benchmark> chosen = Benchmarks.all(sizes, threads).stream()
                .filter(b -> b.name().contains(filter)).toList();
        out.printf(Locale.ROOT, "# riffle bench %s: %s%n", quick ? "--quick (small sizes, no verdicts)"
                : "(issue 9 sizes)", machine());
        List<Measurement> results = new BenchRunner(warmups, runs, !quick, out).run(chosen, workDir);
        out.printf(Locale.ROOT, "load average at the end: %.2f%n", load());
        out.flush();
        return (int) results.stream().filter(m -> m.verdict(!quick).equals("MISSED")).count();
    }

    /** Names of every benchmark at the sizes, in run order. */
    public static List<String> names(boolean quick) {
        return Benchmarks.all(quick ? Sizes.small() : Sizes.full(), 1).stream().map(Benchmark::name).toList();
    }

    /** Runs {@code benchmarks} and prints the table; returns every measurement. */
    List<Measurement> run(List<Benchmark> benchmarks, Path workDir) throws Exception {
        List<Measurement> results = new ArrayList<>();
        for (Benchmark b : benchmarks) {
            int w = Math.min(warmups, b.maxWarmups());
            int r = Math.min(runs, b.maxRuns());
            long t0 = System.nanoTime();
            b.setUp(workDir);
            try {
                for (int i = 0; i < w; i++) {
                    b.runOnce();
                }
                double[][] values = new double[b.metrics().size()][r];
                for (int i = 0; i < r; i++) {
                    double[] v = b.runOnce();
                    for (int m = 0; m < values.length; m++) {
                        values[m][i] = v[m];
                    }
                }
                for (int m = 0; m < values.length; m++) {
                    results.add(new Measurement(b.name(), b.metrics().get(m), values[m]));
                }
            } finally {
                b.tearDown();
            }
            out.printf(Locale.ROOT, "# %s: %d warm-up, %d measured runs, %.1f s in all%n", b.name(), w, r,
                    (System.nanoTime() - t0) / 1e9);
            out.flush();
        }
        printTable(results);
        return results;
    }

    private void printTable(List<Measurement> results) {
        out.printf(Locale.ROOT, "%n| benchmark | metric | median | min | max | target | verdict |%n");
        out.printf(Locale.ROOT, "|---|---|---:|---:|---:|---|---|%n");
        for (Measurement m : results) {
            Metric k = m.metric();
            out.printf(Locale.ROOT, "| %s | %s, %s | %.1f | %.1f | %.1f | %s | %s |%n", m.name(), k.label(),
                    k.unit(), m.median(), m.min(), m.max(), k.targetText(), m.verdict(targetsApply));
        }
        out.println();
        out.flush();
    }

    /** Cores, CPU model, JVM, default max heap, date and load average, on one line. */
    static String machine() {
        return String.format(Locale.ROOT, "%d cores, %s, Java %s (%s), default max heap %d MB, %s, load average "
                + "%.2f", Runtime.getRuntime().availableProcessors(), cpuModel(), System.getProperty("java.version"),
                System.getProperty("java.vm.name"), Runtime.getRuntime().maxMemory() >> 20, LocalDate.now(), load());
    }

    private static double load() {
        return ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    }

    private static String cpuModel() {
        Path info = Path.of("/proc/cpuinfo");
        try (Stream<String> lines = Files.lines(info)) {
            return lines.filter(l -> l.startsWith("model name")).map(l -> l.substring(l.indexOf(':') + 1).strip())
                    .findFirst().orElse(System.getProperty("os.arch"));
        } catch (IOException | java.io.UncheckedIOException e) {
            return System.getProperty("os.arch");
        }
    }
}
