package org.riffle.recurrence;

import java.util.Objects;
import java.util.Optional;
import org.riffle.embed.EmbeddingEstimate;

/**
 * The recurrence quantification of one run of samples, with the parameters it was computed with (the
 * embedding always resolved) and the sample range it came from.
 *
 * <p>Every count is over the full N × N recurrence matrix of the N delay vectors (both triangles), cells
 * with |i − j| &lt; w excluded (Marwan, Romano, Thiel &amp; Kurths 2007, Physics Reports 438:237, §3):
 * <ul>
 * <li>{@code rr} = recurrent cells / eligible cells;</li>
 * <li>{@code det} = points on diagonal lines of length ≥ l_min / all recurrent points; {@code l} = mean
 *     length of those lines; {@code lmax} = the longest of them (0 when there is none);
 *     {@code div} = 1 / lmax; {@code entr} = Shannon entropy (natural log) of the length distribution of
 *     those lines;</li>
 * <li>{@code lam}, {@code tt} and {@code vmax} likewise from vertical lines of length ≥ v_min.</li>
 * </ul>
 * Lines touching the matrix border keep their truncated length; the excluded band cuts vertical lines.
 * Undefined values (a ratio over zero) are {@code NaN}.
 *
 * <p>Immutable.
 *
 * @param params the parameters used, m and τ resolved
 * @param from first sample of the run (inclusive), an index into the series given to the engine
 * @param to end of the run (exclusive)
 * @param vectors N, the number of delay vectors
 * @param radius ε in the channel's unit ({@code NaN} when skipped)
 * @param recurrent recurrent cells counted (full matrix)
 * @param eligible cells eligible (full matrix minus the Theiler band)
 * @param rr recurrence rate
 * @param det determinism
 * @param l mean diagonal line length
 * @param lmax longest diagonal line
 * @param div divergence, 1 / lmax
 * @param entr entropy of diagonal line lengths (nats)
 * @param lam laminarity
 * @param tt trapping time, mean vertical line length
 * @param vmax longest vertical line
 * @param estimate how m and τ were estimated, empty when both were given
 * @param skipped why nothing was computed (for example missing samples), {@code ""} when computed
 */
public record RqaResult(RqaParams params, int from, int to, int vectors, double radius, long recurrent,
                        long eligible, double rr, double det, double l, int lmax, double div, double entr,
                        double lam, double tt, int vmax, Optional<EmbeddingEstimate> estimate, String skipped) {
    public RqaResult {
        Objects.requireNonNull(params, "params");
        Objects.requireNonNull(estimate, "estimate");
        Objects.requireNonNull(skipped, "skipped");
        if (from < 0 || to < from) {
            throw new IllegalArgumentException("sample range " + from + ":" + to + " is reversed or negative");
        }
    }

    /** A run for which nothing was computed, for the reason given; every measure is {@code NaN}. */
    static RqaResult skipped(RqaParams params, int from, int to, int vectors, String reason) {
        return new RqaResult(params, from, to, vectors, Double.NaN, 0, 0, Double.NaN, Double.NaN, Double.NaN, 0,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0, Optional.empty(), reason);
    }

    /** True when the measures were computed. */
    public boolean computed() {
        return skipped.isEmpty();
    }
}
