package org.riffle.note;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

/**
 * Keeps the draft of one log up to date while the technician types: the screen hands in each new
 * {@link Findings} with {@link #update}; a background thread writes the draft every few seconds when
 * it changed, and a shutdown hook writes it once more when the JVM is stopped by a hang-up (a dropped
 * SSH session), an interrupt or a termination signal. Emptied findings remove the draft. A
 * {@code kill -9} loses at most the last interval's typing; the draft on disk is always complete
 * (see {@link AtomicFiles}).
 *
 * <p>Thread-safe: {@link #update} may be called from the UI thread while the timer saves.
 */
public final class Autosave implements AutoCloseable {
    private final DraftStore store;
    private final Path log;
    private final ScheduledExecutorService timer;
    private final Thread hook;
    private volatile Findings latest;
    private Findings saved;
    private volatile String problem = "";
    private boolean closed;

    Autosave(DraftStore store, Path log, Findings initial, Duration every) {
        if (every.isNegative() || every.isZero()) {
            throw new IllegalArgumentException("autosave interval " + every + " must be positive");
        }
        this.store = Objects.requireNonNull(store, "store");
        this.log = Objects.requireNonNull(log, "log");
        this.latest = Objects.requireNonNull(initial, "initial");
        this.saved = initial;
        this.timer = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "riffle-draft");
            t.setDaemon(true);
            return t;
        });
        this.hook = new Thread(this::saveNow, "riffle-draft-on-exit");
        Runtime.getRuntime().addShutdownHook(hook);
        long ms = every.toMillis();
        timer.scheduleWithFixedDelay(this::saveNow, ms, ms, TimeUnit.MILLISECONDS);
    }

    /** The findings as they now stand; saved at the next tick. */
    public void update(Findings findings) {
        latest = Objects.requireNonNull(findings, "findings");
    }

    /** Saves now if anything changed since the last save; returns true when the draft is current. */
    public synchronized boolean saveNow() {
        Findings now = latest;
        if (now.equals(saved)) {
            return true;
        }
        try {
            if (now.isEmpty()) {
                store.delete(log);
            } else {
                store.save(log, now);
            }
            saved = now;
            problem = "";
            return true;
        } catch (NoteException e) {
            problem = e.getMessage();
            return false;
        }
    }

    /**
     * Call after the note holding {@code findings} was saved: the draft is removed, and kept again only
     * when something changes.
     *
     * @throws NoteException when the draft cannot be removed (the note is saved all the same)
     */
    public synchronized void noteSaved(Findings findings) throws NoteException {
        saved = Objects.requireNonNull(findings, "findings");
        store.delete(log);
    }

    /** The last save's problem, fit to print, if the last attempt failed. */
    public Optional<String> problem() {
        return problem.isEmpty() ? Optional.empty() : Optional.of(problem);
    }

    /** Saves once more if needed, then stops the timer and the shutdown hook. */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        timer.shutdownNow();
        saveNow();
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // The JVM is already shutting down; the hook runs (or ran) and finds nothing new to save.
        }
    }
}
