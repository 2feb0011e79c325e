package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle bench}: the list, a small real run through Main, its work folder and its usage errors. */
class BenchCommandTest {
    @TempDir
    Path dir;

    @Test
    void listNamesEveryBenchmarkOfTheIssue() {
        MainTest.Run r = MainTest.run("bench", "--list");
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("read CSV 1M rows x 8 ch", lines.get(0));
        assertTrue(lines.contains("riffle report, 1M rows x 8 ch (child JVM)"), r.out());
        assertTrue(lines.contains("screen, 1M rows x 8 ch (child JVM)"), r.out());
        assertEquals(16, lines.size(), r.out());
    }

    @Test
    void aQuickRunPrintsTheMachineAndATableWithoutVerdictsAndKeepsTheGivenWorkFolder() {
        Path work = dir.resolve("work");
        MainTest.Run r = MainTest.run("bench", "--quick", "--only", "read CSV", "--warmups", "0", "--runs", "2",
                "--work", work.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("# riffle bench --quick (small sizes, no verdicts): "
                + Runtime.getRuntime().availableProcessors() + " cores, "), r.out());
        assertTrue(r.out().matches("(?s).*\\| read CSV 20k rows x 8 ch \\| wall, ms \\| [0-9.]+ \\| [0-9.]+ \\| "
                + "[0-9.]+ \\| - \\| - \\|\n.*"), r.out());
        assertTrue(Files.isRegularFile(work.resolve("bench-20000x8.csv")), "the input stays for next time");
    }

    @Test
    void noMeasuredRunIsAUsageError() {
        MainTest.Run r = MainTest.run("bench", "--runs", "0");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().contains("--warmups 3 and --runs 0: need --warmups >= 0 and --runs >= 1"), r.err());
    }

    @Test
    void helpMatchesTheGoldenText() {
        Golden.assertMatches("bench-help.expected.txt", MainTest.run("bench", "--help").out());
    }
}
