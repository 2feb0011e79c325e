package org.riffle.triage;

import java.util.Arrays;
import org.apache.commons.math3.distribution.TDistribution;
import org.riffle.triage.BaselineModel.MeasureModel;

/**
 * The combination rule: every measure is compared with its own baseline distribution, the window's
 * score is its largest departure, and one alert level calibrated on the baseline windows turns scores
 * into the three levels. The rule, as documented in the README and the manual page:
 * <ol>
 * <li>departure z_m = (v_m − median_m) / spread_m, where the median and the spread come from the
 *     baseline windows; spread = the larger of 1.4826 × median absolute deviation and the sample
 *     standard deviation (whichever is more cautious), floored; for {@code novelty} v is its logarithm;</li>
 * <li>window score S = max_m |z_m| over the measures present;</li>
 * <li>alert level T = max(the calibration quantile q of S over the baseline windows,
 *     t_ν⁻¹(1 − (1 − q)/(2k)) · √(1 + 1/n)) with k measures, n the baseline's independent windows
 *     (windows × step / length) and ν = n − 1: the second term is the Student-t prediction bound
 *     (Hahn &amp; Meeker 1991, Statistical Intervals, section 4.4) that k Gaussian measures estimated
 *     from n windows would exceed together in a fraction 1 − q of new windows (Bonferroni), a floor that
 *     keeps short baselines from calibrating too tight an alert level;</li>
 * <li>a window is steady when S ≤ T, departed when S &gt; T in it and in the {@code sustained − 1}
 *     windows before it, and watch otherwise.</li>
 * </ol>
 *
 * <p>Stateless.
 */
final class Judge {
    /** Robust-spread factor: 1.4826 × MAD estimates a Gaussian σ (Rousseeuw &amp; Croux 1993, JASA 88:1273). */
    static final double MAD_TO_SIGMA = 1.4826;

    private Judge() {
    }

    /** The value of measure {@code name} on the scale its departure is measured on. */
    static double scale(String name, double v) {
        return "novelty".equals(name) ? Math.log(v) : v;
    }

    /** A measure's baseline model from its baseline windows' values, with spread at least {@code floor}. */
    static MeasureModel model(String name, double[] values, double floor) {
        double[] s = Arrays.stream(values).map(v -> scale(name, v)).filter(v -> !Double.isNaN(v)
                && !Double.isInfinite(v)).sorted().toArray();
        if (s.length == 0) {
            return new MeasureModel(name, Double.NaN, Double.NaN, values);
        }
        double median = quantileSorted(s, 0.5);
        double[] dev = Arrays.stream(s).map(v -> Math.abs(v - median)).sorted().toArray();
        double mean = Arrays.stream(s).average().orElse(median);
        double var = s.length < 2 ? 0 : Arrays.stream(s).map(v -> (v - mean) * (v - mean)).sum() / (s.length - 1);
        double spread = Math.max(Math.max(MAD_TO_SIGMA * quantileSorted(dev, 0.5), Math.sqrt(var)), floor);
        return new MeasureModel(name, median, spread, values);
    }

    /** Signed departure of value {@code v} of the measure of {@code m}. */
    static double departure(MeasureModel m, double v) {
        double x = scale(m.name(), v);
        if (Double.isNaN(x) || Double.isNaN(m.center())) {
            return Double.NaN;
        }
        if (Double.isInfinite(x)) {
            return x;
        }
        return (x - m.center()) / m.spread();
    }

    /** Window scores: max |departure| over measures; values[m][w]; NaN where no measure is present. */
    static double[] scores(MeasureModel[] models, double[][] values) {
        int n = values.length == 0 ? 0 : values[0].length;
        double[] out = new double[n];
        for (int w = 0; w < n; w++) {
            double s = Double.NaN;
            for (int m = 0; m < models.length; m++) {
                double z = Math.abs(departure(models[m], values[m][w]));
                if (!Double.isNaN(z)) {
                    s = Double.isNaN(s) ? z : Math.max(s, z);
                }
            }
            out[w] = s;
        }
        return out;
    }

    /**
     * The prediction-bound floor of the alert level for {@code k} measures at quantile {@code q}, with
     * spreads estimated from {@code n} independent baseline windows (n ≥ 2).
     */
    static double predictionFloor(double q, int k, double n) {
        double nu = Math.max(1, n - 1);
        double t = new TDistribution(null, nu, 1e-12).inverseCumulativeProbability(1 - (1 - q) / (2 * k));
        return t * Math.sqrt(1 + 1 / n);
    }

    /** The alert level from the baseline windows' scores; {@code independent} windows, {@code k} measures. */
    static double alertLevel(double[] baselineScores, double q, int k, double independent) {
        double[] s = Arrays.stream(baselineScores).filter(v -> !Double.isNaN(v)).sorted().toArray();
        double floor = predictionFloor(q, Math.max(1, k), Math.max(2, independent));
        return s.length == 0 ? floor : Math.max(floor, quantileSorted(s, q));
    }

    /** Window levels from scores: see the class comment. */
    static Level[] levels(double[] scores, double alert, int sustained) {
        Level[] out = new Level[scores.length];
        int run = 0;
        for (int w = 0; w < scores.length; w++) {
            boolean above = scores[w] > alert;
            run = above ? run + 1 : 0;
            out[w] = !above ? Level.STEADY : run >= sustained ? Level.DEPARTED : Level.WATCH;
        }
        return out;
    }

    /** Linear-interpolation quantile (Hyndman &amp; Fan 1996 type 7) of sorted {@code s}. */
    static double quantileSorted(double[] s, double q) {
        if (s.length == 1) {
            return s[0];
        }
        double h = (s.length - 1) * q;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, s.length - 1);
        return s[lo] + (h - lo) * (s[hi] - s[lo]);
    }

    /** Median of the non-NaN values, NaN when none. */
    static double median(double[] v) {
        double[] s = Arrays.stream(v).filter(x -> !Double.isNaN(x)).sorted().toArray();
        return s.length == 0 ? Double.NaN : quantileSorted(s, 0.5);
    }
}
