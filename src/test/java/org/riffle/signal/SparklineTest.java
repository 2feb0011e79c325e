package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class SparklineTest {
    private static final String BLOCKS = "\u2581\u2582\u2583\u2584\u2585\u2586\u2587\u2588";

    /** Values 0..7 on the scale [0, 7] reach levels ⌈v/7·8⌉ = 1, 2, ..., 8: every step once. */
    @Test
    void rampOfEightValuesUsesEveryStepOnce() {
        double[] x = {0, 1, 2, 3, 4, 5, 6, 7};
        assertEquals(BLOCKS, Sparkline.render(x, 8, true));
        assertEquals(".:-=+*#@", Sparkline.render(x, 8, false));
    }

    @Test
    void aSpikeIsNeverAveragedAway() {
        double[] x = new double[10_000];
        x[4321] = 10;
        String s = Sparkline.render(x, 20, false);
        assertEquals("........@...........", s);
    }

    @Test
    void missingOnlyCellsAreBlankAndConstantChannelsSitAtHalfHeight() {
        double[] x = {5, 5, Double.NaN, Double.NaN, 5, 5};
        assertEquals("\u2584 \u2584", Sparkline.render(x, 3, true));
        assertEquals("   ", Sparkline.render(new double[] {Double.NaN, Double.NaN, Double.NaN}, 3, true));
        assertEquals("    ", Sparkline.render(new double[0], 4, false));
    }

    @Test
    void fewerSamplesThanCellsRepeatSamples() {
        double[] x = {0, 1};
        assertEquals("\u2581\u2581\u2588\u2588", Sparkline.render(x, 4, true));
    }

    /** Several rows: a cell is filled from the bottom of its range to its top. */
    @Test
    void rowsShowTheWholeRange() {
        double[] x = {0, 16, 8, 9};
        List<String> rows = Sparkline.render(x, 2, 2, true);
        // scale 0..16 over 16 levels; cell 0 spans 0..16 (full, both rows); cell 1 spans 8..9: level 8..9,
        // so only the top row shows it (one eighth), the bottom row is below its range
        assertEquals(List.of("\u2588\u2581", "\u2588 "), rows);
    }

    /** Oracle: a plain per-cell maximum over the documented sample split, against the renderer. */
    @Test
    void oneRowAgreesWithASlowOracle() {
        Random r = new Random(11);
        for (int trial = 0; trial < 500; trial++) {
            int n = r.nextInt(300);
            int w = 1 + r.nextInt(40);
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = r.nextInt(10) == 0 ? Double.NaN : r.nextGaussian();
            }
            assertEquals(oracle(x, w), Sparkline.render(x, w, true), "n=" + n + " w=" + w);
        }
    }

    private static String oracle(double[] x, int w) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        StringBuilder sb = new StringBuilder();
        int n = x.length;
        for (int c = 0; c < w; c++) {
            int from = c * n / w;
            int to = Math.max((c + 1) * n / w, Math.min(n, from + 1));
            double mx = Double.NEGATIVE_INFINITY;
            for (int i = from; i < to; i++) {
                if (!Double.isNaN(x[i])) {
                    mx = Math.max(mx, x[i]);
                }
            }
            if (mx == Double.NEGATIVE_INFINITY) {
                sb.append(' ');
            } else if (hi == lo) {
                sb.append(BLOCKS.charAt(3));
            } else {
                int level = Math.max(1, (int) Math.ceil((mx - lo) / (hi - lo) * 8));
                sb.append(BLOCKS.charAt(level - 1));
            }
        }
        return sb.toString();
    }

    @Test
    void rejectsAZeroWidth() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Sparkline.render(new double[3], 0, true));
        assertEquals("sparkline of 3 samples in 0 cells × 1 rows: need width ≥ 1, rows ≥ 1",
                e.getMessage());
    }
}
