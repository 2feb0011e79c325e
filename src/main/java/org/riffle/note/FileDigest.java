package org.riffle.note;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * A file's size and SHA-256 digest (FIPS 180-4), as {@code sha256sum} prints it: 64 lower-case hex
 * digits. The file is streamed, never held in memory.
 *
 * <p>Immutable.
 *
 * @param sizeBytes bytes read
 * @param sha256 lower-case hex digest
 */
record FileDigest(long sizeBytes, String sha256) {
    private static final int BUFFER = 1 << 16;

    /** Reads {@code file} through once. */
    static FileDigest of(Path file) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
        long size = 0;
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[BUFFER];
            int n;
            while ((n = in.read(buf)) > 0) {
                md.update(buf, 0, n);
                size += n;
            }
        }
        return new FileDigest(size, HexFormat.of().formatHex(md.digest()));
    }
}
