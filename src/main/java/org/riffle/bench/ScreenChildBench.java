package org.riffle.bench;

import java.nio.file.Path;
import java.util.List;
import org.riffle.demo.Demo;

/**
 * The screen on the demo log (written by its generator) or on the harness's 8-channel CSV, each run in
 * fresh JVMs: the first frame and the whole analysis visible as a technician meets them, {@code riffle
 * LOG} in a real terminal ({@link RealScreen}, a tmux pane of 200 × 60; ms after the process started),
 * and the 95th percentile of 40 key presses redrawn at 200 × 60 while the analysis ran, on Lanterna's
 * virtual terminal ({@link ScreenBench}), where the screen's own drawing time can be taken apart from
 * the terminal's. Without tmux the first two are "n/a". Confined to the harness thread.
 */
final class ScreenChildBench implements Benchmark {
    private final int rows;
    private Path dir;
    private Path log;
    private int run;

    /** @param rows the harness CSV's rows, or 0 for the demo log */
    ScreenChildBench(int rows) {
        this.rows = rows;
    }

    @Override
    public String name() {
        return "screen, " + (rows == 0 ? "demo log" : Sizes.count(rows) + " rows x 8 ch") + " (child JVM)";
    }

    @Override
    public List<Metric> metrics() {
        boolean demo = rows == 0;
        return List.of(new Metric("first frame, riffle LOG in tmux", "ms", demo ? ScreenBench.FIRST_FRAME_MS
                        : rows == ReadBench.ROWS ? ScreenBench.BIG_FIRST_FRAME_MS : Double.NaN),
                new Metric("key press p95, virtual 200x60", "ms", ScreenBench.KEY_MS),
                new Metric("analysis visible, riffle LOG in tmux", "ms", rows == ReadBench.ROWS
                        ? ScreenBench.BIG_ANALYSED_MS : Double.NaN));
    }

    @Override
    public int maxWarmups() {
        return rows == 0 ? 1 : 0;
    }

    @Override
    public int maxRuns() {
        return rows == 0 ? 5 : 3;
    }

    @Override
    public void setUp(Path workDir) throws Exception {
        dir = workDir;
        // the demo log from its generator, the same bytes as fixtures/demo, so the bench runs from any folder
        log = rows == 0 ? Demo.writeTo(workDir.resolve("demo")).get(0) : Inputs.csv(workDir, rows);
    }

    @Override
    public double[] runOnce() throws Exception {
        RealScreen.Figures real = RealScreen.run(log, dir, run++, 300);
        ScreenBench.Figures f = ScreenBench.child(log, dir);
        return new double[] {real.firstFrameMs(), f.keyP95Ms(), real.analysedMs()};
    }
}
