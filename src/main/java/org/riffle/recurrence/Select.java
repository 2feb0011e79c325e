package org.riffle.recurrence;

/**
 * Order statistics of a long array in expected linear time (Hoare's selection, median-of-three pivot).
 *
 * <p>Stateless; reorders the array it is given.
 */
final class Select {
    private Select() {
    }

    /** The {@code rank}-th smallest (1-based) of {@code a[0, size)}. */
    static long kth(long[] a, int size, int rank) {
        if (rank < 1 || rank > size) {
            throw new IllegalArgumentException("rank " + rank + " outside 1.." + size);
        }
        int k = rank - 1;
        int lo = 0;
        int hi = size - 1;
        while (hi > lo) {
            int mid = (lo + hi) >>> 1;
            long x = a[lo];
            long y = a[mid];
            long z = a[hi];
            long pivot = Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    long t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }
}
