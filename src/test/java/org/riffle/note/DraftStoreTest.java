package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DraftStoreTest {
    @TempDir
    Path dir;
    Path log;
    Path state;
    DraftStore store;

    /** Text that tries every escape: line breaks, tabs, backslashes, a colon, non-ASCII, an ESC, a lone surrogate. */
    static final String AWKWARD = "Line one: \"ok\"\r\nline two\twith a tab \\n not a break\n\u00b0C \u00b5m m\u00b3/h "
            + "\u2603 \ud83d\ude00 ESC[\u001b[31mred\u001b[0m\u0000 end\ud800";

    @BeforeEach
    void setUp() throws IOException {
        log = Files.writeString(dir.resolve("p3 log.csv"), "time,a\n");
        state = dir.resolve("state");
        store = new DraftStore(state, Clock.fixed(Instant.parse("2026-03-14T09:15:02Z"), ZoneOffset.UTC),
                AtomicFiles.Fault.NONE);
    }

    static Findings awkward() {
        return new Findings("Hollow Creek", "P-3", "", "A. N. Other", "1480 r/min\nvalve 70 %",
                java.util.Map.of(), AWKWARD)
                .withComment("p3 log.csv", "flow [m3/h]", AWKWARD)
                .withComment("p3 log.csv", "tab\tname", "second\n\nparagraph ");
    }

    @Test
    void aDraftRoundTripsWordForWord() throws Exception {
        Path where = store.save(log, awkward());
        assertEquals(dir.resolve(".p3 log.csv.riffle-draft").toAbsolutePath(), where);
        DraftStore.Draft d = store.load(log).orElseThrow();
        assertEquals(awkward(), d.findings());
        assertEquals(AWKWARD, d.findings().comment("p3 log.csv", "flow [m3/h]"));
        assertEquals(Instant.parse("2026-03-14T09:15:02Z"), d.savedAt());
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(where)));
        String text = Files.readString(where);
        assertFalse(text.chars().anyMatch(c -> c < 0x20 && c != '\n' && c != '\t'),
                "no raw control character in the file but the field-separating tabs");
    }

    @Test
    void noDraftMeansEmpty() throws Exception {
        assertEquals(Optional.empty(), store.load(log));
    }

    @Test
    void whenTheLogFolderRefusesTheDraftGoesToTheStateFolder() throws Exception {
        DraftStore refusing = new DraftStore(state, Clock.systemUTC(), (temp, target) -> {
            if (target.getParent().equals(dir.toAbsolutePath())) {
                throw new AccessDeniedException(target.toString());
            }
        });
        Path where = refusing.save(log, awkward());
        assertEquals(state.toAbsolutePath(), where.getParent());
        assertTrue(where.getFileName().toString().endsWith("-p3_log.csv.riffle-draft"), where.toString());
        assertEquals(awkward(), refusing.load(log).orElseThrow().findings());
        refusing.delete(log);
        assertEquals(Optional.empty(), refusing.load(log));
    }

    @Test
    void theNewerOfTwoDraftsIsOffered() throws Exception {
        DraftStore later = new DraftStore(state, Clock.fixed(Instant.parse("2026-03-14T10:00:00Z"), ZoneOffset.UTC),
                (temp, target) -> {
                    if (target.getParent().equals(dir.toAbsolutePath())) {
                        throw new AccessDeniedException(target.toString());
                    }
                });
        store.save(log, Findings.EMPTY.withGeneral("older"));
        later.save(log, Findings.EMPTY.withGeneral("newer"));
        assertEquals("newer", store.load(log).orElseThrow().findings().general());
    }

    @Test
    void aDraftSaveInterruptedBeforeTheMoveLeavesThePreviousDraft() throws Exception {
        store.save(log, Findings.EMPTY.withGeneral("kept"));
        DraftStore crashing = new DraftStore(state, Clock.systemUTC(), (temp, target) -> {
            throw new IOException("simulated crash");
        });
        NoteException e = assertThrows(NoteException.class,
                () -> crashing.save(log, Findings.EMPTY.withGeneral("lost")));
        assertTrue(e.getMessage().contains("could not save the draft (simulated crash) nor beside the log"
                + " (simulated crash); your comments are still on screen"), e.getMessage());
        assertEquals("kept", store.load(log).orElseThrow().findings().general());
        try (var s = Files.list(dir)) {
            assertEquals(0, s.filter(p -> p.toString().endsWith(".tmp")).count(), "no temporary file left");
        }
    }

    @Test
    void openingALogClearsTheTemporaryFileAKilledDraftSaveLeftAnHourAgoAndNothingElse() throws Exception {
        store.save(log, Findings.EMPTY.withGeneral("kept"));
        Path stale = Files.writeString(dir.resolve("..p3 log.csv.riffle-draft.0123456789ab.tmp"), "half");
        Path fresh = Files.writeString(dir.resolve("..p3 log.csv.riffle-draft.abcdef012345.tmp"), "under way");
        Path other = Files.writeString(dir.resolve(".notes.riffle-draft.old.tmp"), "not riffle's name");
        java.nio.file.attribute.FileTime twoHoursAgo = java.nio.file.attribute.FileTime.from(
                Instant.now().minusSeconds(7200));
        for (Path p : java.util.List.of(stale, other)) {
            Files.setLastModifiedTime(p, twoHoursAgo);
        }
        assertEquals("kept", store.load(log).orElseThrow().findings().general());
        assertFalse(Files.exists(stale), "a killed save's leftover from two hours ago is removed");
        assertTrue(Files.exists(fresh), "a temporary file seconds old may be a save under way: kept");
        assertTrue(Files.exists(other), "a name riffle does not make is not riffle's to remove");
    }

    @Test
    void aLinkPlantedAtTheDraftPathIsReplacedNotFollowedAndRefusedOnLoad() throws Exception {
        Path victim = Files.writeString(dir.resolve("victim.txt"), "precious\n");
        Path draft = store.besideLog(log);
        Files.createSymbolicLink(draft, victim);
        NoteException e = assertThrows(NoteException.class, () -> store.load(log));
        assertEquals(draft + ": is a symbolic link, not a file riffle wrote; not followed"
                + " (remove it if you did not put it there)", e.getMessage());
        store.save(log, Findings.EMPTY.withGeneral("mine"));
        assertEquals("precious\n", Files.readString(victim));
        assertFalse(Files.isSymbolicLink(draft));
        assertEquals("mine", store.load(log).orElseThrow().findings().general());
    }

    @Test
    void aDamagedDraftIsRefusedWithItsLine() throws Exception {
        Path draft = store.besideLog(log);
        Files.writeString(draft, "riffle-draft 1\nsaved: 2026-03-14T09:15:02Z\nsite x\nend\n");
        NoteException e = assertThrows(NoteException.class, () -> store.load(log));
        assertEquals(draft + ": line 3: expected 'key: value', found 'site x'", e.getMessage());
        Files.writeString(draft, "riffle-draft 1\nsaved: 2026-03-14T09:15:02Z\n");
        e = assertThrows(NoteException.class, () -> store.load(log));
        assertEquals(draft + ": cut off (no end line); the file is incomplete or damaged", e.getMessage());
        Files.writeString(draft, "riffle-draft 2\nend\n");
        e = assertThrows(NoteException.class, () -> store.load(log));
        assertEquals(draft + ": draft format version 2 is not the version 1 this riffle reads;"
                + " open it in a text editor to copy your comments", e.getMessage());
        Files.writeString(draft, "riffle-draft 1\nsaved: 2026-03-14T09:15:02Z\ngeneral: bad \\q escape\n"
                + "site:\nasset:\npoint:\ntechnician:\nconditions:\nend\n");
        e = assertThrows(NoteException.class, () -> store.load(log));
        assertEquals(draft + ": line 3: an unknown escape '\\q'; the file is damaged", e.getMessage());
    }

    @Test
    void autosaveWritesChangesAndTheLastStateOnClose() throws Exception {
        try (Autosave a = store.autosave(log, Findings.EMPTY, Duration.ofMillis(20))) {
            a.update(Findings.EMPTY.withGeneral("first"));
            long until = System.nanoTime() + 5_000_000_000L;
            while (store.load(log).isEmpty() && System.nanoTime() < until) {
                Thread.sleep(10);
            }
            assertEquals("first", store.load(log).orElseThrow().findings().general());
            a.update(Findings.EMPTY.withGeneral("last words"));
        }
        assertEquals("last words", store.load(log).orElseThrow().findings().general());
    }

    @Test
    void autosaveWritesNothingUntilSomethingChangesAndNoteSavedRemovesTheDraft() throws Exception {
        try (Autosave a = store.autosave(log, Findings.EMPTY, Duration.ofHours(1))) {
            assertTrue(a.saveNow());
            assertEquals(Optional.empty(), store.load(log));
            Findings f = Findings.EMPTY.withAsset("P-3");
            a.update(f);
            assertTrue(a.saveNow());
            assertTrue(store.load(log).isPresent());
            a.noteSaved(f);
            assertEquals(Optional.empty(), store.load(log));
        }
        assertEquals(Optional.empty(), store.load(log), "closing after the note was saved writes no draft");
    }
}
