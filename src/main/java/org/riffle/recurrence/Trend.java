package org.riffle.recurrence;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.riffle.embed.EmbeddingEstimate;

/**
 * A windowed RQA trend of one channel: windows of {@code window} samples every {@code step} samples, each
 * measured with the baseline's embedding and the baseline's radius ε, reused unchanged (the threshold
 * policy is kept fixed across windows, as Kraemer et al. 2018, Chaos 28:085720 advise).
 *
 * <p>Immutable.
 *
 * @param params the parameters used, m and τ resolved; {@code params.threshold()} is the policy by which
 *        ε was fixed on the baseline
 * @param radius ε in the channel's unit, fixed on the baseline
 * @param baselineFrom first baseline sample (inclusive)
 * @param baselineTo end of the baseline (exclusive)
 * @param window W, samples per window
 * @param step S, samples between window starts
 * @param estimate how m and τ were estimated on the baseline, empty when both were given
 * @param windows one result per window, oldest first; a window with missing samples is skipped, with
 *        the reason
 */
public record Trend(RqaParams params, double radius, int baselineFrom, int baselineTo, int window, int step,
                    Optional<EmbeddingEstimate> estimate, List<RqaResult> windows) {
    public Trend {
        Objects.requireNonNull(params, "params");
        Objects.requireNonNull(estimate, "estimate");
        windows = List.copyOf(windows);
    }

    /** The windows that lie wholly inside the baseline. */
    public List<RqaResult> baselineWindows() {
        return windows.stream().filter(r -> r.from() >= baselineFrom && r.to() <= baselineTo).toList();
    }
}
