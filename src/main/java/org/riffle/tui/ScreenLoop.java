package org.riffle.tui;

import com.googlecode.lanterna.screen.Screen;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.LongConsumer;
import org.riffle.log.Recording;
import org.riffle.triage.TriageParams;

/**
 * The UI thread's loop: block on the event queue (with a one-second timeout that becomes a timer
 * tick, so an idle screen wakes once a second and does nothing else), apply every queued event, then
 * draw once. Keys, resizes, analysis progress and save results all arrive through the same queue;
 * nothing but this loop touches the screen.
 *
 * <p>{@link #post} is thread-safe; everything else is confined to the thread that calls {@link #run}
 * or {@link #step}.
 */
final class ScreenLoop {
    private static final long TICK_NANOS = TimeUnit.SECONDS.toNanos(1);
    /**
     * Shortest time between two frames drawn for analysis progress alone (ten a second): progress
     * arrives in bursts from every channel, and a frame drawn for each took CPU from the analysis on a
     * 2-core machine. Keys, resizes and finished analyses are drawn at once.
     */
    static final long PROGRESS_FRAME_NANOS = TimeUnit.MILLISECONDS.toNanos(100);

    private final BlockingQueue<Event> queue = new LinkedBlockingQueue<>();
    private final Renderer renderer;
    private final ExecutorService io;
    final Controller controller;
    private long lastTick = System.nanoTime();
    private long keysHandled;
    private long lastFrame = System.nanoTime() - PROGRESS_FRAME_NANOS;
    /** Progress applied but not drawn yet. */
    private boolean behind;
    private LongConsumer onFrame = k -> { };
    /** The desk made after the first frame; null when the desk was ready from the start. */
    private final LateDesk late;
    /** Keys that came while the late desk was being made, in order. */
    private final List<Event> held = new ArrayList<>();
    private boolean deskArrived;

    ScreenLoop(Screen screen, List<Recording> recordings, ScreenOptions options, NoteDesk desk) {
        this(screen, recordings, options, desk, null);
    }

    /**
     * A loop whose note desk is made after the first frame is drawn; keys wait for it (Ctrl-C and
     * hang-up do not), so the draft of an earlier session is still offered before any key acts.
     */
    static ScreenLoop withLateDesk(Screen screen, List<Recording> recordings, ScreenOptions options, LateDesk desk) {
        return new ScreenLoop(screen, recordings, options, desk, desk);
    }

    private ScreenLoop(Screen screen, List<Recording> recordings, ScreenOptions options, NoteDesk desk,
                       LateDesk late) {
        this.late = late;
        List<Source> sources = new ArrayList<>();
        for (Recording r : recordings) {
            sources.add(new Source(r, new TriageParams(-1, -1, options.threads())));
        }
        this.io = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "riffle-note");
            t.setDaemon(true);
            return t;
        });
        this.renderer = new Renderer(screen, options);
        this.controller = new Controller(new ScreenState(sources), options, desk, this::post, io);
    }

    /** Whether the late desk's event has been applied (always false without a late desk). */
    boolean deskArrived() {
        return deskArrived;
    }

    /** Queues an event for the UI thread. Thread-safe. */
    void post(Event e) {
        queue.add(e);
    }

    /** Whether no log's analysis is running any more (none started yet counts as running). */
    boolean settled() {
        return controller.s.sources.stream().noneMatch(Source::running);
    }

    /** Called after each frame with the number of keys handled so far (for the benchmark). */
    void onFrame(LongConsumer callback) {
        this.onFrame = callback;
    }

    /** Starts the screen ({@link #start}) and serves events until it ends. */
    Controller.Outcome run() throws IOException, InterruptedException {
        start();
        while (controller.outcome() == Controller.Outcome.RUNNING) {
            step(TICK_NANOS);
        }
        return controller.outcome();
    }

    /** Draws the first frame, then starts making the late desk (if any) and the analysis. */
    void start() throws IOException {
        drawFirstFrame();
        onFrame.accept(keysHandled);
        if (late != null) {
            late.start(() -> post(new Event.DeskReady()));
        }
        controller.startAll();
    }

    /** Draws the first frame: the whole screen is sent. */
    void drawFirstFrame() throws IOException {
        renderer.render(controller, true);
    }

    /** Draws the current state. */
    void render() throws IOException {
        boolean full = controller.fullRedraw;
        controller.fullRedraw = false;
        renderer.render(controller, full);
    }

    /**
     * Waits up to {@code timeoutNanos} for events (less while progress waits to be drawn), applies all
     * queued ones, and draws once: at once after a key, a resize or a finished analysis, else at most
     * every {@link #PROGRESS_FRAME_NANOS}.
     */
    void step(long timeoutNanos) throws IOException, InterruptedException {
        long wait = behind ? Math.max(0, Math.min(timeoutNanos, lastFrame + PROGRESS_FRAME_NANOS - System.nanoTime()))
                : timeoutNanos;
        Event e = queue.poll(wait, TimeUnit.NANOSECONDS);
        boolean urgent = false;
        while (e != null && controller.outcome() == Controller.Outcome.RUNNING) {
            urgent |= !(e instanceof Event.Progress || e instanceof Event.Updated);
            behind = true;
            apply(e);
            e = queue.poll();
        }
        long now = System.nanoTime();
        if (now - lastTick >= TICK_NANOS) {
            lastTick = now;
            apply(new Event.Tick());
            urgent = true;
        }
        if (controller.outcome() == Controller.Outcome.RUNNING
                && (urgent || (behind && now - lastFrame >= PROGRESS_FRAME_NANOS))) {
            render();
            lastFrame = System.nanoTime();
            behind = false;
            onFrame.accept(keysHandled);
        }
    }

    private void apply(Event e) {
        if (e instanceof Event.DeskReady) {
            deskArrived = true;
            controller.deskReady(late.problem());
            List<Event> keys = List.copyOf(held);
            held.clear();
            for (Event k : keys) {
                if (controller.outcome() != Controller.Outcome.RUNNING) {
                    break; // as in step: no key acts after one that ended the screen
                }
                apply(k);
            }
            return;
        }
        if (e instanceof Event.Key k) {
            if (late != null && !deskArrived && !Controller.interrupts(k.stroke())) {
                held.add(e);
                return;
            }
            keysHandled++;
        }
        controller.dispatch(e);
    }

    /** Stops the analysis and the note thread (the screen is ending). */
    void close() {
        controller.cancelAll();
        io.shutdown();
        try {
            io.awaitTermination(5, TimeUnit.SECONDS);
        } catch (InterruptedException ex) {
            Thread.currentThread().interrupt();
        }
    }
}
