package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Golden-text comparison: the actual text must equal the checked-in file exactly (line ends
 * normalised to LF). Regenerate deliberately with {@code -Driffle.golden.update=true} and review the
 * diff before committing it.
 */
final class Golden {
    static final Path DIR = Path.of("src/test/resources/org/riffle/note");

    private Golden() {
    }

    static void assertMatches(String name, String actual) throws IOException {
        Path file = DIR.resolve(name);
        String normalised = actual.replace("\r\n", "\n");
        if (Boolean.getBoolean("riffle.golden.update")) {
            Files.writeString(file, normalised, StandardCharsets.UTF_8);
        }
        String expected = Files.readString(file, StandardCharsets.UTF_8).replace("\r\n", "\n");
        assertEquals(expected, normalised, "differs from golden " + file
                + " (if the change is intended, rerun with -Driffle.golden.update=true and review the diff)");
    }
}
