package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle report} end to end: the shaded jar in its own JVM, as a technician runs it. */
class ReportIT {
    static final Path JAR = Path.of(System.getProperty("riffle.jar", "target/riffle.jar"));
    static final String LOG = Path.of("src/test/resources/org/riffle/note/booster-p3.csv").toAbsolutePath().toString();

    record Run(int status, String out, String err) {
    }

    static Run riffle(Path cwd, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar", JAR.toAbsolutePath().toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(cwd.toFile());
        pb.environment().put("LANG", "C.UTF-8");
        pb.redirectOutput(cwd.resolve(".out").toFile()).redirectError(cwd.resolve(".err").toFile());
        Process p = pb.start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "riffle did not finish");
        return new Run(p.exitValue(), Files.readString(cwd.resolve(".out")), Files.readString(cwd.resolve(".err")));
    }

    @Test
    void theJarWritesTheNoteIntoTheCurrentFolderAndNeverOverAnother(@TempDir Path dir) throws Exception {
        Run r = riffle(dir, "report", LOG, "--asset", "P-3", "--technician", "R. Ortiz");
        assertEquals(0, r.status(), r.err());
        Path note = dir.resolve("booster-p3-note.txt");
        assertEquals("note: " + note + "\n", r.out());
        String text = Files.readString(note, StandardCharsets.UTF_8);
        assertTrue(text.matches("(?s)RIFFLE FINDINGS NOTE\nWritten \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d:\\d\\d [+-]\\d\\d:\\d\\d"
                + " by riffle \\d+\\.\\d+\\.\\d+.*"), "version from the jar's resource: " + text.substring(0, 80));
        assertTrue(text.contains("Technician:             R. Ortiz\n"));
        assertTrue(text.contains("9be6f054592f051b1bc7b75b495ab52d872e61ea1fca23fef47d9038b9fb470a"),
                "the fixture's SHA-256 as GNU coreutils 9.1 sha256sum printed it (see FileDigestTest)");
        Run again = riffle(dir, "report", LOG);
        assertEquals(0, again.status(), again.err());
        assertEquals("note: " + dir.resolve("booster-p3-note-2.txt") + "\n", again.out());
        assertEquals(text, Files.readString(note, StandardCharsets.UTF_8), "the first note is untouched");
    }

    @Test
    void aFolderThroughThePipeHasNoProgressLineAndNoStackTrace(@TempDir Path dir) throws Exception {
        Path logs = Files.createDirectory(dir.resolve("logs"));
        for (String n : List.of("a.csv", "b.csv", "c.csv")) {
            Files.copy(Path.of(LOG), logs.resolve(n));
        }
        Files.write(logs.resolve("d.csv"), new byte[] {0, 1, 2, 3, (byte) 0xff});
        Run r = riffle(dir, "report", "logs", "-o", "logs");
        assertEquals(ExitCode.BAD_INPUT, r.status(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("riffle: logs/d.csv: "), r.err());
        assertFalse(r.err().contains("\r") || r.err().contains("Exception"), r.err());
        for (String n : List.of("a-note.txt", "b-note.txt", "c-note.txt", "riffle-summary.csv")) {
            assertTrue(Files.isRegularFile(logs.resolve(n)), n);
        }
        assertEquals(13, Files.readAllLines(logs.resolve("riffle-summary.csv")).size(), "header + 3 x 4 channels");
    }
}
