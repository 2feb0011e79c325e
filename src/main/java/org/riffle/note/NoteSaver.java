package org.riffle.note;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.LinkOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.ReadOnlyFileSystemException;

/**
 * Saves a rendered note: atomically (see {@link AtomicFiles}) and never over an existing file. When
 * the path asked for is taken, the first free of {@code name-2.txt}, {@code name-3.txt}, ... is used;
 * the path actually written is returned so the caller can show it. A device or pipe given as the
 * path (for example {@code /dev/null}) is written into, as it holds no note to protect.
 *
 * <p>Stateless and thread-safe.
 */
public final class NoteSaver {
    private static final int TRIES = 1000;
    private static final NoteSaver STANDARD = new NoteSaver(AtomicFiles.Fault.NONE);

    private final AtomicFiles.Fault fault;

    NoteSaver(AtomicFiles.Fault fault) {
        this.fault = fault;
    }

    /**
     * Writes {@code note} (UTF-8) at {@code requested}, or beside it under a new name when that is
     * taken.
     *
     * @return the path written
     * @throws NoteException when the folder is missing or not writable, the disk is full, or similar;
     *     the message says what to do, and nothing has been written
     */
    public static Path save(Path requested, String note) throws NoteException {
        return STANDARD.write(requested, note);
    }

    /**
     * The customary file name of the note for {@code logFile}: its name without directory and
     * extension (a {@code .gz} is dropped first), then {@code -note.txt}; {@code riffle-note.txt}
     * for standard input. Characters unsafe in file names become {@code _}.
     */
    public static String defaultName(String logFile) {
        String name = Sources.fileName(logFile);
        if (name.equals("-") || name.isBlank()) {
            return "riffle-note.txt";
        }
        if (name.toLowerCase(java.util.Locale.ROOT).endsWith(".gz")) {
            name = name.substring(0, name.length() - 3);
        }
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        return stem.replaceAll("[^\\p{L}\\p{N}._+-]", "_") + "-note.txt";
    }

    /** A device or pipe ({@code /dev/null}, a FIFO) holds no note to protect: the text is written into it. */
    private static Path toDevice(Path requested, Path abs, String note) throws NoteException {
        try {
            Files.write(abs, note.getBytes(StandardCharsets.UTF_8), StandardOpenOption.WRITE,
                    LinkOption.NOFOLLOW_LINKS);
            return abs;
        } catch (IOException e) {
            throw new NoteException(requested, "cannot write into this device or pipe (" + IoReason.of(e) + ")", e);
        }
    }

    private static NoteException cannotWrite(Path dir, Exception e) {
        return new NoteException(dir, "cannot write in this folder (permission denied or read-only);"
                + " choose another path for the note (your comments are kept)", e);
    }

    /** The {@code i}-th name tried for {@code requested}: itself, then {@code stem-2.ext}, ... */
    static Path candidate(Path requested, int i) {
        if (i == 0) {
            return requested;
        }
        String name = requested.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        String ext = dot > 0 ? name.substring(dot) : "";
        return requested.resolveSibling(stem + "-" + (i + 1) + ext);
    }

    Path write(Path requested, String note) throws NoteException {
        Path abs = requested.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        if (abs.getFileName() == null || dir == null) {
            throw new NoteException(requested, "is not a file name; choose a path such as notes/pump.txt");
        }
        if (Files.isDirectory(abs)) {
            throw new NoteException(requested, "is a folder; choose a file name inside it");
        }
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS) && !Files.isRegularFile(abs, LinkOption.NOFOLLOW_LINKS)
                && !Files.isSymbolicLink(abs)) {
            return toDevice(requested, abs, note);
        }
        if (!Files.isDirectory(dir)) {
            throw new NoteException(dir, "no such folder; choose another path for the note"
                    + " (your comments are kept)");
        }
        try {
            return AtomicFiles.writeNew(i -> candidate(abs, i), TRIES, note.getBytes(StandardCharsets.UTF_8),
                    fault);
        } catch (AccessDeniedException | ReadOnlyFileSystemException e) {
            throw cannotWrite(dir, e);
        } catch (FileAlreadyExistsException e) {
            throw new NoteException(abs, "this name and " + (TRIES - 1) + " numbered alternatives are taken;"
                    + " choose another name", e);
        } catch (NoSuchFileException e) {
            if (Files.isDirectory(dir)) {
                throw cannotWrite(dir, e);
            }
            throw new NoteException(dir, "the folder went away while saving; choose another path"
                    + " (your comments are kept)", e);
        } catch (IOException e) {
            if (IoReason.refused(e)) {
                throw cannotWrite(dir, e);
            }
            throw new NoteException(abs, "could not save the note (" + IoReason.of(e) + "); "
                    + (IoReason.diskFull(e) ? "free some space or " : "") + "choose another path"
                    + " (your comments are kept)", e);
        }
    }
}
