package org.riffle.bench;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.tui.ScreenProbe;
import org.riffle.tui.Warmup;

/**
 * The screen's speed targets, measured in a fresh JVM (the first number counts from the JVM's start,
 * reading the log included): the first frame (demo log: 0.6 s; the 1,000,000-row × 8-channel log: 1.5 s),
 * a key press redrawn within 50 ms at 200 × 60 while the analysis runs, and the whole analysis visible
 * (1M-row log: 10 s). Run alone with
 * {@code java -cp target/riffle.jar org.riffle.bench.ScreenBench [LOG]}; {@code riffle bench} runs it in
 * a child JVM through {@link #child}. The screen is drawn on Lanterna's virtual terminal, so the
 * terminal emulator's own drawing time is not included. As {@code riffle LOG} does, it starts the
 * screen's {@link Warmup} before reading the log. {@code riffle bench} takes only the key-press figure
 * from here: its first frame and analysis times come from the real entry point ({@link RealScreen}),
 * which also pays the command line, the terminal's set-up and the note desk.
 */
public final class ScreenBench {
    /** Target for the first frame of the demo log, ms after the JVM's start. */
    public static final double FIRST_FRAME_MS = 600;
    /** Target for the first frame of the 1M-row log, ms after the JVM's start. */
    public static final double BIG_FIRST_FRAME_MS = 1_500;
    /** Target for the 1M-row log's whole analysis to be visible, ms after the JVM's start. */
    public static final double BIG_ANALYSED_MS = 10_000;
    /** Target for a key press to be redrawn, ms. */
    public static final double KEY_MS = 50;

    private ScreenBench() {
    }

    /** What one fresh JVM measured: ms after its start, and the key presses' 95th percentile. */
    record Figures(double firstFrameMs, double keyP95Ms, double analysedMs) {
    }

    /** Measures once and prints the figures with their targets. */
    public static ScreenProbe.Timings measure(Path log, PrintWriter out) throws Exception {
        long start = ManagementFactory.getRuntimeMXBean().getStartTime();
        long entered = System.currentTimeMillis();
        Warmup.start(false);
        Recording r = LogReader.read(log, ReadOptions.defaults());
        long read = System.currentTimeMillis();
        ScreenProbe.Timings t = ScreenProbe.run(List.of(r), 200, 60, 40, 25);
        out.printf(Locale.ROOT, "screen first frame after JVM start: %d ms (target <= %.0f ms for the demo log,"
                + " %.0f ms for 1M rows): JVM to main %d ms, reading the log %d ms, screen %d ms%n",
                t.firstFrameEpochMillis() - start, FIRST_FRAME_MS, BIG_FIRST_FRAME_MS, entered - start,
                read - entered, t.firstFrameEpochMillis() - read);
        out.printf(Locale.ROOT, "screen key press to redraw at 200x60: median %.1f ms, 95th %.1f ms, max %.1f ms"
                + " (target <= %.0f ms); %d of %d presses while analysis ran%n", t.keyQuantile(0.5),
                t.keyQuantile(0.95), t.keyQuantile(1), KEY_MS, t.pressesWhileAnalysing(), t.keyMillis().length);
        out.printf(Locale.ROOT, "screen whole analysis visible after JVM start: %d ms (target <= %.0f ms for 1M"
                + " rows)%n", t.analysedEpochMillis() - start, BIG_ANALYSED_MS);
        out.printf(Locale.ROOT, "figures %d %.1f %d%n", t.firstFrameEpochMillis() - start, t.keyQuantile(0.95),
                t.analysedEpochMillis() - start);
        out.flush();
        return t;
    }

    /** Runs {@link #main} in a fresh JVM on {@code log}; the figures it printed. */
    static Figures child(Path log, Path dir) throws Exception {
        ChildJvm.Run r = ChildJvm.run(ScreenBench.class.getName(), List.of(log.toAbsolutePath().toString()), dir,
                300);
        for (String line : r.stdout().split("\n")) {
            if (line.startsWith("figures ")) {
                String[] f = line.strip().split(" ");
                return new Figures(Double.parseDouble(f[1]), Double.parseDouble(f[2]), Double.parseDouble(f[3]));
            }
        }
        throw new IllegalStateException("the screen benchmark printed no figures: " + r.stdout());
    }

    public static void main(String[] args) throws Exception {
        Path log = Path.of(args.length > 0 ? args[0] : "fixtures/demo/af2-process.csv");
        measure(log, new PrintWriter(System.out, true, StandardCharsets.UTF_8));
    }
}
