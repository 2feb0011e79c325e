package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.riffle.note.Findings;
import org.riffle.triage.Assessment;

/**
 * Times the screen for the benchmark, on Lanterna's virtual terminal (so no real terminal is needed
 * and nothing outside {@code tui} touches Lanterna): when the first frame is drawn, and how long a key
 * press takes to be redrawn while the analysis runs on its threads. The UI runs on its own thread as
 * in the real screen; the probe posts keys to it like the key reader does.
 *
 * <p>Confined to the calling thread; one probe per call.
 */
public final class ScreenProbe {
    /**
     * What was measured.
     *
     * @param firstFrameEpochMillis wall-clock time the first frame was complete, ms since the epoch
     * @param keyMillis for each key press, ms from posting it to the end of the frame that shows it
     * @param pressesWhileAnalysing how many of the presses were made while analysis was still running
     * @param analysedEpochMillis wall-clock time the frame showing every channel's finished analysis was
     *        complete, ms since the epoch
     */
    public record Timings(long firstFrameEpochMillis, double[] keyMillis, int pressesWhileAnalysing,
                          long analysedEpochMillis) {
        public Timings {
            keyMillis = keyMillis.clone();
        }

        /** The {@code q}-quantile (0..1) of the key times, nearest rank. */
        public double keyQuantile(double q) {
            double[] s = keyMillis.clone();
            Arrays.sort(s);
            return s.length == 0 ? Double.NaN : s[(int) Math.min(s.length - 1, Math.floor(q * s.length))];
        }
    }

    private final Object lock = new Object();
    private long framesKeys;
    private long frameNanos;

    private ScreenProbe() {
    }

    /**
     * Opens the screen on {@code recordings} at {@code cols} × {@code rows}, starts the analysis, and
     * presses {@code presses} keys (down and up alternately, {@code gapMillis} apart).
     */
    public static Timings run(List<org.riffle.log.Recording> recordings, int cols, int rows, int presses,
                              long gapMillis) throws IOException, InterruptedException {
        return new ScreenProbe().measure(recordings, cols, rows, presses, gapMillis);
    }

    private Timings measure(List<org.riffle.log.Recording> recordings, int cols, int rows, int presses,
                            long gapMillis) throws IOException, InterruptedException {
        TerminalScreen screen = new TerminalScreen(new DefaultVirtualTerminal(new TerminalSize(cols, rows)));
        screen.startScreen();
        ScreenLoop loop = new ScreenLoop(screen, recordings, ScreenOptions.fromEnvironment(
                java.util.Map.of("LANG", "C.UTF-8"), false), new NoDesk());
        loop.render();
        long first = System.currentTimeMillis();
        loop.onFrame(keys -> {
            synchronized (lock) {
                framesKeys = keys;
                frameNanos = System.nanoTime();
                lock.notifyAll();
            }
        });
        Thread ui = new Thread(() -> {
            try {
                loop.controller.startAll();
                while (loop.controller.outcome() == Controller.Outcome.RUNNING) {
                    loop.step(TimeUnit.SECONDS.toNanos(1));
                }
            } catch (IOException | InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "riffle-probe-ui");
        ui.start();
        double[] ms = new double[presses];
        int busy = 0;
        for (int i = 0; i < presses; i++) {
            Thread.sleep(gapMillis);
            busy += loop.controller.s.sources.stream().anyMatch(Source::running) ? 1 : 0;
            long t0 = System.nanoTime();
            loop.post(new Event.Key(new KeyStroke(i % 2 == 0 ? 'j' : 'k', false, false)));
            synchronized (lock) {
                while (framesKeys < i + 1) {
                    lock.wait(10_000);
                }
                ms[i] = (frameNanos - t0) / 1e6;
            }
        }
        long analysed = analysed(loop);
        loop.post(new Event.Key(new KeyStroke('c', true, false)));
        ui.join(10_000);
        loop.close();
        return new Timings(first, ms, busy, analysed);
    }

    /** Waits (up to 10 minutes) for a frame drawn after every source's analysis ended; its time. */
    private long analysed(ScreenLoop loop) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(10);
        while (loop.controller.s.sources.stream().anyMatch(Source::running) && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        long keys;
        synchronized (lock) {
            keys = framesKeys;
        }
        // a key press forces a frame, which then shows the finished state
        loop.post(new Event.Key(new KeyStroke('k', false, false)));
        synchronized (lock) {
            while (framesKeys < keys + 1) {
                lock.wait(10_000);
            }
        }
        return System.currentTimeMillis();
    }

    /** Saves nothing. */
    static final class NoDesk implements NoteDesk {
        @Override
        public Path saveNote(List<Assessment> assessments, Findings findings) {
            throw new UnsupportedOperationException("the probe saves no note");
        }

        @Override
        public void draft(Findings findings) {
        }

        @Override
        public Optional<String> saveDraftNow() {
            return Optional.empty();
        }

        @Override
        public Optional<Findings> restorable() {
            return Optional.empty();
        }

        @Override
        public void close() {
        }
    }
}
