package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NoteSaverTest {
    @TempDir
    Path dir;

    private static final String NOTE = "RIFFLE FINDINGS NOTE\nS\u00fcdhalle, 48 \u00b0C\nEND OF NOTE\n";

    @Test
    void savedNoteReadsBackIdentical() throws Exception {
        Path written = NoteSaver.save(dir.resolve("p3.txt"), NOTE);
        assertEquals(dir.resolve("p3.txt").toAbsolutePath(), written);
        assertArrayEquals(NOTE.getBytes(StandardCharsets.UTF_8), Files.readAllBytes(written));
        assertEquals(List.of(written), listing(), "no temporary file left behind");
    }

    @Test
    void anExistingNoteIsNeverOverwrittenAndTheNewNameIsReturned() throws Exception {
        Path first = NoteSaver.save(dir.resolve("p3.txt"), "first\n");
        Path second = NoteSaver.save(dir.resolve("p3.txt"), "second\n");
        Path third = NoteSaver.save(dir.resolve("p3.txt"), "third\n");
        assertEquals(dir.resolve("p3-2.txt").toAbsolutePath(), second);
        assertEquals(dir.resolve("p3-3.txt").toAbsolutePath(), third);
        assertEquals("first\n", Files.readString(first));
        assertEquals("second\n", Files.readString(second));
    }

    @Test
    void aNameWithoutExtensionGetsANumberAtTheEnd() {
        assertEquals(Path.of("a/note-2"), NoteSaver.candidate(Path.of("a/note"), 1));
        assertEquals(Path.of("a/.hidden-5"), NoteSaver.candidate(Path.of("a/.hidden"), 4));
        assertEquals(Path.of("a/n.v1-3.txt"), NoteSaver.candidate(Path.of("a/n.v1.txt"), 2));
    }

    @Test
    void aSaveInterruptedBetweenWriteAndMoveLeavesThePreviousStateIntact() throws Exception {
        Path old = NoteSaver.save(dir.resolve("p3.txt"), "previous note\n");
        NoteSaver crashing = new NoteSaver((temp, target) -> {
            assertTrue(Files.exists(temp), "the fault strikes after the temporary file is written");
            assertEquals(NOTE, Files.readString(temp));
            throw new IOException("simulated power loss");
        });
        NoteException e = assertThrows(NoteException.class, () -> crashing.write(dir.resolve("p3.txt"), NOTE));
        assertTrue(e.getMessage().contains("could not save the note (simulated power loss)"), e.getMessage());
        assertEquals("previous note\n", Files.readString(old));
        assertEquals(List.of(old), listing(), "neither a new note nor a temporary file");
    }

    @Test
    void aLinkPlantedAtTheNotePathIsNotFollowed() throws Exception {
        Path victim = Files.writeString(dir.resolve("victim.txt"), "precious\n");
        Files.createSymbolicLink(dir.resolve("p3.txt"), victim);
        Path written = NoteSaver.save(dir.resolve("p3.txt"), NOTE);
        assertEquals(dir.resolve("p3-2.txt").toAbsolutePath(), written);
        assertEquals("precious\n", Files.readString(victim));
        assertTrue(Files.isSymbolicLink(dir.resolve("p3.txt")));
    }

    @Test
    void aLinkPlantedAtTheTemporaryPathIsNotFollowed() throws Exception {
        Path victim = Files.writeString(dir.resolve("victim.txt"), "precious\n");
        Path target = dir.resolve("p3.txt");
        Files.createSymbolicLink(dir.resolve(".p3.txt.planted.tmp"), victim);
        String[] tags = {"planted", "fresh"};
        int[] next = {0};
        Path temp = AtomicFiles.writeTemp(target, NOTE.getBytes(StandardCharsets.UTF_8), false, () -> tags[next[0]++]);
        assertEquals(dir.resolve(".p3.txt.fresh.tmp"), temp);
        assertEquals(NOTE, Files.readString(temp));
        assertEquals("precious\n", Files.readString(victim));
    }

    @Test
    void aMissingFolderIsAClearMessage() {
        Path p = dir.resolve("no-such").resolve("p3.txt");
        NoteException e = assertThrows(NoteException.class, () -> NoteSaver.save(p, NOTE));
        assertEquals(dir.resolve("no-such") + ": no such folder; choose another path for the note"
                + " (your comments are kept)", e.getMessage());
    }

    @Test
    void aFolderRefusingWritesIsAClearMessage() {
        NoteSaver denied = new NoteSaver((temp, target) -> {
            throw new AccessDeniedException(target.toString());
        });
        NoteException e = assertThrows(NoteException.class, () -> denied.write(dir.resolve("p3.txt"), NOTE));
        assertEquals(dir.toAbsolutePath() + ": cannot write in this folder (permission denied or read-only);"
                + " choose another path for the note (your comments are kept)", e.getMessage());
    }

    @Test
    void aReallyReadOnlyFolderIsAClearMessage() throws Exception {
        assumeFalse("root".equals(System.getProperty("user.name")), "root ignores folder permissions");
        Path ro = Files.createDirectory(dir.resolve("ro"));
        Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            NoteException e = assertThrows(NoteException.class, () -> NoteSaver.save(ro.resolve("p3.txt"), NOTE));
            assertTrue(e.getMessage().endsWith("cannot write in this folder (permission denied or read-only);"
                    + " choose another path for the note (your comments are kept)"), e.getMessage());
        } finally {
            Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void aFolderNobodyCanWriteIsAClearMessageEvenForRoot() {
        Path proc = Path.of("/proc");
        assumeTrue(Files.isDirectory(proc.resolve("self")), "Linux /proc, where no one can create a file");
        NoteException e = assertThrows(NoteException.class, () -> NoteSaver.save(proc.resolve("p3.txt"), NOTE));
        assertEquals("/proc: cannot write in this folder (permission denied or read-only);"
                + " choose another path for the note (your comments are kept)", e.getMessage());
    }

    @Test
    void aDeviceIsWrittenIntoNotBesideIt() throws Exception {
        Path devNull = Path.of("/dev/null");
        assumeTrue(Files.exists(devNull), "a Unix /dev/null");
        assertEquals(devNull, NoteSaver.save(devNull, NOTE));
        assertFalse(Files.exists(Path.of("/dev/null-2")), "no numbered file beside the device");
    }

    @Test
    void aFolderGivenAsTheNotePathIsAClearMessage() {
        NoteException e = assertThrows(NoteException.class, () -> NoteSaver.save(dir, NOTE));
        assertEquals(dir + ": is a folder; choose a file name inside it", e.getMessage());
    }

    private List<Path> listing() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(Path::toAbsolutePath).filter(p -> !Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS))
                    .sorted().toList();
        }
    }

    @Test
    void listingSeesHiddenTemporaryFiles() throws Exception {
        Files.writeString(dir.resolve(".x.tmp"), "");
        assertFalse(listing().isEmpty(), "the no-temporary-file checks above can fail");
    }
}
