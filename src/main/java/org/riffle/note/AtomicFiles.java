package org.riffle.note;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.SeekableByteChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileAttribute;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.Set;
import java.util.function.IntFunction;
import java.util.function.Supplier;

/**
 * Crash-safe file writing: the bytes go to a fresh temporary file in the target's own folder, are
 * flushed and synced to the device, and only then moved into place in one atomic step; the folder is
 * synced after the move. A crash or power loss at any moment leaves either the previous state or the
 * complete new file.
 *
 * <p>Symbolic links are never followed: the temporary file is created exclusively (it fails rather
 * than open anything already at its path, a planted link included), and the final step is a rename or
 * a hard link, which replace or refuse a link at the target but never write through it.
 *
 * <p>Stateless and thread-safe.
 */
final class AtomicFiles {
    /** The steps of a save, in order; a {@link Fault} is called before each. */
    enum Step {
        /** Writing the bytes into the temporary file. */
        WRITE,
        /** Syncing the temporary file to the device. */
        SYNC,
        /** Moving (or linking) the temporary file into place. */
        MOVE
    }

    /**
     * A fault hook called between writing and moving; tests throw from it to simulate a crash, or
     * from {@link #before} to simulate a full disk or a failing device at any step.
     */
    interface Fault {
        /** No fault. */
        Fault NONE = (temp, target) -> {
        };

        void beforeMove(Path temp, Path target) throws IOException;

        /** Called before each step with the temporary file (already created) and the target. */
        default void before(Step step, Path temp, Path target) throws IOException {
            if (step == Step.MOVE) {
                beforeMove(temp, target);
            }
        }

        /** A fault that throws {@code failure} before {@code step}, as the device would at that step. */
        static Fault at(Step step, IOException failure) {
            return new Fault() {
                @Override
                public void beforeMove(Path temp, Path target) {
                }

                @Override
                public void before(Step s, Path temp, Path target) throws IOException {
                    if (s == step) {
                        throw failure;
                    }
                }
            };
        }
    }

    private static final SecureRandom RANDOM = new SecureRandom();
    private static final int NAME_TRIES = 16;

    private AtomicFiles() {
    }

    /**
     * Writes {@code data} as a new file, never replacing anything: {@code candidates.apply(0)} if no
     * file (or link) is there, else the first free of {@code candidates.apply(1..tries-1)}.
     *
     * @return the path written
     * @throws FileAlreadyExistsException when every candidate is taken
     */
    static Path writeNew(IntFunction<Path> candidates, int tries, byte[] data, Fault fault) throws IOException {
        Path first = candidates.apply(0).toAbsolutePath();
        Path temp = writeTemp(first, data, false, AtomicFiles::randomTag, fault);
        Path written = null;
        try {
            fault.before(Step.MOVE, temp, first);
            for (int i = 0; i < tries && written == null; i++) {
                Path target = candidates.apply(i).toAbsolutePath();
                if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS) && linkOrMove(temp, target)) {
                    syncFolder(target.getParent());
                    written = target;
                }
            }
            if (written == null) {
                throw new FileAlreadyExistsException(first.toString(), null,
                        "it and " + (tries - 1) + " numbered alternatives exist");
            }
        } catch (IOException | RuntimeException | Error e) {
            removeTemp(temp, e);
            throw e;
        }
        removeTemp(temp, null);
        return written;
    }

    /**
     * Writes {@code data} to {@code target}, atomically replacing what is there (a planted link is
     * replaced, not followed). With {@code owner} the file is readable by its owner only.
     */
    static void replace(Path target, byte[] data, boolean owner, Fault fault) throws IOException {
        Path abs = target.toAbsolutePath();
        Path temp = writeTemp(abs, data, owner, AtomicFiles::randomTag, fault);
        try {
            fault.before(Step.MOVE, temp, abs);
            Files.move(temp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            syncFolder(abs.getParent());
        } catch (IOException | RuntimeException | Error e) {
            removeTemp(temp, e);
            throw e;
        }
        removeTemp(temp, null);
    }

    /**
     * Removes the temporary files that saves killed mid-way left in {@code dir} for targets named
     * {@code *suffix}: hidden regular files {@code .NAME.TAG.tmp} last modified more than
     * {@code olderThan} ago (a save in progress elsewhere is seconds old). Best effort: a file that
     * cannot be removed stays, and is harmless.
     *
     * @return how many were removed
     */
    static int sweep(Path dir, String suffix, Duration olderThan) {
        FileTime before = FileTime.from(Instant.now().minus(olderThan));
        int removed = 0;
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, "." + "*" + suffix + ".*.tmp")) {
            for (Path p : s) {
                String tag = p.getFileName().toString();
                tag = tag.substring(0, tag.length() - ".tmp".length());
                tag = tag.substring(tag.lastIndexOf('.') + 1);
                if (tag.matches("[0-9a-f]{12}") && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)
                        && Files.getLastModifiedTime(p, LinkOption.NOFOLLOW_LINKS).compareTo(before) < 0
                        && Files.deleteIfExists(p)) {
                    removed++;
                }
            }
        } catch (IOException | UncheckedIOException e) {
            // Leftovers are hidden, never listed and never read; they can wait for the next save.
        }
        return removed;
    }

    /** Hard-links {@code temp} at {@code target} (refuses an existing target); false when taken meanwhile. */
    private static boolean linkOrMove(Path temp, Path target) throws IOException {
        try {
            Files.createLink(target, temp);
            return true;
        } catch (FileAlreadyExistsException e) {
            return false;
        } catch (UnsupportedOperationException | FileSystemException e) {
            // No hard links here (FAT, some network shares): check, then rename. The window between
            // the check and the rename is the price of such a file system.
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                return false;
            }
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
            return true;
        }
    }

    /**
     * Removes a temporary file (gone already after a rename, a second name after a hard link). A
     * failure to remove it never hides {@code failure}, the reason the save failed; it is attached to
     * it instead.
     */
    private static void removeTemp(Path temp, Throwable failure) {
        try {
            Files.deleteIfExists(temp);
        } catch (IOException e) {
            // After a successful save the data is in place and a stray temporary name is harmless.
            if (failure != null) {
                failure.addSuppressed(e);
            }
        }
    }

    private static String randomTag() {
        byte[] r = new byte[6];
        RANDOM.nextBytes(r);
        return HexFormat.of().formatHex(r);
    }

    /**
     * Creates {@code .NAME.TAG.tmp} beside {@code target} exclusively (trying fresh tags from
     * {@code tags} while a name is taken, by a file or a link alike), writes and syncs {@code data}.
     */
    static Path writeTemp(Path target, byte[] data, boolean owner, Supplier<String> tags) throws IOException {
        return writeTemp(target, data, owner, tags, Fault.NONE);
    }

    private static Path writeTemp(Path target, byte[] data, boolean owner, Supplier<String> tags, Fault fault)
            throws IOException {
        Path dir = target.getParent();
        IOException last = null;
        for (int i = 0; i < NAME_TRIES; i++) {
            Path temp = dir.resolve("." + target.getFileName() + "." + tags.get() + ".tmp");
            boolean created = false;
            try (FileChannel ch = FileChannel.open(temp, Set.of(StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE, LinkOption.NOFOLLOW_LINKS), attributes(dir, owner))) {
                created = true;
                fault.before(Step.WRITE, temp, target);
                ByteBuffer b = ByteBuffer.wrap(data);
                while (b.hasRemaining()) {
                    ch.write(b);
                }
                fault.before(Step.SYNC, temp, target);
                ch.force(true);
                return temp;
            } catch (FileAlreadyExistsException e) {
                last = e;
            } catch (IOException e) {
                if (created) {
                    removeTemp(temp, e);
                }
                throw e;
            }
        }
        throw last;
    }

    private static FileAttribute<?>[] attributes(Path dir, boolean owner) {
        if (owner && dir.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return new FileAttribute<?>[] {PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString(
                    "rw-------"))};
        }
        return new FileAttribute<?>[0];
    }

    /**
     * Reads a small text file of riffle's own as strict UTF-8, refusing to follow a symbolic link.
     *
     * @throws NoteException when it is a link, too big, or not UTF-8
     * @throws IOException when it cannot be read
     */
    static String readOwn(Path file, int maxBytes) throws IOException, NoteException {
        if (Files.isSymbolicLink(file)) {
            throw new NoteException(file, "is a symbolic link, not a file riffle wrote; not followed"
                    + " (remove it if you did not put it there)");
        }
        byte[] data;
        try (SeekableByteChannel ch = Files.newByteChannel(file, StandardOpenOption.READ,
                LinkOption.NOFOLLOW_LINKS)) {
            if (ch.size() > maxBytes) {
                throw new NoteException(file, "is " + ch.size() + " bytes, more than the " + maxBytes
                        + " such a file can have; not read");
            }
            ByteBuffer b = ByteBuffer.allocate((int) ch.size());
            while (b.hasRemaining()) {
                if (ch.read(b) < 0) {
                    break;
                }
            }
            data = Arrays.copyOf(b.array(), b.position());
        }
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(data)).toString();
        } catch (CharacterCodingException e) {
            throw new NoteException(file, "is not valid UTF-8; the file is damaged");
        }
    }

    /** Syncs a folder's entry list so a rename survives power loss; ignored where unsupported. */
    private static void syncFolder(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException e) {
            // Not every platform lets a folder be opened for sync; the rename itself is still atomic.
        }
    }
}
