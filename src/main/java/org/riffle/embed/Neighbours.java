package org.riffle.embed;

/**
 * Nearest-neighbour search among delay vectors x_i = (s_i, s_{i+τ}, …, s_{i+(m−1)τ}), i &lt; count, by a
 * scan outward from the query in the order of the first coordinate, stopped once that coordinate alone
 * is farther than the best found (exact for both norms). Neighbours closer in time than the Theiler
 * window, and those at distance 0, are not used.
 *
 * <p>Immutable after construction; thread-safe.
 */
final class Neighbours {
    private final double[] s;
    private final int m;
    private final int tau;
    private final boolean max;
    private final int theiler;
    private final int[] order;
    private final int[] rank;

    Neighbours(double[] s, int count, int m, int tau, boolean max, int theiler) {
        this.s = s;
        this.m = m;
        this.tau = tau;
        this.max = max;
        this.theiler = theiler;
        Integer[] idx = new Integer[count];
        for (int i = 0; i < count; i++) {
            idx[i] = i;
        }
        java.util.Arrays.sort(idx, (a, b) -> a.equals(b) ? 0 : s[a] != s[b] ? Double.compare(s[a], s[b])
                : Integer.compare(a, b));
        order = new int[count];
        rank = new int[count];
        for (int k = 0; k < count; k++) {
            order[k] = idx[k];
            rank[idx[k]] = k;
        }
    }

    /** The nearest usable neighbour of vector i, or −1 when there is none. */
    int nearest(int i) {
        double best = Double.POSITIVE_INFINITY;
        int bestJ = -1;
        int at = rank[i];
        for (int dir = -1; dir <= 1; dir += 2) {
            for (int k = at + dir; k >= 0 && k < order.length; k += dir) {
                int j = order[k];
                double d0 = Math.abs(s[j] - s[i]);
                if ((max ? d0 : d0 * d0) >= best && d0 > 0) {
                    break;
                }
                if (Math.abs(i - j) < theiler) {
                    continue;
                }
                double d = distance(i, j, best);
                if (d < best && d > 0) {
                    best = d;
                    bestJ = j;
                }
            }
        }
        return bestJ;
    }

    /** Distance (squared for Euclidean) in m dimensions; stops early past {@code bound}. */
    double distance(int i, int j, double bound) {
        double acc = 0;
        for (int k = 0; k < m; k++) {
            double d = s[i + k * tau] - s[j + k * tau];
            acc = max ? Math.max(acc, Math.abs(d)) : acc + d * d;
            if (acc > bound) {
                return acc;
            }
        }
        return acc;
    }
}
