package org.riffle.recurrence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.riffle.embed.Embedding;

/**
 * The streamed engine against {@link BruteForce} (the full N × N matrix, definitions of Marwan, Romano,
 * Thiel &amp; Kurths 2007, Physics Reports 438:237) on random series and parameters: counts, line-length
 * histograms and the target-rate radius must agree exactly, whatever the split into bands, the thread
 * count or the search budget. Series are drawn either from a few levels (many ties, long lines) or from a
 * continuum. Tries are bounded and the jqwik seed is fixed, so runs repeat.
 */
class EngineVsBruteForceProperties {

    static double[] series(long seed, int len, boolean coarse) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] x = new double[len];
        for (int i = 0; i < len; i++) {
            x[i] = coarse ? rnd.nextInt(4) * 0.5 : rnd.nextDouble() * 3 - 1;
        }
        return x;
    }

    // m up to 6: the engine computes m = 2 … 4 cell by cell in registers and other m through a buffer
    @Property(tries = 400, seed = "20260301")
    void linesAndCountsEqualTheFullMatrix(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                          @ForAll @IntRange(min = 2, max = 140) int len,
                                          @ForAll boolean coarse,
                                          @ForAll @IntRange(min = 1, max = 6) int m,
                                          @ForAll @IntRange(min = 1, max = 3) int tau,
                                          @ForAll @IntRange(min = 1, max = 6) int w,
                                          @ForAll boolean maxNorm,
                                          @ForAll @IntRange(min = 1, max = 4) int lmin,
                                          @ForAll @IntRange(min = 1, max = 4) int vmin,
                                          @ForAll @IntRange(min = 0, max = 99) int epsPercent,
                                          @ForAll @IntRange(min = 1, max = 7) int bands,
                                          @ForAll @IntRange(min = 1, max = 3) int threads) {
        double[] x = series(seed, len, coarse);
        if (len - (m - 1) * tau < 1) {
            return;
        }
        double eps = epsPercent / 40.0;
        RqaParams.Norm norm = maxNorm ? RqaParams.Norm.MAX : RqaParams.Norm.EUCLIDEAN;
        Segment seg = new Segment(x, 0, len, new Embedding(m, tau), norm);
        BruteForce bf = BruteForce.of(x, m, tau, maxNorm, eps, w);

        LineMerge lines = Rqa.lines(seg, w, eps, Piece.bands(seg, w, bands, 1), threads, null);
        long[] diagFull = lines.diagHist.clone();
        for (int l = 0; l < diagFull.length; l++) {
            diagFull[l] *= 2;
        }
        assertEquals(bf.recurrent, 2 * lines.recurrent, "recurrent cells");
        assertArrayEquals(bf.diag, diagFull, "diagonal line lengths");
        assertArrayEquals(bf.vert, lines.vertHist, "vertical line lengths");

        if (len - (m - 1) * tau <= w) {
            return;
        }
        RqaParams p = new RqaParams(m, tau, norm, RqaParams.Threshold.radius(eps), lmin, vmin, w);
        RqaResult r = new Rqa(threads).analyse(x, 0, len, p);
        assertEquals(bf.eligible, r.eligible(), "eligible");
        assertEquals(bf.rr(), r.rr(), "RR");
        assertEquals(BruteForce.share(bf.diag, lmin, bf.recurrent), r.det(), "DET");
        assertEquals(BruteForce.meanLength(bf.diag, lmin), r.l(), "L");
        assertEquals(BruteForce.longest(bf.diag, lmin), r.lmax(), "Lmax");
        assertEquals(BruteForce.entropy(bf.diag, lmin), r.entr(), "ENTR");
        assertEquals(BruteForce.share(bf.vert, vmin, bf.recurrent), r.lam(), "LAM");
        assertEquals(BruteForce.meanLength(bf.vert, vmin), r.tt(), "TT");
        assertEquals(BruteForce.longest(bf.vert, vmin), r.vmax(), "Vmax");
    }

    @Property(tries = 200, seed = "20260302")
    void targetRateRadiusIsTheExactOrderStatistic(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                  @ForAll @IntRange(min = 3, max = 120) int len,
                                                  @ForAll boolean coarse,
                                                  @ForAll @IntRange(min = 1, max = 6) int m,
                                                  @ForAll @IntRange(min = 1, max = 3) int tau,
                                                  @ForAll @IntRange(min = 1, max = 4) int w,
                                                  @ForAll boolean maxNorm,
                                                  @ForAll @IntRange(min = 1, max = 1000) int permille,
                                                  @ForAll @IntRange(min = 0, max = 200) int collectAll,
                                                  @ForAll @IntRange(min = 1, max = 300) int collectCap,
                                                  @ForAll @IntRange(min = 2, max = 64) int sample,
                                                  @ForAll @IntRange(min = 2, max = 16) int bins,
                                                  @ForAll @IntRange(min = 1, max = 3) int threads) {
        double[] x = series(seed, len, coarse);
        int n = len - (m - 1) * tau;
        if (n <= w) {
            return;
        }
        double q = permille / 1000.0;
        RqaParams.Norm norm = maxNorm ? RqaParams.Norm.MAX : RqaParams.Norm.EUCLIDEAN;
        double expected = BruteForce.kthDistance(x, m, tau, maxNorm, w, q);

        RqaParams p = new RqaParams(m, tau, norm, RqaParams.Threshold.rate(q), 2, 2, w);
        assertEquals(expected, new Rqa(threads).analyse(x, 0, len, p).radius(), "radius, default budget");

        Segment seg = new Segment(x, 0, len, new Embedding(m, tau), norm);
        long eligible = seg.eligible(w);
        long k = Math.min(eligible, Math.max(1, (long) Math.ceil(q * eligible)));
        List<List<Piece>> tasks = new ArrayList<>();
        for (Piece b : Piece.bands(seg, w, 1 + (int) (seed % 5), 1)) {
            tasks.add(List.of(b));
        }
        RadiusSearch.Budget tight = new RadiusSearch.Budget(collectAll, collectCap, sample, bins);
        double value = RadiusSearch.kth(tasks, w, (k + 1) / 2, eligible / 2, threads, tight);
        assertEquals(expected, seg.toDistance(value), "radius, tight budget");
    }
}
