package org.riffle.embed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/** The k-d tree's nearest neighbour equals a brute-force scan over every pair (written here). */
class NeighboursProperties {
    @Property(tries = 300, seed = "20261202")
    void nearestEqualsTheBruteForceScan(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                        @ForAll @IntRange(min = 2, max = 300) int len,
                                        @ForAll @IntRange(min = 1, max = 6) int m,
                                        @ForAll @IntRange(min = 1, max = 4) int tau,
                                        @ForAll @IntRange(min = 1, max = 12) int theiler,
                                        @ForAll boolean maxNorm,
                                        @ForAll @IntRange(min = 0, max = 2) int kind) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] s = new double[len];
        for (int i = 0; i < len; i++) {
            // continuous, coarsely quantised (many ties and repeated vectors), or a noisy oscillation
            s[i] = kind == 0 ? rnd.nextDouble()
                    : kind == 1 ? rnd.nextInt(4) : Math.sin(0.3 * i) + 0.01 * rnd.nextGaussian();
        }
        int count = len - (m - 1) * tau;
        if (count < 1) {
            return;
        }
        Neighbours nb = new Neighbours(s, count, m, tau, maxNorm, theiler);
        for (int i = 0; i < count; i++) {
            assertEquals(brute(s, count, m, tau, maxNorm, theiler, i), nb.nearest(i), "vector " + i);
        }
    }

    private static int brute(double[] s, int count, int m, int tau, boolean max, int theiler, int i) {
        double best = Double.POSITIVE_INFINITY;
        int bestJ = -1;
        for (int j = 0; j < count; j++) {
            if (Math.abs(i - j) < theiler) {
                continue;
            }
            double acc = 0;
            for (int k = 0; k < m; k++) {
                double d = s[i + k * tau] - s[j + k * tau];
                acc = max ? Math.max(acc, Math.abs(d)) : acc + d * d;
            }
            if (acc > 0 && acc < best) {
                best = acc;
                bestJ = j;
            }
        }
        return bestJ;
    }
}
