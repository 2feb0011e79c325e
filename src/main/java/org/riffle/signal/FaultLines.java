package org.riffle.signal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Looks for named lines in a spectrum against the local noise floor.
 *
 * <p>Search: the bins within ±tolerance of the expected frequency, the tolerance being the larger of a
 * fraction of the frequency (slip and speed uncertainty; bearing lines sit 1–2 % off, Randall &amp;
 * Antoni 2011) and 1.5 bins. Floor: the median density over the neighbouring bins out to five
 * tolerances (at least ten bins) on either side, the search window left out. Present: the strongest
 * searched bin is at least {@link #PRESENT_RATIO} times that median (6 dB; our own choice: a Welch
 * average of 7 or more segments rarely puts a noise bin that high).
 *
 * <p>Stateless.
 */
public final class FaultLines {
    /** Power ratio of a line's top bin to the median floor for it to count as present. */
    public static final double PRESENT_RATIO = 4.0;

    private FaultLines() {
    }

    /** Checks one line at {@code hz} with relative tolerance {@code slip} in {@code s}. */
    public static FaultLine check(Spectrum s, String where, String name, double hz, double slip) {
        double tol = Math.max(slip * hz, 1.5 * s.binHz());
        int lo = (int) Math.ceil((hz - tol) / s.binHz());
        int hi = (int) Math.floor((hz + tol) / s.binHz());
        if (lo < 1 || hi >= s.size() - 1 || s.segments() == 0) {
            return new FaultLine(name, where, hz, Double.NaN, Double.NaN, Double.NaN, false);
        }
        int best = lo;
        for (int k = lo; k <= hi; k++) {
            if (s.density(k) > s.density(best)) {
                best = k;
            }
        }
        int reach = Math.max(10, (int) Math.ceil(5 * tol / s.binHz()));
        double[] floor = new double[2 * reach];
        int m = 0;
        for (int k = Math.max(1, lo - reach); k <= Math.min(s.size() - 1, hi + reach); k++) {
            if (k < lo || k > hi) {
                floor[m++] = s.density(k);
            }
        }
        double median = median(Arrays.copyOf(floor, m));
        Peak p = s.lineAt(best);
        boolean present = s.density(best) >= PRESENT_RATIO * median;
        return new FaultLine(name, where, hz, p.frequencyHz(), p.amplitudeRms(), Math.sqrt(median * s.enbwHz()),
                present);
    }

    /** Order lines 1x, 2x, 3x of {@code shaftHz} in {@code s}. */
    public static List<FaultLine> orders(Spectrum s, String where, double shaftHz, double slip) {
        List<FaultLine> out = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            out.add(check(s, where, i + "x", i * shaftHz, slip));
        }
        return out;
    }

    /** Bearing lines FTF, BPFO, BPFI, BSF of {@code g} at {@code shaftHz} in {@code s}. */
    public static List<FaultLine> bearing(Spectrum s, String where, BearingGeometry g, double shaftHz, double slip) {
        return List.of(check(s, where, "FTF", g.ftf(shaftHz), slip),
                check(s, where, "BPFO", g.bpfo(shaftHz), slip),
                check(s, where, "BPFI", g.bpfi(shaftHz), slip),
                check(s, where, "BSF", g.bsf(shaftHz), slip));
    }

    private static double median(double[] v) {
        if (v.length == 0) {
            return Double.NaN;
        }
        Arrays.sort(v);
        int h = v.length / 2;
        return v.length % 2 == 1 ? v[h] : 0.5 * (v[h - 1] + v[h]);
    }
}
