package org.riffle.recurrence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;

class RqaEngineTest {
    private static final RqaParams GIVEN = new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN,
            RqaParams.Threshold.rate(0.05), 2, 2, 1);

    static double[] noisySine(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(0.07 * i) + 0.3 * Math.sin(0.011 * i) + 0.2 * rnd.nextGaussian();
        }
        return x;
    }

    @Test
    void resultsAreBitIdenticalOnOneTwoAndFourThreads() {
        double[] x = noisySine(4000, 11);
        for (RqaParams p : List.of(GIVEN, GIVEN.withNorm(RqaParams.Norm.MAX).withTheiler(5),
                GIVEN.withThreshold(RqaParams.Threshold.stdFraction(0.2)).withMinLines(3, 4))) {
            RqaResult one = new Rqa(1).analyse(x, 0, x.length, p);
            assertEquals(one, new Rqa(2).analyse(x, 0, x.length, p));
            assertEquals(one, new Rqa(4).analyse(x, 0, x.length, p));
        }
        Trend t1 = new Rqa(1).trend(x, 0, 1000, 400, 150, GIVEN, null);
        assertEquals(t1, new Rqa(2).trend(x, 0, 1000, 400, 150, GIVEN, null));
        assertEquals(t1, new Rqa(4).trend(x, 0, 1000, 400, 150, GIVEN, null));
    }

    /** The fraction-of-std policy uses the population standard deviation (divisor n) of the raw samples. */
    @Test
    void stdFractionUsesThePopulationStandardDeviation() {
        double[] x = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12};
        RqaParams p = new RqaParams(1, 1, RqaParams.Norm.MAX, RqaParams.Threshold.stdFraction(0.5), 2, 2, 1);
        double popStd = Math.sqrt((144 - 1) / 12.0);
        assertEquals(0.5 * popStd, new Rqa(1).analyse(x, 0, x.length, p).radius(), 1e-15);
    }

    /** A target rate q gives RR ≥ q (the k-th distance and everything at least as close recurs). */
    @Test
    void targetRateMeetsTheRateOnContinuousData() {
        double[] x = noisySine(3000, 5);
        for (double q : new double[] {0.01, 0.05, 0.2}) {
            RqaResult r = new Rqa(2).analyse(x, 0, x.length, GIVEN.withThreshold(RqaParams.Threshold.rate(q)));
            long k = (long) Math.ceil(q * r.eligible());
            assertTrue(r.recurrent() >= k && r.recurrent() <= k + 1, "recurrent " + r.recurrent() + " for k " + k);
        }
    }

    @Test
    void resultCarriesItsParametersAndSampleRange() {
        double[] x = noisySine(3000, 3);
        RqaResult r = new Rqa(2).analyse(x, 500, 2500, RqaParams.defaults());
        assertEquals(500, r.from());
        assertEquals(2500, r.to());
        assertTrue(r.params().embeddingGiven());
        assertTrue(r.estimate().isPresent());
        assertEquals(r.params().embedding(), r.estimate().get().embedding());
        assertEquals(2000 - r.params().embedding().span(), r.vectors());
        assertEquals(RqaParams.Threshold.rate(0.05), r.params().threshold());
    }

    /** The thumbnail against the brute-force matrix: a cell is set exactly when a recurrence falls in it. */
    @Test
    void thumbnailMarksExactlyTheCellsWithARecurrence() {
        double[] x = noisySine(260, 9);
        RqaParams p = GIVEN.withTheiler(3);
        double eps = 0.25;
        BruteForce bf = BruteForce.of(x, 3, 2, false, eps, 3);
        for (int[] size : new int[][] {{40, 20}, {7, 13}, {256, 256}}) {
            RecurrencePlot plot = new Rqa(3).plot(x, 0, x.length, p, eps, size[0], size[1]);
            boolean[][] want = new boolean[size[1]][size[0]];
            for (int i = 0; i < bf.n; i++) {
                for (int j = 0; j < bf.n; j++) {
                    if (bf.r[i][j]) {
                        want[i * size[1] / bf.n][j * size[0] / bf.n] = true;
                    }
                }
            }
            for (int yy = 0; yy < size[1]; yy++) {
                for (int xx = 0; xx < size[0]; xx++) {
                    assertEquals(want[yy][xx], plot.at(xx, yy), "cell " + xx + "," + yy);
                }
            }
            // the counts too: recurrences and the pairs outside the Theiler band (|i − j| ≥ 3), per cell
            int[][] recurrences = new int[size[1]][size[0]];
            int[][] pairs = new int[size[1]][size[0]];
            for (int i = 0; i < bf.n; i++) {
                for (int j = 0; j < bf.n; j++) {
                    if (Math.abs(i - j) >= 3) {
                        pairs[i * size[1] / bf.n][j * size[0] / bf.n]++;
                        recurrences[i * size[1] / bf.n][j * size[0] / bf.n] += bf.r[i][j] ? 1 : 0;
                    }
                }
            }
            for (int yy = 0; yy < size[1]; yy++) {
                for (int xx = 0; xx < size[0]; xx++) {
                    assertEquals(recurrences[yy][xx], plot.recurrences(xx, yy), "recurrences of " + xx + "," + yy);
                    assertEquals(pairs[yy][xx], plot.pairs(xx, yy), "pairs of " + xx + "," + yy);
                }
            }
        }
    }

    /**
     * The trend reuses the baseline's embedding and ε unchanged: every window equals a single-window run
     * with that fixed radius; on the baseline, the target rate is met over its windows taken together
     * (the pooled k-th smallest distance, checked against the brute force).
     */
    @Test
    void trendReusesTheBaselineRadiusInEveryWindow() {
        double[] x = noisySine(2000, 21);
        List<Double> progress = new CopyOnWriteArrayList<>();
        Trend t = new Rqa(2).trend(x, 0, 600, 300, 100, GIVEN, progress::add);
        assertEquals(18, t.windows().size());
        assertEquals(18, progress.size());
        assertEquals(1.0, progress.stream().mapToDouble(Double::doubleValue).max().orElse(0), 0.0);
        RqaParams fixed = GIVEN.withThreshold(RqaParams.Threshold.radius(t.radius()));
        for (RqaResult w : t.windows()) {
            RqaResult alone = new Rqa(1).analyse(x, w.from(), w.to(), fixed);
            assertEquals(t.radius(), w.radius(), 0.0);
            assertEquals(alone.recurrent(), w.recurrent());
            assertEquals(alone.det(), w.det(), 0.0);
            assertEquals(alone.lam(), w.lam(), 0.0);
        }
        List<Double> pooled = new ArrayList<>();
        for (RqaResult w : t.baselineWindows()) {
            double[] win = Arrays.copyOfRange(x, w.from(), w.to());
            int n = win.length - 4;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (i != j) {
                        pooled.add(BruteForce.distance(win, 3, 2, false, i, j));
                    }
                }
            }
        }
        pooled.sort(null);
        assertEquals(4, t.baselineWindows().size());
        int k = (int) Math.ceil(0.05 * pooled.size());
        assertEquals(pooled.get(k - 1), t.radius(), 0.0);
    }

    @Test
    void trendSkipsWindowsWithMissingSamplesAndSaysWhy() {
        double[] x = noisySine(1200, 4);
        x[950] = Double.NaN;
        Trend t = new Rqa(2).trend(x, 0, 600, 200, 100, GIVEN, null);
        List<RqaResult> bad = t.windows().stream().filter(r -> !r.computed()).toList();
        assertEquals(List.of(800, 900), bad.stream().map(RqaResult::from).toList());
        assertEquals("missing sample at 950", bad.get(0).skipped());
        assertTrue(Double.isNaN(bad.get(0).rr()));
        assertFalse(t.windows().get(0).skipped().length() > 0);
    }

    /**
     * A long baseline's target-rate radius comes from at most 64 of its windows, evenly spread; checked
     * against the exact k-th distance over all of its windows (a brute-force sort of every distance):
     * within 1 % of it, and the rate over all windows within 0.1 percentage points of the target.
     */
    @Test
    void aLongBaselinesRadiusFromSixtyFourWindowsMatchesTheRadiusOverAllOfThem() {
        double[] x = noisySine(30_100, 21);
        Trend t = new Rqa(2).trend(x, 0, 30_100, 300, 150, GIVEN, null);
        int windows = t.windows().size();
        assertTrue(windows > 3 * TrendRun.RADIUS_WINDOWS, windows + " windows");
        List<Double> all = new ArrayList<>();
        Segment[] segs = new Segment[windows];
        for (int k = 0; k < windows; k++) {
            segs[k] = new Segment(x, k * 150, k * 150 + 300, GIVEN.embedding(), GIVEN.norm());
            for (int i = 0; i < segs[k].vectors(); i++) {
                for (int j = i + 1; j < segs[k].vectors(); j++) {
                    all.add(Math.sqrt(segs[k].distance(i, j)));
                }
            }
        }
        double[] d = all.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        double exact = d[(int) Math.ceil(0.05 * d.length) - 1];
        assertEquals(exact, t.radius(), 0.01 * exact, "radius from 64 windows against all " + windows);
        long within = Arrays.stream(d).filter(v -> v <= t.radius()).count();
        assertEquals(0.05, (double) within / d.length, 0.001, "recurrence rate over every baseline window");
    }

    @Test
    void trendEstimatesTheEmbeddingOnTheBaselineWhenAutomatic() {
        double[] x = noisySine(3000, 8);
        Trend t = new Rqa(2).trend(x, 0, 1500, 500, 250, RqaParams.defaults(), null);
        assertTrue(t.estimate().isPresent());
        assertEquals(0, t.estimate().get().from());
        assertEquals(1500, t.estimate().get().to());
        assertEquals(t.estimate().get().embedding(), t.params().embedding());
    }

    @Test
    void badArgumentsAreRefusedWithMessagesNamingTheValues() {
        double[] x = noisySine(100, 1);
        Rqa rqa = new Rqa(1);
        assertEquals("sample range 50:40 is empty or outside 0:100", assertThrows(IllegalArgumentException.class,
                () -> rqa.analyse(x, 50, 40, GIVEN)).getMessage());
        assertEquals("delay 20 × (dimension 6 − 1) with Theiler window 1 leaves no pair of vectors in the range"
                + " 0:100 of 100 samples", assertThrows(IllegalArgumentException.class,
                    () -> rqa.analyse(x, 0, 100, GIVEN.withEmbedding(6, 20))).getMessage());
        x[7] = Double.NaN;
        assertEquals("sample 7 is missing or not finite (NaN); choose a range without gaps",
                assertThrows(IllegalArgumentException.class, () -> rqa.analyse(x, 0, 100, GIVEN)).getMessage());
        assertEquals("rate 1.5 is out of range (0 < q ≤ 1)", assertThrows(IllegalArgumentException.class,
                () -> RqaParams.Threshold.rate(1.5)).getMessage());
        assertEquals("Theiler window 0 must be at least 1 (1 excludes only the main diagonal)",
                assertThrows(IllegalArgumentException.class, () -> GIVEN.withTheiler(0)).getMessage());
        assertEquals("baseline 0:0 is empty or outside 0:100", assertThrows(IllegalArgumentException.class,
                () -> rqa.trend(x, 0, 0, 20, 10, GIVEN, null)).getMessage());
    }

    @Test
    void parametersDescribeThemselves() {
        assertEquals("m = auto, τ = auto, euclidean norm, target RR 0.05, l_min = 2, v_min = 2, w = 1",
                RqaParams.defaults().describe());
        assertEquals("m = 3, τ = 2, max norm, radius 0.25, l_min = 2, v_min = 2, w = 1",
                GIVEN.withNorm(RqaParams.Norm.MAX).withThreshold(RqaParams.Threshold.radius(0.25)).describe());
        assertEquals("0.1 × std", RqaParams.Threshold.stdFraction(0.1).describe());
    }
}
