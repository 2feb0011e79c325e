package org.riffle.log;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Optional;

/**
 * Chooses the text encoding of a log from its first bytes: a UTF-8 byte-order mark or valid UTF-8
 * means UTF-8; anything else is read as Windows-1252 (the single-byte code page of Windows PCs in
 * Western Europe, a superset of ISO-8859-1's printable characters), so {@code °C}, {@code µm} and
 * {@code m³/h} survive either way. UTF-16 and binary data are refused with a message saying what the
 * file is.
 *
 * <p>Stateless and thread-safe.
 */
final class Encodings {
    /** The single-byte fallback. */
    static final Charset LEGACY = Charset.forName("windows-1252");

    private Encodings() {
    }

    /** The chosen encoding and the length of the byte-order mark to skip. */
    record Choice(Charset charset, int bomLength) {
    }

    /**
     * Chooses the encoding of the text that starts with {@code head[0, len)}.
     *
     * @param atEof true when {@code head} holds the whole file (a cut multi-byte character at the end is then an error)
     */
    static Choice choose(String file, byte[] head, int len, Optional<Charset> forced, boolean atEof)
            throws LogException {
        if (len >= 2 && ((head[0] == (byte) 0xFF && head[1] == (byte) 0xFE)
                || (head[0] == (byte) 0xFE && head[1] == (byte) 0xFF))) {
            throw new LogException(file, 0, 0, "UTF-16 text (byte-order mark " + hex(head[0]) + " " + hex(head[1])
                    + "); riffle reads UTF-8 or single-byte text: convert it first, e.g. iconv -f UTF-16 -t UTF-8");
        }
        int bom = len >= 3 && head[0] == (byte) 0xEF && head[1] == (byte) 0xBB && head[2] == (byte) 0xBF ? 3 : 0;
        checkNotBinary(file, head, bom, len);
        if (forced.isPresent()) {
            return new Choice(forced.get(), forced.get().equals(StandardCharsets.UTF_8) ? bom : 0);
        }
        if (bom > 0) {
            return new Choice(StandardCharsets.UTF_8, bom);
        }
        int upTo = atEof ? len : completeUtf8Prefix(head, len);
        return new Choice(isUtf8(head, 0, upTo) ? StandardCharsets.UTF_8 : LEGACY, 0);
    }

    /** Refuses NUL bytes and control characters other than tab, CR, LF, form feed and Ctrl-Z. */
    private static void checkNotBinary(String file, byte[] head, int from, int len) throws LogException {
        int zeroEven = 0;
        int zeroOdd = 0;
        int control = 0;
        int first = -1;
        for (int i = from; i < len; i++) {
            int c = head[i] & 0xFF;
            if (c == 0) {
                if ((i & 1) == 0) {
                    zeroEven++;
                } else {
                    zeroOdd++;
                }
            }
            if (c < 0x20 && c != '\t' && c != '\n' && c != '\r' && c != 0x0C && c != 0x1A || c == 0x7F) {
                control++;
                if (first < 0) {
                    first = i;
                }
            }
        }
        int pairs = Math.max(1, (len - from) / 2);
        if (Math.max(zeroEven, zeroOdd) > pairs * 0.4 && Math.min(zeroEven, zeroOdd) < pairs * 0.05) {
            throw new LogException(file, 0, 0, "looks like UTF-16 text without a byte-order mark (every other byte"
                    + " is 0); riffle reads UTF-8 or single-byte text: convert it first, e.g. iconv -f UTF-16LE -t UTF-8");
        }
        if (control > 0) {
            throw new LogException(file, 0, 0, "binary data, not a text log (byte " + hex(head[first])
                    + " at offset " + first + ")");
        }
    }

    /** Length of {@code head[0, len)} without a multi-byte character cut off at its end. */
    private static int completeUtf8Prefix(byte[] head, int len) {
        int i = len;
        int back = 0;
        while (i > 0 && back < 4 && (head[i - 1] & 0xC0) == 0x80) {
            i--;
            back++;
        }
        if (i > 0 && (head[i - 1] & 0xC0) == 0xC0) {
            return i - 1;
        }
        return len;
    }

    /** True when {@code b[s, e)} is well-formed UTF-8. */
    static boolean isUtf8(byte[] b, int s, int e) {
        return firstBadUtf8(b, s, e) < 0;
    }

    /**
     * Offset of the first byte in {@code b[s, e)} that does not start a well-formed UTF-8 sequence
     * (Unicode 15, Table 3-7: no overlong forms, no surrogates, nothing above U+10FFFF), or -1.
     */
    static int firstBadUtf8(byte[] b, int s, int e) {
        int i = s;
        while (i < e) {
            int c = b[i] & 0xFF;
            if (c < 0x80) {
                i++;
                continue;
            }
            int n;
            int lo = 0x80;
            int hi = 0xBF;
            if (c >= 0xC2 && c <= 0xDF) {
                n = 1;
            } else if (c >= 0xE0 && c <= 0xEF) {
                n = 2;
                lo = c == 0xE0 ? 0xA0 : 0x80;
                hi = c == 0xED ? 0x9F : 0xBF;
            } else if (c >= 0xF0 && c <= 0xF4) {
                n = 3;
                lo = c == 0xF0 ? 0x90 : 0x80;
                hi = c == 0xF4 ? 0x8F : 0xBF;
            } else {
                return i;
            }
            if (i + n >= e) {
                return i;
            }
            int c1 = b[i + 1] & 0xFF;
            if (c1 < lo || c1 > hi) {
                return i;
            }
            for (int k = 2; k <= n; k++) {
                if ((b[i + k] & 0xC0) != 0x80) {
                    return i;
                }
            }
            i += n + 1;
        }
        return -1;
    }

    static String hex(byte b) {
        return String.format("0x%02X", b & 0xFF);
    }
}
