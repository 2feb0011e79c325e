package org.riffle.log;

import java.util.Locale;

/**
 * The one neutraliser for text that came from input (channel names, units, preamble lines, cells,
 * file names) before it reaches a terminal, a note or a message: every control character (C0, DEL,
 * C1, which includes the 8-bit CSI 0x9B), format character (bidirectional overrides, zero-width
 * marks), line or paragraph separator and unpaired surrogate is replaced by a visible, inert spelling:
 * caret notation for C0 ({@code ^[} for ESC), {@code ^?} for DEL, {@code <U+XXXX>} for the rest. An
 * escape sequence thus loses its introducer and prints as plain text. Both faces ({@code tui} and
 * {@code note}) and the command line's messages use it, so they cannot disagree.
 *
 * <p>Character classes are Unicode's general categories as {@link Character#getType} reports them
 * (Cc, Cf, Zl, Zp, Cs); ECMA-48 (5th edition, 1991) defines C0 and C1 and ESC as the introducer of
 * every escape sequence.
 *
 * <p>Stateless and thread-safe.
 */
public final class Printable {
    private Printable() {
    }

    /** {@code s} made harmless on one line (a line break becomes {@code ^J}); {@code null} stays null. */
    public static String clean(String s) {
        if (s == null || isClean(s)) {
            return s;
        }
        StringBuilder sb = new StringBuilder(s.length() + 8);
        s.codePoints().forEach(cp -> append(sb, cp));
        return sb.toString();
    }

    /**
     * Several lines made harmless: line breaks (CR LF, CR, LF) are kept as LF, a tab becomes one space,
     * everything else as in {@link #clean}.
     */
    public static String cleanLines(String s) {
        String unified = s.replace("\r\n", "\n").replace('\r', '\n').replace('\t', ' ');
        StringBuilder sb = new StringBuilder(unified.length());
        unified.codePoints().forEach(cp -> {
            if (cp == '\n') {
                sb.append('\n');
            } else {
                append(sb, cp);
            }
        });
        return sb.toString();
    }

    /** True when {@link #clean} would leave {@code s} unchanged. */
    public static boolean isClean(String s) {
        for (int i = 0; i < s.length(); ) {
            int cp = s.codePointAt(i);
            if (unsafe(cp)) {
                return false;
            }
            i += Character.charCount(cp);
        }
        return true;
    }

    private static void append(StringBuilder sb, int cp) {
        if (cp < 0x20) {
            sb.append('^').append((char) (cp + 0x40));
        } else if (cp == 0x7F) {
            sb.append("^?");
        } else if (unsafe(cp)) {
            sb.append(String.format(Locale.ROOT, "<U+%04X>", cp));
        } else {
            sb.appendCodePoint(cp);
        }
    }

    private static boolean unsafe(int cp) {
        if (cp < 0x20 || cp == 0x7F) {
            return true;
        }
        int type = Character.getType(cp);
        return type == Character.CONTROL || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                || type == Character.PARAGRAPH_SEPARATOR || type == Character.SURROGATE;
    }
}
