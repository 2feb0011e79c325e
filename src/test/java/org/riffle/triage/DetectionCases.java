package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The calibration and change cases of issue 4, run through riffle and through a plain rolling mean/std
 * detector on the same windows, and the comparison table the README shows. Every series is our own,
 * seeded; n = 8192 samples, the baseline is the first 25 %, changes start at sample 4096.
 */
final class DetectionCases {
    static final int N = 8192;
    static final int CHANGE = 4096;
    /** Standard deviation of the AR(1) series with φ = 0.9 and unit innovations: 1/√(1 − 0.81). */
    static final double AR_STD = 1 / Math.sqrt(1 - 0.81);

    private DetectionCases() {
    }

    /** One case: its name, its series, the sample from which a detector should flag, and whether it changes. */
    record Case(String name, double[] x, int onset, boolean changes) {
    }

    /** One detector's outcome on one case. */
    record Outcome(int firstFlag, double flaggedAfter, double flaggedBefore) {
    }

    static List<Case> stationary() {
        List<Case> c = new ArrayList<>();
        for (long seed = 1; seed <= 2; seed++) {
            c.add(new Case("chaotic map + noise (seed " + seed + ")", Scenarios.logistic(2 * N, 3.8, 0.02, seed),
                    2 * N, false));
            c.add(new Case("coloured noise AR(1) (seed " + seed + ")", Scenarios.ar1(2 * N, 0.9, 1, seed), 2 * N,
                    false));
            c.add(new Case("sine + noise (seed " + seed + ")", Scenarios.sineNoise(2 * N, 50, 0.3, seed), 2 * N,
                    false));
        }
        return c;
    }

    static List<Case> changes() {
        List<Case> c = new ArrayList<>();
        c.add(new Case("chaotic becomes periodic (logistic r 3.8 to 3.5)",
                concat(Scenarios.logistic(CHANGE, 3.8, 0.02, 1), Scenarios.logistic(N - CHANGE, 3.5, 0.02, 2)),
                CHANGE, true));
        c.add(new Case("noise-level step (AR(1) deviations x 1.5)",
                Scenarios.withGain(Scenarios.ar1(N, 0.9, 1, 3), CHANGE, 0, 1.5), CHANGE, true));
        c.add(new Case("level step (AR(1) + 2.5 std)",
                Scenarios.withStep(Scenarios.ar1(N, 0.9, 1, 4), CHANGE, 2.5 * AR_STD), CHANGE, true));
        // the drift reaches 2 std half way to the end: detection is expected from there
        c.add(new Case("slow drift (AR(1) + ramp to 4 std; onset taken at 2 std)",
                Scenarios.withDrift(Scenarios.ar1(N, 0.9, 1, 5), CHANGE, 4 * AR_STD), CHANGE + (N - CHANGE) / 2,
                true));
        c.add(new Case("impulsive bursts on a vibration signal",
                Scenarios.withBursts(Scenarios.vibration(N, 6), CHANGE, 25, 4.0, 7), CHANGE, true));
        c.add(new Case("Henon map replaced by its phase-randomised surrogate",
                Scenarios.withSurrogate(Scenarios.henon(N), CHANGE, 8), CHANGE, true));
        c.add(new Case("map parameter moves, mean and variance held (logistic r 3.8 to 3.9)",
                Scenarios.logisticParameterMove(N, CHANGE, 3.8, 3.9, 9), CHANGE, true));
        return c;
    }

    static double[] concat(double[] a, double[] b) {
        double[] o = new double[a.length + b.length];
        System.arraycopy(a, 0, o, 0, a.length);
        System.arraycopy(b, 0, o, a.length, b.length);
        return o;
    }

    /** riffle's window flags for {@code c}: the channel's trend rows. */
    static List<WindowRow> riffle(Case c) {
        Assessment a = new Analyzer(TriageParams.defaults().withThreads(1)).assess(
                Scenarios.recording("x", c.x()), TriageListener.NONE);
        return a.channels().get(0).trend();
    }

    /**
     * The plain detector: the same windows' mean and standard deviation, each compared with the mean and
     * standard deviation of its values over the baseline windows; a window is flagged when either lies
     * more than 3 standard deviations away (a Shewhart chart with 3-sigma limits, common practice).
     */
    static boolean[] meanStd(List<WindowRow> rows, int baselineEnd) {
        double[][] v = new double[2][rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            v[0][k] = rows.get(k).mean();
            v[1][k] = rows.get(k).std();
        }
        boolean[] flag = new boolean[rows.size()];
        for (double[] series : v) {
            double s = 0;
            double ss = 0;
            int n = 0;
            for (int k = 0; k < rows.size(); k++) {
                if (rows.get(k).endIndex() <= baselineEnd) {
                    s += series[k];
                    ss += series[k] * series[k];
                    n++;
                }
            }
            double mean = s / n;
            double sd = Math.sqrt((ss - n * mean * mean) / (n - 1));
            for (int k = 0; k < rows.size(); k++) {
                flag[k] |= Math.abs(series[k] - mean) > 3 * sd;
            }
        }
        return flag;
    }

    static boolean[] flags(List<WindowRow> rows) {
        boolean[] f = new boolean[rows.size()];
        for (int k = 0; k < f.length; k++) {
            f[k] = rows.get(k).flag() == 1;
        }
        return f;
    }

    /** First flagged window at or after the onset (counted from the first window starting there), shares. */
    static Outcome outcome(List<WindowRow> rows, boolean[] flag, int baselineEnd, int onset) {
        int first = -1;
        int idx = 0;
        int after = 0;
        int flaggedAfter = 0;
        int before = 0;
        int flaggedBefore = 0;
        for (int k = 0; k < rows.size(); k++) {
            WindowRow r = rows.get(k);
            if (r.startIndex() >= onset) {
                if (first < 0 && flag[k]) {
                    first = idx;
                }
                idx++;
                if (first >= 0) {
                    after++;
                    flaggedAfter += flag[k] ? 1 : 0;
                }
            } else if (r.startIndex() >= baselineEnd && r.endIndex() <= Math.min(onset, CHANGE)) {
                before++;
                flaggedBefore += flag[k] ? 1 : 0;
            }
        }
        return new Outcome(first, after == 0 ? 0 : (double) flaggedAfter / after,
                before == 0 ? Double.NaN : (double) flaggedBefore / before);
    }

    static String pct(double share) {
        return Double.isNaN(share) ? "-" : String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }

    static String first(int w) {
        return w < 0 ? "never" : Integer.toString(w);
    }
}
