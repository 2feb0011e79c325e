package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.riffle.log.Recording;
import org.riffle.recurrence.RqaParams;

/**
 * The thumbnails the triage attaches, against an analytic recurrence plot. A sine of whole period P,
 * x_i = sin(2πi/P), embedded with m = 2 and τ = P/4 gives the delay vectors v_i = (sin θ_i, cos θ_i),
 * points on the unit circle, so ‖v_j − v_i‖ = 2·|sin(π(j − i)/P)| (the chord of the angle between them;
 * analytic). That is 0 when j − i is a multiple of P and at least 2·sin(π/P) otherwise. With
 * P = 200 the gap is 0.0314; at ε = 0.01 the recurrences are exactly the pairs with j − i = k·P, k ≠ 0
 * (the Theiler window 1 leaves out k = 0). Samples are stored as float, so a "zero" distance is at most a
 * few 1e-8, far inside ε.
 */
class ThumbnailStepTest {
    private static final int P = 200;
    private static final int N_SAMPLES = 10_000;
    private static final int WINDOW = 1000;
    private static final double EPS = 0.01;
    private static final RqaParams RQA = new RqaParams(2, P / 4, RqaParams.Norm.EUCLIDEAN,
            RqaParams.Threshold.radius(EPS), 2, 2, 1);
    private static final TriageParams PARAMS = TriageParams.defaults().withThreads(1).withSearch(false)
            .withWindow(WINDOW, WINDOW / 2).withBaseline(0, 5000).withRqa(RQA);

    private static ChannelAssessment sine;

    @BeforeAll
    static void analyse() {
        sine = new Analyzer(PARAMS).assess(Scenarios.recording("sine", sine(N_SAMPLES)), TriageListener.NONE)
                .channels().get(0);
    }

    static double[] sine(int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(2 * Math.PI * i / P);
        }
        return x;
    }

    /**
     * The analytic grid: cell (x, y) of a {@code w} × {@code h} grid over {@code n} vectors holds the
     * recurrent pairs i, j = i ± k·P (k ≥ 1) with ⌊j·w/n⌋ = x and ⌊i·h/n⌋ = y, and every pair i ≠ j with
     * those cells (the Theiler window 1 leaves out i = j); it is set when it holds a recurrence and its
     * share of recurrent pairs is at least the whole grid's (the display rule of {@link Thumbnail}).
     */
    static boolean[][] expected(int n, int w, int h) {
        long[][] rec = new long[w][h];
        long[][] pairs = new long[w][h];
        long allRec = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (j == i) {
                    continue;
                }
                int x = (int) ((long) j * w / n);
                int y = (int) ((long) i * h / n);
                pairs[x][y]++;
                if ((j - i) % P == 0) {
                    rec[x][y]++;
                    allRec++;
                }
            }
        }
        long allPairs = (long) n * n - n;
        boolean[][] cell = new boolean[w][h];
        for (int x = 0; x < w; x++) {
            for (int y = 0; y < h; y++) {
                cell[x][y] = rec[x][y] > 0 && rec[x][y] * allPairs >= allRec * pairs[x][y];
            }
        }
        return cell;
    }

    private static void assertGrid(boolean[][] want, Thumbnail t) {
        StringBuilder diff = new StringBuilder();
        for (int y = 0; y < t.height(); y++) {
            for (int x = 0; x < t.width(); x++) {
                if (want[x][y] != t.at(x, y)) {
                    diff.append(" (").append(x).append(',').append(y).append(')');
                }
            }
        }
        assertEquals("", diff.toString(), "cells that differ from the analytic plot in " + t);
    }

    @Test
    void baselineAndLatestWindowsAreTheLastTrendWindowOfEach() {
        assertEquals(2, sine.thumbnails().size(), sine.thumbnails().toString());
        Thumbnail base = sine.thumbnails().get(0);
        Thumbnail now = sine.thumbnails().get(1);
        assertEquals(Thumbnail.Span.BASELINE, base.span());
        assertEquals(4000, base.fromRow(), "windows every 500 from 0; the last inside [0, 5000) starts at 4000");
        assertEquals(5000, base.toRow());
        assertEquals(Thumbnail.Span.LATEST, now.span());
        assertEquals(9000, now.fromRow(), "the last window of 10000 samples");
        assertEquals(10_000, now.toRow());
        assertEquals(9999.0, now.toSeconds(), 0, "1 Hz from 0 s: the last row's time");
        assertEquals(EPS, base.radius(), 0, "the baseline's radius");
        assertEquals(ThumbnailStep.SIZE, base.width());
    }

    @Test
    void cellsAreExactlyThoseOfTheAnalyticPlot() {
        int vectors = WINDOW - P / 4;
        boolean[][] want = expected(vectors, 16, 16);
        for (Thumbnail t : sine.thumbnails()) {
            assertGrid(want, t);
        }
        Thumbnail t = sine.thumbnails().get(1);
        // by hand, 950 vectors, 59.4 per cell: cells (x, y) with |x − y| ≤ 2 hold offsets |j − i| < 3 · 59.4 =
        // 178 only, so no multiple of 200 but 0 (left out): clear. The whole grid: 2·(750 + 550 + 350 + 150)
        // = 3,600 recurrences of 950² − 950 pairs, a rate of 0.0040; cell (3, 0) holds i in [0, 60) and j in
        // [179, 238), 60 · 59 pairs, of which the 38 with j = i + 200 recur, 0.0107: set
        for (int y = 0; y < 16; y++) {
            for (int x = Math.max(0, y - 2); x <= Math.min(15, y + 2); x++) {
                assertFalse(t.at(x, y), "near-diagonal cell " + x + "," + y);
            }
        }
        assertTrue(t.at(3, 0));
        assertTrue(t.at(0, 3), "symmetric");
    }

    @Test
    void coarserGridsAreTheThumbnailsAtThatSize() {
        int vectors = WINDOW - P / 4;
        Thumbnail t = sine.thumbnails().get(0);
        assertGrid(expected(vectors, 8, 8), t.coarser(2, 2));
        assertGrid(expected(vectors, 16, 8), t.coarser(1, 2));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.coarser(3, 1));
        assertEquals("factors 3 × 1 do not divide 16 × 16", e.getMessage());
    }

    @Test
    void aWindowWithAMissingSampleGivesWayToTheNearestEarlierOne() {
        double[] x = sine(N_SAMPLES);
        x[9800] = Double.NaN;
        ChannelAssessment a = new Analyzer(PARAMS).assess(Scenarios.recording("sine", x), TriageListener.NONE)
                .channels().get(0);
        Thumbnail now = a.thumbnails().get(1);
        assertEquals(8500, now.fromRow(), "[9000, 10000) holds the missing row 9800, [8500, 9500) does not");
        assertEquals(9500, now.toRow());
        assertGrid(expected(WINDOW - P / 4, 16, 16), now);
    }

    @Test
    void aBaselineFromAnotherLogGivesOnlyTheLatestThumbnail() {
        Recording r = Scenarios.recording("sine", sine(N_SAMPLES));
        Analyzer an = new Analyzer(PARAMS);
        BaselineModel own = an.learn(r, new Baseline(0, 5000, "rows 0-5000"));
        BaselineModel other = new BaselineModel(own.source(), Baseline.separateLog("old.csv", 5000), own.window(),
                own.step(), own.quantile(), own.sustained(), own.channels(), own.rqaNorm(), own.minLine(),
                own.minVert(), own.theiler());
        List<Thumbnail> t = an.assess(r, other, TriageListener.NONE).channels().get(0).thumbnails();
        assertEquals(1, t.size(), t.toString());
        assertEquals(Thumbnail.Span.LATEST, t.get(0).span());
    }
}
