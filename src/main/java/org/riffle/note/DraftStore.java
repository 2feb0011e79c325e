package org.riffle.note;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.HexFormat;
import java.util.Objects;
import java.util.Optional;

/**
 * Drafts of what the technician typed, kept so that a dropped session loses nothing. A draft sits
 * beside its log as {@code .LOGNAME.riffle-draft} (hidden); when that folder cannot be written (a
 * read-only stick, a full disk) it goes to the user's state folder instead
 * ({@code $XDG_STATE_HOME/riffle/drafts}, default {@code ~/.local/state/riffle/drafts}), named by a
 * digest of the log's absolute path. Loading looks in both places and offers the newer draft. When a
 * screen has several logs open, the first one keys the draft.
 *
 * <p>Drafts are written atomically and readable by their owner only; a symbolic link planted at a
 * draft's path is replaced (on save) or refused (on load), never followed. The format is plain text,
 * see {@link DraftFormat}.
 *
 * <p>Immutable and thread-safe.
 */
public final class DraftStore {
    private static final String SUFFIX = ".riffle-draft";

    private final Path stateFolder;
    private final Clock clock;
    private final AtomicFiles.Fault fault;

    DraftStore(Path stateFolder, Clock clock, AtomicFiles.Fault fault) {
        this.stateFolder = stateFolder.toAbsolutePath();
        this.clock = Objects.requireNonNull(clock, "clock");
        this.fault = Objects.requireNonNull(fault, "fault");
    }

    /** The store for this user: the state folder from the environment, the system clock. */
    public static DraftStore standard() {
        return new DraftStore(Folders.drafts(System.getenv(), Folders.home()), Clock.systemUTC(),
                AtomicFiles.Fault.NONE);
    }

    /** A store whose fallback folder is {@code stateFolder} (for tests and tools). */
    public static DraftStore inFolder(Path stateFolder) {
        return new DraftStore(stateFolder, Clock.systemUTC(), AtomicFiles.Fault.NONE);
    }

    /**
     * A draft as found: what was typed, when it was saved, and where it is.
     *
     * @param findings the technician's entries, word for word
     * @param savedAt when the draft was written
     * @param path the draft file
     */
    public record Draft(Findings findings, Instant savedAt, Path path) {
        public Draft {
            Objects.requireNonNull(findings, "findings");
            Objects.requireNonNull(savedAt, "savedAt");
            Objects.requireNonNull(path, "path");
        }
    }

    /**
     * Saves {@code findings} as the draft of {@code log}: beside the log, or in the state folder when
     * that fails.
     *
     * @return where the draft was written
     * @throws NoteException when neither place can be written; the findings are still the caller's
     */
    public Path save(Path log, Findings findings) throws NoteException {
        byte[] data = DraftFormat.write(log, findings, clock.instant()).getBytes(StandardCharsets.UTF_8);
        Path beside = besideLog(log);
        IOException besideFailure = null;
        if (beside != null) {
            try {
                AtomicFiles.replace(beside, data, true, fault);
                removeQuietly(inState(log));
                return beside;
            } catch (IOException e) {
                besideFailure = e;
            }
        }
        Path state = inState(log);
        try {
            createPrivateFolder(stateFolder);
            AtomicFiles.replace(state, data, true, fault);
            return state;
        } catch (IOException e) {
            String why = besideFailure == null ? "" : " nor beside the log (" + IoReason.of(besideFailure) + ")";
            throw new NoteException(state, "could not save the draft (" + IoReason.of(e) + ")" + why
                    + "; your comments are still on screen: save the note to another place", e);
        }
    }

    /**
     * The newest draft of {@code log}, if there is one.
     *
     * @throws NoteException when a draft is there but damaged, of another format version, or a link
     */
    public Optional<Draft> load(Path log) throws NoteException {
        Draft best = null;
        for (Path p : new Path[] {besideLog(log), inState(log)}) {
            if (p == null) {
                continue;
            }
            // a draft save killed mid-way leaves a hidden temporary file; once an hour old it is no save
            // under way, so opening the log clears it (autosave itself runs too often to look every time)
            AtomicFiles.sweep(p.getParent(), SUFFIX, Duration.ofHours(1));
            if (!Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
                continue;
            }
            Draft d = read(p);
            if (best == null || d.savedAt().isAfter(best.savedAt())) {
                best = d;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Removes every draft of {@code log} (after its note is saved, or when the user declines it). */
    public void delete(Path log) throws NoteException {
        for (Path p : new Path[] {besideLog(log), inState(log)}) {
            if (p == null) {
                continue;
            }
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                throw new NoteException(p, "could not remove the draft (" + e.getMessage() + ")", e);
            }
        }
    }

    /**
     * Starts saving the draft of {@code log} every {@code every} and when the JVM shuts down (hang-up,
     * interrupt, termination). {@code initial} is what the screen starts with (an empty
     * {@link Findings} or a restored draft); nothing is written until it changes.
     */
    public Autosave autosave(Path log, Findings initial, Duration every) {
        return new Autosave(this, log, initial, every);
    }

    private Draft read(Path p) throws NoteException {
        try {
            return DraftFormat.read(p, AtomicFiles.readOwn(p, DraftFormat.MAX_BYTES));
        } catch (IOException e) {
            throw new NoteException(p, "could not read the draft (" + e.getMessage() + ")", e);
        }
    }

    /** The draft's place beside the log, {@code null} for standard input. */
    Path besideLog(Path log) {
        if (log.toString().equals("-")) {
            return null;
        }
        Path abs = log.toAbsolutePath().normalize();
        return abs.resolveSibling("." + abs.getFileName() + SUFFIX);
    }

    /** The draft's place in the state folder. */
    Path inState(Path log) {
        if (log.toString().equals("-")) {
            return stateFolder.resolve("stdin" + SUFFIX);
        }
        Path abs = log.toAbsolutePath().normalize();
        String safe = abs.getFileName().toString().replaceAll("[^A-Za-z0-9._-]", "_");
        return stateFolder.resolve(digest(abs.toString()) + "-" + safe + SUFFIX);
    }

    static String digest(String s) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 8);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static void removeQuietly(Path stale) {
        try {
            Files.deleteIfExists(stale);
        } catch (IOException e) {
            // An older draft left in the state folder is harmless: load() offers the newer one.
        }
    }

    private static void createPrivateFolder(Path dir) throws IOException {
        if (Files.isDirectory(dir)) {
            return;
        }
        if (dir.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.createDirectories(dir, PosixFilePermissions.asFileAttribute(
                    PosixFilePermissions.fromString("rwx------")));
        } else {
            Files.createDirectories(dir);
        }
    }
}
