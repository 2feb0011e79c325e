package org.riffle.embed;

/**
 * Average mutual information between s_t and s_{t+τ} (Fraser &amp; Swinney 1986, Phys. Rev. A 33:1134),
 * estimated from a joint histogram of equally spaced bins over the samples' range, linearly binned:
 * I(τ) = Σ p_ij ln(p_ij / (p_i p_j)) in nats, the marginals taken from the same pairs; and the
 * autocorrelation used as the fallback for the delay.
 *
 * <p>Stateless.
 */
final class MutualInformation {
    private MutualInformation() {
    }

    /** I(τ) for τ = 0 … maxLag over {@code x[from, to)} (finite samples). */
    static double[] curve(double[] x, int from, int to, int maxLag, int bins) {
        int n = to - from;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = from; i < to; i++) {
            min = Math.min(min, x[i]);
            max = Math.max(max, x[i]);
        }
        int[] low = new int[n];
        double[] frac = new double[n];
        double scale = max > min ? (bins - 1) / (max - min) : 0;
        for (int i = 0; i < n; i++) {
            double u = (x[from + i] - min) * scale;
            int k = Math.min(bins - 2, (int) u);
            low[i] = k;
            frac[i] = u - k;
        }
        double[] out = new double[maxLag + 1];
        for (int tau = 0; tau <= maxLag; tau++) {
            out[tau] = atLag(low, frac, n - tau, tau, bins);
        }
        return out;
    }

    /**
     * I at one lag from a joint histogram with linear ("cloud-in-cell") binning: each sample's unit
     * weight is shared between the two nearest of the equally spaced bin centres in proportion to its
     * nearness, and each pair's weight among the four nearest cells. This removes the grid-alignment
     * noise that plain binning shows on smooth signals.
     */
    private static double atLag(int[] low, double[] frac, int pairs, int tau, int bins) {
        double[] joint = new double[bins * bins];
        double[] pa = new double[bins];
        double[] pb = new double[bins];
        for (int t = 0; t < pairs; t++) {
            int a = low[t];
            int b = low[t + tau];
            double fa = frac[t];
            double fb = frac[t + tau];
            joint[a * bins + b] += (1 - fa) * (1 - fb);
            joint[(a + 1) * bins + b] += fa * (1 - fb);
            joint[a * bins + b + 1] += (1 - fa) * fb;
            joint[(a + 1) * bins + b + 1] += fa * fb;
            pa[a] += 1 - fa;
            pa[a + 1] += fa;
            pb[b] += 1 - fb;
            pb[b + 1] += fb;
        }
        double sum = 0;
        for (int a = 0; a < bins; a++) {
            for (int b = 0; b < bins; b++) {
                double c = joint[a * bins + b];
                if (c > 0) {
                    sum += c / pairs * Math.log(c * pairs / (pa[a] * pb[b]));
                }
            }
        }
        return sum;
    }

    /** The first τ ≥ 1 with I(τ) &lt; I(τ − 1) and I(τ) ≤ I(τ + 1), or −1 when there is none. */
    static int firstMinimum(double[] ami) {
        for (int tau = 1; tau + 1 < ami.length; tau++) {
            if (ami[tau] < ami[tau - 1] && ami[tau] <= ami[tau + 1]) {
                return tau;
            }
        }
        return -1;
    }

    /** The sample autocorrelation r(τ) for τ = 0 … maxLag (divisor n, the usual biased estimate). */
    static double[] autocorrelation(double[] x, int from, int to, int maxLag) {
        int n = to - from;
        double mean = 0;
        for (int i = from; i < to; i++) {
            mean += x[i];
        }
        mean /= n;
        double c0 = 0;
        for (int i = from; i < to; i++) {
            c0 += (x[i] - mean) * (x[i] - mean);
        }
        double[] r = new double[maxLag + 1];
        for (int tau = 0; tau <= maxLag; tau++) {
            double c = 0;
            for (int i = from; i + tau < to; i++) {
                c += (x[i] - mean) * (x[i + tau] - mean);
            }
            r[tau] = c / c0;
        }
        return r;
    }
}
