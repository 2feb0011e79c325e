package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.riffle.log.Channel;
import org.riffle.signal.Sparkline;

/**
 * A channel's sparkline drawn from the channel's own run ranges (no copy of its samples) is the
 * sparkline of its samples: the same cells as {@link Sparkline#render(double[], int, boolean)} on a
 * copy, for lengths below, at and far above the width, with missing and infinite samples.
 */
class ChannelSparklineTest {
    @Test
    void runRangesDrawTheSameAsTheSamples() {
        Random r = new Random(5);
        for (int trial = 0; trial < 400; trial++) {
            int n = trial % 4 == 0 ? r.nextInt(5) : r.nextInt(3000);
            int width = 1 + r.nextInt(120);
            float[] x = new float[n];
            for (int i = 0; i < n; i++) {
                int kind = r.nextInt(40);
                x[i] = kind == 0 ? Float.NaN : kind == 1 ? Float.POSITIVE_INFINITY : (float) r.nextGaussian();
            }
            Channel ch = new Channel("c", "", x);
            for (boolean unicode : new boolean[] {true, false}) {
                assertEquals(Sparkline.render(ch.toDoubles(), width, unicode),
                        Sparkline.render(ch::ranges, ch.size(), width, unicode), "n=" + n + " width=" + width);
            }
        }
    }
}
