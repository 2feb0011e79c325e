package org.riffle.tui;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.riffle.note.Findings;
import org.riffle.triage.Assessment;

/**
 * Where the screen's findings go: the findings note, and the draft of the entries that survives a
 * dropped session. The screen calls {@link #saveNote} on a background thread and the rest on its own
 * thread; implementations are thread-safe. {@link VisitDesk} is the real one.
 */
public interface NoteDesk extends AutoCloseable {
    /**
     * Writes the findings note for the assessed logs and returns where it went.
     *
     * @throws Exception with a message fit to show on one line when the note could not be written
     */
    Path saveNote(List<Assessment> assessments, Findings findings) throws Exception;

    /** The entries as they now stand; kept in the draft in the background and when the process ends. */
    void draft(Findings findings);

    /** Writes the draft at once if it changed (Ctrl-C); returns a problem to show, empty when fine. */
    Optional<String> saveDraftNow();

    /** A draft left by an earlier session of the same log, to offer back. */
    Optional<Findings> restorable();

    /** Saves the draft once more if needed and stops the background saving. */
    @Override
    void close();
}
