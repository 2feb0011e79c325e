package org.riffle.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The whole headless {@code riffle report} on the 8-channel bench CSV in a fresh JVM with the default
 * heap settings: reading, statistics, spectra, RQA trend, reservoir health and the note written to a
 * file. Target (issue 9): at most 8 s wall and 600 MB peak resident set on the 2-core machine.
 * Confined to the harness thread.
 */
final class ReportBench implements Benchmark {
    /** Wall-clock target, ms. */
    static final double WALL_MS = 8_000;
    /** Peak resident set target, MB. */
    static final double RSS_MB = 600;

    private final int rows;
    private Path dir;
    private Path log;
    private int run;

    ReportBench(int rows) {
        this.rows = rows;
    }

    @Override
    public String name() {
        return "riffle report, " + Sizes.count(rows) + " rows x 8 ch (child JVM)";
    }

    @Override
    public List<Metric> metrics() {
        return List.of(Metric.wallMillis(WALL_MS), new Metric("peak RSS", "MB", RSS_MB));
    }

    @Override
    public int maxWarmups() {
        return 1;
    }

    @Override
    public int maxRuns() {
        return 3;
    }

    @Override
    public void setUp(Path workDir) throws Exception {
        dir = workDir;
        log = Inputs.csv(workDir, rows);
    }

    @Override
    public double[] runOnce() throws Exception {
        Path note = dir.resolve("report-note-" + (run++) + ".txt");
        try {
            ChildJvm.Run r = ChildJvm.run("org.riffle.cli.Main", List.of("report", log.toString(), "-o",
                    note.toString()), dir, 300);
            if (!Files.exists(note)) {
                throw new IllegalStateException("riffle report wrote no note: " + r.stdout());
            }
            return new double[] {r.wallMillis(), r.peakMegabytes()};
        } finally {
            Files.deleteIfExists(note);
        }
    }
}
