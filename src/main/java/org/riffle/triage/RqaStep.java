package org.riffle.triage;

import java.util.Optional;

/**
 * The recurrence part of a channel's judgement: the embedding and threshold fixed from the baseline, and
 * per window RR, DET, L, Lmax, ENTR, LAM and TT. Waits for the recurrence engine; until it is wired in,
 * nothing is computed and the reason says so. Stateless.
 */
final class RqaStep {
    /** Row order of {@link #trend}: rr, det, l, lmax, entr, lam, tt. */
    static final int MEASURES = 7;

    private RqaStep() {
    }

    /** The baseline's embedding and threshold, with the baseline windows' measures. */
    record Learned(int dimension, int delay, double radius, double[][] baselineValues) {
    }

    /** Learns from baseline {@code base} in windows {@code w}; empty with {@link #reason()} when unavailable. */
    static Optional<Learned> learn(double[] base, Windows w) {
        return Optional.empty();
    }

    /** Why there is no recurrence analysis. */
    static String reason() {
        return "recurrence measures: not wired in yet";
    }

    /** Measures per window of {@code x}: [measure][window]. */
    static double[][] trend(double[] x, Windows w, int dimension, int delay, double radius) {
        double[][] out = new double[MEASURES][w.count()];
        for (double[] row : out) {
            java.util.Arrays.fill(row, Double.NaN);
        }
        return out;
    }
}
