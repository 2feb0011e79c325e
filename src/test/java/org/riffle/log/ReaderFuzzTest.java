package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Coverage-guided fuzzing of the log readers with Jazzer (libFuzzer's engine driven by the JVM's own
 * branch coverage of {@code org.riffle.log} and Commons CSV, which Jazzer instruments as the classes
 * load). The property: any bytes read as a log give a {@link Recording} whose channels all have one
 * value per row, or a {@link LogException} whose message is one line naming the input; never another
 * exception, a hang (more than {@value #TIMEOUT_S} s for one input) or an {@link OutOfMemoryError}
 * (the forked JVM has a 1 GB heap; see the {@code fuzz} execution in {@code pom.xml}).
 *
 * <p>The seeds are every file of {@code fixtures/dialects} and {@code fixtures/bad}. The bytes go in
 * through {@link LogReader#read(java.io.InputStream, String, ReadOptions)}, the path standard input
 * takes in the CLI, which sniffs gzip and WAV by magic bytes exactly as for a named file.
 *
 * <p>Run by {@code mvn verify} in its own JVM with {@code JAZZER_FUZZ=1} (fuzzing mode, bounded by
 * {@code maxDuration}). Inputs that break the property are written by Jazzer to
 * {@code src/test/resources/org/riffle/log/ReaderFuzzTestInputs/anyBytesGiveARecordingOrTheDomainError/};
 * commit one there after the fix and it is replayed first on every run. Not part of the ordinary
 * surefire run (Jazzer's agent would instrument every test JVM-wide).
 */
class ReaderFuzzTest {
    static final int TIMEOUT_S = 10;
    private static final ExecutorService READER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "fuzz-read");
        t.setDaemon(true);
        return t;
    });
    private static final Set<String> NOT_SAMPLES = Set.of("README.md", "make_hostile.py", "expected.tsv");

    /** The seed corpus: every sample log in the fixtures, good and bad. */
    static Stream<byte[]> fixtures() {
        return Stream.of("fixtures/dialects", "fixtures/bad").flatMap(ReaderFuzzTest::filesIn).map(p -> {
            try {
                return Files.readAllBytes(p);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    private static Stream<Path> filesIn(String dir) {
        try (Stream<Path> s = Files.list(Path.of(dir))) {
            List<Path> files = s.filter(Files::isRegularFile)
                    .filter(p -> !NOT_SAMPLES.contains(p.getFileName().toString())).sorted().toList();
            assertTrue(files.size() >= 20, dir + " has only " + files.size() + " samples: wrong working folder?");
            return files.stream();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @AfterAll
    static void stop() {
        READER.shutdownNow();
    }

    /**
     * The target. The read runs on a worker so that a hang is caught here, after {@value #TIMEOUT_S} s,
     * as a failure naming the input (libFuzzer's own per-input timeout is 20 minutes, and a JUnit
     * {@code @Timeout} would also cut the whole fuzzing run short). Coverage is collected JVM-wide,
     * so running on another thread loses no feedback.
     */
    @MethodSource("fixtures")
    @FuzzTest(maxDuration = "30s")
    void anyBytesGiveARecordingOrTheDomainError(byte[] data) throws Throwable {
        Future<Recording> read = READER.submit(() -> {
            try {
                return LogReader.read(new ByteArrayInputStream(data), "fuzzed.csv", ReadOptions.defaults());
            } catch (LogException e) {
                String m = e.getMessage();
                assertEquals(1, m.lines().count(), "not one line: " + m);
                assertTrue(m.startsWith("fuzzed.csv"), "does not name the input: " + m);
                assertFalse(m.chars().anyMatch(c -> c < 0x20 && c != '\t'), "control character in: " + m);
                return null;
            }
        });
        Recording r;
        try {
            r = read.get(TIMEOUT_S, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            read.cancel(true);
            throw new AssertionError("reading " + data.length + " bytes did not finish in " + TIMEOUT_S + " s");
        } catch (ExecutionException e) {
            throw e.getCause();
        }
        if (r == null) {
            return;
        }
        assertTrue(r.rows() > 0, "a recording with no rows");
        for (Channel c : r.channels()) {
            assertEquals(r.rows(), c.size(), "channel " + c.name() + " length");
        }
    }
}
