package org.riffle.signal;

/**
 * Descriptive statistics of one run of samples, missing ({@code NaN}) samples skipped.
 *
 * <p>Conventions: {@code std} is the sample standard deviation (divisor n − 1); {@code rms} is the root
 * mean square of the raw values; {@code peak} is the largest absolute value; {@code crest} =
 * peak / rms; {@code skewness} and {@code kurtosis} are the population moment ratios m3/m2^1.5 and
 * m4/m2² with divisor n (kurtosis in Pearson's convention: 3 for a Gaussian, not "excess").
 * Undefined values are {@code NaN}. Computed in two passes about the mean, which keeps the NIST StRD
 * "NumAcc" sets exact to the precision they certify.
 *
 * <p>Sources: the corrected two-pass mean and moments (Chan, Golub &amp; LeVeque 1983, The American
 * Statistician 37:242); b1/b2 moment ratios (Joanes &amp; Gill 1998, The Statistician 47:183). Checked
 * against the NIST StRD univariate certified values and analytic moments (see the tests).
 *
 * <p>Immutable and thread-safe. Every value except the counts is in the samples' unit (skewness,
 * kurtosis and crest are dimensionless).
 *
 * @param count samples present
 * @param missing samples missing ({@code NaN})
 * @param min smallest sample
 * @param max largest sample
 * @param mean arithmetic mean
 * @param std sample standard deviation, divisor n − 1 ({@code NaN} for fewer than two samples)
 * @param rms root mean square of the raw samples
 * @param peak largest absolute sample
 * @param crest peak / rms ({@code NaN} when rms is 0)
 * @param skewness m3 / m2^1.5, divisor n ({@code NaN} when m2 is 0)
 * @param kurtosis m4 / m2², divisor n, Pearson's convention ({@code NaN} when m2 is 0)
 */
public record Summary(int count, int missing, double min, double max, double mean, double std,
                      double rms, double peak, double crest, double skewness, double kurtosis) {

    /** Statistics of {@code x[from, to)}. */
    public static Summary of(double[] x, int from, int to) {
        int n = 0;
        int missing = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        double sum = 0;
        for (int i = from; i < to; i++) {
            double v = x[i];
            if (Double.isNaN(v)) {
                missing++;
                continue;
            }
            n++;
            sum += v;
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        if (n == 0) {
            return new Summary(0, missing, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double mean0 = sum / n;
        double c1 = 0;
        for (int i = from; i < to; i++) {
            if (!Double.isNaN(x[i])) {
                c1 += x[i] - mean0;
            }
        }
        double mean = mean0 + c1 / n;
        double m2 = 0;
        double m3 = 0;
        double m4 = 0;
        double sq = 0;
        for (int i = from; i < to; i++) {
            double v = x[i];
            if (Double.isNaN(v)) {
                continue;
            }
            double d = v - mean;
            double d2 = d * d;
            m2 += d2;
            m3 += d2 * d;
            m4 += d2 * d2;
            sq += v * v;
        }
        double std = n > 1 ? Math.sqrt(m2 / (n - 1)) : Double.NaN;
        double rms = Math.sqrt(sq / n);
        double peak = Math.max(Math.abs(min), Math.abs(max));
        double crest = rms > 0 ? peak / rms : Double.NaN;
        double pm2 = m2 / n;
        double skew = pm2 > 0 ? (m3 / n) / Math.pow(pm2, 1.5) : Double.NaN;
        double kurt = pm2 > 0 ? (m4 / n) / (pm2 * pm2) : Double.NaN;
        return new Summary(n, missing, min, max, mean, std, rms, peak, crest, skew, kurt);
    }

    /** Statistics of all of {@code x}. */
    public static Summary of(double[] x) {
        return of(x, 0, x.length);
    }
}
