package org.riffle.tui;

/**
 * The characters the screen draws with: a Unicode set for UTF-8 terminals and a plain ASCII set for
 * everything else. Nothing on screen depends on colour; every flag is a symbol and a word.
 *
 * <p>Immutable.
 */
final class Glyphs {
    /** Unicode block elements, lowest to highest. */
    private static final String UNICODE_RAMP = "▁▂▃▄▅▆▇█";
    /** An ASCII ramp, lowest to highest. */
    private static final String ASCII_RAMP = "_.-:=+*#";

    static final Glyphs UNICODE = new Glyphs(false, UNICODE_RAMP, '│', '─', '┼', '█', '▲', '▼', '…', '·',
            "→", "⏎", "↑↓", "←→", "▌", '░');
    static final Glyphs ASCII = new Glyphs(true, ASCII_RAMP, '|', '-', '+', '#', '^', 'v', '~', '.',
            "->", "Enter", "Up/Dn", "Lt/Rt", "|", ':');

    private final boolean ascii;
    private final String ramp;
    final char vertical;
    final char horizontal;
    final char cross;
    final char full;
    final char up;
    final char down;
    final char ellipsis;
    final char dot;
    final String arrow;
    final String enter;
    final String upDown;
    final String leftRight;
    final String cursor;
    final char shade;

    private Glyphs(boolean ascii, String ramp, char vertical, char horizontal, char cross, char full, char up,
                   char down, char ellipsis, char dot, String arrow, String enter, String upDown,
                   String leftRight, String cursor, char shade) {
        this.ascii = ascii;
        this.ramp = ramp;
        this.vertical = vertical;
        this.horizontal = horizontal;
        this.cross = cross;
        this.full = full;
        this.up = up;
        this.down = down;
        this.ellipsis = ellipsis;
        this.dot = dot;
        this.arrow = arrow;
        this.enter = enter;
        this.upDown = upDown;
        this.leftRight = leftRight;
        this.cursor = cursor;
        this.shade = shade;
    }

    /** True for the ASCII set. */
    boolean ascii() {
        return ascii;
    }

    /** Number of steps of the ramp. */
    int steps() {
        return ramp.length();
    }

    /** Ramp character {@code step} (0 = lowest), clamped to the ramp. */
    char ramp(int step) {
        return ramp.charAt(Math.max(0, Math.min(ramp.length() - 1, step)));
    }

    /**
     * Text fit for this set: unchanged for Unicode; for ASCII, every character outside printable ASCII
     * is replaced (a few common unit signs by their spelled form, the rest by {@code ?}).
     */
    String text(String s) {
        if (!ascii) {
            return s;
        }
        StringBuilder sb = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            if (cp >= 0x20 && cp < 0x7f) {
                sb.append((char) cp);
            } else if (cp == 'µ' || cp == 'μ') {
                sb.append('u');
            } else if (cp == '°') {
                sb.append("deg");
            } else if (cp == '²') {
                sb.append('2');
            } else if (cp == '³') {
                sb.append('3');
            } else if (cp == '–' || cp == '—' || cp == '−') {
                sb.append('-');
            } else if (cp == '×') {
                sb.append('x');
            } else {
                sb.append('?');
            }
        });
        return sb.toString();
    }
}
