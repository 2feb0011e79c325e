package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The main screen for the demo log, compared cell for cell with a checked-in text once the analysis
 * has finished (the analysis is deterministic and the screen shows no wall-clock time, so nothing
 * needs normalising beyond trailing blanks). After an intended change of the screen or the analysis,
 * regenerate with {@code mvn test -Dtest=MainScreenGoldenTest -Driffle.golden.update=true} and review
 * the diff.
 */
class MainScreenGoldenTest {
    private static final Path GOLDEN = Path.of("src/test/resources/org/riffle/tui");

    @TempDir
    Path dir;

    @Test
    void mainScreenOfTheDemoLogAt80x24() throws Exception {
        check("main-80x24.txt", 80, 24, false);
    }

    @Test
    void mainScreenOfTheDemoLogAt120x30InAscii() throws Exception {
        check("main-120x30-ascii.txt", 120, 30, true);
    }

    private void check(String name, int cols, int rows, boolean ascii) throws Exception {
        Path log = DemoCsv.write(dir.resolve("pump-skid.csv"), 2000);
        VirtualScreen v = new VirtualScreen(List.of(log), cols, rows, ascii).analysed();
        String actual = v.text();
        Path file = GOLDEN.resolve(name);
        if (Boolean.getBoolean("riffle.golden.update")) {
            Files.createDirectories(GOLDEN);
            Files.writeString(file, actual, StandardCharsets.UTF_8);
        }
        String expected = Files.readString(file, StandardCharsets.UTF_8).replace("\r\n", "\n");
        assertEquals(expected, actual, "screen differs from " + file + " (see the class comment to regenerate)");
    }
}
