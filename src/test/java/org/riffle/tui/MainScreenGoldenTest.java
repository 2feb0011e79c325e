package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The main screen for the demo log ({@code fixtures/demo/af2-process.csv}), compared cell for cell with a checked-in text once the analysis
 * has finished (the analysis is deterministic and the screen shows no wall-clock time, so nothing
 * needs normalising beyond trailing blanks). After an intended change of the screen or the analysis,
 * regenerate with {@code mvn test -Dtest=MainScreenGoldenTest -Driffle.golden.update=true} and review
 * the diff.
 */
class MainScreenGoldenTest {
    private static final Path GOLDEN = Path.of("src/test/resources/org/riffle/tui");

    private static final Path DEMO = Path.of("fixtures/demo/af2-process.csv");

    /** One analysis of the demo log, the main screen at the minimum size and after a resize. */
    @Test
    void mainScreenOfTheDemoLogAt80x24AndAt120x30() throws Exception {
        VirtualScreen v = new VirtualScreen(List.of(DEMO), 80, 24, false).analysed();
        check("af2-main-80x24.txt", v);
        check("af2-main-120x30.txt", v.resize(120, 30));
    }

    private void check(String name, VirtualScreen v) throws Exception {
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
