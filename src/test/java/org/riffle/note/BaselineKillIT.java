package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;

/**
 * A {@code kill -9} during a baseline save leaves the store as it was or with one more complete
 * baseline: the baseline saved before is byte for byte the same and still loads, every file the store
 * lists is complete and loads, and whatever a killed save left behind (a hidden temporary file) is
 * neither listed nor reported as a problem by {@code riffle baseline list}.
 *
 * <p>Two ways to kill: {@code riffle baseline save} from the jar, killed at times spread over its run
 * (the save is its last few milliseconds, so most of these kills land in the learning); and
 * {@link BaselineChild}, a JVM that does nothing but save, so that the kills land mid-save.
 */
class BaselineKillIT {
    static final Path JAR = Path.of(System.getProperty("riffle.jar", "target/riffle.jar"));
    static final Path LOG = Path.of("src/test/resources/org/riffle/note/booster-p3.csv").toAbsolutePath();

    @TempDir
    Path dir;
    Path store;
    Path previous;
    byte[] previousBytes;
    Recording rec;

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    private Process riffle(String... args) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(java(), "-jar", JAR.toAbsolutePath().toString()));
        cmd.addAll(List.of(args));
        return new ProcessBuilder(cmd).directory(dir.toFile()).redirectOutput(dir.resolve("out.txt").toFile())
                .redirectError(dir.resolve("err.txt").toFile()).start();
    }

    @BeforeEach
    void saveTheBaselineToProtect() throws Exception {
        store = dir.resolve("store");
        Process p = riffle("baseline", "save", LOG.toString(), "--asset", "P-3", "--store", store.toString());
        assertTrue(p.waitFor(180, TimeUnit.SECONDS), "riffle baseline save did not finish");
        assertEquals(0, p.exitValue(), Files.readString(dir.resolve("err.txt")));
        List<StoredBaseline> saved = BaselineStore.at(store).list().baselines();
        assertEquals(1, saved.size());
        previous = saved.get(0).path();
        previousBytes = Files.readAllBytes(previous);
        rec = LogReader.read(LOG, ReadOptions.defaults());
    }

    private static void kill9(Process p) throws Exception {
        Process k = new ProcessBuilder("kill", "-KILL", Long.toString(p.pid())).inheritIO().start();
        assertEquals(0, k.waitFor(), "kill -KILL");
        assertTrue(p.waitFor(20, TimeUnit.SECONDS), "did not die on SIGKILL");
    }

    /** The store after a kill: the old baseline untouched, every listed one whole, no problem reported. */
    private int checkStore(String when) throws Exception {
        assertArrayEquals(previousBytes, Files.readAllBytes(previous), when + ": the previous baseline changed");
        BaselineStore s = BaselineStore.at(store);
        BaselineStore.Listing l = s.list();
        assertEquals(List.of(), l.problems(), when + ": a damaged file is listed");
        assertTrue(l.baselines().stream().anyMatch(b -> b.path().equals(previous)), when);
        for (StoredBaseline b : l.baselines()) {
            assertEquals(rec.channels().size(), s.load(b, rec).channels().size(), when + ": " + b.id());
        }
        Process list = riffle("baseline", "list", "--store", store.toString());
        assertTrue(list.waitFor(120, TimeUnit.SECONDS));
        assertEquals(0, list.exitValue(), when);
        assertEquals("", Files.readString(dir.resolve("err.txt")), when + ": riffle baseline list complained");
        String out = Files.readString(dir.resolve("out.txt"));
        int n = l.baselines().size();
        assertTrue(out.startsWith(n + (n == 1 ? " baseline in " : " baselines in ")), when + ": " + out);
        assertTrue(!out.contains(".tmp"), when + ": a temporary file is listed: " + out);
        return l.baselines().size();
    }

    private List<Path> temporaryFiles() throws IOException {
        try (Stream<Path> s = Files.walk(store)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".tmp")).toList();
        }
    }

    @Test
    void killingRiffleBaselineSaveAtAnyMomentLeavesThePreviousBaselineIntact() throws Exception {
        long t0 = System.nanoTime();
        Process full = riffle("baseline", "save", LOG.toString(), "--asset", "P-3", "--store", store.toString());
        assertTrue(full.waitFor(180, TimeUnit.SECONDS));
        long runMs = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - t0);
        int before = checkStore("after an undisturbed second save");
        assertEquals(2, before);
        for (int round = 0; round < 3; round++) {
            Process p = riffle("baseline", "save", LOG.toString(), "--asset", "P-3", "--store", store.toString());
            Thread.sleep(runMs * (60 + 15L * round) / 100);
            if (p.isAlive()) {
                kill9(p);
                assertEquals(137, p.exitValue(), "128 + SIGKILL");
            }
            int now = checkStore("round " + round);
            assertTrue(now == before || now == before + 1, "round " + round + ": " + before + " -> " + now);
            before = now;
        }
    }

    @Test
    void killedInTheMiddleOfSavingTheStoreHoldsOnlyWholeBaselines() throws Exception {
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        for (int round = 0; round < 4; round++) {
            Process p = new ProcessBuilder(java(), "-cp", cp, BaselineChild.class.getName(), LOG.toString(),
                    store.toString(), "P-3").redirectErrorStream(true).start();
            BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
            assertEquals("saving", r.readLine(), "the child did not start");
            Thread.sleep(150 + 37L * round);
            kill9(p);
            assertEquals(137, p.exitValue(), "128 + SIGKILL: no shutdown hook ran");
            int n = checkStore("child round " + round);
            assertTrue(n > 1, "the child saved nothing in round " + round);
        }
        // At most one save is under way when a kill lands, so at most one temporary file per kill
        // (checkStore has shown that none of them is listed or reported).
        List<Path> left = temporaryFiles();
        assertTrue(left.size() <= 4, left.size() + " temporary files after 4 kills: " + left);
    }
}
