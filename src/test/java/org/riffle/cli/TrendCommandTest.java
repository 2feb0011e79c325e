package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogException;
import org.riffle.log.TimeBase;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import org.riffle.recurrence.Trend;

/** {@code riffle trend}: rows, columns, times and the baseline option; values as the engine gives them. */
class TrendCommandTest {
    @TempDir
    Path dir;

    @Test
    void csvHasOneRowPerWindowWithTheColumnsOfTheIssue() throws IOException, LogException {
        Path log = RqaCommandTest.log(dir, 1000, -1);
        MainTest.Run r = MainTest.run("trend", log.toString(), "--channel", "vib", "--window", "200", "--step",
                "150", "--baseline", "0:400", "--dim", "3", "--delay", "2", "--csv");
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("start_index,end_index,start_time,end_time,rr,det,l,lmax,entr,lam,tt,div,vmax,novelty,flag",
                lines.get(0));
        Trend t = new Rqa(1).trend(RqaCommandTest.samples(log), 0, 400, 200, 150,
                new RqaParams(3, 2, RqaParams.Norm.EUCLIDEAN, RqaParams.Threshold.rate(0.05), 2, 2, 1), null);
        assertEquals(1 + (1000 - 200) / 150, lines.size() - 1);
        assertEquals(t.windows().size(), lines.size() - 1);
        for (int k = 0; k < t.windows().size(); k++) {
            RqaResult w = t.windows().get(k);
            String[] f = lines.get(k + 1).split(",");
            assertEquals(Integer.toString(150 * k), f[0]);
            assertEquals(Integer.toString(150 * k + 200), f[1]);
            int s = 150 * k;
            int e = s + 199;
            assertEquals(String.format("2026-03-01T00:%02d:%02d", s / 60, s % 60), f[2]);
            assertEquals(String.format("2026-03-01T00:%02d:%02d", e / 60, e % 60), f[3]);
            RqaCommandTest.close(w.rr(), f[4], "rr");
            RqaCommandTest.close(w.det(), f[5], "det");
            RqaCommandTest.close(w.l(), f[6], "l");
            assertEquals(Integer.toString(w.lmax()), f[7]);
            RqaCommandTest.close(w.entr(), f[8], "entr");
            RqaCommandTest.close(w.lam(), f[9], "lam");
            RqaCommandTest.close(w.tt(), f[10], "tt");
        }
    }

    @Test
    void aWindowWithAMissingSampleIsNaNWithTheReasonInText() throws IOException {
        Path log = RqaCommandTest.log(dir, 800, 650);
        MainTest.Run csv = MainTest.run("trend", log.toString(), "--channel", "vib", "--window", "200", "--dim",
                "2", "--delay", "3", "--csv");
        assertEquals(0, csv.status(), csv.err());
        assertTrue(csv.out().contains("\n500,700,2026-03-01T00:08:20,2026-03-01T00:11:39,NaN,NaN,NaN,NaN,NaN,NaN,"
                + "NaN,NaN,NaN,NaN,NaN\n"), csv.out());
        MainTest.Run text = MainTest.run("trend", log.toString(), "--channel", "vib", "--window", "200", "--dim",
                "2", "--delay", "3");
        assertTrue(text.out().contains("missing sample at 650"), text.out());
        assertTrue(text.out().contains("baseline    first 25 % (samples 0:200)"), text.out());
    }

    @Test
    void badBaselineIsAUsageError() throws IOException {
        String log = RqaCommandTest.log(dir, 500, -1).toString();
        RqaCommandTest.assertUsage("riffle: --baseline 300:200 selects samples 300:200, not a non-empty range"
                + " inside 0:500", "trend", log, "--channel", "vib", "--baseline", "300:200");
        RqaCommandTest.assertUsage("riffle: --baseline 'soon' is not A:B in sample indices (0:2500), seconds"
                + " (0s:3600s) or ISO date-times (2026-03-01T10:00:2026-03-01T12:00)", "trend", log, "--channel",
                "vib", "--baseline", "soon");
        RqaCommandTest.assertUsage("riffle: window 1 must be at least 2 and step 1 at least 1", "trend", log,
                "--channel", "vib", "--window", "1");
    }

    /** Baselines by index, by seconds and by date-time on a 2 Hz time base starting 2026-03-01T10:00Z. */
    @Test
    void baselineRangesByIndexSecondsAndDateTime() {
        TimeBase tb = TimeBase.regular(1000, 2.0, Instant.parse("2026-03-01T10:00:00Z"));
        assertEquals(new BaselineRange(0, 250, "first 25 % (samples 0:250)"), BaselineRange.parse(null, tb, 1000));
        assertEquals(100, BaselineRange.parse("100:", tb, 1000).from());
        assertEquals(1000, BaselineRange.parse("100:", tb, 1000).to());
        assertEquals(40, BaselineRange.parse(":40", tb, 1000).to());
        BaselineRange s = BaselineRange.parse("10s:60.5s", tb, 1000);
        assertEquals(List.of(20, 121), List.of(s.from(), s.to()));
        BaselineRange d = BaselineRange.parse("2026-03-01T10:01:2026-03-01T10:02:30", tb, 1000);
        assertEquals(List.of(120, 300), List.of(d.from(), d.to()));
        BaselineRange z = BaselineRange.parse("2026-03-01T11:01+01:00:", tb, 1000);
        assertEquals(List.of(120, 1000), List.of(z.from(), z.to()));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BaselineRange.parse("2026-03-01T10:01:2026-03-01T10:02", TimeBase.indexed(50), 50));
        assertEquals("--baseline 2026-03-01T10:01:2026-03-01T10:02: the log has no wall-clock times; give sample"
                + " indices (0:2500) or seconds (0s:3600s)", e.getMessage());
    }
}
