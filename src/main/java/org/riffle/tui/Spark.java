package org.riffle.tui;

import org.riffle.log.Channel;

/**
 * Interim cell ranges for sparklines and traces: for each of {@code cells} equal slices of samples,
 * the smallest and largest sample present ({@code NaN} when all are missing). To be replaced by the
 * {@code signal} package's sparkline once it lands; kept tiny on purpose.
 *
 * <p>Stateless.
 */
final class Spark {
    private Spark() {
    }

    /** {@code [min[], max[]]} of samples {@code [from, to)} cut into {@code cells} slices. */
    static double[][] ranges(Channel ch, int from, int to, int cells) {
        double[] lo = new double[cells];
        double[] hi = new double[cells];
        int n = to - from;
        for (int c = 0; c < cells; c++) {
            int a = from + (int) ((long) n * c / cells);
            int b = Math.max(a + 1, from + (int) ((long) n * (c + 1) / cells));
            double mn = Double.NaN;
            double mx = Double.NaN;
            for (int i = a; i < b && i < to; i++) {
                float v = ch.value(i);
                if (!Float.isNaN(v)) {
                    mn = Double.isNaN(mn) ? v : Math.min(mn, v);
                    mx = Double.isNaN(mx) ? v : Math.max(mx, v);
                }
            }
            lo[c] = mn;
            hi[c] = mx;
        }
        return new double[][] {lo, hi};
    }

    /** One line of ramp glyphs: each cell a bar up to the middle of its slice's range, scaled to the whole range. */
    static String line(double[][] r, Glyphs g) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < r[0].length; c++) {
            if (!Double.isNaN(r[0][c])) {
                lo = Math.min(lo, r[0][c]);
                hi = Math.max(hi, r[1][c]);
            }
        }
        StringBuilder sb = new StringBuilder(r[0].length);
        for (int c = 0; c < r[0].length; c++) {
            if (Double.isNaN(r[1][c])) {
                sb.append(' ');
            } else if (!(hi > lo)) {
                sb.append(g.ramp(g.steps() / 2));
            } else {
                double mid = 0.5 * (r[0][c] + r[1][c]);
                sb.append(g.ramp((int) Math.floor((mid - lo) / (hi - lo) * (g.steps() - 1e-9))));
            }
        }
        return sb.toString();
    }
}
