package org.riffle.recurrence;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CancellationException;
import java.util.function.DoubleConsumer;
import org.riffle.embed.EmbeddingEstimate;
import org.riffle.embed.EmbeddingEstimator;
import org.riffle.embed.EmbeddingSearch;

/**
 * The recurrence quantification engine: RQA measures of a run of samples, a recurrence-plot thumbnail,
 * and windowed trends against a baseline. Definitions and conventions are those of {@link RqaResult} and
 * {@link RqaParams} (Marwan, Romano, Thiel &amp; Kurths 2007, Physics Reports 438:237).
 *
 * <p>It never holds the N × N matrix: it streams rows of the upper triangle as bits and keeps O(N) state
 * (one run counter per diagonal and per column), counting both triangles by symmetry. Rows are split into
 * bands on {@code threads} threads; line counts are exact integers joined in band order, so results are
 * bit-identical for any thread count. The target-rate radius is the exact k-th smallest eligible
 * distance, found by a streamed bracket-and-select search.
 *
 * <p>Immutable and thread-safe; each call owns its threads. Interrupting the caller cancels a call with
 * a {@link CancellationException}. Samples must be finite; units are the channel's own.
 */
public final class Rqa {
    private final int threads;

    /** An engine that uses {@code threads} threads (≥ 1). */
    public Rqa(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads " + threads + " must be at least 1");
        }
        this.threads = threads;
    }

    /** An engine that uses every core. */
    public static Rqa withAllCores() {
        return new Rqa(Runtime.getRuntime().availableProcessors());
    }

    public int threads() {
        return threads;
    }

    /**
     * The RQA of {@code series[from, to)}: m and τ estimated there when automatic, ε chosen there by the
     * threshold policy.
     *
     * @throws IllegalArgumentException when the range is empty or out of bounds, holds a non-finite
     *         sample, or is too short for the embedding
     */
    public RqaResult analyse(double[] series, int from, int to, RqaParams params) {
        Checks.finiteRange(series, from, to);
        Optional<EmbeddingEstimate> est = Optional.empty();
        RqaParams p = params;
        if (!params.embeddingGiven()) {
            EmbeddingEstimate e = EmbeddingEstimator.estimate(series, from, to, EmbeddingSearch.defaults(),
                    params.dimension(), params.delay());
            p = params.withEmbedding(e.embedding());
            est = Optional.of(e);
        }
        Checks.fits(p, to - from, "the range " + from + ":" + to);
        Segment seg = new Segment(series, from, to, p.embedding(), p.norm());
        double eps = radius(List.of(seg), p, Checks.populationStd(series, from, to));
        return measure(seg, p, eps, est, threads, null);
    }

    /**
     * A width × height thumbnail of the recurrence plot of {@code series[from, to)} at radius ε, computed
     * without the full matrix.
     *
     * @param params parameters with m and τ given (the threshold policy is not used)
     */
    public RecurrencePlot plot(double[] series, int from, int to, RqaParams params, double radius, int width,
                               int height) {
        Checks.finiteRange(series, from, to);
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("thumbnail " + width + " × " + height + " is empty");
        }
        if (!(radius >= 0) || Double.isInfinite(radius)) {
            throw new IllegalArgumentException("radius " + radius + " must be finite and ≥ 0");
        }
        Checks.fits(params, to - from, "the range " + from + ":" + to);
        Segment seg = new Segment(series, from, to, params.embedding(), params.norm());
        PlotMarks marks = new PlotMarks(width, height, seg.vectors());
        measure(seg, params, radius, Optional.empty(), threads, marks);
        return new RecurrencePlot(width, height, marks.counts, seg.vectors(), params.theiler(), radius);
    }

    /**
     * The windowed trend of a whole channel: windows of {@code window} samples every {@code step}
     * samples from sample 0, each measured with the baseline's embedding (estimated on the baseline when
     * automatic) and the baseline's ε, reused unchanged. On the baseline, a target rate is met over its
     * windows taken together, at most 64 of them evenly spread (over the whole baseline when it is
     * shorter than a window); a fraction of the standard deviation uses the baseline samples' population
     * standard deviation.
     *
     * @param progress receives the fraction of windows done, from worker threads; may be {@code null}
     * @throws IllegalArgumentException when the baseline or window does not fit the series or the
     *         embedding, or the baseline has no stretch without missing samples
     */
    public Trend trend(double[] series, int baselineFrom, int baselineTo, int window, int step, RqaParams params,
                       DoubleConsumer progress) {
        return new TrendRun(this, series, baselineFrom, baselineTo, window, step, params, progress).run();
    }

    /** ε by the threshold policy over the segments' eligible cells taken together. */
    double radius(List<Segment> segs, RqaParams p, double std) {
        RqaParams.Threshold t = p.threshold();
        switch (t.policy()) {
            case RADIUS:
                return t.value();
            case STD_FRACTION:
                return t.value() * std;
            default:
                break;
        }
        long eligible = 0;
        for (Segment s : segs) {
            eligible += s.eligible(p.theiler());
        }
        if (eligible == 0) {
            return Double.NaN;
        }
        long k = Math.min(eligible, Math.max(1, (long) Math.ceil(t.value() * eligible)));
        List<List<Piece>> tasks = new ArrayList<>();
        if (segs.size() == 1) {
            for (Piece b : Piece.bands(segs.get(0), p.theiler(), 4 * threads, Piece.MIN_BAND_CELLS)) {
                tasks.add(List.of(b));
            }
        } else {
            tasks = Piece.groups(segs, p.theiler(), 4 * threads);
        }
        double value = RadiusSearch.kth(tasks, p.theiler(), (k + 1) / 2, eligible / 2, threads,
                RadiusSearch.Budget.DEFAULT);
        return segs.get(0).toDistance(value);
    }

    /** The measures of one segment at radius ε, on {@code nThreads} threads. */
    static RqaResult measure(Segment seg, RqaParams p, double eps, Optional<EmbeddingEstimate> est, int nThreads,
                             PlotMarks marks) {
        List<Piece> bands = Piece.bands(seg, p.theiler(), nThreads == 1 ? 1 : 4 * nThreads,
                Piece.MIN_BAND_CELLS);
        LineMerge merged = lines(seg, p.theiler(), eps, bands, nThreads, marks);
        return Measures.of(p, seg, seg.from() + seg.vectors() + p.embedding().span(), eps, merged.recurrent,
                merged.diagHist, merged.vertHist, est);
    }

    /** The merged line counts of {@code bands} (a split of the segment's rows) at radius ε. */
    static LineMerge lines(Segment seg, int theiler, double eps, List<Piece> bands, int nThreads,
                           PlotMarks marks) {
        int rows = seg.rows(theiler);
        double vt = seg.valueThreshold(eps);
        List<Callable<LineScan>> jobs = new ArrayList<>();
        for (Piece b : bands) {
            PlotMarks own = marks == null ? null : new PlotMarks(marks.width, marks.height, seg.vectors());
            jobs.add(() -> new LineScan(seg, theiler, vt, b.rowFrom(), b.rowTo(), rows, own).run());
        }
        List<LineScan> scans = Parallel.run(nThreads, jobs);
        if (marks != null) {
            for (LineScan s : scans) {
                s.addInto(marks);
            }
        }
        return LineMerge.of(scans, seg.vectors());
    }
}
