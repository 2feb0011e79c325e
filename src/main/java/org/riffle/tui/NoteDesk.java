package org.riffle.tui;

import java.nio.file.Path;

/**
 * Where the screen's findings go: the findings note, and the draft of the comments that survives a
 * dropped session. The screen calls {@link #saveNote} on its own thread and {@link #saveDraft} from
 * its thread or from a shutdown hook, so implementations must be thread-safe.
 */
public interface NoteDesk {
    /**
     * Writes the findings note and returns where it went.
     *
     * @throws Exception with a message fit to show on one line when the note could not be written
     */
    Path saveNote(Findings findings) throws Exception;

    /**
     * Writes the comments draft (quickly; it may run while the process is going down).
     *
     * @throws Exception with a message fit to show when the draft could not be written
     */
    void saveDraft(Findings findings) throws Exception;
}
