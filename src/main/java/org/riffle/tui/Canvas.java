package org.riffle.tui;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TextCharacter;
import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.screen.Screen;
import org.riffle.log.Printable;

/**
 * The one place that writes cells into Lanterna's back buffer: text clipped to the screen, passed
 * through the shared neutraliser and the {@link Glyphs} set (so ASCII mode never emits anything else), in one of a few styles.
 * Colour is only ever a second cue; without colour the same styles use bold and reverse video.
 *
 * <p>Confined to the UI thread.
 */
final class Canvas {
    /** How a piece of text looks. */
    enum Style {
        PLAIN, BOLD, REVERSE, CAUTION, DEPARTED, WATCH, DIM, BASELINE
    }

    /**
     * Styled cells by character, style and colour: Lanterna's TextCharacter is immutable, and making one
     * runs a grapheme break iterator, which was most of a frame's cost at 200 × 60.
     */
    private static final java.util.concurrent.ConcurrentHashMap<Integer, TextCharacter> CELLS =
            new java.util.concurrent.ConcurrentHashMap<>();

    private final Screen screen;
    final Glyphs glyphs;
    private final boolean color;
    private final int cols;
    private final int rows;

    Canvas(Screen screen, TerminalSize size, Glyphs glyphs, boolean color) {
        this.screen = screen;
        this.glyphs = glyphs;
        this.color = color;
        this.cols = size.getColumns();
        this.rows = size.getRows();
    }

    int cols() {
        return cols;
    }

    int rows() {
        return rows;
    }

    /** Writes {@code s} at ({@code col}, {@code row}), clipped at the right edge; returns the next column. */
    int text(int col, int row, String s, Style style) {
        if (row < 0 || row >= rows) {
            return col;
        }
        String t = shown(s);
        int c = col;
        for (int i = 0; i < t.length() && c < cols; ) {
            int cp = t.codePointAt(i);
            i += Character.charCount(cp);
            if (c >= 0) {
                put(c, row, cp, style);
            }
            c++;
        }
        return c;
    }

    /** Writes {@code s} fitted to exactly {@code width} cells (see {@link Text#fit}). */
    int field(int col, int row, String s, int width, Style style) {
        return text(col, row, Text.fit(shown(s), width, glyphs.ellipsis), style);
    }

    /** Writes {@code s} right-aligned in {@code width} cells. */
    int right(int col, int row, String s, int width, Style style) {
        return text(col, row, Text.right(shown(s), width, glyphs.ellipsis), style);
    }

    /**
     * Text as it may reach the terminal: control characters and escape sequences from input
     * neutralised ({@link Printable#clean}), then fitted to the glyph set.
     */
    private String shown(String s) {
        return glyphs.text(Printable.clean(s));
    }

    /** One character. */
    void put(int col, int row, char ch, Style style) {
        put(col, row, (int) ch, style);
    }

    private void put(int col, int row, int cp, Style style) {
        if (col < 0 || col >= cols || row < 0 || row >= rows) {
            return;
        }
        char ch = Character.isBmpCodePoint(cp) ? (char) cp : '?';
        int key = ch | style.ordinal() << 16 | (color ? 1 << 24 : 0);
        TextCharacter tc = CELLS.get(key);
        if (tc == null) {
            tc = styled(TextCharacter.fromCharacter(ch)[0], style);
            CELLS.putIfAbsent(key, tc);
        }
        screen.setCharacter(col, row, tc);
    }

    /** Paints the rest of row {@code row} from {@code col} with blanks of {@code style}. */
    void fill(int col, int row, Style style) {
        for (int c = Math.max(0, col); c < cols; c++) {
            put(c, row, ' ', style);
        }
    }

    private TextCharacter styled(TextCharacter tc, Style style) {
        return switch (style) {
            case PLAIN -> tc;
            case BOLD -> tc.withModifier(SGR.BOLD);
            case REVERSE -> tc.withModifier(SGR.REVERSE);
            case CAUTION -> tc.withModifier(SGR.REVERSE).withModifier(SGR.BOLD);
            case DEPARTED -> color ? tc.withModifier(SGR.BOLD).withForegroundColor(TextColor.ANSI.RED)
                    : tc.withModifier(SGR.BOLD);
            case WATCH -> color ? tc.withForegroundColor(TextColor.ANSI.YELLOW) : tc.withModifier(SGR.BOLD);
            case DIM -> color ? tc.withForegroundColor(TextColor.ANSI.BLUE) : tc;
            case BASELINE -> color ? tc.withForegroundColor(TextColor.ANSI.GREEN) : tc.withModifier(SGR.UNDERLINE);
        };
    }
}
