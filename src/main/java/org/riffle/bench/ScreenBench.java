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
 * The screen's speed targets: the first frame for the demo log within 0.6 s of the JVM's start, and
 * a key press redrawn within 50 ms at 200 × 60 while the analysis runs. Must run in a fresh JVM (the
 * first number counts from the JVM's start, reading the log included):
 * {@code java -cp target/riffle.jar org.riffle.bench.ScreenBench [LOG]}. The screen is drawn on
 * Lanterna's virtual terminal, so the terminal emulator's own drawing time is not included. As
 * {@code riffle LOG} does, it starts the screen's {@link Warmup} before reading the log.
 */
public final class ScreenBench {
    /** Target for the first frame, ms after the JVM's start. */
    public static final double FIRST_FRAME_MS = 600;
    /** Target for a key press to be redrawn, ms. */
    public static final double KEY_MS = 50;

    private ScreenBench() {
    }

    /** Measures once and prints both figures with their targets. */
    public static ScreenProbe.Timings measure(Path log, PrintWriter out) throws Exception {
        long start = ManagementFactory.getRuntimeMXBean().getStartTime();
        long entered = System.currentTimeMillis();
        Warmup.start();
        Recording r = LogReader.read(log, ReadOptions.defaults());
        long read = System.currentTimeMillis();
        ScreenProbe.Timings t = ScreenProbe.run(List.of(r), 200, 60, 40, 25);
        out.printf(Locale.ROOT, "screen first frame after JVM start: %d ms (target <= %.0f ms): JVM to main %d ms,"
                + " reading the log %d ms, screen %d ms%n", t.firstFrameEpochMillis() - start, FIRST_FRAME_MS,
                entered - start, read - entered, t.firstFrameEpochMillis() - read);
        out.printf(Locale.ROOT, "screen key press to redraw at 200x60: median %.1f ms, 95th %.1f ms, max %.1f ms"
                + " (target <= %.0f ms); %d of %d presses while analysis ran%n", t.keyQuantile(0.5),
                t.keyQuantile(0.95), t.keyQuantile(1), KEY_MS, t.pressesWhileAnalysing(), t.keyMillis().length);
        out.flush();
        return t;
    }

    public static void main(String[] args) throws Exception {
        Path log = Path.of(args.length > 0 ? args[0] : "fixtures/demo/af2-process.csv");
        measure(log, new PrintWriter(System.out, true, StandardCharsets.UTF_8));
    }
}
