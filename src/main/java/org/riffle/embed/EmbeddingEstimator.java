package org.riffle.embed;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Estimates a delay embedding from a run of samples: the delay from the average mutual information's
 * first minimum (autocorrelation as fallback), the dimension from false nearest neighbours or Cao's
 * method, as {@link EmbeddingSearch} describes. The delay is found first and used for the dimension.
 *
 * <p>Stateless and thread-safe.
 */
public final class EmbeddingEstimator {
    private EmbeddingEstimator() {
    }

    /**
     * Estimates whatever is not given, from the first {@code search.maxSamples()} samples of
     * {@code x[from, to)}.
     *
     * @param dimension the dimension if given (≥ 1), or 0 to estimate it
     * @param delay the delay if given (≥ 1), or 0 to estimate it
     * @throws IllegalArgumentException when the range is out of bounds, shorter than 16 samples, or holds
     *         a non-finite sample
     */
    public static EmbeddingEstimate estimate(double[] x, int from, int to, EmbeddingSearch search, int dimension,
                                             int delay) {
        if (from < 0 || to > x.length || to - from < 16) {
            throw new IllegalArgumentException("sample range " + from + ":" + to + " of 0:" + x.length
                    + " is out of bounds or shorter than 16 samples");
        }
        int end = (int) Math.min(to, (long) from + search.maxSamples());
        double[] s = Arrays.copyOfRange(x, from, end);
        for (int i = 0; i < s.length; i++) {
            if (!Double.isFinite(s[i])) {
                throw new IllegalArgumentException("sample " + (from + i) + " is missing or not finite");
            }
        }
        List<Double> ami = List.of();
        int tau = delay;
        String delayMethod = "given";
        if (delay == 0) {
            int maxLag = Math.min(search.maxDelay(), s.length / 4);
            double[] curve = MutualInformation.curve(s, 0, s.length, maxLag, search.bins());
            ami = boxed(curve);
            tau = MutualInformation.firstMinimum(curve);
            delayMethod = "AMI first minimum";
            if (tau < 0) {
                double[] r = MutualInformation.autocorrelation(s, 0, s.length, maxLag);
                tau = firstBelow(r, 0);
                delayMethod = "autocorrelation first zero";
                if (tau < 0) {
                    tau = firstBelow(r, Math.exp(-1));
                    delayMethod = "autocorrelation 1/e";
                }
                if (tau < 0) {
                    tau = 1;
                    delayMethod = "default, no AMI minimum or autocorrelation fall";
                }
            }
        }
        if (dimension != 0) {
            return new EmbeddingEstimate(new Embedding(dimension, tau), delayMethod, "given", from, end, ami,
                    List.of(), search);
        }
        return withDimension(s, tau, delayMethod, ami, from, end, search);
    }

    private static EmbeddingEstimate withDimension(double[] s, int tau, String delayMethod, List<Double> ami,
                                                   int from, int end, EmbeddingSearch search) {
        double[] curve;
        int m;
        if (search.method() == EmbeddingSearch.Method.FNN) {
            curve = FalseNeighbours.fnn(s, tau, search.maxDimension(), search.rtol(), search.atol(),
                    search.theiler(), search.fnnLimit());
            m = chooseFnn(curve, search.fnnLimit());
        } else {
            curve = FalseNeighbours.caoE1(s, tau, search.maxDimension(), search.theiler());
            m = chooseCao(curve, search.caoChange());
        }
        return new EmbeddingEstimate(new Embedding(m, tau), delayMethod, search.method().words(), from, end, ami,
                boxed(curve), search);
    }

    /** Smallest m with fraction ≤ limit; else smallest within limit of the least; 1 when no curve. */
    static int chooseFnn(double[] f, double limit) {
        double least = Double.POSITIVE_INFINITY;
        for (int k = 0; k < f.length; k++) {
            if (f[k] <= limit) {
                return k + 1;
            }
            least = Math.min(least, f[k]);
        }
        for (int k = 0; k < f.length; k++) {
            if (f[k] <= least + limit) {
                return k + 1;
            }
        }
        return 1;
    }

    /** Smallest m with |E1(m + 1) − E1(m)| ≤ change; else the m with the largest E1; 1 when no curve. */
    static int chooseCao(double[] e1, double change) {
        int best = -1;
        for (int k = 0; k < e1.length; k++) {
            if (k + 1 < e1.length && Math.abs(e1[k + 1] - e1[k]) <= change) {
                return k + 1;
            }
            if (best < 0 || e1[k] > e1[best]) {
                best = k;
            }
        }
        return best < 0 ? 1 : best + 1;
    }

    private static int firstBelow(double[] r, double level) {
        for (int tau = 1; tau < r.length; tau++) {
            if (r[tau] <= level) {
                return tau;
            }
        }
        return -1;
    }

    private static List<Double> boxed(double[] a) {
        List<Double> out = new ArrayList<>(a.length);
        for (double v : a) {
            out.add(v);
        }
        return out;
    }
}
