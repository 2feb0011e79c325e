package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Golden-text comparison: the expected text is a checked-in file under
 * {@code src/test/resources/org/riffle/cli/}; line endings are normalised to LF on both sides. Run the
 * tests with {@code -Driffle.golden.update=true} to rewrite the expected files after a deliberate
 * change, then review the diff before committing.
 */
final class Golden {
    private static final Path DIR = Path.of("src", "test", "resources", "org", "riffle", "cli");

    private Golden() {
    }

    static void assertMatches(String file, String actual) {
        String got = normalise(actual);
        Path p = DIR.resolve(file);
        try {
            if (Boolean.getBoolean("riffle.golden.update")) {
                Files.writeString(p, got, StandardCharsets.UTF_8);
            }
            assertEquals(normalise(Files.readString(p, StandardCharsets.UTF_8)), got,
                    "output differs from " + p + " (rerun with -Driffle.golden.update=true to accept a deliberate change)");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String normalise(String s) {
        return s.replace("\r\n", "\n").replace('\r', '\n');
    }
}
