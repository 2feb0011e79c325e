package org.riffle.note;

import java.nio.file.Path;

/**
 * A note, draft or baseline file that could not be written or read, with a message fit to print on
 * one line: the path, what went wrong, and what to do next. Nothing the user typed is lost when this
 * is thrown: the caller still holds its {@link Findings}.
 *
 * <p>Immutable.
 */
public final class NoteException extends Exception {
    private static final long serialVersionUID = 1L;

    private final String path;

    /**
     * @param path the file or folder concerned, or {@code null}
     * @param reason what went wrong and what to do next
     */
    public NoteException(Path path, String reason) {
        super(path == null ? reason : Text.clean(path.toString()) + ": " + reason);
        this.path = path == null ? null : path.toString();
    }

    NoteException(Path path, String reason, Throwable cause) {
        this(path, reason);
        initCause(cause);
    }

    /** The file or folder concerned, as given, or {@code null}. */
    public String path() {
        return path;
    }
}
