package org.riffle.tui;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import org.riffle.note.Autosave;
import org.riffle.note.DraftStore;
import org.riffle.note.Findings;
import org.riffle.note.NoteException;
import org.riffle.note.NoteSaver;
import org.riffle.note.NoteWriter;
import org.riffle.triage.Assessment;

/**
 * The screen's {@link NoteDesk} on the {@code note} package: the note is rendered by
 * {@link NoteWriter} and saved by {@link NoteSaver} beside the first log (never over an existing
 * note); the draft is kept by the {@link DraftStore}'s {@link Autosave} every three seconds and on
 * hang-up, interrupt and termination.
 *
 * <p>Thread-safe.
 */
public final class VisitDesk implements NoteDesk {
    private final Path firstLog;
    private final NoteWriter writer;
    private final Autosave autosave;
    private final Optional<Findings> restorable;

    private VisitDesk(Path firstLog, NoteWriter writer, DraftStore store) {
        this.firstLog = firstLog;
        this.writer = writer;
        Optional<Findings> found;
        try {
            found = store.load(firstLog).map(DraftStore.Draft::findings);
        } catch (NoteException e) {
            found = Optional.empty();
        }
        this.restorable = found;
        this.autosave = store.autosave(firstLog, Findings.EMPTY, Duration.ofSeconds(3));
    }

    /** The desk for a visit to {@code logs}: notes and drafts keyed by the first log. */
    public static VisitDesk forLogs(List<Path> logs, boolean ascii) {
        return new VisitDesk(logs.get(0), NoteWriter.standard().withAscii(ascii), DraftStore.standard());
    }

    @Override
    public Path saveNote(List<Assessment> assessments, Findings findings) throws NoteException {
        String text = writer.render(assessments, findings);
        Path requested = firstLog.toAbsolutePath().resolveSibling(NoteSaver.defaultName(firstLog.toString()));
        Path written = NoteSaver.save(requested, text);
        try {
            autosave.noteSaved(findings);
        } catch (NoteException e) {
            // the note is saved; a draft left behind is only offered again
        }
        return written;
    }

    @Override
    public void draft(Findings findings) {
        autosave.update(findings);
    }

    @Override
    public Optional<String> saveDraftNow() {
        return autosave.saveNow() ? Optional.empty() : autosave.problem();
    }

    @Override
    public Optional<Findings> restorable() {
        return restorable;
    }

    @Override
    public void close() {
        autosave.close();
    }
}
