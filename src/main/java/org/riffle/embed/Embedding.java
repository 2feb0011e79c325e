package org.riffle.embed;

/**
 * A forward delay embedding: the vector {@code x_i = (s_i, s_{i+τ}, …, s_{i+(m−1)τ})} for
 * {@code i = 0 … n−(m−1)τ−1} of a run of {@code n} samples {@code s} (Takens' delay coordinates; the
 * form used by Marwan, Romano, Thiel &amp; Kurths 2007, Physics Reports 438:237, eq. 3).
 *
 * <p>Immutable.
 *
 * @param dimension embedding dimension m, at least 1
 * @param delay delay τ in samples, at least 1
 */
public record Embedding(int dimension, int delay) {
    public Embedding {
        if (dimension < 1) {
            throw new IllegalArgumentException("embedding dimension " + dimension + " must be at least 1");
        }
        if (delay < 1) {
            throw new IllegalArgumentException("embedding delay " + delay + " must be at least 1");
        }
        if ((long) (dimension - 1) * delay > Integer.MAX_VALUE / 2) {
            throw new IllegalArgumentException("delay " + delay + " × dimension " + dimension + " is too large");
        }
    }

    /** The span of one vector in samples, minus one: {@code (m − 1)·τ}. */
    public int span() {
        return (dimension - 1) * delay;
    }

    /** Number of delay vectors in a run of {@code samples} samples (0 when the run is too short). */
    public int vectors(int samples) {
        return Math.max(0, samples - span());
    }

    @Override
    public String toString() {
        return "m = " + dimension + ", τ = " + delay;
    }
}
