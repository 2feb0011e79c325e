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
     * measures [measure][window]; or only a reason.
     */
    record Learned(int dimension, int delay, double radius, String settings, double[][] baselineValues) {
    }

    /** The outcome of learning: the baseline's recurrence figures, or the reason there are none. */
    record Outcome(Optional<Learned> learned, String reason) {
    }

    /**
     * Learns from the baseline rows [from, to) of channel samples {@code x} (only x[0, to) is read): the
     * embedding and ε as {@code params} asks, and the measures of the trend windows (grid from sample 0,
     * {@code length} and {@code step}) that lie inside the baseline, in order.
     */
    static Outcome learn(double[] x, int from, int to, int length, int step, RqaParams params) {
        try {
            double[] prefix = to == x.length ? x : Arrays.copyOf(x, to);
            Trend t = new Rqa(1).trend(prefix, from, to, length, step, params, null);
            RqaParams p = t.params();
            String settings = p.describe() + " → radius " + Reporting.num(t.radius()) + " (fixed on the baseline)";
            List<RqaResult> inside = t.windows().stream().filter(r -> r.from() >= from).toList();
            return new Outcome(Optional.of(new Learned(p.dimension(), p.delay(), t.radius(), settings,
                    values(inside, inside.size()))), "");
        } catch (IllegalArgumentException e) {
            return new Outcome(Optional.empty(), "recurrence measures: " + e.getMessage());
        }
    }

    /**
     * Measures per window of {@code x}: [measure][window], NaN where a window could not be measured;
     * null when the embedding does not fit at all.
     */
    static double[][] trend(double[] x, Windows w, RqaParams settings, int dimension, int delay, double radius) {
        RqaParams p = settings.withEmbedding(dimension, delay).withThreshold(RqaParams.Threshold.radius(radius));
        Rqa rqa = new Rqa(1);
        try {
            // with a fixed radius the engine needs no baseline beyond one window to validate against
            return values(rqa.trend(x, 0, Math.min(x.length, w.length()), w.length(), w.step(), p, null).windows(),
                    w.count());
        } catch (IllegalArgumentException first) {
            try {
                return values(rqa.trend(x, 0, x.length, w.length(), w.step(), p, null).windows(), w.count());
            } catch (IllegalArgumentException e) {
                return null;
            }
        }
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
