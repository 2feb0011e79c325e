package org.riffle.recurrence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The engine against analytic results. Definitions: Marwan, Romano, Thiel &amp; Kurths 2007, Physics
 * Reports 438:237, §3 (RR eq. 9, DET eq. 11, L eq. 12, Lmax, ENTR eq. 14, LAM eq. 17, TT eq. 18).
 */
class RqaAnalyticTest {

    /**
     * Analytic: for iid U(0,1) samples, m = 1, maximum norm, a pair recurs with probability
     * p = P(|U − V| ≤ ε) = 2ε − ε², so RR → p; a recurrent cell lies on a diagonal line (l_min = 2) unless
     * both diagonal neighbours fail, independently, so DET → 1 − (1 − p)².
     *
     * <p>Tolerances from the sampling error (Hoeffding projection of the U-statistics): with
     * h(x) = P(|U − x| ≤ ε) and ζ = Var h(U) = (2/3)ε³ − ε⁴, Var RR ≈ 4ζ/N and, by the delta method,
     * Var DET ≈ 16(1 − p)²ζ/N. Each check allows 5 standard deviations, plus 6/N for DET for the cells at
     * the border and next to the excluded diagonal, which have fewer independent neighbours.
     */
    @Test
    void iidUniformNoiseMeetsTheAnalyticRecurrenceRateAndDeterminism() {
        int n = 6000;
        double[] x = new double[n];
        SplittableRandom rnd = new SplittableRandom(20260301L);
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextDouble();
        }
        for (double eps : new double[] {0.05, 0.1, 0.2}) {
            RqaParams p = new RqaParams(1, 1, RqaParams.Norm.MAX, RqaParams.Threshold.radius(eps), 2, 2, 1);
            RqaResult r = new Rqa(2).analyse(x, 0, n, p);
            double rr = 2 * eps - eps * eps;
            double zeta = 2.0 / 3 * eps * eps * eps - eps * eps * eps * eps;
            double sdRr = Math.sqrt(4 * zeta / n);
            double sdDet = 4 * (1 - rr) * Math.sqrt(zeta / n);
            assertEquals(rr, r.rr(), 5 * sdRr, "RR at ε = " + eps);
            assertEquals(1 - (1 - rr) * (1 - rr), r.det(), 5 * sdDet + 6.0 / n, "DET at ε = " + eps);
        }
    }

    /**
     * Analytic: a sine with an integer period P, sampled so that every period repeats bit for bit, with
     * ε below the smallest distance between different phases, recurs exactly on the diagonals |i − j| = kP.
     * Each is one line of length N − kP, so DET = 1, Lmax = N − P, L is their mean, there are no vertical
     * lines (LAM = 0, Vmax = 0, TT undefined) and RR = 2 Σ_k (N − kP) / (N(N − 1)). N mod P ≠ 1, so no
     * line has length 1.
     */
    @Test
    void exactlyPeriodicSineHasDeterminismOneAndLongestLineNMinusP() {
        int period = 25;
        double[] one = new double[period];
        for (int i = 0; i < period; i++) {
            one[i] = Math.sin(2 * Math.PI * i / period);
        }
        double[] x = new double[600];
        for (int i = 0; i < x.length; i++) {
            x[i] = one[i % period];
        }
        RqaParams p = new RqaParams(2, 3, RqaParams.Norm.EUCLIDEAN, RqaParams.Threshold.radius(0.01), 2, 2, 1);
        RqaResult r = new Rqa(2).analyse(x, 0, x.length, p);
        int n = 597;
        long points = 0;
        long lines = 0;
        for (int d = period; d < n; d += period) {
            points += n - d;
            lines++;
        }
        assertEquals(n, r.vectors());
        assertEquals(1.0, r.det(), 0.0);
        assertEquals(n - period, r.lmax());
        assertEquals((double) points / lines, r.l(), 1e-12);
        assertEquals(1.0 / (n - period), r.div(), 1e-15);
        assertEquals(2.0 * points / ((long) n * (n - 1)), r.rr(), 1e-15);
        assertEquals(0.0, r.lam(), 0.0);
        assertEquals(0, r.vmax());
        assertTrue(Double.isNaN(r.tt()), "TT undefined without vertical lines");
        assertEquals(Math.log(lines), r.entr(), 1e-12, "every line length occurs once: ENTR = ln(lines)");
    }

    /**
     * Analytic: a constant series recurs everywhere outside the Theiler band, so RR = 1. Every diagonal is
     * one line; only the two corner cells (|i − j| = N − 1) are lines of length 1, so DET = 1 − 2/E with E
     * the eligible cells. Column j splits into pieces of j − w + 1 and N − j − w cells; exactly two pieces
     * have length 1, so LAM = 1 − 2/E. The longest diagonal is |i − j| = w with N − w cells, and so is the
     * longest vertical piece.
     */
    @Test
    void constantSeriesRecursEverywhereOutsideTheBand() {
        double[] x = new double[300];
        java.util.Arrays.fill(x, 4.2);
        for (int w : new int[] {1, 3, 17}) {
            RqaParams p = new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN, RqaParams.Threshold.rate(0.05), 2, 2, w);
            RqaResult r = new Rqa(3).analyse(x, 0, x.length, p);
            int n = 296;
            assertEquals((long) (n - w) * (n - w + 1), r.eligible(), "eligible = N² − band");
            assertEquals(0.0, r.radius(), 0.0);
            assertEquals(1.0, r.rr(), 0.0);
            assertEquals(1 - 2.0 / r.eligible(), r.det(), 1e-15);
            assertEquals(1 - 2.0 / r.eligible(), r.lam(), 1e-15);
            assertEquals(n - w, r.lmax());
            assertEquals(n - w, r.vmax());
        }
    }
}
