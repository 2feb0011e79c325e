package org.riffle.recurrence;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.DoubleConsumer;
import org.riffle.embed.EmbeddingEstimate;
import org.riffle.embed.EmbeddingEstimator;
import org.riffle.embed.EmbeddingSearch;

/**
 * One windowed trend computation (see {@link Rqa#trend}): resolves the embedding and ε on the baseline,
 * then measures every window in parallel, one window a task, each on one thread.
 *
 * <p>Confined to the calling thread; used once.
 */
final class TrendRun {
    /**
     * Most baseline windows a target-rate radius is searched over. Sixty-four windows of a thousand
     * vectors hold 3·10⁷ distances, so the rate's quantile is pinned far more tightly than the windows
     * vary among themselves, while a long baseline no longer costs a pass over all its windows.
     */
    static final int RADIUS_WINDOWS = 64;

    private final Rqa engine;
    private final double[] x;
    private final int baseFrom;
    private final int baseTo;
    private final int window;
    private final int step;
    private final RqaParams params;
    private final DoubleConsumer progress;

    TrendRun(Rqa engine, double[] x, int baseFrom, int baseTo, int window, int step, RqaParams params,
             DoubleConsumer progress) {
        this.engine = engine;
        this.x = x;
        this.baseFrom = baseFrom;
        this.baseTo = baseTo;
        this.window = window;
        this.step = step;
        this.params = params;
        this.progress = progress == null ? f -> { } : progress;
    }

    Trend run() {
        if (window < 2 || step < 1) {
            throw new IllegalArgumentException("window " + window + " must be at least 2 and step " + step
                    + " at least 1");
        }
        if (baseFrom < 0 || baseTo > x.length || baseTo <= baseFrom) {
            throw new IllegalArgumentException("baseline " + baseFrom + ":" + baseTo + " is empty or outside 0:"
                    + x.length);
        }
        int[] clean = longestFiniteRun(baseFrom, baseTo);
        Optional<EmbeddingEstimate> est = Optional.empty();
        RqaParams p = params;
        if (!params.embeddingGiven()) {
            if (clean[1] - clean[0] < 16) {
                throw new IllegalArgumentException("baseline " + baseFrom + ":" + baseTo
                        + " has no 16 consecutive samples without gaps to estimate the embedding from");
            }
            EmbeddingEstimate e = EmbeddingEstimator.estimate(x, clean[0], clean[1], EmbeddingSearch.defaults(),
                    params.dimension(), params.delay());
            p = params.withEmbedding(e.embedding());
            est = Optional.of(e);
        }
        Checks.fits(p, Math.min(window, x.length), "a window");
        double eps = engine.radius(baselineSegments(p, clean), p, Checks.populationStd(x, baseFrom, baseTo));
        return new Trend(p, eps, baseFrom, baseTo, window, step, est, windows(p, eps));
    }

    /**
     * The baseline's windows without gaps, at most {@link #RADIUS_WINDOWS} of them evenly spread; else
     * its longest stretch without gaps.
     */
    private List<Segment> baselineSegments(RqaParams p, int[] clean) {
        List<Integer> starts = new ArrayList<>();
        for (int s = 0; s + window <= baseTo; s += step) {
            if (s >= baseFrom && Checks.firstNonFinite(x, s, s + window) < 0) {
                starts.add(s);
            }
        }
        List<Segment> segs = new ArrayList<>();
        int count = starts.size();
        int used = Math.min(count, RADIUS_WINDOWS);
        for (int k = 0; k < used; k++) {
            int s = starts.get((int) ((long) k * count / used));
            segs.add(new Segment(x, s, s + window, p.embedding(), p.norm()));
        }
        if (segs.isEmpty()) {
            if (p.embedding().vectors(clean[1] - clean[0]) <= p.theiler()) {
                throw new IllegalArgumentException("baseline " + baseFrom + ":" + baseTo
                        + " has no stretch without gaps long enough for " + p.embedding());
            }
            segs.add(new Segment(x, clean[0], clean[1], p.embedding(), p.norm()));
        }
        return segs;
    }

    private List<RqaResult> windows(RqaParams p, double eps) {
        int count = x.length >= window ? (x.length - window) / step + 1 : 0;
        AtomicInteger done = new AtomicInteger();
        List<Callable<RqaResult>> jobs = new ArrayList<>(count);
        for (int w = 0; w < count; w++) {
            int s = w * step;
            jobs.add(() -> {
                RqaResult r = one(p, eps, s, s + window);
                progress.accept((double) done.incrementAndGet() / count);
                return r;
            });
        }
        return Parallel.run(engine.threads(), jobs);
    }

    private RqaResult one(RqaParams p, double eps, int from, int to) {
        int bad = Checks.firstNonFinite(x, from, to);
        if (bad >= 0) {
            return RqaResult.skipped(p, from, to, p.embedding().vectors(to - from),
                    "missing sample at " + bad);
        }
        Segment seg = new Segment(x, from, to, p.embedding(), p.norm());
        return Rqa.measure(seg, p, eps, Optional.empty(), 1, null);
    }

    /** The longest run of finite samples in [a, b) as {start, end}; the first of equal ones. */
    private int[] longestFiniteRun(int a, int b) {
        int bestStart = a;
        int bestEnd = a;
        int start = a;
        for (int i = a; i <= b; i++) {
            if (i == b || !Double.isFinite(x[i])) {
                if (i - start > bestEnd - bestStart) {
                    bestStart = start;
                    bestEnd = i;
                }
                start = i + 1;
            }
        }
        return new int[] {bestStart, bestEnd};
    }
}
