package org.riffle.signal;

/**
 * Sample autocorrelation at a lag, in the form the NIST Statistical Reference Datasets certify:
 * r(k) = Σ_{i=1}^{n−k} (x_i − x̄)(x_{i+k} − x̄) / Σ_{i=1}^{n} (x_i − x̄)², with x̄ the mean of all
 * present samples. Missing ({@code NaN}) samples drop out of the denominator, and every product that
 * involves one drops out of the numerator. Pure functions; stateless and thread-safe.
 */
public final class Autocorrelation {
    private Autocorrelation() {
    }

    /**
     * r(lag) of {@code x}; {@code NaN} when fewer than two samples are present, the samples are all
     * equal, or {@code lag} is not below the length.
     */
    public static double at(double[] x, int lag) {
        if (lag < 0) {
            throw new IllegalArgumentException("lag " + lag + " is negative");
        }
        Summary s = Summary.of(x);
        if (s.count() < 2 || lag >= x.length) {
            return Double.NaN;
        }
        double mean = s.mean();
        double num = 0;
        double den = 0;
        for (int i = 0; i < x.length; i++) {
            double d = x[i] - mean;
            if (Double.isNaN(d)) {
                continue;
            }
            den += d * d;
            if (i + lag < x.length && !Double.isNaN(x[i + lag])) {
                num += d * (x[i + lag] - mean);
            }
        }
        return den > 0 ? num / den : Double.NaN;
    }

    /** r(1), the lag-1 autocorrelation. */
    public static double lag1(double[] x) {
        return at(x, 1);
    }
}
