package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;

/**
 * {@code riffle rqa}: the wiring from options to the engine and back to text. The numbers themselves are
 * checked in the recurrence package (brute force, analytic results); here each printed value must equal
 * the engine's on the same samples, to the 7 significant digits printed.
 */
class RqaCommandTest {
    @TempDir
    Path dir;

    /** An invented log: a 1 s time column and one noisy oscillating channel, seeded. */
    static Path log(Path dir, int rows, int gapAt) throws IOException {
        StringBuilder sb = new StringBuilder("time,vib\n");
        SplittableRandom rnd = new SplittableRandom(7);
        for (int i = 0; i < rows; i++) {
            double v = Math.sin(0.3 * i) + 0.2 * rnd.nextDouble();
            sb.append(String.format("2026-03-01T%02d:%02d:%02d,%s%n", i / 3600, i / 60 % 60, i % 60,
                    i == gapAt ? "" : String.format(java.util.Locale.ROOT, "%.4f", v)));
        }
        Path p = dir.resolve("bearing.csv");
        Files.writeString(p, sb.toString(), StandardCharsets.UTF_8);
        return p;
    }

    static double[] samples(Path log) throws LogException {
        return LogReader.read(log, ReadOptions.defaults()).channel("vib").orElseThrow().toDoubles();
    }

    /** Header to value, from a two-line CSV. */
    static Map<String, String> row(String csv) {
        String[] lines = csv.split("\\R");
        String[] h = lines[0].split(",");
        String[] v = lines[1].split(",");
        Map<String, String> m = new HashMap<>();
        for (int k = 0; k < h.length; k++) {
            m.put(h[k], v[k]);
        }
        return m;
    }

    /** Printed to 7 significant digits: relative error at most 5e-7 (NaN must print as NaN). */
    static void close(double want, String got, String what) {
        if (Double.isNaN(want)) {
            assertEquals("NaN", got, what);
            return;
        }
        assertEquals(want, Double.parseDouble(got), 5e-7 * Math.abs(want) + 1e-300, what + ": " + got);
    }

    @Test
    void csvHasTheColumnsOfTheIssueAndTheEnginesValues() throws IOException, LogException {
        Path log = log(dir, 600, -1);
        MainTest.Run r = MainTest.run("rqa", log.toString(), "--channel", "VIB", "--from", "50", "--to", "550",
                "--dim", "3", "--delay", "2", "--recurrence-rate", "0.08", "--theiler", "3", "--csv");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("n,radius,rr,det,l,lmax,div,entr,lam,tt,vmax,"), r.out());
        RqaParams p = new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN, RqaParams.Threshold.rate(0.08), 2, 2, 3);
        RqaResult e = new Rqa(1).analyse(samples(log), 50, 550, p);
        Map<String, String> got = row(r.out());
        assertEquals("496", got.get("n"));
        close(e.radius(), got.get("radius"), "radius");
        close(e.rr(), got.get("rr"), "rr");
        close(e.det(), got.get("det"), "det");
        close(e.l(), got.get("l"), "l");
        assertEquals(Integer.toString(e.lmax()), got.get("lmax"));
        close(e.div(), got.get("div"), "div");
        close(e.entr(), got.get("entr"), "entr");
        close(e.lam(), got.get("lam"), "lam");
        close(e.tt(), got.get("tt"), "tt");
        assertEquals(Integer.toString(e.vmax()), got.get("vmax"));
        assertEquals(List.of("vib", "50", "550", "3", "2", "euclidean", "rate", "0.08", "2", "2", "3"),
                Arrays.asList(got.get("channel"), got.get("from"), got.get("to"), got.get("dim"), got.get("delay"),
                        got.get("norm"), got.get("policy"), got.get("policy_value"), got.get("min_line"),
                        got.get("min_vert"), got.get("theiler")));
        assertEquals(Long.toString(e.recurrent()), got.get("recurrent"));
        assertEquals(Long.toString(e.eligible()), got.get("eligible"));
    }

    @Test
    void textNamesEveryParameterUsed() throws IOException {
        Path log = log(dir, 400, -1);
        MainTest.Run r = MainTest.run("rqa", log.toString(), "--channel", "vib", "--dim", "2", "--delay", "5",
                "--radius", "0.5", "--norm", "max", "--min-line", "3", "--theiler", "4");
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(log + ", channel vib, samples 0:400 (400 samples, 395 delay vectors)", lines.get(0));
        assertEquals("embedding   m = 2 (given), tau = 5 samples (given)", lines.get(1));
        assertEquals("norm        max", lines.get(2));
        assertEquals("threshold   fixed radius -> radius 0.5", lines.get(3));
        assertEquals("Theiler     w = 4 (cells with |i-j| < w excluded)", lines.get(4));
        assertEquals("lines       l_min = 3, v_min = 2", lines.get(5));
        assertEquals(List.of("RR", "DET", "L", "Lmax", "DIV", "ENTR", "LAM", "TT", "Vmax"),
                lines.subList(6, 15).stream().map(s -> s.split(" +")[0]).toList());
    }

    @Test
    void automaticEmbeddingSaysHowItWasChosen() throws IOException {
        MainTest.Run r = MainTest.run("rqa", log(dir, 800, -1).toString(), "--channel", "vib");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("(false nearest neighbours), tau = "), r.out());
        assertTrue(r.out().contains(" samples (AMI first minimum)"), r.out());
        assertTrue(r.out().contains("threshold   target recurrence rate 0.05 -> radius "), r.out());
    }

    @Test
    void aMissingSampleInTheRangeIsBadInputNamingTheFile() throws IOException {
        Path log = log(dir, 300, 120);
        MainTest.Run r = MainTest.run("rqa", log.toString(), "--channel", "vib", "--dim", "2", "--delay", "1");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + log + ": channel vib has a missing sample at index 120 in 0:300; choose"
                + " --from/--to without gaps", r.err().strip());
        assertEquals(0, MainTest.run("rqa", log.toString(), "--channel", "vib", "--from", "121", "--dim", "2",
                "--delay", "1").status());
    }

    @Test
    void badOptionsAreUsageErrorsWithTheirReason() throws IOException {
        String log = log(dir, 300, -1).toString();
        assertUsage("riffle: no numeric channel 'temp' in " + log + "; channels: vib", "rqa", log, "--channel",
                "temp");
        assertUsage("riffle: --norm 'l1' is not one of: euclidean, max", "rqa", log, "--channel", "vib", "--norm",
                "l1");
        assertUsage("riffle: --from 200 --to 100 is not a range inside 0:300 of channel vib", "rqa", log,
                "--channel", "vib", "--from", "200", "--to", "100");
        assertUsage("riffle: delay 40 × (dimension 9 − 1) with Theiler window 1 leaves no pair of vectors in the"
                + " range 0:300 of 300 samples", "rqa", log, "--channel", "vib", "--dim", "9", "--delay", "40");
        assertUsage("riffle: rate 2.0 is out of range (0 < q ≤ 1)", "rqa", log, "--channel", "vib",
                "--recurrence-rate", "2");
        MainTest.Run both = MainTest.run("rqa", log, "--channel", "vib", "--radius", "1", "--recurrence-rate", "0.1");
        assertEquals(ExitCode.USAGE, both.status());
        assertTrue(both.err().contains("mutually exclusive"), both.err());
    }

    static void assertUsage(String firstLine, String... args) {
        MainTest.Run r = MainTest.run(args);
        assertEquals(ExitCode.USAGE, r.status(), r.err());
        assertEquals(firstLine, r.err().lines().findFirst().orElse(""));
    }

    @Test
    void helpTextsMatchTheGoldenText() {
        Golden.assertMatches("rqa-help.expected.txt", MainTest.run("rqa", "--help").out());
        Golden.assertMatches("trend-help.expected.txt", MainTest.run("trend", "--help").out());
    }
}
