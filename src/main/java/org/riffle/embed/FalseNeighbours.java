package org.riffle.embed;

/**
 * The dimension curves: the false-nearest-neighbour fraction (Kennel, Brown &amp; Abarbanel 1992,
 * Phys. Rev. A 45:3403, criteria 1 and 2, Euclidean norm) and Cao's E1(m) (Cao 1997, Physica D 110:43,
 * eqs. 1–3, maximum norm). Vector i in dimension m is tested only when its coordinate m (0-based) exists,
 * so both curves compare the same vectors in m and m + 1 dimensions.
 *
 * <p>Stateless.
 */
final class FalseNeighbours {
    private FalseNeighbours() {
    }

    /**
     * The false fraction for m = 1 … maxDim ({@code NaN} where no vector had a usable neighbour); the
     * curve stops early when too few vectors remain, after the first m whose fraction is at most
     * {@code stopAt} (higher dimensions cannot change that choice), and once the fraction has stayed more
     * than {@code stopAt} above its lowest value for two dimensions in a row: the curve of noisy data
     * rises again past its minimum (Kennel's second criterion flags neighbours that are far apart in
     * absolute terms), and the higher dimensions are the costliest to search. That last stop is riffle's
     * own shortcut, not part of the published method. {@code stopAt} NaN computes the whole curve.
     */
    static double[] fnn(double[] s, int tau, int maxDim, double rtol, double atol, int theiler, double stopAt) {
        double ra = std(s);
        double[] out = new double[maxDim];
        int used = 0;
        double least = Double.POSITIVE_INFINITY;
        int risen = 0;
        for (int m = 1; m <= maxDim; m++) {
            int count = s.length - m * tau;
            if (count < 2 * theiler + 8) {
                break;
            }
            Neighbours nb = new Neighbours(s, count, m, tau, false, theiler);
            long tested = 0;
            long fals = 0;
            for (int i = 0; i < count; i++) {
                int j = nb.nearest(i);
                if (j < 0) {
                    continue;
                }
                double rm2 = nb.distance(i, j, Double.POSITIVE_INFINITY);
                double extra = Math.abs(s[i + m * tau] - s[j + m * tau]);
                boolean f = extra > rtol * Math.sqrt(rm2) || Math.sqrt(rm2 + extra * extra) > atol * ra;
                tested++;
                fals += f ? 1 : 0;
            }
            out[m - 1] = tested > 0 ? (double) fals / tested : Double.NaN;
            used = m;
            if (out[m - 1] <= stopAt) {
                break;
            }
            least = Math.min(least, out[m - 1]);
            risen = out[m - 1] > least + stopAt ? risen + 1 : 0;
            if (risen == 2) {
                break;
            }
        }
        return java.util.Arrays.copyOf(out, used);
    }

    /** Cao's E1(m) = E(m + 1) / E(m) for m = 1 … maxDim; stops early when too few vectors remain. */
    static double[] caoE1(double[] s, int tau, int maxDim, int theiler) {
        double[] e = new double[maxDim + 1];
        int used = 0;
        for (int m = 1; m <= maxDim + 1; m++) {
            int count = s.length - m * tau;
            if (count < 2 * theiler + 8) {
                break;
            }
            Neighbours nb = new Neighbours(s, count, m, tau, true, theiler);
            double sum = 0;
            long n = 0;
            for (int i = 0; i < count; i++) {
                int j = nb.nearest(i);
                if (j < 0) {
                    continue;
                }
                double dm = nb.distance(i, j, Double.POSITIVE_INFINITY);
                double dm1 = Math.max(dm, Math.abs(s[i + m * tau] - s[j + m * tau]));
                sum += dm1 / dm;
                n++;
            }
            e[m - 1] = n > 0 ? sum / n : Double.NaN;
            used = m;
        }
        double[] e1 = new double[Math.max(0, used - 1)];
        for (int m = 1; m <= e1.length; m++) {
            e1[m - 1] = e[m] / e[m - 1];
        }
        return e1;
    }

    static double std(double[] s) {
        double mean = 0;
        for (double v : s) {
            mean += v;
        }
        mean /= s.length;
        double ss = 0;
        for (double v : s) {
            ss += (v - mean) * (v - mean);
        }
        return Math.sqrt(ss / s.length);
    }
}
