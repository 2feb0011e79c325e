package org.riffle.tui;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;

/**
 * The bytes a terminal is sent for one character of the screen, worked out directly. Lanterna encodes
 * each character through {@code Charset.encode} (a buffer, an encoder and a lookup per character,
 * costly before the JIT has compiled it: most of a first frame's refresh) and sends the whole backing
 * array, which for a two-byte UTF-8 character (° in °C, ³ in m³/h) holds a stray NUL byte after it.
 * Here: ASCII as itself, and in UTF-8 the one to three bytes of RFC 3629; anything else (a surrogate,
 * or a non-ASCII character on an ASCII terminal) is left to Lanterna.
 *
 * <p>Stateless and thread-safe.
 */
final class CellBytes {
    private CellBytes() {
    }

    /** The bytes of {@code c} on a terminal of {@code charset} (UTF-8 or ASCII); null to leave it to Lanterna. */
    static byte[] of(char c, Charset charset) {
        if (c < 0x80) {
            return new byte[] {(byte) c};
        }
        if (!StandardCharsets.UTF_8.equals(charset) || Character.isSurrogate(c)) {
            return null;
        }
        if (c < 0x800) {
            return new byte[] {(byte) (0xC0 | c >> 6), (byte) (0x80 | c & 0x3F)};
        }
        return new byte[] {(byte) (0xE0 | c >> 12), (byte) (0x80 | c >> 6 & 0x3F), (byte) (0x80 | c & 0x3F)};
    }
}
