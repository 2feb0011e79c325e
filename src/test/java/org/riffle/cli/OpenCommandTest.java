package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** {@code riffle open} and {@code riffle LOG} without a terminal (the test JVM has none). */
class OpenCommandTest {
    @Test
    void openWithoutATerminalSaysSoInOneLineAndExits4() {
        MainTest.Run r = MainTest.run("open", "some.csv");
        assertEquals(ExitCode.NO_TERMINAL, r.status());
        assertEquals("riffle: no terminal: the screen needs one (over SSH use 'ssh -t'); without one use a"
                + " headless command such as 'riffle channels LOG'", r.err().strip());
        assertEquals("", r.out());
    }

    @Test
    void aPlainLogArgumentOpensTheScreenToo() {
        MainTest.Run r = MainTest.run("some.csv", "other.csv");
        assertEquals(ExitCode.NO_TERMINAL, r.status());
        assertTrue(r.err().startsWith("riffle: no terminal:"), r.err());
    }

    @Test
    void helpStillListsTheSubcommands() {
        MainTest.Run r = MainTest.run("--help");
        assertEquals(0, r.status());
        assertTrue(r.out().contains("channels") && r.out().contains("open"), r.out());
        assertTrue(r.out().contains("[LOG...]"), r.out());
    }

    @Test
    void openNeedsAtLeastOneLog() {
        MainTest.Run r = MainTest.run("open");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: Missing required parameter: 'LOG'"), r.err());
    }
}
