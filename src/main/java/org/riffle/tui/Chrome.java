package org.riffle.tui;

import java.util.Locale;
import org.riffle.tui.Canvas.Style;

/**
 * What frames every view: the caution on the top line (whatever the view, whatever the size), the
 * status line at the bottom (a prompt, a question, a message, or the main keys), and the one-line
 * request to enlarge a window smaller than 80 × 24.
 *
 * <p>Stateless; called on the UI thread.
 */
final class Chrome {
    /** Smallest usable size. */
    static final int MIN_COLS = 80;
    static final int MIN_ROWS = 24;

    static final String CAUTION_LONG = "CAUTION: riffle is a screening aid. Decisions belong to qualified"
            + " maintenance staff under site procedures and local codes.";
    static final String CAUTION_SHORT = "! Screening aid only; qualified staff decide under site rules and local codes";

    private Chrome() {
    }

    /** The caution text that fits {@code cols}. */
    static String caution(int cols) {
        return cols >= CAUTION_LONG.length() ? CAUTION_LONG : CAUTION_SHORT;
    }

    /** Draws the caution across row 0. */
    static void caution(Canvas c) {
        c.field(0, 0, caution(c.cols()), c.cols(), Style.CAUTION);
    }

    /** The whole screen when it is below the minimum: the caution, then one line asking for more room. */
    static void tooSmall(Canvas c) {
        String ask = String.format(Locale.ROOT, "Enlarge the window to at least %dx%d (now %dx%d).",
                MIN_COLS, MIN_ROWS, c.cols(), c.rows());
        if (c.rows() >= 2) {
            caution(c);
            c.field(0, 1, ask, c.cols(), Style.BOLD);
        } else {
            c.field(0, 0, ask, c.cols(), Style.BOLD);
        }
    }

    /** Draws the bottom line for {@code s}. */
    static void status(Canvas c, ScreenState s) {
        int row = c.rows() - 1;
        if (s.prompt != null) {
            Prompt p = s.prompt;
            String head = p.label + ": ";
            int room = c.cols() - head.length() - 1;
            int start = Math.max(0, p.cursor() - room);
            String shown = p.text().substring(start);
            int col = c.text(0, row, head, Style.BOLD);
            col = c.text(col, row, shown.substring(0, Math.min(shown.length(), Math.max(0, room))), Style.PLAIN);
            c.fill(col, row, Style.PLAIN);
            int cur = head.length() + p.cursor() - start;
            String under = p.cursor() < p.text().length() ? p.text().substring(p.cursor(), p.cursor() + 1) : " ";
            c.text(Math.min(cur, c.cols() - 1), row, under, Style.REVERSE);
            return;
        }
        if (s.mode == ScreenState.Mode.ASK_QUIT) {
            c.field(0, row, "Comments not in a saved note. s: save note and quit   d: discard and quit"
                    + "   Esc: stay", c.cols(), Style.REVERSE);
            return;
        }
        if (s.mode == ScreenState.Mode.ASK_DRAFT) {
            c.field(0, row, "Comments from an earlier session of this log were kept. r: restore them   d: discard",
                    c.cols(), Style.REVERSE);
            return;
        }
        if (!s.message.isEmpty()) {
            c.field(0, row, s.message, c.cols(), Style.BOLD);
            return;
        }
        c.field(0, row, hints(s.view, c.glyphs), c.cols(), Style.DIM);
    }

    private static String hints(View v, Glyphs g) {
        return switch (v) {
            case LIST -> g.upDown + " move  " + g.enter + " detail  c comment  C general  a asset  s save"
                    + "  ? help  q quit";
            case DETAIL -> g.leftRight + " cursor  +/- zoom  H/L pan  b baseline  Tab more  c comment"
                    + "  Esc back ? help";
            case HELP -> g.upDown + " scroll   Esc or ? back";
        };
    }
}
