package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import org.junit.jupiter.api.Test;

class UnitsTest {
    private static void splits(String header, String name, String unit) {
        assertEquals(new Units.Split(name, unit), Units.split(header), header);
    }

    @Test
    void aUnitInBracketsOrInParenthesesThatLookLikeAUnitIsSplitOff() {
        splits("flow [m³/h]", "flow", "m³/h");
        splits("  motor current   [ A ]  ", "motor current", "A");
        splits("flow (m3/h)", "flow", "m3/h");
        splits("speed (rpm)", "speed", "rpm");
        splits("pressure (inlet)", "pressure (inlet)", "");
        splits("[bar]", "[bar]", "");
        splits("a [b] c", "a [b] c", "");
        splits("a [b]]", "a [b]]", "");
        splits("x [a [b]", "x [a", "b");
        splits("temp [°C] (avg)", "temp [°C] (avg)", "");
        splits("level []", "level", "");
    }

    /**
     * A fuzzed log's 760,000-character header cell took minutes in the earlier regular expression (a lazy
     * name before a bracketed group backtracks quadratically); the scan is linear.
     */
    @Test
    void aHugeHeaderCellIsSplitInLinearTime() {
        String cell = "t".repeat(760_000) + "[" + "7".repeat(368_000);
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> splits(cell, cell, ""));
        String many = "[(".repeat(200_000) + "x";
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> splits(many, many, ""));
    }
}
