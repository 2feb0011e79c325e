package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The severity columns of {@code riffle channels --csv}, end to end from a log file. */
class ChannelsSeverityTest {
    @TempDir
    static Path dir;
    private static Path log;

    /** 8 s at 5120 Hz without a time column: a 0.1 in/s peak sine at 29.3 Hz, and a pressure channel. */
    @BeforeAll
    static void writeLog() throws IOException {
        StringBuilder b = new StringBuilder("v [in/s],p [bar]\n");
        for (int i = 0; i < 5120 * 8; i++) {
            b.append(String.format(Locale.ROOT, "%.7f,%.3f%n", 0.1 * Math.sin(2 * Math.PI * 29.3 * i / 5120.0),
                    2 + 0.01 * Math.sin(i * 0.001)));
        }
        log = dir.resolve("velocity.csv");
        Files.writeString(log, b.toString(), StandardCharsets.UTF_8);
    }

    private static String[] column(List<String> lines, String name) {
        int at = Arrays.asList(lines.get(0).split(",")).indexOf(name);
        return lines.stream().skip(1).map(l -> l.split(",", -1)[at]).toArray(String[]::new);
    }

    /**
     * 0.1 in/s peak is 1.80 mm/s RMS (DOMAIN.md §3; analytic 0.1 × 25.4 / √2 = 1.796); zone B of group 2
     * rigid (1.4 &lt; v ≤ 2.8, boundaries from memory — verify). 1 %: see SeverityTest.
     */
    @Test
    void velocityAndZoneColumns() {
        MainTest.Run r = MainTest.run("channels", "--csv", "--time-column", "none", "--rate", "5120",
                "--machine-group", "2", "--support", "rigid", log.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        String[] v = column(lines, "velocity_rms_mm_s");
        assertEquals(1.796, Double.parseDouble(v[0]), 0.018);
        assertEquals("", v[1], "pressure has no velocity");
        assertEquals(List.of("B", ""), List.of(column(lines, "zone")));
    }

    @Test
    void withoutGroupAndSupportThereIsAVelocityButNoZone() {
        MainTest.Run r = MainTest.run("channels", "--csv", "--time-column", "none", "--rate", "5120",
                log.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(1.796, Double.parseDouble(column(lines, "velocity_rms_mm_s")[0]), 0.018);
        assertEquals(List.of("", ""), List.of(column(lines, "zone")));
    }
}
