package org.riffle.recurrence;

import java.util.Arrays;

/** A growable list of primitive longs. Confined to one thread. */
final class LongList {
    private long[] a;
    private int size;

    LongList(int capacity) {
        a = new long[Math.max(1, capacity)];
    }

    void add(long v) {
        if (size == a.length) {
            a = Arrays.copyOf(a, 2 * size);
        }
        a[size++] = v;
    }

    long[] toArray() {
        return Arrays.copyOf(a, size);
    }
}
