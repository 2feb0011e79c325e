package org.riffle.recurrence;

import java.util.Optional;
import org.riffle.embed.EmbeddingEstimate;

/**
 * The RQA measures from exact line-length histograms (Marwan, Romano, Thiel &amp; Kurths 2007, Physics
 * Reports 438:237, eqs. 9–21 in our conventions; see {@link RqaResult}). Every sum runs over integer
 * counts in ascending length, so the measures depend only on the histograms, never on how the work was
 * split.
 *
 * <p>Stateless.
 */
final class Measures {
    private Measures() {
    }

    /**
     * @param upperRecurrent recurrent cells of the upper triangle (the full matrix has twice as many)
     * @param upperDiag diagonal line lengths of the upper triangle (mirrored in the lower one)
     * @param vert vertical line lengths of the full matrix
     */
    static RqaResult of(RqaParams p, Segment seg, int to, double radius, long upperRecurrent, long[] upperDiag,
                        long[] vert, Optional<EmbeddingEstimate> estimate) {
        long eligible = seg.eligible(p.theiler());
        long rec = 2 * upperRecurrent;
        double rr = eligible > 0 ? (double) rec / eligible : Double.NaN;
        Lines d = Lines.of(upperDiag, p.minLine());
        Lines v = Lines.of(vert, p.minVert());
        double det = rec > 0 ? (double) (2 * d.points) / rec : Double.NaN;
        double lam = rec > 0 ? (double) v.points / rec : Double.NaN;
        double div = d.longest > 0 ? 1.0 / d.longest : Double.NaN;
        return new RqaResult(p, seg.from(), to, seg.vectors(), radius, rec, eligible, rr, det, d.mean(),
                d.longest, div, d.entropy, lam, v.mean(), v.longest, estimate, "");
    }

    /** Lines of length ≥ the minimum: how many, their points, the longest, the entropy of lengths. */
    private record Lines(long count, long points, int longest, double entropy) {
        static Lines of(long[] hist, int min) {
            long count = 0;
            long points = 0;
            int longest = 0;
            for (int len = min; len < hist.length; len++) {
                if (hist[len] > 0) {
                    count += hist[len];
                    points += len * hist[len];
                    longest = len;
                }
            }
            double entropy = Double.NaN;
            if (count > 0) {
                entropy = 0;
                for (int len = min; len < hist.length; len++) {
                    if (hist[len] > 0) {
                        double q = (double) hist[len] / count;
                        entropy -= q * Math.log(q);
                    }
                }
            }
            return new Lines(count, points, longest, entropy);
        }

        double mean() {
            return count > 0 ? (double) points / count : Double.NaN;
        }
    }
}
