package org.riffle.tui;

/**
 * The characters the screen draws with besides sparklines (which {@code signal.Sparkline} draws): a
 * Unicode set for UTF-8 terminals and a plain ASCII set for everything else. Nothing on screen depends
 * on colour; every flag is a symbol and a word.
 *
 * <p>Immutable.
 */
final class Glyphs {
    static final Glyphs UNICODE = new Glyphs(false, '│', '▲', '…', '·', "⏎", "↑↓", "←→");
    static final Glyphs ASCII = new Glyphs(true, '|', '^', '~', '.', "Enter", "Up/Dn", "Lt/Rt");

    private final boolean ascii;
    final char vertical;
    final char up;
    final char ellipsis;
    final char dot;
    final String enter;
    final String upDown;
    final String leftRight;

    private Glyphs(boolean ascii, char vertical, char up, char ellipsis, char dot, String enter, String upDown,
                   String leftRight) {
        this.ascii = ascii;
        this.vertical = vertical;
        this.up = up;
        this.ellipsis = ellipsis;
        this.dot = dot;
        this.enter = enter;
        this.upDown = upDown;
        this.leftRight = leftRight;
    }

    /** True for the ASCII set. */
    boolean ascii() {
        return ascii;
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
