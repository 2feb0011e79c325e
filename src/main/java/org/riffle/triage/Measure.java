package org.riffle.triage;

import java.util.Objects;

/**
 * One measure of a channel against its baseline: the baseline's typical value, the recent value, and
 * how far the recent value departs, in units of the baseline's own spread (NaN when undefined).
 * Immutable.
 *
 * @param name short name as the trade uses it, e.g. {@code "DET"}, {@code "LAM"}, {@code "mean"}
 * @param baseline typical value over the baseline windows
 * @param current value over the most recent windows
 * @param departure signed departure in baseline spreads (for example a robust z-score)
 */
public record Measure(String name, double baseline, double current, double departure) {
    public Measure {
        Objects.requireNonNull(name, "name");
    }
}
