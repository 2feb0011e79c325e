package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The hostile inputs too big to commit or impossible to commit (a pipe, a device, a file name holding
 * an escape sequence), made at run time and run through {@code riffle channels} like the rows of
 * {@code fixtures/bad/expected.tsv}: status, exact message, no stack trace, no hang.
 */
class HostileInputTest {
    private static final Duration NO_HANG = Duration.ofSeconds(60);

    @TempDir
    Path dir;

    /** Status, standard output, standard error. */
    private record Run(int status, String out, String err) {
    }

    private static Run channels(Path file) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = assertTimeoutPreemptively(NO_HANG, () -> Main.run(new String[] {"channels", file.toString()},
                new PrintWriter(out, true), new PrintWriter(err, true)));
        assertFalse(err.toString().contains("Exception") || err.toString().contains("\tat "),
                "no stack trace: " + err);
        return new Run(status, out.toString(), err.toString().strip());
    }

    @Test
    void aTenMegabyteLineIsRefusedWithoutReadingItWhole() throws IOException {
        Path f = dir.resolve("one-line.csv");
        try (Writer w = Files.newBufferedWriter(f, StandardCharsets.US_ASCII)) {
            for (int i = 0; i < 10 * 1024 * 1024 / 8; i++) {
                w.write("1.25000,");
            }
        }
        assertEquals(10L * 1024 * 1024, Files.size(f));
        Run r = channels(f);
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + f + ":1: line 1 is longer than 4194304 bytes: not a delimited text log"
                + " (binary data, or no line breaks?)", r.err());
    }

    @Test
    void twentyThousandColumnsAreReadOrRefusedCleanly() throws IOException {
        Path f = dir.resolve("wide.csv");
        StringBuilder sb = new StringBuilder("time");
        for (int c = 0; c < 20_000; c++) {
            sb.append(",c").append(c);
        }
        sb.append('\n');
        for (int r = 0; r < 5; r++) {
            sb.append(r);
            for (int c = 0; c < 20_000; c++) {
                sb.append(',').append(c % 10);
            }
            sb.append('\n');
        }
        Files.writeString(f, sb, StandardCharsets.US_ASCII);
        Run r = channels(f);
        assertEquals(ExitCode.OK, r.status(), r.err());
        assertTrue(r.out().startsWith(f + ": 5 rows, 20000 numeric channels, 0 text channels"), r.out());
        assertTrue(r.out().contains("\nc19999 "), "the last column is listed");
    }

    /**
     * 20,000 columns as a historian exports them: tag names with units make the header 620 KB and each
     * row of six-decimal values 240 KB, both past the 256 KiB that used to be the line limit.
     */
    @Test
    void twentyThousandLongNamedColumnsWithWideRowsAreRead() throws IOException {
        Path f = dir.resolve("wide-tags.csv");
        StringBuilder sb = new StringBuilder("time");
        for (int c = 0; c < 20_000; c++) {
            sb.append(String.format(Locale.ROOT, ",AREA7_PUMPSTATION_TAG%05d [m3/h]", c));
        }
        int header = sb.length();
        sb.append('\n');
        for (int r = 0; r < 4; r++) {
            sb.append("2026-03-01T08:00:0").append(r).append('Z');
            for (int c = 0; c < 20_000; c++) {
                sb.append(String.format(Locale.ROOT, ",%.6f", r + c / 1e4));
            }
            sb.append('\n');
        }
        Files.writeString(f, sb, StandardCharsets.US_ASCII);
        assertTrue(header > 600_000, "header of " + header + " bytes");
        Run r = channels(f);
        assertEquals(ExitCode.OK, r.status(), r.err());
        assertTrue(r.out().startsWith(f + ": 4 rows, 20000 numeric channels, 0 text channels"), r.out());
        assertTrue(r.out().contains("\nAREA7_PUMPSTATION_TAG19999  m3/h "), "the last column, its unit split off");
    }

    @Test
    void aNamedPipeIsRefusedAtOnceInsteadOfWaitingForAWriter() throws Exception {
        Path fifo = dir.resolve("feed.csv");
        Process p = new ProcessBuilder("mkfifo", fifo.toString()).redirectErrorStream(true).start();
        assumeTrue(p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0, "mkfifo is available");
        Run r = channels(fifo);
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + fifo + ": not a regular file (a named pipe or a device); copy it to a file"
                + " first, or give it on standard input: riffle ... - < " + fifo, r.err());
        Path link = dir.resolve("link.csv");
        Files.createSymbolicLink(link, fifo);
        assertEquals(ExitCode.BAD_INPUT, channels(link).status(), "a link to a pipe is a pipe");
    }

    @Test
    void aDeviceThatNeverEndsIsRefused() {
        Path zero = Path.of("/dev/zero");
        assumeTrue(Files.exists(zero), "/dev/zero exists");
        Run r = channels(zero);
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertTrue(r.err().startsWith("riffle: /dev/zero: not a regular file"), r.err());
    }

    @Test
    void anEscapeSequenceInAFileNameIsShownInertInTheMessage() throws IOException {
        Path f = dir.resolve("evil\u001b]0;owned\u0007\u001b[2J.csv");
        Files.writeString(f, "time,flow\n", StandardCharsets.US_ASCII);
        Run r = channels(f);
        assertEquals(ExitCode.BAD_INPUT, r.status());
        String shown = dir + "/evil^[]0;owned^G^[[2J.csv";
        assertEquals("riffle: " + shown + ": no data rows under the header (line 1)", r.err());
        assertFalse(r.err().chars().anyMatch(c -> c < 0x20), "no control character reaches the terminal");
    }
}
