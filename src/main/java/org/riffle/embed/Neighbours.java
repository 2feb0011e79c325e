package org.riffle.embed;

/**
 * Exact nearest-neighbour search among delay vectors x_i = (s_i, s_{i+τ}, …, s_{i+(m−1)τ}), i &lt; count,
 * with a k-d tree (Bentley 1975, Comm. ACM 18:509; Friedman, Bentley &amp; Finkel 1977, ACM TOMS 3:209):
 * split at the median of the coordinate with the widest spread, buckets of a few vectors at the leaves,
 * subtrees skipped once the splitting plane is farther than the best found (exact for both norms).
 * Neighbours closer in time than the Theiler window, and those at distance 0, are not used; of equally
 * near neighbours the one with the smallest index is taken, so the answer does not depend on the tree.
 *
 * <p>Immutable after construction; thread-safe.
 */
final class Neighbours {
    private static final int LEAF = 8;

    private final double[] s;
    private final int m;
    private final int tau;
    private final boolean max;
    private final int theiler;
    private final int[] idx;
    private final byte[] splitDim;

    Neighbours(double[] s, int count, int m, int tau, boolean max, int theiler) {
        this.s = s;
        this.m = m;
        this.tau = tau;
        this.max = max;
        this.theiler = theiler;
        this.idx = new int[count];
        for (int i = 0; i < count; i++) {
            idx[i] = i;
        }
        this.splitDim = new byte[count];
        build(0, count);
    }

    private double coord(int vector, int k) {
        return s[vector + k * tau];
    }

    private void build(int lo, int hi) {
        if (hi - lo <= LEAF) {
            return;
        }
        int dim = 0;
        double widest = -1;
        for (int k = 0; k < m; k++) {
            double a = Double.POSITIVE_INFINITY;
            double b = Double.NEGATIVE_INFINITY;
            for (int p = lo; p < hi; p++) {
                double c = coord(idx[p], k);
                a = Math.min(a, c);
                b = Math.max(b, c);
            }
            if (b - a > widest) {
                widest = b - a;
                dim = k;
            }
        }
        int mid = (lo + hi) >>> 1;
        select(lo, hi - 1, mid, dim);
        splitDim[mid] = (byte) dim;
        build(lo, mid);
        build(mid + 1, hi);
    }

    /** Rearranges idx[lo..hi] so that idx[k] holds the k-th by coordinate dim, smaller ones before it. */
    private void select(int lo, int hi, int k, int dim) {
        while (hi > lo) {
            double pivot = coord(idx[(lo + hi) >>> 1], dim);
            int a = lo;
            int b = hi;
            while (a <= b) {
                while (coord(idx[a], dim) < pivot) {
                    a++;
                }
                while (coord(idx[b], dim) > pivot) {
                    b--;
                }
                if (a <= b) {
                    int t = idx[a];
                    idx[a] = idx[b];
                    idx[b] = t;
                    a++;
                    b--;
                }
            }
            if (k <= b) {
                hi = b;
            } else if (k >= a) {
                lo = a;
            } else {
                return;
            }
        }
    }

    /** The nearest usable neighbour of vector i, or −1 when there is none. */
    int nearest(int i) {
        Query q = new Query(i);
        q.search(0, idx.length);
        return q.bestJ;
    }

    /** One search: the query vector and the best neighbour so far. */
    private final class Query {
        final int i;
        double best = Double.POSITIVE_INFINITY;
        int bestJ = -1;

        Query(int i) {
            this.i = i;
        }

        void search(int lo, int hi) {
            if (hi - lo <= LEAF) {
                for (int p = lo; p < hi; p++) {
                    consider(idx[p]);
                }
                return;
            }
            int mid = (lo + hi) >>> 1;
            int dim = splitDim[mid];
            double diff = coord(i, dim) - coord(idx[mid], dim);
            boolean left = diff <= 0;
            if (left) {
                search(lo, mid);
            } else {
                search(mid + 1, hi);
            }
            consider(idx[mid]);
            double plane = max ? Math.abs(diff) : diff * diff;
            if (plane <= best) {
                if (left) {
                    search(mid + 1, hi);
                } else {
                    search(lo, mid);
                }
            }
        }

        private void consider(int j) {
            if (Math.abs(i - j) < theiler) {
                return;
            }
            double d = distance(i, j, best);
            if (d > 0 && (d < best || (d == best && j < bestJ))) {
                best = d;
                bestJ = j;
            }
        }
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
