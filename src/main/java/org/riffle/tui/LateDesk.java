package org.riffle.tui;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;
import org.riffle.note.Findings;
import org.riffle.triage.Assessment;

/**
 * A {@link NoteDesk} made on a thread of its own once the screen's first frame is out: setting up the
 * note writer and the draft store (clock and zone data, the draft's digest, a look for an earlier
 * draft) took the second core from reading the log on a 2-core machine. The screen holds keys until
 * {@link #start}'s callback says the desk is ready (see {@link ScreenLoop}), so nothing reaches the desk
 * before; Ctrl-C and hang-up are not held, and find nothing to keep.
 *
 * <p>When the desk cannot be made, the screen goes on: saving a note then fails with the reason, and
 * the reason is shown once ({@link #problem}).
 *
 * <p>Thread-safe.
 */
final class LateDesk implements NoteDesk {
    /** How long closing waits for a desk still being made before leaving it (it holds nothing typed). */
    private static final long CLOSE_WAIT_SECONDS = 2;

    private final Supplier<? extends NoteDesk> maker;
    private final CompletableFuture<NoteDesk> made = new CompletableFuture<>();
    private boolean started;

    /** A desk that {@code maker} will make once {@link #start} is called. */
    LateDesk(Supplier<? extends NoteDesk> maker) {
        this.maker = maker;
    }

    /** Starts making the desk (once); {@code whenDone} runs on the maker's thread when it is made or failed. */
    synchronized void start(Runnable whenDone) {
        if (started) {
            return;
        }
        started = true;
        Thread t = new Thread(() -> {
            try {
                made.complete(maker.get());
            } catch (RuntimeException | Error e) {
                made.completeExceptionally(e);
            }
            whenDone.run();
        }, "riffle-desk");
        t.setDaemon(true);
        t.start();
    }

    /** The desk, once made; empty while it is being made or when making it failed. */
    private Optional<NoteDesk> ready() {
        return made.isDone() && !made.isCompletedExceptionally() ? Optional.of(made.join()) : Optional.empty();
    }

    /** Why the desk could not be made, once that is known. */
    Optional<String> problem() {
        if (!made.isCompletedExceptionally()) {
            return Optional.empty();
        }
        try {
            made.get();
            return Optional.empty();
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            String why = cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
            return Optional.of("notes and drafts cannot be saved: " + why);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Optional.empty();
        }
    }

    @Override
    public Path saveNote(List<Assessment> assessments, Findings findings) throws Exception {
        Optional<String> why = problem();
        if (why.isPresent()) {
            throw new IllegalStateException(why.get());
        }
        return made.join().saveNote(assessments, findings);
    }

    @Override
    public void draft(Findings findings) {
        ready().ifPresent(d -> d.draft(findings));
    }

    @Override
    public Optional<String> saveDraftNow() {
        Optional<NoteDesk> d = ready();
        return d.isPresent() ? d.get().saveDraftNow() : problem();
    }

    @Override
    public Optional<Findings> restorable() {
        return ready().flatMap(NoteDesk::restorable);
    }

    /** Closes the desk, waiting a little for one still being made. */
    @Override
    public void close() {
        synchronized (this) {
            if (!started) {
                return;
            }
        }
        try {
            made.get(CLOSE_WAIT_SECONDS, TimeUnit.SECONDS).close();
        } catch (ExecutionException | TimeoutException e) {
            // never made, or not in time: it holds nothing typed (keys wait for it)
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
