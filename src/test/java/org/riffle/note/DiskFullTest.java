package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.ClosedByInterruptException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * A full disk at each step of a save (writing the temporary file, syncing it, moving it into place),
 * injected as the {@link IOException} the JDK throws for {@code ENOSPC} ("No space left on device",
 * the C library's text for that error): the note, the draft and the baseline each fail with one clear
 * line, the previous file is intact, the draft survives a failed note save, and no temporary file is
 * left behind. The same with the refusals of a read-only folder and with an interrupted save.
 */
class DiskFullTest {
    private static final Instant T = Instant.parse("2026-03-14T09:15:02Z");

    @TempDir
    Path dir;
    Path log;
    Path state;

    @BeforeEach
    void setUp() throws IOException {
        log = Files.writeString(dir.resolve("p3.csv"), "time,a\n");
        state = dir.resolve("state");
    }

    private static IOException full() {
        return new IOException("No space left on device");
    }

    /** Every file under {@code top}, relative, sorted: what a user would find there. */
    private static List<String> files(Path top) throws IOException {
        if (!Files.exists(top)) {
            return List.of();
        }
        try (Stream<Path> s = Files.walk(top)) {
            return s.filter(Files::isRegularFile).map(p -> top.relativize(p).toString()).sorted().toList();
        }
    }

    @ParameterizedTest
    @EnumSource(AtomicFiles.Step.class)
    void aFullDiskWhileSavingTheNoteKeepsThePreviousNoteAndSaysSo(AtomicFiles.Step step) throws Exception {
        Path note = Files.writeString(dir.resolve("p3-note.txt"), "the previous note\n");
        NoteSaver saver = new NoteSaver(AtomicFiles.Fault.at(step, full()));
        NoteException e = assertThrows(NoteException.class, () -> saver.write(note, "the new note\n"));
        assertEquals(note + ": could not save the note (the disk is full); free some space or choose another"
                + " path (your comments are kept)", e.getMessage());
        assertEquals("the previous note\n", Files.readString(note));
        assertEquals(List.of("p3-note.txt", "p3.csv"), files(dir), "no temporary file, no numbered note");
    }

    @ParameterizedTest
    @EnumSource(AtomicFiles.Step.class)
    void aFullDiskWhileSavingTheDraftKeepsThePreviousDraft(AtomicFiles.Step step) throws Exception {
        DraftStore good = new DraftStore(state, Clock.fixed(T, ZoneOffset.UTC), AtomicFiles.Fault.NONE);
        Path where = good.save(log, Findings.EMPTY.withGeneral("kept"));
        DraftStore failing = new DraftStore(state, Clock.systemUTC(), AtomicFiles.Fault.at(step, full()));
        NoteException e = assertThrows(NoteException.class,
                () -> failing.save(log, Findings.EMPTY.withGeneral("newer")));
        assertEquals(failing.inState(log) + ": could not save the draft (the disk is full) nor beside the log"
                + " (the disk is full); your comments are still on screen: save the note to another place",
                e.getMessage());
        assertEquals("kept", good.load(log).orElseThrow().findings().general());
        assertEquals(List.of(dir.relativize(where).toString(), "p3.csv"), files(dir), "no temporary file");
    }

    @ParameterizedTest
    @EnumSource(AtomicFiles.Step.class)
    void aFullDiskWhileSavingABaselineLeavesTheStoreAsItWas(AtomicFiles.Step step) throws Exception {
        Path root = dir.resolve("store");
        BaselineStore good = new BaselineStore(root, Clock.fixed(T, ZoneOffset.UTC), AtomicFiles.Fault.NONE);
        StoredBaseline before = save(good);
        BaselineStore failing = new BaselineStore(root, Clock.fixed(T.plusSeconds(60), ZoneOffset.UTC),
                AtomicFiles.Fault.at(step, full()));
        NoteException e = assertThrows(NoteException.class, () -> save(failing));
        assertEquals(root.resolve("P-3") + ": cannot save the baseline (the disk is full); free some space, or set "
                + Folders.BASELINE_ENV + " or --store to a writable folder; the stored baselines are as they were",
                e.getMessage());
        BaselineStore.Listing l = good.list();
        assertEquals(List.of(before), l.baselines());
        assertEquals(List.of(), l.problems());
        assertEquals(List.of("P-3/20260314-091502.baseline"), files(root), "no temporary file");
    }

    private static StoredBaseline save(BaselineStore s) throws NoteException {
        return s.save("P-3", "0.1.0", NoteFixture.FILE, "first 25 % (rows 0-30)", BaselineStoreTest.CHANNELS,
                k -> k.raw("model.example", "1.5 2.5"));
    }

    @Test
    void aFailedNoteSaveLeavesTheAutosavedDraftInPlace() throws Exception {
        DraftStore drafts = new DraftStore(state, Clock.systemUTC(), AtomicFiles.Fault.NONE);
        Findings typed = Findings.EMPTY.withGeneral("bearing warm").withComment("p3.csv", "a", "rising");
        try (Autosave autosave = drafts.autosave(log, Findings.EMPTY, Duration.ofHours(1))) {
            autosave.update(typed);
            assertTrue(autosave.saveNow());
            // What the screen does (tui.VisitDesk.saveNote): the draft goes only after the note is saved.
            NoteSaver saver = new NoteSaver(AtomicFiles.Fault.at(AtomicFiles.Step.SYNC, full()));
            assertThrows(NoteException.class, () -> saver.write(dir.resolve("p3-note.txt"), "note"));
            assertEquals(typed, drafts.load(log).orElseThrow().findings());
        }
        assertEquals(typed, drafts.load(log).orElseThrow().findings(), "still there after the screen closes");
    }

    @Test
    void aRefusedWriteNamesTheReasonNotTheTemporaryFile() throws Exception {
        Path note = dir.resolve("p3-note.txt");
        Path temp = dir.resolve(".p3-note.txt.0123456789ab.tmp");
        NoteSaver denied = new NoteSaver(AtomicFiles.Fault.at(AtomicFiles.Step.WRITE,
                new AccessDeniedException(temp.toString())));
        NoteException e = assertThrows(NoteException.class, () -> denied.write(note, "note"));
        assertEquals(dir + ": cannot write in this folder (permission denied or read-only); choose another path"
                + " for the note (your comments are kept)", e.getMessage());
        NoteSaver readOnly = new NoteSaver(AtomicFiles.Fault.at(AtomicFiles.Step.MOVE,
                new FileSystemException(temp.toString(), note.toString(), "Read-only file system")));
        e = assertThrows(NoteException.class, () -> readOnly.write(note, "note"));
        assertTrue(e.getMessage().startsWith(dir + ": cannot write in this folder"), e.getMessage());

        BaselineStore store = new BaselineStore(dir.resolve("store"), Clock.fixed(T, ZoneOffset.UTC),
                AtomicFiles.Fault.at(AtomicFiles.Step.WRITE, new AccessDeniedException(temp.toString())));
        e = assertThrows(NoteException.class, () -> save(store));
        assertEquals(dir.resolve("store").resolve("P-3") + ": cannot save the baseline (permission denied); set "
                + Folders.BASELINE_ENV + " or --store to a writable folder; the stored baselines are as they were",
                e.getMessage());
        assertEquals(List.of("p3.csv"), files(dir), "no temporary file, no note");
    }

    @Test
    void aSaveInterruptedMidWayLeavesNoTemporaryFile() throws Exception {
        Path note = dir.resolve("p3-note.txt");
        byte[] big = "x".repeat(4 << 20).getBytes(StandardCharsets.UTF_8);
        Thread.currentThread().interrupt();
        try {
            IOException e = assertThrows(IOException.class, () -> AtomicFiles.writeNew(i -> note, 1, big,
                    AtomicFiles.Fault.NONE));
            assertTrue(e instanceof ClosedByInterruptException, e.toString());
        } finally {
            assertTrue(Thread.interrupted(), "the interrupt is kept for the caller");
        }
        NoteSaver saver = new NoteSaver(AtomicFiles.Fault.NONE);
        Thread.currentThread().interrupt();
        try {
            NoteException e = assertThrows(NoteException.class, () -> saver.write(note, "note"));
            assertEquals(note + ": could not save the note (interrupted); choose another path (your comments"
                    + " are kept)", e.getMessage());
        } finally {
            Thread.interrupted();
        }
        DraftStore drafts = new DraftStore(state, Clock.systemUTC(), AtomicFiles.Fault.NONE);
        Thread.currentThread().interrupt();
        try {
            assertThrows(NoteException.class, () -> drafts.save(log, Findings.EMPTY.withGeneral("typed")));
        } finally {
            Thread.interrupted();
        }
        assertEquals(List.of("p3.csv"), files(dir), "no temporary file, no note, no draft");
    }
}
