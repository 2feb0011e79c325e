package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.nio.file.Files;
import org.junit.jupiter.api.Test;

/** The committed note fixture is exactly what its generator writes (regenerate: {@code -Driffle.fixtures.update=true}). */
class NoteFixtureTest {
    @Test
    void committedFixtureEqualsGeneratorOutput() throws Exception {
        byte[] expected = NoteFixture.generate();
        if (Boolean.getBoolean("riffle.fixtures.update")) {
            Files.write(NoteFixture.FILE, expected);
        }
        assertArrayEquals(expected, Files.readAllBytes(NoteFixture.FILE),
                "fixture differs from its generator; regenerate deliberately with -Driffle.fixtures.update=true");
    }
}
