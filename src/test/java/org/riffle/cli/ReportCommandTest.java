package org.riffle.cli;

import org.riffle.log.ReadOptions;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.note.Findings;
import org.riffle.note.NoteWriter;
import org.riffle.triage.TriageParams;

class ReportCommandTest {
    static final String LOG = "src/test/resources/org/riffle/note/booster-p3.csv";

    @TempDir
    Path dir;

    /**
     * The read options reach the report: a log whose dates can be read day first or month first is
     * refused with the option that settles it, and reported when the option is given.
     */
    @Test
    void theReadOptionsSettleAnAmbiguousLogForTheReport() throws Exception {
        Path log = dir.resolve("ambiguous.csv");
        StringBuilder sb = new StringBuilder("time,flow [m3/s]\n");
        for (int i = 0; i < 2000; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "03/04/2026 %02d:%02d:%02d,%.2f%n", i / 3600,
                    i / 60 % 60, i % 60, 30 + Math.sin(0.1 * i)));
        }
        java.nio.file.Files.writeString(log, sb.toString());
        Path note = dir.resolve("ambiguous-note.txt");
        MainTest.Run refused = MainTest.run("report", log.toString(), "-o", note.toString());
        assertEquals(ExitCode.BAD_INPUT, refused.status(), refused.err());
        assertTrue(refused.err().contains("give --day-first or --month-first"), refused.err());
        MainTest.Run done = MainTest.run("report", log.toString(), "-o", note.toString(), "--day-first");
        assertEquals(0, done.status(), done.err());
        assertTrue(java.nio.file.Files.readString(note).contains("2026-04-03"), "read as 3 April");
    }

    @Test
    void aNoteIsWrittenWithWhatWasGivenAndWhereItWentIsPrinted() throws Exception {
        Path note = dir.resolve("p3.txt");
        MainTest.Run r = MainTest.run("report", LOG, "-o", note.toString(), "--site", "Hollow Creek",
                "--asset", "P-3", "--point", "outboard bearing", "--technician", "R. Ortiz",
                "--conditions", "1480 r/min", "--comment", "Escalated to the analyst.");
        assertEquals(0, r.status(), r.err());
        assertEquals("note: " + note + "\n", r.out());
        assertEquals("", r.err());
        String text = Files.readString(note, StandardCharsets.UTF_8);
        for (String line : List.of("  Site:                   Hollow Creek", "  Asset:                  P-3",
                "  Measuring point:        outboard bearing", "  Technician:             R. Ortiz",
                "  Operating conditions:   1480 r/min", "  Escalated to the analyst.",
                "  " + LOG, "  [4/4] bearing temp [", "END OF NOTE")) {
            assertTrue(text.contains(line + "\n") || text.contains(line), "missing '" + line + "' in\n" + text);
        }
        assertTrue(text.startsWith("RIFFLE FINDINGS NOTE\nWritten "), text);
    }

    @Test
    void anExistingNoteIsKeptAndTheNewNameIsShown() throws Exception {
        Path note = Files.writeString(dir.resolve("p3.txt"), "an older note\n");
        MainTest.Run r = MainTest.run("report", LOG, "-o", note.toString());
        assertEquals(0, r.status(), r.err());
        Path second = dir.resolve("p3-2.txt");
        assertEquals("note: " + second + "\n", r.out());
        assertEquals("riffle: " + note + " exists and was kept; the note went to " + second + "\n", r.err());
        assertEquals("an older note\n", Files.readString(note));
        assertTrue(Files.readString(second).startsWith("RIFFLE FINDINGS NOTE\n"));
    }

    @Test
    void aDashSendsTheNoteToStandardOutputAndAFolderTakesTheDefaultName() throws Exception {
        MainTest.Run r = MainTest.run("report", LOG, "-o", "-", "--ascii");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("RIFFLE FINDINGS NOTE\n") && r.out().endsWith("END OF NOTE\n"), r.out());
        assertTrue(r.out().chars().allMatch(c -> c < 0x80), "--ascii gives ASCII only");
        r = MainTest.run("report", LOG, "-o", dir.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals("note: " + dir.resolve("booster-p3-note.txt") + "\n", r.out());
    }

    @Test
    void metricsGoToCsvWithOneRowPerChannel() throws Exception {
        Path csv = dir.resolve("figures.csv");
        MainTest.Run r = MainTest.run("report", LOG, "-o", dir.resolve("n.txt").toString(), "--metrics",
                csv.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().endsWith("metrics: " + csv + "\n"), r.out());
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        assertEquals(5, lines.size(), String.join("\n", lines));
        assertTrue(lines.get(0).startsWith("file,channel,unit,samples,missing,min,max,mean,std,rms"), lines.get(0));
        assertTrue(lines.get(2).startsWith(LOG + ",discharge,bar,4000,0,"), lines.get(2));
    }

    @Test
    void aFolderGivesOneNotePerLogAndOneSummaryAndSkipsABadLog() throws Exception {
        Path logs = Files.createDirectory(dir.resolve("logs"));
        Files.copy(Path.of(LOG), logs.resolve("a.csv"));
        Files.copy(Path.of(LOG), logs.resolve("b.csv"));
        Files.write(logs.resolve("c.csv"), new byte[] {0x1f, 0x01, 0x02, 0x03, 0x00, 0x7f});
        Files.writeString(logs.resolve("readme.md"), "not a log\n");
        Files.writeString(logs.resolve("old-note.txt"), "riffle's own output is not a log\n");
        Path out = Files.createDirectory(dir.resolve("out"));
        MainTest.Run r = MainTest.run("report", logs.toString(), "-o", out.toString(), "--asset", "P-3");
        assertEquals(ExitCode.BAD_INPUT, r.status(), r.err());
        assertEquals("note: " + out.resolve("a-note.txt") + "\nnote: " + out.resolve("b-note.txt") + "\nsummary: "
                + out.resolve("riffle-summary.csv") + "\n", r.out());
        assertTrue(r.err().startsWith("riffle: " + logs.resolve("c.csv") + ": "), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        List<String> summary = Files.readAllLines(out.resolve("riffle-summary.csv"));
        assertEquals(9, summary.size(), "header and 4 channels of each good log");
        assertTrue(summary.get(5).startsWith(logs.resolve("b.csv") + ",suction,bar,"), summary.get(5));
        assertTrue(Files.readString(out.resolve("b-note.txt")).contains("Asset:                  P-3"));
    }

    @Test
    void theProgressLineIsDrawnOnlyForATerminal() throws Exception {
        Path logs = Files.createDirectory(dir.resolve("logs"));
        Files.copy(Path.of(LOG), logs.resolve("a.csv"));
        Files.copy(Path.of(LOG), logs.resolve("b.csv"));
        for (boolean terminal : new boolean[] {true, false}) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            Path o = Files.createDirectory(dir.resolve("o" + terminal));
            int status = new ReportBatch(new PrintWriter(out), new PrintWriter(err), terminal).run(List.of(logs), o,
                    null, new ReportCommand.Judging(new TriageParams(-1, -1, 2), null, null,
                            ReadOptions.defaults()), NoteWriter.standard(),
                    Findings.EMPTY);
            assertEquals(0, status, err.toString());
            assertEquals(terminal, err.toString().contains("\rriffle report: 2 of 2 logs done"), err.toString());
            assertEquals(terminal, !err.toString().isEmpty(), "nothing on a non-terminal: '" + err + "'");
        }
    }

    @Test
    void filesAndFoldersTogetherAreAUsageError() {
        MainTest.Run r = MainTest.run("report", LOG, dir.toString());
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: give either log files or folders of logs, not both\n"), r.err());
    }

    @Test
    void aBadBaselineSpanIsAUsageErrorAndOneTooLongIsBadInput() {
        MainTest.Run r = MainTest.run("report", LOG, "-o", "-", "--baseline", "30");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: --baseline '30' must be A:B with whole row numbers 0 <= A < B\n"),
                r.err());
        r = MainTest.run("report", LOG, "-o", "-", "--baseline", "10:5000");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + LOG + ": --baseline 10:5000 ends after the last row of this log (4000 rows)\n",
                r.err());
    }

    @Test
    void anUnwritableFolderIsOneLineAndStatus1() {
        assumeTrue(Files.isDirectory(Path.of("/proc/self")), "Linux /proc, where no one can create a file");
        MainTest.Run r = MainTest.run("report", LOG, "-o", "/proc/p3.txt");
        assertEquals(ExitCode.FAILED, r.status());
        assertEquals("riffle: /proc: cannot write in this folder (permission denied or read-only); choose another"
                + " path for the note (your comments are kept)\n", r.err());
        assertFalse(r.err().contains("Exception"));
    }

    @Test
    void aMissingLogIsBadInput() {
        MainTest.Run r = MainTest.run("report", "no-such.csv", "-o", "-");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: no-such.csv: no such file\n", r.err());
    }

    @Test
    void helpMatchesTheGoldenText() {
        Golden.assertMatches("report-help.expected.txt", MainTest.run("report", "--help").out());
    }
}
