package org.riffle.bench;

import java.util.Locale;

/**
 * One measured quantity of a benchmark and the target its median is held to. Immutable.
 *
 * @param label what is measured, e.g. {@code "wall"} or {@code "peak RSS"}
 * @param unit its unit, e.g. {@code "ms"} or {@code "MB"}
 * @param target the largest acceptable median in {@code unit}, or {@code NaN} when there is no target
 */
record Metric(String label, String unit, double target) {
    Metric {
        if (label.isBlank() || unit.isBlank()) {
            throw new IllegalArgumentException("metric label '" + label + "' and unit '" + unit
                    + "' must not be blank");
        }
        if (!(target > 0) && !Double.isNaN(target)) {
            throw new IllegalArgumentException("metric '" + label + "' target " + target
                    + " must be positive or NaN");
        }
    }

    /** Wall-clock milliseconds with a target in milliseconds ({@code NaN}: none). */
    static Metric wallMillis(double target) {
        return new Metric("wall", "ms", target);
    }

    /** The target as text, e.g. {@code "<= 8000 ms"}, or {@code "-"}. */
    String targetText() {
        return Double.isNaN(target) ? "-" : String.format(Locale.ROOT, "<= %s %s", plain(target), unit);
    }

    private static String plain(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
