package org.riffle.triage;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import org.riffle.recurrence.Trend;

/**
 * The recurrence part of a channel's judgement: the embedding and the threshold ε fixed on the baseline
 * ({@link TriageParams#rqa()}, by default m and τ estimated, Euclidean norm, ε for a 5 % recurrence rate
 * over the baseline windows, l_min = v_min = 2, Theiler window 1), then per window RR, DET, L, Lmax,
 * ENTR, LAM, TT, DIV and Vmax with that embedding and ε unchanged. Runs on the calling thread. Stateless.
 */
final class RqaStep {
    /** Row order of {@link #trend}: rr, det, l, lmax, entr, lam, tt, then div and vmax. */
    static final int MEASURES = 7;

    private RqaStep() {
    }

    /**
     * What the baseline gave: the resolved embedding and ε, their description, and the baseline windows'
     * measures (which {@link #trend} reuses); or only a reason.
     */
    record Learned(int dimension, int delay, double radius, String settings, Known baseline) {
    }

    /** The outcome of learning: the baseline's recurrence figures, or the reason there are none. */
    record Outcome(Optional<Learned> learned, String reason) {
    }

    /**
     * Learns from the baseline rows [from, to) of channel samples {@code x}: the embedding and ε as
     * {@code params} asks, and the measures of the trend windows (grid from sample 0, {@code length} and
     * {@code step}) that lie inside the baseline, in order. The series handed to the engine starts at
     * the last grid point at or before {@code from}, which keeps the grid and measures at most one window
     * that is not the baseline's.
     */
    static Outcome learn(double[] x, int from, int to, int length, int step, RqaParams params) {
        try {
            int start = from / step * step;
            double[] part = Arrays.copyOfRange(x, start, to);
            Trend t = new Rqa(1).trend(part, from - start, to - start, length, step, params, null);
            RqaParams p = t.params();
            String settings = p.describe() + " → radius " + Reporting.num(t.radius()) + " (fixed on the baseline)";
            List<RqaResult> inside = t.windows().stream().filter(r -> r.from() >= from - start).toList();
            return new Outcome(Optional.of(new Learned(p.dimension(), p.delay(), t.radius(), settings,
                    new Known((from + step - 1) / step, values(inside, inside.size())))), "");
        } catch (IllegalArgumentException e) {
            return new Outcome(Optional.empty(), "recurrence measures: " + e.getMessage());
        }
    }

    /**
     * Measures per window of {@code x}: [measure][window], NaN where a window could not be measured;
     * null when the embedding does not fit at all. Windows {@code known.first()} onwards that
     * {@code known} already holds (the baseline's, measured with the same embedding and ε while
     * learning) are copied, not measured again.
     */
    static double[][] trend(double[] x, Windows w, RqaParams settings, int dimension, int delay, double radius,
                            Optional<Known> known) {
        RqaParams p = settings.withEmbedding(dimension, delay).withThreshold(RqaParams.Threshold.radius(radius));
        int a = known.map(Known::first).orElse(w.count());
        int b = known.map(k -> Math.min(w.count(), k.first() + k.values()[0].length)).orElse(w.count());
        if (a < 0 || a > b) {
            a = w.count();
            b = w.count();
        }
        double[][] head = range(x, w, 0, a, p);
        double[][] tail = range(x, w, b, w.count(), p);
        if (head == null || tail == null) {
            return null;
        }
        double[][] out = new double[MEASURES + 2][];
        for (int r = 0; r < out.length; r++) {
            out[r] = new double[w.count()];
            System.arraycopy(head[r], 0, out[r], 0, a);
            if (b > a) {
                System.arraycopy(known.get().values()[r], 0, out[r], a, b - a);
            }
            System.arraycopy(tail[r], 0, out[r], b, w.count() - b);
        }
        return out;
    }

    /** Windows [a, b) of the grid {@code w}: measures [measure][window − a]; null when the embedding does not fit. */
    private static double[][] range(double[] x, Windows w, int a, int b, RqaParams p) {
        if (a >= b) {
            return new double[MEASURES + 2][0];
        }
        double[] part = Arrays.copyOfRange(x, w.start(a), w.end(b - 1));
        Rqa rqa = new Rqa(1);
        try {
            // with a fixed radius the engine needs no baseline beyond one window to validate against
            return values(rqa.trend(part, 0, Math.min(part.length, w.length()), w.length(), w.step(), p, null)
                    .windows(), b - a);
        } catch (IllegalArgumentException first) {
            try {
                return values(rqa.trend(part, 0, part.length, w.length(), w.step(), p, null).windows(), b - a);
            } catch (IllegalArgumentException e) {
                return null;
            }
        }
    }

    /** Measures of windows {@code first} … of a trend grid, [measure][window − first], known already. */
    record Known(int first, double[][] values) {
    }

    private static double[][] values(List<RqaResult> windows, int count) {
        double[][] out = new double[MEASURES + 2][count];
        for (double[] row : out) {
            Arrays.fill(row, Double.NaN);
        }
        for (int k = 0; k < Math.min(count, windows.size()); k++) {
            RqaResult r = windows.get(k);
            if (!r.computed()) {
                continue;
            }
            out[0][k] = r.rr();
            out[1][k] = r.det();
            out[2][k] = r.l();
            out[3][k] = r.lmax();
            out[4][k] = r.entr();
            out[5][k] = r.lam();
            out[6][k] = r.tt();
            out[7][k] = r.div();
            out[8][k] = r.vmax();
        }
        return out;
    }
}
