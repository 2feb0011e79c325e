package org.riffle.recurrence;

/**
 * Argument checks shared by the engine's entry points, with messages that name the clashing values.
 *
 * <p>Stateless.
 */
final class Checks {
    private Checks() {
    }

    /** The range is inside the series, not empty, and every sample in it is finite. */
    static void finiteRange(double[] series, int from, int to) {
        if (from < 0 || to > series.length || to <= from) {
            throw new IllegalArgumentException("sample range " + from + ":" + to + " is empty or outside 0:"
                    + series.length);
        }
        int bad = firstNonFinite(series, from, to);
        if (bad >= 0) {
            throw new IllegalArgumentException("sample " + bad + " is missing or not finite (" + series[bad]
                    + "); choose a range without gaps");
        }
    }

    /** Index of the first non-finite sample in [from, to), or −1. */
    static int firstNonFinite(double[] series, int from, int to) {
        for (int i = from; i < to; i++) {
            if (!Double.isFinite(series[i])) {
                return i;
            }
        }
        return -1;
    }

    /** The embedding leaves at least one eligible pair in a run of {@code samples} samples. */
    static void fits(RqaParams p, int samples, String what) {
        int vectors = p.embedding().vectors(samples);
        if (vectors <= p.theiler()) {
            throw new IllegalArgumentException("delay " + p.delay() + " × (dimension " + p.dimension()
                    + " − 1) with Theiler window " + p.theiler() + " leaves no pair of vectors in " + what + " of "
                    + samples + " samples");
        }
    }

    /** Population standard deviation (divisor n) of the finite samples in [from, to), two passes. */
    static double populationStd(double[] x, int from, int to) {
        double sum = 0;
        int n = 0;
        for (int i = from; i < to; i++) {
            if (Double.isFinite(x[i])) {
                sum += x[i];
                n++;
            }
        }
        if (n == 0) {
            return Double.NaN;
        }
        double mean = sum / n;
        double ss = 0;
        for (int i = from; i < to; i++) {
            if (Double.isFinite(x[i])) {
                double d = x[i] - mean;
                ss += d * d;
            }
        }
        return Math.sqrt(ss / n);
    }
}
