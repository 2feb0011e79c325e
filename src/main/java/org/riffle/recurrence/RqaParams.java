package org.riffle.recurrence;

import java.util.Locale;
import java.util.Objects;
import org.riffle.embed.Embedding;

/**
 * What a recurrence quantification is asked to compute: the embedding (dimension m, delay τ; either may
 * be {@link #AUTO} to estimate it from the data), the norm, the threshold policy, the minimum diagonal
 * and vertical line lengths l_min and v_min, and the Theiler window w.
 *
 * <p>Conventions (Marwan, Romano, Thiel &amp; Kurths 2007, Physics Reports 438:237): a pair of delay
 * vectors recurs when their distance is ≤ ε (inclusive); cells with |i − j| &lt; w are excluded from every
 * count and from the RR denominator; w = 1 excludes only the main diagonal.
 *
 * <p>Immutable; checked when built.
 *
 * @param dimension embedding dimension m (≥ 1), or {@link #AUTO}
 * @param delay embedding delay τ in samples (≥ 1), or {@link #AUTO}
 * @param norm distance between delay vectors
 * @param threshold how ε is chosen
 * @param minLine l_min, shortest diagonal line counted (≥ 1)
 * @param minVert v_min, shortest vertical line counted (≥ 1)
 * @param theiler Theiler window w in samples (≥ 1)
 */
public record RqaParams(int dimension, int delay, Norm norm, Threshold threshold, int minLine, int minVert,
                        int theiler) {
    /** Marks an embedding dimension or delay that is to be estimated from the data. */
    public static final int AUTO = 0;

    public RqaParams {
        Objects.requireNonNull(norm, "norm");
        Objects.requireNonNull(threshold, "threshold");
        if (dimension < 0 || delay < 0) {
            throw new IllegalArgumentException("embedding dimension " + dimension + " and delay " + delay
                    + " must be at least 1 (or automatic)");
        }
        if (dimension > 0 && delay > 0) {
            new Embedding(dimension, delay);
        }
        if (minLine < 1 || minVert < 1) {
            throw new IllegalArgumentException("minimum line lengths l_min " + minLine + " and v_min " + minVert
                    + " must be at least 1");
        }
        if (theiler < 1) {
            throw new IllegalArgumentException("Theiler window " + theiler
                    + " must be at least 1 (1 excludes only the main diagonal)");
        }
    }

    /** riffle's defaults: m and τ estimated, Euclidean norm, target RR 5 %, l_min = v_min = 2, w = 1. */
    public static RqaParams defaults() {
        return new RqaParams(AUTO, AUTO, Norm.EUCLIDEAN, Threshold.rate(0.05), 2, 2, 1);
    }

    /** True when both m and τ are given. */
    public boolean embeddingGiven() {
        return dimension != AUTO && delay != AUTO;
    }

    /**
     * The embedding.
     *
     * @throws IllegalStateException when m or τ is still {@link #AUTO}
     */
    public Embedding embedding() {
        if (!embeddingGiven()) {
            throw new IllegalStateException("embedding not resolved: m = " + dimension + ", τ = " + delay);
        }
        return new Embedding(dimension, delay);
    }

    public RqaParams withEmbedding(Embedding e) {
        return new RqaParams(e.dimension(), e.delay(), norm, threshold, minLine, minVert, theiler);
    }

    public RqaParams withEmbedding(int m, int tau) {
        return new RqaParams(m, tau, norm, threshold, minLine, minVert, theiler);
    }

    public RqaParams withNorm(Norm n) {
        return new RqaParams(dimension, delay, n, threshold, minLine, minVert, theiler);
    }

    public RqaParams withThreshold(Threshold t) {
        return new RqaParams(dimension, delay, norm, t, minLine, minVert, theiler);
    }

    public RqaParams withMinLines(int lmin, int vmin) {
        return new RqaParams(dimension, delay, norm, threshold, lmin, vmin, theiler);
    }

    public RqaParams withTheiler(int w) {
        return new RqaParams(dimension, delay, norm, threshold, minLine, minVert, w);
    }

    /** One line fit to print, e.g. {@code m = 3, τ = 2, euclidean norm, target RR 0.05, l_min = 2, v_min = 2, w = 1}. */
    public String describe() {
        return "m = " + (dimension == AUTO ? "auto" : dimension) + ", τ = " + (delay == AUTO ? "auto" : delay)
                + ", " + norm.word() + " norm, " + threshold.describe() + ", l_min = " + minLine + ", v_min = "
                + minVert + ", w = " + theiler;
    }

    /** The distance between two delay vectors. */
    public enum Norm {
        /** Euclidean (L2) distance. */
        EUCLIDEAN("euclidean"),
        /** Maximum (L∞, Chebyshev) distance. */
        MAX("max");

        private final String word;

        Norm(String word) {
            this.word = word;
        }

        /** The word used on the command line and in output. */
        public String word() {
            return word;
        }
    }

    /**
     * A threshold policy and its value.
     *
     * @param policy how ε is chosen
     * @param value the radius (in the channel's unit), the fraction of the standard deviation, or the
     *        target recurrence rate (0 &lt; q ≤ 1)
     */
    public record Threshold(Policy policy, double value) {
        public Threshold {
            Objects.requireNonNull(policy, "policy");
            boolean ok = switch (policy) {
                case RADIUS, STD_FRACTION -> value >= 0 && Double.isFinite(value);
                case RATE -> value > 0 && value <= 1;
            };
            if (!ok) {
                throw new IllegalArgumentException(policy.word() + " " + value + " is out of range ("
                        + (policy == Policy.RATE ? "0 < q ≤ 1" : "finite and ≥ 0") + ")");
            }
        }

        /** A fixed radius ε in the channel's unit. */
        public static Threshold radius(double epsilon) {
            return new Threshold(Policy.RADIUS, epsilon);
        }

        /** ε = fraction × the population standard deviation of the raw samples. */
        public static Threshold stdFraction(double fraction) {
            return new Threshold(Policy.STD_FRACTION, fraction);
        }

        /** ε = the k-th smallest eligible distance, k = ceil(q · eligible cells). */
        public static Threshold rate(double q) {
            return new Threshold(Policy.RATE, q);
        }

        /** E.g. {@code radius 0.2}, {@code 0.1 × std}, {@code target RR 0.05}. */
        public String describe() {
            return switch (policy) {
                case RADIUS -> "radius " + fmt(value);
                case STD_FRACTION -> fmt(value) + " × std";
                case RATE -> "target RR " + fmt(value);
            };
        }

        private static String fmt(double v) {
            return String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+($|e)", "$1$2")
                    .replace(".e", "e").replaceAll("\\.$", "");
        }

        /** The threshold policies. */
        public enum Policy {
            /** A fixed radius. */
            RADIUS("radius"),
            /** A fraction of the population standard deviation of the raw series. */
            STD_FRACTION("std-fraction"),
            /** A target recurrence rate. */
            RATE("rate");

            private final String word;

            Policy(String word) {
                this.word = word;
            }

            /** The word used on the command line and in CSV output. */
            public String word() {
                return word;
            }
        }
    }
}
