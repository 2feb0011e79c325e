package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.fail;

/** The one tolerance check of these tests: |actual − expected| ≤ tol, the failure naming both numbers. */
final class Close {
    private Close() {
    }

    static void assertClose(String what, double expected, double actual, double tol) {
        if (!(Math.abs(actual - expected) <= tol)) {
            fail(what + ": expected " + expected + " ± " + tol + " but was " + actual + " (off by "
                    + Math.abs(actual - expected) + ")");
        }
    }
}
