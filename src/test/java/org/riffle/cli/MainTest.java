package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class MainTest {
    /** Output and status of one run. */
    record Run(int status, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(status, out.toString(), err.toString());
    }

    @Test
    void versionPrintsTheProjectVersion() {
        Run r = run("--version");
        assertEquals(0, r.status());
        assertTrue(r.out().matches("riffle \\d+\\.\\d+\\.\\d+\\R"), r.out());
    }

    /** A worker's OutOfMemoryError arrives wrapped (the triage pool's IllegalStateException): still the memory line. */
    @Test
    void aWrappedOutOfMemoryErrorIsTheMemoryLineNotAnInternalError() {
        assertTrue(Main.outOfMemory(new IllegalStateException("triage failed on a channel",
                new java.util.concurrent.ExecutionException(new OutOfMemoryError("Java heap space")))));
        assertFalse(Main.outOfMemory(new IllegalStateException("a bug", new ArithmeticException())));
        assertTrue(Main.outOfMemory().matches("riffle: not enough memory: the Java heap limit is \\d+ MiB; raise it,"
                + " e\\.g\\. java -Xmx4g -jar riffle\\.jar \\.\\.\\., or split the log into shorter files"),
                Main.outOfMemory());
    }

    @Test
    void missingFileIsOneLineWithTheFileNameAndStatus3() {
        Run r = run("channels", "no-such-file.csv");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: no-such-file.csv: no such file", r.err().strip());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        Run r = run("channels", "--no-such-option", "x.csv");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: Unknown option: '--no-such-option'"), r.err());
    }
}
