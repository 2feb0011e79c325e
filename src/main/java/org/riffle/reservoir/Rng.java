package org.riffle.reservoir;

/**
 * The reservoir's own seeded generator: SplitMix64 (Steele, Lea &amp; Flood 2014, "Fast splittable
 * pseudorandom number generators", OOPSLA), written out here so that a seed gives the same reservoir on
 * every JDK, now and later (a stored baseline model rebuilds its reservoir from the seed).
 *
 * <p>Not thread-safe: one instance per construction.
 */
final class Rng {
    private long state;

    Rng(long seed) {
        this.state = seed;
    }

    long nextLong() {
        long z = state += 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** Uniform in [0, 1) with 53 random bits. */
    double nextDouble() {
        return (nextLong() >>> 11) * 0x1.0p-53;
    }

    /** Uniform in [-1, 1). */
    double nextSigned() {
        return 2 * nextDouble() - 1;
    }

    /** Uniform integer in [0, bound), bound &gt; 0, unbiased (rejects the incomplete top block of 2^64). */
    int nextInt(int bound) {
        long limit = Long.remainderUnsigned(-1L, bound);
        while (true) {
            long r = nextLong();
            if (Long.compareUnsigned(r, -1L - limit) < 0) {
                return (int) Long.remainderUnsigned(r, bound);
            }
        }
    }
}
