package org.riffle.note;

import java.io.IOException;
import java.nio.channels.ClosedByInterruptException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.util.Locale;

/**
 * What went wrong with a file operation, in words fit for the middle of a one-line message: the
 * reason only, never the path of a temporary file or a class name. Java reports a full disk as a
 * plain {@link IOException} whose message is the C library's text for {@code ENOSPC}, and a refused
 * write as an {@link AccessDeniedException} whose message is only the path; both would read badly
 * as they are.
 *
 * <p>Stateless.
 */
final class IoReason {
    private IoReason() {
    }

    /** The reason {@code e} happened, in lower-case words, control characters neutralised. */
    static String of(IOException e) {
        if (diskFull(e)) {
            return "the disk is full";
        }
        String text = String.valueOf(e.getMessage()).toLowerCase(Locale.ROOT);
        if (text.contains("disk quota exceeded")) {
            return "the disk quota is used up";
        }
        if (e instanceof AccessDeniedException || text.contains("permission denied")) {
            return "permission denied";
        }
        if (text.contains("read-only file system")) {
            return "read-only file system";
        }
        if (e instanceof NoSuchFileException) {
            return "no such folder";
        }
        if (e instanceof ClosedByInterruptException) {
            return "interrupted";
        }
        if (e instanceof FileSystemException fs && fs.getReason() != null) {
            return Text.clean(fs.getReason());
        }
        return Text.clean(String.valueOf(e.getMessage()));
    }

    /** True when {@code e} says the device has no space left ({@code ENOSPC}). */
    static boolean diskFull(IOException e) {
        String text = String.valueOf(e.getMessage()).toLowerCase(Locale.ROOT);
        return text.contains("no space left on device");
    }

    /** True when {@code e} says the place cannot be written at all: permission or a read-only file system. */
    static boolean refused(IOException e) {
        String r = of(e);
        return r.equals("permission denied") || r.equals("read-only file system");
    }
}
