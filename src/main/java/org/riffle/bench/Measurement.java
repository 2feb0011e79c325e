package org.riffle.bench;

import java.util.Arrays;

/**
 * The measured values of one metric of one benchmark, in the metric's unit. Immutable.
 *
 * @param name benchmark name
 * @param metric what was measured and its target
 * @param values every measured run, in run order, at least one
 */
record Measurement(String name, Metric metric, double[] values) {
    Measurement {
        if (values.length == 0) {
            throw new IllegalArgumentException("benchmark '" + name + "' has no measured values");
        }
        values = values.clone();
    }

    /** The median of the measured runs (the mean of the middle two when their number is even). */
    double median() {
        double[] s = values.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
    }

    double min() {
        return Arrays.stream(values).min().orElseThrow();
    }

    double max() {
        return Arrays.stream(values).max().orElseThrow();
    }

    /** {@code "met"}, {@code "MISSED"}, or {@code "-"} when there is no target or targets do not apply. */
    String verdict(boolean targetsApply) {
        if (!targetsApply || Double.isNaN(metric.target())) {
            return "-";
        }
        if (Double.isNaN(median())) {
            return "n/a";
        }
        return median() <= metric.target() ? "met" : "MISSED";
    }
}
