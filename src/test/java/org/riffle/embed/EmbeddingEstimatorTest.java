package org.riffle.embed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class EmbeddingEstimatorTest {
    private static final EmbeddingSearch FNN = EmbeddingSearch.defaults();
    private static final EmbeddingSearch CAO = EmbeddingSearch.defaults().withMethod(EmbeddingSearch.Method.CAO);

    /**
     * Kennel, Brown &amp; Abarbanel 1992 (Phys. Rev. A 45:3403, the Hénon map with τ = 1) and Hegger, Kantz
     * &amp; Schreiber 1999 (Chaos 9:413): the false fraction of Hénon x falls to about 0 at m = 2. Limit
     * 1 % (our default) because a deterministic map leaves no false neighbours once unfolded.
     */
    @Test
    void henonNeedsTwoDimensionsByFalseNeighbours() {
        EmbeddingEstimate e = EmbeddingEstimator.estimate(Systems.henonX(3000), 0, 3000, FNN, 0, 1);
        assertEquals(2, e.embedding().dimension(), e.dimensionCurve().toString());
        assertTrue(e.dimensionCurve().get(0) > 0.5, "most neighbours are false at m = 1: " + e.dimensionCurve());
        assertTrue(e.dimensionCurve().get(1) <= 0.01, e.dimensionCurve().toString());
        assertEquals(2, e.dimensionCurve().size(), "the curve ends where the fraction reaches the limit");
        assertEquals("false nearest neighbours", e.dimensionMethod());
        assertEquals("given", e.delayMethod());
    }

    /**
     * Kennel et al. 1992 and Hegger et al. 1999: Lorenz x needs m = 3 (false fraction about 0 at m = 3,
     * clearly above at m = 2). Sampled every 0.01 and every 0.05 time units, delay from the AMI.
     */
    @Test
    void lorenzNeedsThreeDimensionsByFalseNeighbours() {
        for (int every : new int[] {1, 5}) {
            EmbeddingEstimate e = EmbeddingEstimator.estimate(Systems.lorenzX(5000, every), 0, 5000, FNN, 0, 0);
            assertEquals(3, e.embedding().dimension(), "every " + every + ": " + e.dimensionCurve());
            assertTrue(e.dimensionCurve().get(1) > 0.02, e.dimensionCurve().toString());
            assertTrue(e.dimensionCurve().get(2) <= 0.01, e.dimensionCurve().toString());
            assertEquals("AMI first minimum", e.delayMethod());
        }
    }

    /**
     * Cao 1997 (Physica D 110:43, from memory): E1 saturates at the minimum embedding dimension, 2 for
     * Hénon (τ = 1) and 3 for Lorenz x (here sampled every 0.05 time units).
     */
    @Test
    void caoAgreesForHenonAndLorenz() {
        assertEquals(2, EmbeddingEstimator.estimate(Systems.henonX(3000), 0, 3000, CAO, 0, 1).embedding()
                .dimension());
        EmbeddingEstimate l = EmbeddingEstimator.estimate(Systems.lorenzX(5000, 5), 0, 5000, CAO, 0, 0);
        assertEquals(3, l.embedding().dimension(), l.dimensionCurve().toString());
        assertEquals("Cao's E1", l.dimensionMethod());
    }

    /**
     * Analytic: for s = sin(θ) the pair (s_t, s_{t+τ}) lies on an ellipse that is a circle (the least
     * dependent pair) at τ = P/4, and I(τ) = I(P/2 − τ) by symmetry, so the first AMI minimum sits at a
     * quarter period. Tolerance ±1 sample: the period need not be a multiple of 4 and the histogram
     * estimate is discrete.
     */
    @Test
    void amiOfASineHasItsFirstMinimumNearAQuarterPeriod() {
        for (double period : new double[] {12, 20.3, 37.3, 40, 48.9, 64.2, 100.7}) {
            double[] s = Systems.sine(5000, period, 0.3);
            EmbeddingEstimate e = EmbeddingEstimator.estimate(s, 0, s.length, FNN, 1, 0);
            assertEquals(period / 4, e.embedding().delay(), 1.0, "period " + period);
            assertEquals("AMI first minimum", e.delayMethod());
        }
    }

    @Test
    void givenValuesAreKeptAndSaidToBeGiven() {
        EmbeddingEstimate e = EmbeddingEstimator.estimate(Systems.sine(500, 20, 0), 0, 500, FNN, 4, 7);
        assertEquals(new Embedding(4, 7), e.embedding());
        assertEquals("m = 4 (given), τ = 7 (given)", e.describe());
        assertTrue(e.mutualInformation().isEmpty() && e.dimensionCurve().isEmpty());
    }

    @Test
    void onlyTheFirstMaxSamplesAreUsed() {
        EmbeddingEstimate e = EmbeddingEstimator.estimate(Systems.sine(9000, 40, 0), 100, 9000,
                FNN.withMaxSamples(2000), 2, 0);
        assertEquals(100, e.from());
        assertEquals(2100, e.to());
    }

    /** The fallbacks and choosers, on curves made by hand (their answers follow from the stated rules). */
    @Test
    void choosersFollowTheirStatedRules() {
        assertEquals(-1, MutualInformation.firstMinimum(new double[] {3, 2, 1, 0.5, 0.4}));
        assertEquals(2, MutualInformation.firstMinimum(new double[] {3, 2, 1, 1, 0.4}));
        assertEquals(3, EmbeddingEstimator.chooseFnn(new double[] {0.9, 0.3, 0.005, 0}, 0.01));
        assertEquals(3, EmbeddingEstimator.chooseFnn(new double[] {0.9, 0.3, 0.10, 0.095, 0.11}, 0.01));
        assertEquals(2, EmbeddingEstimator.chooseCao(new double[] {0.1, 0.9, 0.95, 0.97}, 0.1));
        assertEquals(3, EmbeddingEstimator.chooseCao(new double[] {0.1, 0.5, 0.9}, 0.1));
    }

    @Test
    void aConstantSeriesFallsBackToDelayOneWithoutFailing() {
        double[] c = new double[400];
        java.util.Arrays.fill(c, 2.5);
        EmbeddingEstimate e = EmbeddingEstimator.estimate(c, 0, 400, FNN, 0, 0);
        assertEquals(1, e.embedding().delay());
        assertEquals("default, no AMI minimum or autocorrelation fall", e.delayMethod());
    }

    @Test
    void badRangesAndGapsAreRefusedByMessage() {
        IllegalArgumentException a = assertThrows(IllegalArgumentException.class,
                () -> EmbeddingEstimator.estimate(new double[10], 0, 10, FNN, 0, 0));
        assertEquals("sample range 0:10 of 0:10 is out of bounds or shorter than 16 samples", a.getMessage());
        double[] x = Systems.sine(100, 20, 0);
        x[42] = Double.NaN;
        IllegalArgumentException b = assertThrows(IllegalArgumentException.class,
                () -> EmbeddingEstimator.estimate(x, 0, 100, FNN, 0, 0));
        assertEquals("sample 42 is missing or not finite", b.getMessage());
        IllegalArgumentException c = assertThrows(IllegalArgumentException.class, () -> new Embedding(0, 2));
        assertEquals("embedding dimension 0 must be at least 1", c.getMessage());
    }

    /**
     * White noise has no finite embedding: its false fraction falls, then rises again as Kennel's second
     * criterion flags ever more distant neighbours (from memory: Kennel et al. 1992 added that criterion
     * so that noise keeps showing false neighbours as m grows). The curve stops after rising twice, with
     * the same values up to there and the same choice as the whole curve.
     */
    @Test
    void aRisingCurveStopsEarlyWithTheSameChoice() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(5);
        double[] s = new double[3000];
        for (int i = 0; i < s.length; i++) {
            s[i] = rnd.nextGaussian();
        }
        double[] whole = FalseNeighbours.fnn(s, 1, 10, 15, 2, 10, Double.NaN);
        double[] cut = FalseNeighbours.fnn(s, 1, 10, 15, 2, 10, 0.01);
        assertEquals(10, whole.length);
        assertTrue(cut.length < whole.length, java.util.Arrays.toString(cut));
        assertEquals(java.util.Arrays.toString(java.util.Arrays.copyOf(whole, cut.length)),
                java.util.Arrays.toString(cut));
        assertEquals(EmbeddingEstimator.chooseFnn(whole, 0.01), EmbeddingEstimator.chooseFnn(cut, 0.01));
    }
}
