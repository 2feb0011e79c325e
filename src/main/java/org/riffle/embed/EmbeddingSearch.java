package org.riffle.embed;

import java.util.Objects;

/**
 * How to search for an embedding.
 *
 * <p>Delay: the first local minimum of the average mutual information I(τ) (Fraser &amp; Swinney 1986,
 * Phys. Rev. A 33:1134), estimated from a joint histogram of {@code bins} × {@code bins} equal-width bins,
 * (linear binning, see the estimator's notes) for τ = 1 … {@code maxDelay}; when it has no minimum there, the first zero crossing of the
 * autocorrelation, else its first fall below 1/e, else 1.
 *
 * <p>Dimension, by {@link Method#FNN}: false nearest neighbours (Kennel, Brown &amp; Abarbanel 1992,
 * Phys. Rev. A 45:3403) with the criteria |s_{i+mτ} − s_{j+mτ}| / R_m &gt; {@code rtol} or R_{m+1} / R_A
 * &gt; {@code atol} (R_A the standard deviation of the samples); m is the smallest dimension whose false
 * fraction is ≤ {@code fnnLimit}, or, when none is, the smallest whose fraction is within
 * {@code fnnLimit} of the least fraction seen. By {@link Method#CAO}: Cao's E1(m) (Cao 1997, Physica D
 * 110:43) with the maximum norm; E1 "stops changing" once m is large enough, so m is the smallest m with
 * |E1(m + 1) − E1(m)| ≤ {@code caoChange} (Cao's m0 + 1), or, when none is, the m with the largest E1.
 * Neighbours closer in time than {@code theiler} samples are not used.
 *
 * <p>Only the first {@code maxSamples} samples of a range are used, which bounds the cost.
 *
 * <p>Immutable; checked when built.
 *
 * @param maxDelay largest delay tried (≥ 2)
 * @param maxDimension largest dimension tried (≥ 1)
 * @param bins histogram bins per axis for the mutual information (≥ 2)
 * @param method how the dimension is found
 * @param rtol Kennel's R_tol (&gt; 0)
 * @param atol Kennel's A_tol (&gt; 0)
 * @param fnnLimit false-neighbour fraction taken as "none left" (0 ≤ f &lt; 1)
 * @param caoChange the change of E1 from m to m + 1 taken as "stopped changing" (0 &lt; c ≤ 1)
 * @param theiler neighbours with |i − j| &lt; theiler are not used (≥ 1)
 * @param maxSamples samples used at most (≥ 16)
 */
public record EmbeddingSearch(int maxDelay, int maxDimension, int bins, Method method, double rtol, double atol,
                              double fnnLimit, double caoChange, int theiler, int maxSamples) {
    public EmbeddingSearch {
        Objects.requireNonNull(method, "method");
        if (maxDelay < 2 || maxDimension < 1 || bins < 2 || theiler < 1 || maxSamples < 16) {
            throw new IllegalArgumentException("embedding search: max delay " + maxDelay + " (≥ 2), max dimension "
                    + maxDimension + " (≥ 1), bins " + bins + " (≥ 2), Theiler window " + theiler
                    + " (≥ 1), samples " + maxSamples + " (≥ 16)");
        }
        if (!(rtol > 0) || !(atol > 0) || !(fnnLimit >= 0 && fnnLimit < 1) || !(caoChange > 0 && caoChange <= 1)) {
            throw new IllegalArgumentException("embedding search: R_tol " + rtol + " and A_tol " + atol
                    + " must be > 0, FNN limit " + fnnLimit + " in [0, 1), Cao change " + caoChange + " in (0, 1]");
        }
    }

    /**
     * riffle's defaults: τ ≤ 64, m ≤ 10, 16 bins, FNN with R_tol = 15 and A_tol = 2 (Kennel et al. 1992),
     * limit 1 %, Cao change 0.1, Theiler window 10 samples, at most 5000 samples.
     */
    public static EmbeddingSearch defaults() {
        return new EmbeddingSearch(64, 10, 16, Method.FNN, 15, 2, 0.01, 0.1, 10, 5000);
    }

    public EmbeddingSearch withMethod(Method m) {
        return new EmbeddingSearch(maxDelay, maxDimension, bins, m, rtol, atol, fnnLimit, caoChange, theiler,
                maxSamples);
    }

    public EmbeddingSearch withTheiler(int w) {
        return new EmbeddingSearch(maxDelay, maxDimension, bins, method, rtol, atol, fnnLimit, caoChange, w,
                maxSamples);
    }

    public EmbeddingSearch withMaxSamples(int n) {
        return new EmbeddingSearch(maxDelay, maxDimension, bins, method, rtol, atol, fnnLimit, caoChange, theiler,
                n);
    }

    /** How the embedding dimension is found. */
    public enum Method {
        /** False nearest neighbours (Kennel, Brown &amp; Abarbanel 1992). */
        FNN("false nearest neighbours"),
        /** Cao's E1 saturation (Cao 1997). */
        CAO("Cao's E1");

        private final String words;

        Method(String words) {
            this.words = words;
        }

        /** As printed. */
        public String words() {
            return words;
        }
    }
}
