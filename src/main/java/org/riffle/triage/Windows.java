package org.riffle.triage;

/**
 * The trend windows over {@code n} samples: window k covers [offset + k·step, offset + k·step + length),
 * for every k whose window fits entirely. Immutable.
 */
final class Windows {
    private final int offset;
    private final int length;
    private final int step;
    private final int count;

    Windows(int n, int length, int step) {
        this(n, length, step, 0);
    }

    Windows(int n, int length, int step, int offset) {
        this.offset = offset;
        this.length = length;
        this.step = step;
        this.count = n < offset + length ? 0 : (n - offset - length) / step + 1;
    }

    int count() {
        return count;
    }

    int start(int k) {
        return offset + k * step;
    }

    int end(int k) {
        return offset + k * step + length;
    }

    int length() {
        return length;
    }

    int step() {
        return step;
    }

    /** Mean of {@code x[from + start, from + end)} per window, NaN where more than half is missing. */
    double[] means(double[] x, int from) {
        double[] out = new double[count];
        for (int k = 0; k < count; k++) {
            double s = 0;
            int n = 0;
            for (int i = from + start(k); i < from + end(k); i++) {
                if (!Double.isNaN(x[i])) {
                    s += x[i];
                    n++;
                }
            }
            out[k] = 2 * n > length ? s / n : Double.NaN;
        }
        return out;
    }

    /** Sample standard deviation per window (two-pass), NaN where more than half is missing. */
    double[] stds(double[] x, int from, double[] means) {
        double[] out = new double[count];
        for (int k = 0; k < count; k++) {
            if (Double.isNaN(means[k])) {
                out[k] = Double.NaN;
                continue;
            }
            double s = 0;
            int n = 0;
            for (int i = from + start(k); i < from + end(k); i++) {
                if (!Double.isNaN(x[i])) {
                    double d = x[i] - means[k];
                    s += d * d;
                    n++;
                }
            }
            out[k] = n > 1 ? Math.sqrt(s / (n - 1)) : Double.NaN;
        }
        return out;
    }

    /** Kurtosis m4/m2² (Pearson: 3 for a Gaussian) per window, NaN where the mean is or the spread is 0. */
    double[] kurtoses(double[] x, int from, double[] means) {
        double[] out = new double[count];
        for (int k = 0; k < count; k++) {
            if (Double.isNaN(means[k])) {
                out[k] = Double.NaN;
                continue;
            }
            double m2 = 0;
            double m4 = 0;
            for (int i = from + start(k); i < from + end(k); i++) {
                if (!Double.isNaN(x[i])) {
                    double d = x[i] - means[k];
                    double d2 = d * d;
                    m2 += d2;
                    m4 += d2 * d2;
                }
            }
            out[k] = m2 > 0 ? m4 * countPresent(x, from + start(k), from + end(k)) / (m2 * m2) : Double.NaN;
        }
        return out;
    }

    private static int countPresent(double[] x, int a, int b) {
        int n = 0;
        for (int i = a; i < b; i++) {
            n += Double.isNaN(x[i]) ? 0 : 1;
        }
        return n;
    }

    /**
     * Novelty per window from one-step errors at the analysis rate: error k is the error of predicting
     * analysis sample k + 1, which stands for input sample (k + 1)·d. The window's novelty is
     * √(mean of its squared errors / {@code referenceMse}); NaN where fewer than half its errors exist.
     */
    double[] novelty(double[] err, int d, int from, double referenceMse) {
        double[] out = new double[count];
        for (int w = 0; w < count; w++) {
            int k0 = ceilDiv(from + start(w), d) - 1;
            int k1 = ceilDiv(from + end(w), d) - 1;
            double s = 0;
            int n = 0;
            for (int k = Math.max(0, k0); k < Math.min(k1, err.length); k++) {
                if (!Double.isNaN(err[k])) {
                    s += err[k] * err[k];
                    n++;
                }
            }
            out[w] = n >= 3 && 2 * n >= k1 - k0 ? Math.sqrt(s / n / referenceMse) : Double.NaN;
        }
        return out;
    }

    private static int ceilDiv(int a, int b) {
        return -Math.floorDiv(-a, b);
    }
}
