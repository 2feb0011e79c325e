package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BaselineCommandTest {
    static final String LOG = ReportCommandTest.LOG;

    @TempDir
    Path dir;

    private Path onlyBaseline(Path store) throws Exception {
        try (Stream<Path> s = Files.walk(store)) {
            List<Path> files = s.filter(p -> p.toString().endsWith(".baseline")).toList();
            assertEquals(1, files.size(), files.toString());
            return files.get(0);
        }
    }

    @Test
    void saveListJudgeAgainstAndRemove() throws Exception {
        Path store = dir.resolve("store");
        MainTest.Run r = MainTest.run("baseline", "save", LOG, "--asset", "P-3", "--span", "0:1200", "--store",
                store.toString());
        assertEquals(0, r.status(), r.err());
        Path file = onlyBaseline(store);
        String id = file.getFileName().toString().replace(".baseline", "");
        assertEquals("baseline: " + file + "\nasset P-3, id " + id + ", 4 channels, rows 0-1200 of " + LOG + "\n",
                r.out());

        r = MainTest.run("baseline", "list", "--store", store.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("1 baseline in " + store.toAbsolutePath(), lines.get(0));
        assertTrue(lines.get(1).startsWith("P-3  " + id + "  saved "), lines.get(1));
        assertEquals("    from " + LOG + ", rows 0-1200", lines.get(2));
        // As GNU coreutils 9.1 sha256sum printed it for the fixture (see FileDigestTest).
        assertEquals("    SHA-256 9be6f054592f051b1bc7b75b495ab52d872e61ea1fca23fef47d9038b9fb470a", lines.get(3));
        assertEquals("    channels: suction, discharge, motor current, bearing temp", lines.get(4));

        r = MainTest.run("report", LOG, "-o", "-", "--asset", "P-3", "--stored-baseline", "--store", store.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("  Judged against:       rows 0-1200 of booster-p3.csv (stored baseline\n"
                + "                        " + id + "); not rows of this log\n"), r.out());
        assertTrue(r.out().contains("  Stored baseline:      " + id + " of asset P-3\n"), r.out());

        r = MainTest.run("baseline", "remove", "--asset", "P-3", id, "--store", store.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals("removed: " + file + "\n", r.out());
        assertTrue(Files.notExists(file));
    }

    @Test
    void refusalsAreOneLineWithTheirStatus() throws Exception {
        Path store = dir.resolve("store");
        MainTest.Run r = MainTest.run("baseline", "save", LOG, "--store", store.toString());
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: Missing required option: '--asset=ID'"), r.err());

        r = MainTest.run("report", LOG, "-o", "-", "--stored-baseline", "--store", store.toString());
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: --stored-baseline needs --asset ID\n"), r.err());

        r = MainTest.run("report", LOG, "-o", "-", "--asset", "P-9", "--stored-baseline", "--store", store.toString());
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: no stored baseline for asset 'P-9' in " + store.toAbsolutePath()
                + " (save one with: riffle baseline save LOG --asset P-9)\n", r.err());

        r = MainTest.run("report", LOG, "-o", "-", "--asset", "P-3", "--stored-baseline", "--baseline", "0:9");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: --baseline and --stored-baseline exclude each other\n"), r.err());

        r = MainTest.run("baseline", "remove", "--asset", "P-3", "--store", store.toString());
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: name the baselines to remove, or give --all\n"), r.err());

        r = MainTest.run("baseline", "save", LOG, "--asset", "P-3", "--span", "0:9999", "--store", store.toString());
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + LOG + ": --span 0:9999 ends after the last row of this log (4000 rows)\n", r.err());
    }

    @Test
    void aDamagedBaselineIsSkippedInTheListAndRefusedForJudging() throws Exception {
        Path store = dir.resolve("store");
        assertEquals(0, MainTest.run("baseline", "save", LOG, "--asset", "P-3", "--store", store.toString()).status());
        Path file = onlyBaseline(store);
        String text = Files.readString(file);
        Files.writeString(file, text.substring(0, text.lastIndexOf('\n', text.length() / 2) + 1));
        MainTest.Run r = MainTest.run("baseline", "list", "--store", store.toString());
        assertEquals(0, r.status());
        assertEquals("0 baselines in " + store.toAbsolutePath() + "\n", r.out());
        assertEquals("riffle: skipped: " + file + ": cut off (no end line); the file is incomplete or damaged\n",
                r.err());
        r = MainTest.run("report", LOG, "-o", "-", "--asset", "P-3", "--stored-baseline", "--store", store.toString());
        assertEquals(ExitCode.BAD_INPUT, r.status());
    }

    @Test
    void helpMatchesTheGoldenText() {
        Golden.assertMatches("baseline-help.expected.txt", MainTest.run("baseline", "--help").out()
                + MainTest.run("baseline", "save", "--help").out() + MainTest.run("baseline", "list", "--help").out()
                + MainTest.run("baseline", "remove", "--help").out());
    }
}
