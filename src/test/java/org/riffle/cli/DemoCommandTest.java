package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoCommandTest {
    @Test
    void writesTheFixturesAndNamesThem(@TempDir Path tmp) {
        Path dir = tmp.resolve("new/sub");
        MainTest.Run r = MainTest.run("demo", dir.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals(3, r.out().lines().count(), r.out());
        assertTrue(Files.isRegularFile(dir.resolve("af2-process.csv")));
        assertTrue(Files.isRegularFile(dir.resolve("af2-vibration.wav")));
        assertTrue(Files.isRegularFile(dir.resolve("README.md")));
    }

    @Test
    void aFileInTheWayIsAOneLineFailureWithStatus1(@TempDir Path tmp) throws IOException {
        Path file = Files.writeString(tmp.resolve("occupied"), "x");
        MainTest.Run r = MainTest.run("demo", file.toString());
        assertEquals(ExitCode.FAILED, r.status());
        assertEquals("riffle: " + file + ": cannot write the demo fixtures: a file is in the way of " + file,
                r.err().strip());
        assertEquals(1, r.err().lines().count(), r.err());
        assertFalse(r.err().contains("\tat "), r.err());
    }

    @Test
    void isHiddenFromTheHelpListing() {
        assertFalse(MainTest.run("--help").out().contains("demo"));
    }
}
