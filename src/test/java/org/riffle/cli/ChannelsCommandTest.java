package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class ChannelsCommandTest {
    static final String SMALL = "src/test/resources/org/riffle/cli/channels-small.csv";

    private static String runWithEnv(Map<String, String> env, String... args) {
        StringWriter out = new StringWriter();
        CommandLine cl = new CommandLine(new ChannelsCommand(env));
        cl.setOut(new PrintWriter(out, true));
        assertEquals(0, cl.execute(args));
        return out.toString();
    }

    @Test
    void textTableMatchesTheGoldenText() {
        MainTest.Run r = MainTest.run("channels", "--ascii", SMALL);
        assertEquals(0, r.status(), r.err());
        Golden.assertMatches("channels-small.expected.txt", r.out());
    }

    /**
     * A name holding a format character (a right-to-left override, which the reader lets through as
     * text) is printed in its inert spelling and the columns after it stay aligned.
     */
    @Test
    void aNameThatNeedsNeutralisingKeepsTheTableAligned(@org.junit.jupiter.api.io.TempDir Path dir)
            throws IOException {
        Path log = dir.resolve("esc.csv");
        StringBuilder sb = new StringBuilder("time,\u202ewipe [bar],plain [bar]\n");
        for (int i = 0; i < 50; i++) {
            sb.append(i).append(',').append(i % 7).append(',').append(i % 5).append('\n');
        }
        Files.writeString(log, sb.toString(), StandardCharsets.UTF_8);
        MainTest.Run r = MainTest.run("channels", "--ascii", log.toString());
        assertEquals(0, r.status(), r.err());
        assertFalse(r.out().contains("\u202e"), r.out());
        List<String> table = r.out().lines().filter(l -> l.startsWith("channel") || l.contains("bar ")).toList();
        assertEquals(3, table.size(), r.out());
        int unitColumn = table.get(0).indexOf("unit");
        for (String l : table.subList(1, 3)) {
            assertEquals("bar", l.substring(unitColumn, unitColumn + 3), "unit column aligned in:\n" + r.out());
        }
    }

    @Test
    void helpTextsMatchTheGoldenText() {
        Golden.assertMatches("riffle-help.expected.txt", MainTest.run("--help").out());
        Golden.assertMatches("channels-help.expected.txt", MainTest.run("channels", "--help").out());
    }

    /**
     * Every statistic of {@code --csv} against NumPy 2.4.6 / SciPy 1.17.1 on the same 32-bit samples
     * ({@code channels_small.py}, committed with its output). Tolerance: relative 1e-6, as the CSV
     * rounds to 7 significant digits (relative error ≤ 5e-7) and the double sums differ far less.
     */
    @Test
    void csvAgreesWithScipy() throws IOException {
        List<Map<String, String>> rows = csvAgreesWith(SMALL, "channels-small-scipy.csv");
        for (Map<String, String> got : rows) {
            assertEquals("1", got.get("rate_hz"));
            assertEquals("39", got.get("span_s"));
            assertEquals("0", got.get("gaps"));
        }
    }

    /**
     * The demo process log through the real reader and {@code --csv}, against NumPy 2.4.6 / SciPy
     * 1.17.1 ({@code channels_demo.py}): the {@code NaN} and {@code ---} tokens count as missing, the
     * status column is left out, the logger restart is one gap. Tolerance as above.
     */
    @Test
    void demoProcessLogAgreesWithNumpy() throws IOException {
        List<Map<String, String>> rows = csvAgreesWith("fixtures/demo/af2-process.csv", "af2-process-numpy.csv");
        assertEquals(8, rows.size());
        assertEquals("\u00b0C", rows.get(3).get("unit"));
        for (Map<String, String> got : rows) {
            assertEquals("0.1", got.get("rate_hz"));
            assertEquals("172794", got.get("span_s"), "2026-02-16T00:00:00 to 2026-02-17T23:59:54");
            assertEquals("1", got.get("gaps"), "the logger restart");
        }
    }

    @Test
    void demoTableMatchesTheGoldenText() {
        MainTest.Run r = MainTest.run("channels", "--ascii", "fixtures/demo/af2-process.csv");
        assertEquals(0, r.status(), r.err());
        Golden.assertMatches("af2-process.channels.expected.txt", r.out());
    }

    /** Runs {@code channels --csv log} and compares each row's statistics with the reference file. */
    private static List<Map<String, String>> csvAgreesWith(String log, String reference) throws IOException {
        MainTest.Run r = MainTest.run("channels", "--csv", log);
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        String[] head = lines.get(0).split(",", -1);
        assertTrue(lines.get(0).startsWith("channel,unit,samples,missing,rate_hz,mean,std,min,max,rms,crest,kurtosis"),
                lines.get(0));
        List<String> ref = Files.readAllLines(Path.of("src/test/resources/org/riffle/cli", reference),
                StandardCharsets.UTF_8);
        String[] refHead = ref.get(1).split(",");
        assertEquals(ref.size() - 2, lines.size() - 1, "one row per channel");
        List<Map<String, String>> rows = new ArrayList<>();
        for (int row = 0; row < lines.size() - 1; row++) {
            Map<String, String> got = fields(head, lines.get(row + 1).split(",", -1));
            Map<String, String> want = fields(refHead, ref.get(row + 2).split(","));
            assertEquals(want.get("channel"), got.get("channel"));
            for (String k : refHead) {
                if (k.equals("channel")) {
                    continue;
                }
                double w = Double.parseDouble(want.get(k));
                double g = Double.parseDouble(got.get(k));
                assertEquals(w, g, 1e-6 * Math.abs(w), want.get("channel") + " " + k + ": reference " + w + ", riffle " + g);
            }
            rows.add(got);
        }
        return rows;
    }

    @Test
    void csvNumbersArePlainDecimalsWithAPoint() {
        String out = MainTest.run("channels", "--csv", SMALL).out();
        for (String line : out.lines().skip(1).toList()) {
            for (String f : line.split(",", -1)) {
                assertTrue(f.isEmpty() || !Character.isDigit(f.charAt(f.length() - 1))
                        || f.matches("-?\\d+(\\.\\d+)?"), "'" + f + "' in " + line);
            }
        }
    }

    @Test
    void sparklineUsesBlocksOnlyWhenTheLocaleIsUtf8() {
        String unicode = runWithEnv(Map.of("LANG", "en_GB.UTF-8"), SMALL);
        assertTrue(unicode.contains("\u2588"), unicode);
        String ascii = runWithEnv(Map.of("LANG", "C"), SMALL);
        assertFalse(ascii.chars().anyMatch(c -> c >= 0x2581 && c <= 0x2588), ascii);
        assertTrue(ascii.contains("@"), ascii);
        String forced = runWithEnv(Map.of("LC_ALL", "C.UTF-8"), "--ascii", SMALL);
        assertEquals(ascii, forced);
    }

    @Test
    void localeDecisionFollowsPosixPrecedence() {
        assertTrue(ChannelsCommand.utf8(Map.of("LANG", "de_CH.utf8")));
        assertFalse(ChannelsCommand.utf8(Map.of()));
        assertFalse(ChannelsCommand.utf8(Map.of("LC_ALL", "C", "LANG", "en_US.UTF-8")), "LC_ALL wins");
        assertTrue(ChannelsCommand.utf8(Map.of("LC_CTYPE", "C.UTF-8", "LANG", "C")), "LC_CTYPE before LANG");
        Map<String, String> emptyAll = new HashMap<>();
        emptyAll.put("LC_ALL", "");
        emptyAll.put("LANG", "en_US.UTF-8");
        assertTrue(ChannelsCommand.utf8(emptyAll), "an empty LC_ALL is not set");
    }

    @Test
    void directoryIsBadInputNamedInOneLine() {
        MainTest.Run r = MainTest.run("channels", "src");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: src: is a directory, not a log file", r.err().strip());
    }

    private static Map<String, String> fields(String[] names, String[] values) {
        Map<String, String> m = new HashMap<>();
        for (int i = 0; i < names.length; i++) {
            m.put(names[i], values[i]);
        }
        return m;
    }
}
