package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;
import org.riffle.log.TimeBase;
import org.riffle.triage.BaselineModel.MeasureModel;

/** The combination rule and the channel verdict, piece by piece. */
class JudgeTest {
    @Test
    void quantileIsHyndmanFanType7AsCommonsMathComputesIt() {
        // reference: Commons Math 3.6.1 Percentile with EstimationType.R_7 (Hyndman & Fan 1996, type 7)
        SplittableRandom rnd = new SplittableRandom(3);
        for (int n : new int[] {1, 2, 5, 31, 200}) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = rnd.nextGaussian();
            }
            double[] sorted = v.clone();
            Arrays.sort(sorted);
            for (double q : new double[] {0.01, 0.5, 0.9, 0.99}) {
                double ref = new Percentile().withEstimationType(Percentile.EstimationType.R_7).evaluate(v, 100 * q);
                assertEquals(ref, Judge.quantileSorted(sorted, q), 1e-12, "n " + n + " q " + q);
            }
        }
    }

    @Test
    void predictionFloorMatchesTheTTable() {
        // Student t table: t(0.995; 10) = 3.169 (two-sided 99 %), times the prediction factor sqrt(1 + 1/11);
        // for a very long baseline the floor tends to the normal quantile z(0.995) = 2.5758 (standard tables)
        assertEquals(3.169 * Math.sqrt(1 + 1.0 / 11), Judge.predictionFloor(0.99, 1, 11), 2e-3);
        assertEquals(2.5758, Judge.predictionFloor(0.99, 1, 1e9), 1e-4);
        // Bonferroni over 7 measures: z(1 - 0.01/14) = 3.19 (standard normal table)
        assertEquals(3.19, Judge.predictionFloor(0.99, 7, 1e9), 5e-3);
    }

    @Test
    void measureModelUsesTheMoreCautiousOfMadAndStd() {
        double[] v = {1, 2, 3, 4, 100};
        MeasureModel m = Judge.model("mean", v, 0);
        assertEquals(3, m.center());
        double mean = 22;
        double sd = Math.sqrt(((21 * 21) + (20 * 20) + (19 * 19) + (18 * 18) + (78 * 78)) / 4.0);
        assertEquals(Math.max(1.4826 * 1, sd), m.spread(), 1e-12, "std wins with an outlier (mean " + mean + ")");
        MeasureModel flat = Judge.model("DET", new double[] {1, 1, 1}, 0.05);
        assertEquals(0.05, flat.spread(), "the floor keeps a spread for a constant measure");
        MeasureModel nov = Judge.model("novelty", new double[] {Math.E, Math.E, Math.E}, 0.02);
        assertEquals(1, nov.center(), 1e-15, "novelty is judged on its logarithm");
    }

    @Test
    void levelsFollowTheRuleWrittenOutPlainly() {
        double t = 4;
        double[] s = {1, 5, 5, 5, 5, 1, 9, 9, Double.NaN, 9, 9, 9};
        Level[] got = Judge.levels(s, t, 3);
        Level[] expected = new Level[s.length];
        for (int k = 0; k < s.length; k++) {
            boolean above = s[k] > t;
            boolean run = k >= 2 && s[k] > t && s[k - 1] > t && s[k - 2] > t;
            expected[k] = !above ? Level.STEADY : run ? Level.DEPARTED : Level.WATCH;
        }
        assertArrayEquals(expected, got);
    }

    @Test
    void healthIsOneHundredWithinTheAlertLevelAndFallsAsTheDepartureGrows() {
        TimeBase tb = TimeBase.regular(1000, 10, null);
        Windows w = new Windows(1000, 100, 50);
        boolean[] none = new boolean[w.count()];
        double alert = 4;
        double previous = 101;
        for (double score = 0.5; score < 40; score *= 1.3) {
            double[] s = new double[w.count()];
            Arrays.fill(s, 1);
            for (int k = w.count() - 3; k < w.count(); k++) {
                s[k] = score;
            }
            Health h = ChannelVerdict.judge(s, Judge.levels(s, alert, 3), none, w, alert, 3, tb);
            assertTrue(h.figure() <= previous, "monotone at score " + score);
            assertTrue(score > alert || h.figure() == 100, "100 within the alert level");
            previous = h.figure();
        }
        double[] twice = new double[w.count()];
        Arrays.fill(twice, 8);
        Health h = ChannelVerdict.judge(twice, Judge.levels(twice, alert, 3), none, w, alert, 3, tb);
        assertEquals(50, h.figure(), 1e-12, "50 at twice the alert level");
        assertEquals(Level.DEPARTED, h.level());
        assertEquals(0, h.sinceIndex(), "the run starts at the first window");
        assertEquals(0.0, h.sinceSeconds());
    }
}
