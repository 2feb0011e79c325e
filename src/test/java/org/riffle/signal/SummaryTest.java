package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.riffle.signal.Close.assertClose;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Analytic checks of {@link Summary}. Kurtosis is shown in Pearson's convention, m4/m2² with divisor n:
 * 3 for a Gaussian (the "excess" or Fisher form would be 0).
 */
class SummaryTest {
    /**
     * Analytic: a sine sampled at N equally spaced points over whole periods (N divisible by 4, so the
     * crests are sampled) has mean 0, RMS A/√2, peak A, crest factor √2, skewness 0 and kurtosis 1.5,
     * since Σ sin² = N/2, Σ sin³ = 0, Σ sin⁴ = 3N/8 exactly for N > 4. Tolerance 1e-12: rounding only.
     */
    @Test
    void sineHasCrestFactorRootTwoAndKurtosisOneAndAHalf() {
        int n = 4000;
        double a = 3.7;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = a * Math.sin(2 * Math.PI * 5 * i / n); // five whole periods
        }
        Summary s = Summary.of(x);
        assertClose("mean", 0, s.mean(), 1e-12);
        assertClose("rms", a / Math.sqrt(2), s.rms(), 1e-12);
        assertClose("peak", a, s.peak(), 1e-12);
        assertClose("crest", Math.sqrt(2), s.crest(), 1e-12);
        assertClose("skewness", 0, s.skewness(), 1e-12);
        assertClose("kurtosis (Pearson)", 1.5, s.kurtosis(), 1e-12);
    }

    /**
     * Analytic: a standard Gaussian has kurtosis 3 (Pearson), skewness 0, std 1. On n = 200,000 seeded
     * draws the sample kurtosis has standard error √(24/n) ≈ 0.011 and the skewness √(6/n) ≈ 0.0055
     * (large-sample variances of b2 and √b1 for a normal parent); the tolerance is 4 standard errors.
     */
    @Test
    void gaussianKurtosisIsThreeWithinItsSamplingError() {
        int n = 200_000;
        Random r = new Random(20_260_301L);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = r.nextGaussian();
        }
        Summary s = Summary.of(x);
        assertClose("kurtosis (Pearson)", 3.0, s.kurtosis(), 4 * Math.sqrt(24.0 / n));
        assertClose("skewness", 0.0, s.skewness(), 4 * Math.sqrt(6.0 / n));
        assertClose("std", 1.0, s.std(), 4 * Math.sqrt(0.5 / n));
    }

    /**
     * Analytic: a uniform distribution has kurtosis 9/5 = 1.8 (Pearson). Its standard error on n draws
     * follows from the delta method for a symmetric parent: Var(b2) ≈ (μ8/μ2⁴ − 4μ6μ4/μ2⁵ + 4μ4³/μ2⁶ −
     * μ4²/μ2⁴)/n, with the central moments of U(−1, 1): μ2 = 1/3, μ4 = 1/5, μ6 = 1/7, μ8 = 1/9 (the same
     * formula gives 24/n for the Gaussian). Tolerance 4 standard errors.
     */
    @Test
    void uniformKurtosisIsOnePointEightWithinItsSamplingError() {
        int n = 200_000;
        Random r = new Random(20_260_302L);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 2 * r.nextDouble() - 1;
        }
        double m2 = 1.0 / 3;
        double m4 = 1.0 / 5;
        double m6 = 1.0 / 7;
        double m8 = 1.0 / 9;
        double var = (m8 / Math.pow(m2, 4) - 4 * m6 * m4 / Math.pow(m2, 5) + 4 * Math.pow(m4, 3) / Math.pow(m2, 6)
                - m4 * m4 / Math.pow(m2, 4)) / n;
        Summary s = Summary.of(x);
        assertClose("kurtosis (Pearson)", 1.8, s.kurtosis(), 4 * Math.sqrt(var));
        assertClose("rms of U(-1,1) = 1/sqrt(3)", 1 / Math.sqrt(3), s.rms(), 4 * Math.sqrt(4.0 / 45 / n) / (2 / Math.sqrt(3)));
    }

    /** Missing samples are skipped and counted; a run with no samples is all NaN, not an exception. */
    @Test
    void missingSamplesAreSkippedAndCounted() {
        Summary s = Summary.of(new double[] {Double.NaN, 1, 3, Double.NaN});
        assertEquals(2, s.count());
        assertEquals(2, s.missing());
        assertEquals(2.0, s.mean());
        assertEquals(Math.sqrt(2), s.std(), 1e-15);
        Summary empty = Summary.of(new double[] {Double.NaN});
        assertEquals(0, empty.count());
        assertTrue(Double.isNaN(empty.mean()) && Double.isNaN(empty.kurtosis()));
        Summary one = Summary.of(new double[] {4});
        assertTrue(Double.isNaN(one.std()) && Double.isNaN(one.kurtosis()));
        assertEquals(1.0, one.crest());
    }

    /**
     * Oracle: exact BigDecimal moments of random runs with gaps (some offset by 1e6), against the
     * two-pass double code. Tolerances: the mean within 4 ulps of the largest datum (the corrected
     * two-pass mean is that good); std and kurtosis within 1e-9 and 1e-8 relative, far below what a
     * one-pass sum-of-squares formula achieves on the offset runs.
     */
    @Test
    void agreesWithAnExactOracle() {
        Random r = new Random(5);
        MathContext mc = MathContext.DECIMAL128;
        for (int trial = 0; trial < 200; trial++) {
            int n = 2 + r.nextInt(150);
            double[] x = new double[n];
            double offset = r.nextInt(3) == 0 ? 1e6 : 0;
            for (int i = 0; i < n; i++) {
                x[i] = i > 1 && r.nextInt(8) == 0 ? Double.NaN : offset + r.nextGaussian() * (1 + r.nextInt(5));
            }
            BigDecimal sum = BigDecimal.ZERO;
            int k = 0;
            double maxAbs = 0;
            for (double v : x) {
                if (!Double.isNaN(v)) {
                    sum = sum.add(new BigDecimal(v));
                    maxAbs = Math.max(maxAbs, Math.abs(v));
                    k++;
                }
            }
            BigDecimal mean = sum.divide(BigDecimal.valueOf(k), mc);
            BigDecimal m2 = BigDecimal.ZERO;
            BigDecimal m4 = BigDecimal.ZERO;
            for (double v : x) {
                if (!Double.isNaN(v)) {
                    BigDecimal d = new BigDecimal(v).subtract(mean, mc);
                    m2 = m2.add(d.pow(2, mc), mc);
                    m4 = m4.add(d.pow(4, mc), mc);
                }
            }
            Summary s = Summary.of(x);
            double std = Math.sqrt(m2.doubleValue() / (k - 1));
            double kurt = m4.doubleValue() * k / (m2.doubleValue() * m2.doubleValue());
            assertClose("mean, trial " + trial, mean.doubleValue(), s.mean(), 4 * Math.ulp(maxAbs));
            assertClose("std, trial " + trial, std, s.std(), 1e-9 * std);
            assertClose("kurtosis, trial " + trial, kurt, s.kurtosis(), 1e-8 * kurt);
        }
    }
}
