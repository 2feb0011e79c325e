package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.riffle.note.DraftStore;

/**
 * Saves that the system refuses, for real, through the shaded jar: a full device ({@code /dev/full},
 * and a small tmpfs filled to the last byte, where the kernel answers {@code ENOSPC}) and a read-only
 * folder (entered as the unprivileged user 65534 by {@code setpriv}, because root writes into a
 * mode-555 folder regardless; see {@code UnreadableLogIT}). Each gives one line naming the place and
 * the reason, a non-zero status, no stack trace; what was there before is unchanged and no temporary
 * file is left. Where the machine cannot do it (no mount rights, no setpriv) the test says why it is
 * skipped.
 */
class DiskFullIT {
    Path dir;
    Path mounted;

    @BeforeEach
    void setUp() throws IOException {
        dir = Files.createTempDirectory("riffle-full", PosixFilePermissions.asFileAttribute(
                PosixFilePermissions.fromString("rwxr-xr-x")));
    }

    @AfterEach
    void tearDown() throws Exception {
        if (mounted != null) {
            new ProcessBuilder("umount", mounted.toString()).inheritIO().start().waitFor(30, TimeUnit.SECONDS);
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path q : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(q);
            }
        } catch (IOException e) {
            // best effort: a temp folder left behind is not worth failing the test for
        }
    }

    private record Run(int status, String out, String err) {
    }

    private Run run(boolean unprivileged, List<String> args) throws Exception {
        List<String> cmd = new ArrayList<>();
        if (unprivileged) {
            cmd.addAll(List.of("/usr/bin/setpriv", "--reuid=65534", "--regid=65534", "--clear-groups"));
        }
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-XX:-UsePerfData");
        cmd.addAll(args);
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(dir.toFile());
        pb.environment().put("LANG", "C.UTF-8");
        pb.environment().put("HOME", dir.toString());
        Path out = Files.createTempFile("riffle-out", ".txt");
        Path err = Files.createTempFile("riffle-err", ".txt");
        try {
            Process p = pb.redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            assertTrue(p.waitFor(180, TimeUnit.SECONDS), "riffle did not finish: " + cmd);
            return new Run(p.exitValue(), Files.readString(out), Files.readString(err));
        } finally {
            Files.deleteIfExists(out);
            Files.deleteIfExists(err);
        }
    }

    private Run riffle(boolean unprivileged, String... args) throws Exception {
        Path jar = dir.resolve("riffle.jar");
        if (!Files.exists(jar)) {
            Files.copy(ReportIT.JAR, jar, StandardCopyOption.REPLACE_EXISTING);
            Files.setPosixFilePermissions(jar, PosixFilePermissions.fromString("rw-r--r--"));
        }
        List<String> all = new ArrayList<>(List.of("-jar", jar.toString()));
        all.addAll(List.of(args));
        return run(unprivileged, all);
    }

    private static void assertOneCleanLine(Run r, String expected) {
        assertEquals(expected + "\n", r.err(), "stderr");
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        assertEquals(ExitCode.FAILED, r.status(), r.err());
    }

    private Path log() throws IOException {
        Path log = dir.resolve("booster-p3.csv");
        if (!Files.exists(log)) {
            Files.copy(Path.of(ReportIT.LOG), log);
            Files.setPosixFilePermissions(log, PosixFilePermissions.fromString("rw-r--r--"));
        }
        return log;
    }

    private static List<String> namesIn(Path folder) throws IOException {
        try (Stream<Path> s = Files.walk(folder)) {
            return s.filter(Files::isRegularFile).map(p -> folder.relativize(p).toString()).sorted().toList();
        }
    }

    @Test
    void aNoteWrittenToDevFullSaysTheDiskIsFull() throws Exception {
        assumeTrue(Files.exists(Path.of("/dev/full")), "no /dev/full on this system");
        Run r = riffle(false, "report", log().toString(), "-o", "/dev/full");
        assertOneCleanLine(r, "riffle: /dev/full: cannot write into this device or pipe (the disk is full)");
    }

    /** What to put on the small file system before it is filled. */
    private interface Setup {
        void on(Path mnt) throws Exception;
    }

    /** Mounts a 256 kB tmpfs at {@code dir/full}, lets {@code setup} put files there, then fills it up. */
    private Path fullDevice(Setup setup) throws Exception {
        boolean root = "root".equals(System.getProperty("user.name"));
        assumeTrue(root, "mounting a small file system needs root; skipped");
        Path mnt = Files.createDirectory(dir.resolve("full"));
        Process m = new ProcessBuilder("mount", "-t", "tmpfs", "-o", "size=256k,mode=755", "tmpfs", mnt.toString())
                .redirectErrorStream(true).start();
        String why = new String(m.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assumeTrue(m.waitFor() == 0, "cannot mount a tmpfs here (" + why + "); skipped");
        mounted = mnt;
        setup.on(mnt);
        byte[] block = new byte[4096];
        try (OutputStream o = Files.newOutputStream(mnt.resolve("filler"))) {
            while (true) {
                o.write(block);
                o.flush();
            }
        } catch (IOException e) {
            assertTrue(String.valueOf(e.getMessage()).contains("No space left on device"), e.toString());
        }
        return mnt;
    }

    @Test
    void onAFullFileSystemTheNoteAndTheBaselineFailCleanlyAndLeaveNothingBehind() throws Exception {
        Path store = dir.resolve("store");
        Run first = riffle(false, "baseline", "save", log().toString(), "--asset", "P-3", "--store", store.toString());
        assertEquals(0, first.status(), first.err());
        Path saved;
        try (Stream<Path> s = Files.list(store.resolve("P-3"))) {
            saved = s.findFirst().orElseThrow();
        }
        Path mnt = fullDevice(m -> Files.copy(saved, Files.createDirectory(m.resolve("P-3")).resolve(
                saved.getFileName())));
        List<String> before = namesIn(mnt);
        byte[] baseline = Files.readAllBytes(saved);

        Path note = mnt.resolve("p3-note.txt");
        Run r = riffle(false, "report", log().toString(), "-o", note.toString());
        assertOneCleanLine(r, "riffle: " + note + ": could not save the note (the disk is full); free some space"
                + " or choose another path (your comments are kept)");

        Run b = riffle(false, "baseline", "save", log().toString(), "--asset", "P-3", "--store", mnt.toString());
        assertOneCleanLine(b, "riffle: " + mnt.resolve("P-3") + ": cannot save the baseline (the disk is full);"
                + " free some space, or set RIFFLE_BASELINE_DIR or --store to a writable folder; the stored"
                + " baselines are as they were");
        assertEquals(before, namesIn(mnt), "no temporary file, no partial note or baseline");
        assertArrayEquals(baseline, Files.readAllBytes(mnt.resolve("P-3").resolve(saved.getFileName())));
        Run list = riffle(false, "baseline", "list", "--store", mnt.toString());
        assertEquals(0, list.status(), list.err());
        assertEquals("", list.err(), "no problem listed");
        assertTrue(list.out().startsWith("1 baseline in " + mnt), list.out());
    }

    @Test
    void onAFullFileSystemTheDraftSaysSoAndThePreviousDraftIsKept() throws Exception {
        Path text = dir.resolve("typed.txt");
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Path[] logAndState = new Path[2];
        List<String> child = new ArrayList<>();
        Path mnt = fullDevice(m -> {
            logAndState[0] = Files.writeString(m.resolve("p3.csv"), "time,a\n");
            logAndState[1] = m.resolve("state");
            child.addAll(List.of("-cp", cp, "org.riffle.note.DraftChild", logAndState[0].toString(),
                    logAndState[1].toString(), text.toString(), "1000", "once"));
            Files.writeString(text, "the first words");
            Run first = run(false, child);
            assertEquals("saved: " + m.resolve(".p3.csv.riffle-draft") + "\n", first.out(), first.err());
        });
        Files.writeString(text, "the words typed when the disk was full");
        Run r = run(false, child);
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith(logAndState[1] + "/"), r.out());
        assertTrue(r.out().endsWith(": could not save the draft (the disk is full) nor beside the log (the disk"
                + " is full); your comments are still on screen: save the note to another place\n"), r.out());
        assertEquals("the first words", DraftStore.inFolder(logAndState[1]).load(logAndState[0]).orElseThrow()
                .findings().general(), "the previous draft is kept whole");
        assertEquals(List.of(".p3.csv.riffle-draft", "filler", "p3.csv"), namesIn(mnt), "no temporary file");
    }

    @Test
    void aReadOnlyFolderRefusesTheNoteAndTheBaselineWithAClearLine() throws Exception {
        boolean root = "root".equals(System.getProperty("user.name"));
        assumeTrue(root && Files.isExecutable(Path.of("/usr/bin/setpriv")),
                "needs root and setpriv to run riffle as an unprivileged user; skipped");
        Path ro = Files.createDirectory(dir.resolve("read-only"));
        Path note = Files.writeString(ro.resolve("booster-p3-note.txt"), "the previous note\n");
        Path store = dir.resolve("store");
        Run first = riffle(false, "baseline", "save", log().toString(), "--asset", "P-3", "--store", store.toString());
        assertEquals(0, first.status(), first.err());
        List<String> storeBefore = namesIn(store);
        for (Path p : List.of(ro, store, store.resolve("P-3"))) {
            Files.setPosixFilePermissions(p, PosixFilePermissions.fromString("r-xr-xr-x"));
        }
        Run r = riffle(true, "report", log().toString(), "-o", ro.toString());
        assertOneCleanLine(r, "riffle: " + ro + ": cannot write in this folder (permission denied or read-only);"
                + " choose another path for the note (your comments are kept)");
        assertEquals("the previous note\n", Files.readString(note));
        assertEquals(List.of("booster-p3-note.txt"), namesIn(ro));

        Run b = riffle(true, "baseline", "save", log().toString(), "--asset", "P-3", "--store", store.toString());
        assertOneCleanLine(b, "riffle: " + store.resolve("P-3") + ": cannot save the baseline (permission denied);"
                + " set RIFFLE_BASELINE_DIR or --store to a writable folder; the stored baselines are as they were");
        assertEquals(storeBefore, namesIn(store));
    }
}
