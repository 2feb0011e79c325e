package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;

/** {@code riffle health}: the table, the CSV, the baseline options, and bad input. */
class HealthCommandTest {
    @TempDir
    Path dir;

    /** Two channels at 1 Hz: "steady" (AR(1) noise) and "stepped" (the same with a level step of 8 at row 2000). */
    static Path log(Path dir, String name, int rows, long seed, boolean step) throws IOException {
        StringBuilder sb = new StringBuilder("time,steady [bar],stepped [bar]\n");
        SplittableRandom rnd = new SplittableRandom(seed);
        double a = 0;
        double b = 0;
        for (int i = 0; i < rows; i++) {
            a = 0.8 * a + rnd.nextGaussian();
            b = 0.8 * b + rnd.nextGaussian();
            double s = b + (step && i >= 2000 ? 8 : 0);
            sb.append(String.format(Locale.ROOT, "2026-03-01T%02d:%02d:%02d,%.5f,%.5f%n", i / 3600, i / 60 % 60,
                    i % 60, a, s));
        }
        Path p = dir.resolve(name);
        Files.writeString(p, sb.toString(), StandardCharsets.UTF_8);
        return p;
    }

    @Test
    void tableShowsHealthLevelSinceAndTheParameters() throws Exception {
        Path p = log(dir, "pump.csv", 4000, 1, true);
        MainTest.Run r = MainTest.run("health", p.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(p + ": 2 channels, baseline first 25 % (rows 0-1000)", lines.get(0));
        assertTrue(lines.get(2).matches("steady +bar +100 +steady +-"), lines.get(2));
        assertTrue(lines.get(3).matches("stepped +bar +\\d+ +departed +2026-03-01T00:3\\d:\\d\\d \\(row \\d+\\)"),
                lines.get(3));
        assertTrue(r.out().contains("  reservoir seed = 20261201"), r.out());
        assertTrue(r.out().contains("  calibration quantile = 0.99"), r.out());
    }

    @Test
    void csvCarriesTheSameFiguresAsTheAnalyzer() throws Exception {
        Path p = log(dir, "pump.csv", 4000, 2, true);
        MainTest.Run r = MainTest.run("health", p.toString(), "--channel", "stepped", "--csv");
        assertEquals(0, r.status(), r.err());
        Map<String, String> row = parse(r.out()).get(0);
        Assessment a = new Analyzer(TriageParams.defaults()).assess(
                LogReader.read(p, ReadOptions.defaults()), TriageListener.NONE);
        assertEquals(a.channels().get(1).health().figure(), Double.parseDouble(row.get("health")), 1e-4,
                "printed to the CSV precision of 7 significant digits");
        assertEquals("departed", row.get("level"));
        assertEquals(Integer.toString(a.channels().get(1).health().sinceIndex()), row.get("since_index"));
        assertEquals("20261201", row.get("reservoir_seed"));
        assertEquals("0.99", row.get("calibration_quantile"));
        assertTrue(r.out().lines().findFirst().orElseThrow().startsWith(
                "channel,unit,health,level,since_index,since_time,no_estimate,analysis_rate,"), r.out());
    }

    /** The CSV rows as header-to-value maps, parsed by Commons CSV (RFC 4180 quoting). */
    static List<Map<String, String>> parse(String csv) throws IOException {
        try (CSVParser parser = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv))) {
            return parser.getRecords().stream().map(CSVRecord::toMap).toList();
        }
    }

    @Test
    void aSeparateBaselineLogIsUsedWhole() throws Exception {
        Path base = log(dir, "commissioning.csv", 3000, 3, false);
        Path now = log(dir, "today.csv", 3000, 4, false);
        MainTest.Run r = MainTest.run("health", now.toString(), "--baseline-file", base.toString(), "--csv");
        assertEquals(0, r.status(), r.err());
        for (Map<String, String> row : parse(r.out())) {
            assertEquals("baseline log " + base + " (rows 0-3000)", row.get("baseline"));
            assertEquals("100", row.get("health"), row.toString());
            assertEquals("steady", row.get("level"), row.toString());
        }
    }

    @Test
    void aFlatChannelHasNoEstimateWithItsReason() throws Exception {
        StringBuilder sb = new StringBuilder("time,level\n");
        for (int i = 0; i < 2000; i++) {
            sb.append(String.format(Locale.ROOT, "2026-03-01T%02d:%02d:%02d,2.5%n", i / 3600, i / 60 % 60, i % 60));
        }
        Path p = dir.resolve("flat.csv");
        Files.writeString(p, sb.toString(), StandardCharsets.UTF_8);
        MainTest.Run r = MainTest.run("health", p.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("no estimate: flat: the baseline is constant at 2.5, nothing to judge against"),
                r.out());
    }

    @Test
    void badOptionsAreUsageErrorsAndAMissingLogIsBadInput() throws Exception {
        String p = log(dir, "pump.csv", 500, 5, false).toString();
        RqaCommandTest.assertUsage("riffle: --baseline and --baseline-file exclude each other: give one", "health",
                p, "--baseline", "0:100", "--baseline-file", p);
        RqaCommandTest.assertUsage("riffle: no numeric channel 'flow' in " + p + "; channels: steady, stepped",
                "health", p, "--channel", "flow");
        RqaCommandTest.assertUsage("riffle: --baseline 300:200 selects samples 300:200, not a non-empty range"
                + " inside 0:500", "health", p, "--baseline", "300:200");
        MainTest.Run r = MainTest.run("health", dir.resolve("nothing.csv").toString());
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + dir.resolve("nothing.csv") + ": no such file", r.err().strip());
    }
}
