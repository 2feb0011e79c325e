package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.riffle.log.TimeBase;
import org.riffle.recurrence.RecurrencePlot;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.triage.BaselineModel.ChannelModel;

/**
 * The recurrence-plot thumbnails of a channel that has a recurrence estimate, for a technician to set
 * "healthy" beside "now": one of the last trend window inside the baseline (the healthy picture closest
 * in time to what follows; none when the baseline is a separate log, whose samples are not at hand) and
 * one of the last trend window of the log. The latest window is shown rather than the window where a
 * departure began: the start of a departure is already given as "since" and drawn in the level row,
 * while the question at the machine is what the channel does now; for a departed channel the latest
 * window is a departed one anyway.
 *
 * <p>Both use the baseline's embedding (m, τ), its radius ε and its Theiler window, so they differ only
 * in the samples, and each is exactly one of the windows whose DET and LAM the trend shows (its last
 * {@value #MAX_SAMPLES} samples when the window is longer). A window with a missing sample cannot be
 * embedded; the nearest earlier window without one is taken instead, and the thumbnail says which rows
 * it shows. Cost: one RQA of at most {@value #MAX_SAMPLES} vectors per thumbnail, without the N × N
 * matrix. Runs on the calling thread. Stateless.
 */
final class ThumbnailStep {
    /** Cells per side of a thumbnail; even, so a face can halve it exactly. */
    static final int SIZE = 16;
    /** Most samples a thumbnail covers. */
    static final int MAX_SAMPLES = 1000;

    private ThumbnailStep() {
    }

    /** The baseline and latest thumbnails of samples {@code x}, in that order; empty without an estimate. */
    static List<Thumbnail> of(double[] x, ChannelModel m, BaselineModel bm, Baseline b, TimeBase time) {
        List<Thumbnail> out = new ArrayList<>(2);
        if (m.embeddingDimension() < 1 || m.embeddingDelay() < 1 || !Double.isFinite(m.rqaRadius())) {
            return out;
        }
        RqaParams p = bm.rqa().withEmbedding(m.embeddingDimension(), m.embeddingDelay());
        Windows w = new Windows(x.length, bm.window(), bm.step());
        if (b.sameLog()) {
            int k = w.count() - 1;
            while (k >= 0 && !(w.end(k) <= b.toRow() && w.start(k) >= b.fromRow())) {
                k--;
            }
            plot(x, w, k, b.fromRow(), Thumbnail.Span.BASELINE, p, m.rqaRadius(), time).ifPresent(out::add);
        }
        plot(x, w, w.count() - 1, 0, Thumbnail.Span.LATEST, p, m.rqaRadius(), time).ifPresent(out::add);
        return out;
    }

    /**
     * The thumbnail of window {@code k}, or of the nearest earlier window starting at or after row
     * {@code first} that has no missing sample; empty when there is none or it does not fit the embedding.
     */
    private static Optional<Thumbnail> plot(double[] x, Windows w, int k, int first, Thumbnail.Span span,
                                                      RqaParams p, double radius, TimeBase time) {
        for (int j = k; j >= 0 && w.start(j) >= first; j--) {
            int to = w.end(j);
            int from = Math.max(w.start(j), to - MAX_SAMPLES);
            if (!finite(x, from, to)) {
                continue;
            }
            try {
                RecurrencePlot rp = new Rqa(1).plot(x, from, to, p, radius, SIZE, SIZE);
                int[] recurrences = new int[SIZE * SIZE];
                int[] pairs = new int[SIZE * SIZE];
                for (int y = 0; y < SIZE; y++) {
                    for (int c = 0; c < SIZE; c++) {
                        recurrences[y * SIZE + c] = rp.recurrences(c, y);
                        pairs[y * SIZE + c] = rp.pairs(c, y);
                    }
                }
                return Optional.of(new Thumbnail(span, from, to, time.seconds(from), time.seconds(to - 1),
                        radius, SIZE, SIZE, recurrences, pairs));
            } catch (IllegalArgumentException e) {
                return Optional.empty();
            }
        }
        return Optional.empty();
    }

    private static boolean finite(double[] x, int from, int to) {
        for (int i = from; i < to; i++) {
            if (!Double.isFinite(x[i])) {
                return false;
            }
        }
        return true;
    }
}
