package org.riffle.signal;

import java.util.ArrayList;
import java.util.List;

/**
 * A channel drawn as a row (or rows) of text cells. The samples are split into {@code width}
 * consecutive, nearly equal runs (cell c covers samples [⌊c·n/w⌋, ⌊(c+1)·n/w⌋), at least one sample
 * when n ≥ 1); each cell stands for the range min..max of its run, scaled between the channel's
 * smallest and largest value. In one row a cell shows the top of its range, so a single spike is never
 * averaged away; in several rows a cell is filled from the bottom of its range to its top. Glyphs are
 * the eighth blocks U+2581..U+2588 in Unicode mode and the ramp {@value #ASCII_RAMP} otherwise (eight
 * steps each). A cell whose samples are all missing ({@code NaN}, or not finite) is a blank; a channel
 * with a single value draws every present cell at half height.
 *
 * <p>Pure functions; stateless and thread-safe.
 */
public final class Sparkline {
    /** The eight ASCII steps, lowest first. */
    public static final String ASCII_RAMP = ".:-=+*#@";
    private static final String BLOCKS = "\u2581\u2582\u2583\u2584\u2585\u2586\u2587\u2588";

    private Sparkline() {
    }

    /**
     * Measures runs of samples: for each run k, the smallest and largest finite sample of
     * [from[k], to[k]) into min[k] and max[k], or +∞ and −∞ when the run has none. A source that holds
     * its samples (a log's channel) answers without copying them.
     */
    @FunctionalInterface
    public interface Runs {
        void ranges(int[] from, int[] to, double[] min, double[] max);
    }

    /** One row of {@code width} cells for {@code x}. */
    public static String render(double[] x, int width, boolean unicode) {
        return render(x, width, 1, unicode).get(0);
    }

    /** One row of {@code width} cells for the {@code n} samples that {@code samples} measures. */
    public static String render(Runs samples, int n, int width, boolean unicode) {
        check(n, width, 1);
        return cells(samples, n, width, 1, unicode).get(0);
    }

    /** {@code rows} rows of {@code width} cells, top row first, for the samples {@code x}. */
    public static List<String> render(double[] x, int width, int rows, boolean unicode) {
        check(x.length, width, rows);
        return cells((from, to, min, max) -> ranges(x, x, from, to, min, max), x.length, width, rows, unicode);
    }

    private static void check(int n, int width, int rows) {
        if (width < 1 || rows < 1) {
            throw new IllegalArgumentException("sparkline of " + n + " samples in " + width + " cells × "
                    + rows + " rows: need width ≥ 1, rows ≥ 1");
        }
    }

    /**
     * One row of {@code width} cells for {@code n = min.length} consecutive runs of samples known only by
     * their range {@code [min[b], max[b]]} (the blocks of a log too large to hold): cell c covers runs
     * [⌊c·n/w⌋, ⌊(c+1)·n/w⌋) and stands for the range of their union, exactly as {@link #render} would
     * draw the samples themselves when each run's cell boundaries fall on run boundaries. A run with
     * {@code NaN} bounds (no sample present) is skipped.
     */
    public static String renderRanges(double[] min, double[] max, int width, boolean unicode) {
        int n = min.length;
        if (width < 1 || max.length != n) {
            throw new IllegalArgumentException("sparkline of " + n + " minima and " + max.length + " maxima in "
                    + width + " cells: need width ≥ 1 and one maximum per minimum");
        }
        return cells((from, to, lo, hi) -> ranges(min, max, from, to, lo, hi), n, width, 1, unicode).get(0);
    }

    /**
     * {@code rows} rows of {@code width} cells for {@code n} consecutive runs (a single sample is a run
     * whose range is itself): cell c stands for runs [⌊c·n/w⌋, ⌊(c+1)·n/w⌋), at least one, and the range
     * of their union, as {@code runs} measures it.
     */
    private static List<String> cells(Runs runs, int n, int width, int rows, boolean unicode) {
        int[] from = new int[width];
        int[] to = new int[width];
        for (int c = 0; c < width; c++) {
            from[c] = (int) ((long) c * n / width);
            to[c] = Math.max((int) ((long) (c + 1) * n / width), Math.min(n, from[c] + 1));
        }
        double[] cellMin = new double[width];
        double[] cellMax = new double[width];
        runs.ranges(from, to, cellMin, cellMax);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < width; c++) {
            lo = Math.min(lo, cellMin[c]);
            hi = Math.max(hi, cellMax[c]);
        }
        return draw(cellMin, cellMax, lo, hi, width, rows, unicode);
    }

    /**
     * {@link Runs} over runs known by their ranges [low[i], high[i]] (single samples: both arrays the
     * same); a run with a bound that is not finite is skipped. The loop calls no method: the screen's
     * first frame runs it before the JIT has compiled it.
     */
    private static void ranges(double[] low, double[] high, int[] from, int[] to, double[] min, double[] max) {
        for (int c = 0; c < from.length; c++) {
            double mn = Double.POSITIVE_INFINITY;
            double mx = Double.NEGATIVE_INFINITY;
            for (int i = from[c]; i < to[c]; i++) {
                double a = low[i];
                double b = high[i];
                if (a - a == 0 && b - b == 0) { // both finite: x − x is NaN for NaN and ±∞
                    mn = a < mn ? a : mn;
                    mx = b > mx ? b : mx;
                }
            }
            min[c] = mn;
            max[c] = mx;
        }
    }

    private static List<String> draw(double[] cellMin, double[] cellMax, double lo, double hi, int width, int rows,
                                     boolean unicode) {
        String glyphs = unicode ? BLOCKS : ASCII_RAMP;
        int levels = 8 * rows;
        List<String> out = new ArrayList<>(rows);
        for (int r = rows - 1; r >= 0; r--) {
            StringBuilder sb = new StringBuilder(width);
            for (int c = 0; c < width; c++) {
                sb.append(glyph(cellMin[c], cellMax[c], lo, hi, levels, r, glyphs));
            }
            out.add(sb.toString());
        }
        return out;
    }

    /** The glyph of row {@code r} (0 = bottom) for a cell spanning [mn, mx] on the scale [lo, hi]. */
    private static char glyph(double mn, double mx, double lo, double hi, int levels, int r, String glyphs) {
        if (mn > mx) {
            return ' ';
        }
        int top;
        int bottom;
        if (hi > lo) {
            top = Math.max(1, (int) Math.ceil((mx - lo) / (hi - lo) * levels));
            bottom = Math.min(levels - 1, (int) Math.floor((mn - lo) / (hi - lo) * levels));
        } else {
            top = Math.max(1, levels / 2);
            bottom = top - 1;
        }
        int rowBase = 8 * r;
        if (top <= rowBase || bottom >= rowBase + 8) {
            return ' '; // the row lies wholly above or below the cell's range
        }
        int fill = Math.min(8, top - rowBase);
        return glyphs.charAt(fill - 1);
    }
}
