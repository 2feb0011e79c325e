package org.riffle.note;

import java.util.Locale;

/**
 * The escaping used inside riffle's own line-based files (drafts, stored baselines): a backslash, a
 * line break, a carriage return, a tab and every other control or format character are written as
 * backslash escapes ({@code \\ \n \r \t \\uXXXX}), so any text, comments with line breaks included,
 * round-trips word for word on one line. Everything else is kept as UTF-8.
 *
 * <p>Stateless and thread-safe.
 */
final class Escape {
    private Escape() {
    }

    /** {@code s} on one line, reversible with {@link #decode}. */
    static String encode(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 8);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    int type = Character.getType(c);
                    if (type == Character.CONTROL || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                            || type == Character.PARAGRAPH_SEPARATOR
                            || Character.isSurrogate(c) && !pairedAt(s, i)) {
                        sb.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }

    private static boolean pairedAt(String s, int i) {
        char c = s.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1));
        }
        return i > 0 && Character.isHighSurrogate(s.charAt(i - 1));
    }

    /**
     * The text {@link #encode} wrote.
     *
     * @throws IllegalArgumentException on a malformed escape, naming it
     */
    static String decode(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '\\') {
                sb.append(c);
                continue;
            }
            if (i + 1 >= s.length()) {
                throw new IllegalArgumentException("a lone backslash at the end of the line");
            }
            char e = s.charAt(++i);
            switch (e) {
                case '\\' -> sb.append('\\');
                case 'n' -> sb.append('\n');
                case 'r' -> sb.append('\r');
                case 't' -> sb.append('\t');
                case 'u' -> {
                    if (i + 5 > s.length()) {
                        throw new IllegalArgumentException("a cut-off \\u escape");
                    }
                    String hex = s.substring(i + 1, i + 5);
                    if (!hex.matches("[0-9a-fA-F]{4}")) {
                        throw new IllegalArgumentException("a bad \\u escape '" + hex + "'");
                    }
                    sb.append((char) Integer.parseInt(hex, 16));
                    i += 4;
                }
                default -> throw new IllegalArgumentException("an unknown escape '\\" + e + "'");
            }
        }
        return sb.toString();
    }
}
