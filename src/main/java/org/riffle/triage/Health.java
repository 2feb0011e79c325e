package org.riffle.triage;

import java.util.Objects;

/**
 * A channel's health estimate: a figure from 0 to 100 (100 = indistinguishable from baseline), the
 * level, and since when the channel has departed; or "no estimate" with the reason. Immutable.
 *
 * @param figure 0–100, {@code NaN} when there is no estimate
 * @param level the channel's level, {@code null} when there is no estimate
 * @param sinceIndex first sample of the first sustained departure, -1 when none
 * @param sinceSeconds the same as seconds of the time base, {@code NaN} when none
 * @param noEstimateReason why there is no estimate, {@code ""} when there is one
 */
public record Health(double figure, Level level, int sinceIndex, double sinceSeconds, String noEstimateReason) {
    public Health {
        Objects.requireNonNull(noEstimateReason, "noEstimateReason");
        if (noEstimateReason.isEmpty() == Double.isNaN(figure)) {
            throw new IllegalArgumentException("health figure " + figure + " with reason '"
                    + noEstimateReason + "': give exactly one");
        }
    }

    /** No estimate, for the reason given. */
    public static Health none(String reason) {
        return new Health(Double.NaN, null, -1, Double.NaN, reason);
    }

    /** True when there is a figure. */
    public boolean estimated() {
        return noEstimateReason.isEmpty();
    }
}
