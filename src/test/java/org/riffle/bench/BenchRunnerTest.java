package org.riffle.bench;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The harness without clocks: fake benchmarks return scripted values, so the medians, verdicts, run
 * counts and the table are exact. The median is checked against the textbook definition (analytic:
 * the middle value of the sorted sample, the mean of the middle two when the count is even).
 */
class BenchRunnerTest {
    @TempDir
    Path dir;

    /** Returns the scripted values in order; counts its calls. */
    private static final class Scripted implements Benchmark {
        private final String name;
        private final List<Metric> metrics;
        private final boolean heavy;
        private final double[][] script;
        private int calls;
        private final List<String> log = new ArrayList<>();

        Scripted(String name, List<Metric> metrics, boolean heavy, double[]... script) {
            this.name = name;
            this.metrics = metrics;
            this.heavy = heavy;
            this.script = script;
        }

        @Override
        public String name() {
            return name;
        }

        @Override
        public List<Metric> metrics() {
            return metrics;
        }

        @Override
        public int maxWarmups() {
            return heavy ? 1 : Integer.MAX_VALUE;
        }

        @Override
        public int maxRuns() {
            return heavy ? 3 : Integer.MAX_VALUE;
        }

        @Override
        public void setUp(Path workDir) {
            log.add("setUp " + workDir.getFileName());
        }

        @Override
        public double[] runOnce() {
            return script[calls++];
        }

        @Override
        public void tearDown() {
            log.add("tearDown");
        }
    }

    @Test
    void warmUpsAreDroppedAndTheTableHoldsMedianMinMaxAndVerdict() throws Exception {
        Scripted a = new Scripted("fast", List.of(Metric.wallMillis(10)), false,
                new double[] {999}, new double[] {4}, new double[] {12}, new double[] {6});
        Scripted b = new Scripted("slow", List.of(Metric.wallMillis(10)), false,
                new double[] {1}, new double[] {30}, new double[] {11}, new double[] {20});
        StringWriter text = new StringWriter();
        List<Measurement> m = new BenchRunner(1, 3, true, new PrintWriter(text)).run(List.of(a, b), dir);
        assertEquals(4, a.calls);
        assertEquals(List.of("setUp " + dir.getFileName(), "tearDown"), a.log);
        assertArrayEquals(new double[] {4, 12, 6}, m.get(0).values(), "the warm-up's 999 is not measured");
        String t = text.toString();
        assertTrue(t.contains("| fast | wall, ms | 6.0 | 4.0 | 12.0 | <= 10 ms | met |\n"), t);
        assertTrue(t.contains("| slow | wall, ms | 20.0 | 11.0 | 30.0 | <= 10 ms | MISSED |\n"), t);
    }

    @Test
    void heavyBenchmarksGetAtMostOneWarmUpAndThreeRunsAndEveryMetricARow() throws Exception {
        Scripted h = new Scripted("child", List.of(Metric.wallMillis(100), new Metric("peak RSS", "MB", 600)), true,
                new double[] {0, 0}, new double[] {50, 700}, new double[] {90, 500}, new double[] {70, 650});
        StringWriter text = new StringWriter();
        List<Measurement> m = new BenchRunner(5, 9, true, new PrintWriter(text)).run(List.of(h), dir);
        assertEquals(4, h.calls);
        assertEquals(70, m.get(0).median());
        assertEquals(650, m.get(1).median());
        assertTrue(text.toString().contains("| child | peak RSS, MB | 650.0 | 500.0 | 700.0 | <= 600 MB | MISSED |"),
                text.toString());
        assertTrue(text.toString().contains("# child: 1 warm-up, 3 measured runs"), text.toString());
    }

    @Test
    void withoutTargetsOrAtSmallSizesTheVerdictIsADash() {
        Measurement none = new Measurement("x", Metric.wallMillis(Double.NaN), new double[] {5});
        Measurement small = new Measurement("x", Metric.wallMillis(1), new double[] {5});
        assertEquals("-", none.verdict(true));
        assertEquals("-", small.verdict(false));
        assertEquals("MISSED", small.verdict(true));
        assertEquals("-", none.metric().targetText());
    }

    @Test
    void medianMatchesTheSortedMiddleForRandomSamples() {
        SplittableRandom rnd = new SplittableRandom(9);
        for (int trial = 0; trial < 200; trial++) {
            double[] v = rnd.doubles(1 + rnd.nextInt(12), 0, 100).toArray();
            double[] s = v.clone();
            Arrays.sort(s);
            double oracle = s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
            Measurement m = new Measurement("r", Metric.wallMillis(50), v);
            assertEquals(oracle, m.median(), 0.0);
            assertEquals(s[0], m.min(), 0.0);
            assertEquals(s[s.length - 1], m.max(), 0.0);
        }
    }

    @Test
    void badSettingsAreRefusedByName() {
        PrintWriter out = new PrintWriter(new StringWriter());
        assertEquals("warmups -1 and runs 3: need warmups >= 0 and runs >= 1",
                assertThrows(IllegalArgumentException.class, () -> new BenchRunner(-1, 3, true, out)).getMessage());
        assertEquals("benchmark 'e' has no measured values", assertThrows(IllegalArgumentException.class,
                () -> new Measurement("e", Metric.wallMillis(1), new double[0])).getMessage());
        assertEquals("metric 'wall' target -2.0 must be positive or NaN", assertThrows(IllegalArgumentException.class,
                () -> Metric.wallMillis(-2)).getMessage());
    }

    @Test
    void theRegistryHasEveryBenchmarkOfTheIssueWithItsTarget() {
        List<Benchmark> all = Benchmarks.all(Sizes.full(), 2);
        List<String> names = all.stream().map(Benchmark::name).toList();
        for (String n : List.of("read CSV 1M rows x 8 ch", "RQA N = 2k, given radius",
                "RQA N = 100k, target-rate search (child JVM, -Xmx512m)", "screen, demo log (child JVM)",
                "screen, 1M rows x 8 ch (child JVM)",
                "RQA trend 1M samples, W = 1000, S = 500", "reservoir train + search, 20k samples, 200 units",
                "reservoir run 1M steps, 200 units", "Welch PSD 1M samples", "riffle report, 1M rows x 8 ch (child JVM)")) {
            assertTrue(names.contains(n), n + " in " + names);
        }
        assertEquals(names.size(), names.stream().distinct().count(), "names are unique");
        Benchmark rqa10k = all.get(names.indexOf("RQA N = 10k, target-rate search"));
        assertEquals(200, rqa10k.metrics().get(0).target());
        Benchmark rqa20k = all.get(names.indexOf("RQA N = 20k, given radius"));
        assertEquals(320, rqa20k.metrics().get(0).target(), "four times the 80 ms of N = 10,000");
        Benchmark rqa100k = all.get(names.indexOf("RQA N = 100k, target-rate search (child JVM, -Xmx512m)"));
        assertEquals(List.of(0, 1), List.of(rqa100k.maxWarmups(), rqa100k.maxRuns()));
        Benchmark screen = all.get(names.indexOf("screen, demo log (child JVM)"));
        assertEquals(List.of(600.0, 50.0), List.of(screen.metrics().get(0).target(), screen.metrics().get(1).target()));
        Benchmark big = all.get(names.indexOf("screen, 1M rows x 8 ch (child JVM)"));
        assertEquals(List.of(1500.0, 10000.0), List.of(big.metrics().get(0).target(), big.metrics().get(2).target()));
    }

    @Test
    void aQuickTimedBenchmarkMeasuresRealWorkAndKeepsItsResult() throws Exception {
        Benchmark welch = SpectrumBench.welch(4096);
        StringWriter text = new StringWriter();
        List<Measurement> m = new BenchRunner(0, 2, false, new PrintWriter(text)).run(List.of(welch), dir);
        assertEquals(2, m.get(0).values().length);
        assertTrue(m.get(0).min() > 0, "a spectrum takes time: " + text);
        assertTrue(Double.isFinite(((Timed<?>) welch).checksum()), "the check values were kept");
    }
}
