package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FileDigestTest {
    @Test
    void digestOfTheFixtureEqualsWhatSha256sumPrints() throws Exception {
        // Printed by GNU coreutils 9.1 `sha256sum src/test/resources/org/riffle/note/booster-p3.csv`
        // (run once by hand on the committed fixture; NoteFixtureTest keeps the fixture's bytes fixed):
        // 9be6f054592f051b1bc7b75b495ab52d872e61ea1fca23fef47d9038b9fb470a, 176072 bytes by `stat -c %s`.
        FileDigest d = FileDigest.of(NoteFixture.FILE);
        assertEquals("9be6f054592f051b1bc7b75b495ab52d872e61ea1fca23fef47d9038b9fb470a", d.sha256());
        assertEquals(NoteFixture.SHA256, d.sha256());
        assertEquals(176_072, d.sizeBytes(), "as `stat -c %s` prints it");
    }

    @Test
    void digestOfAbcIsTheFipsExample(@TempDir Path dir) throws Exception {
        // FIPS 180-2 (2002), appendix B.1, "abc": the SHA-256 one-block example.
        Path f = Files.write(dir.resolve("abc"), "abc".getBytes(StandardCharsets.US_ASCII));
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", FileDigest.of(f).sha256());
    }

    @Test
    void digestOfAnEmptyFileIsTheKnownEmptyDigest(@TempDir Path dir) throws Exception {
        // SHA-256 of the empty message, as `sha256sum /dev/null` prints it (GNU coreutils 9.1).
        Path f = Files.write(dir.resolve("empty"), new byte[0]);
        FileDigest d = FileDigest.of(f);
        assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", d.sha256());
        assertEquals(0, d.sizeBytes());
    }
}
