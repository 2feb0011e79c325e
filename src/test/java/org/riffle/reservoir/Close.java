package org.riffle.reservoir;

import static org.junit.jupiter.api.Assertions.fail;

/** One tolerance helper: |actual − expected| ≤ tol, the failure message printing both numbers. */
final class Close {
    private Close() {
    }

    static void within(double expected, double actual, double tol, String what) {
        if (!(Math.abs(actual - expected) <= tol)) {
            fail(what + ": expected " + expected + " ± " + tol + " but was " + actual + " (off by "
                    + Math.abs(actual - expected) + ")");
        }
    }
}
