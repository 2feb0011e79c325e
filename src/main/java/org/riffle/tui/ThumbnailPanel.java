package org.riffle.tui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.riffle.log.TimeBase;
import org.riffle.triage.Thumbnail;

/**
 * The lines of the "recurrence plot" panel: a channel's thumbnails side by side (baseline left, latest
 * right), each framed by bars, with the span each shows. With twelve rows or more each thumbnail is 16
 * cells wide and the spans are written under it; with fewer it is halved to 8 cells (exactly the
 * thumbnail at that size, see {@link Thumbnail#coarser}) and the spans are written beside it, so it
 * fits the five rows under the title at 80 × 24.
 *
 * <p>UTF-8 draws two cell rows a line with half blocks ({@code ▀ ▄ █}, blank when neither is set); ASCII
 * draws one cell a character, {@code #} set and {@code .} clear, with every two cell rows merged into
 * one line (again exact). Either way a thumbnail is as many characters wide as it has cells and half as
 * many lines high, which on a terminal's tall cells looks square. The first vectors are at the bottom
 * left. Nothing depends on colour.
 *
 * <p>Stateless.
 */
final class ThumbnailPanel {
    /** Panel rows (title included) from which the full-size layout is used. */
    static final int FULL_ROWS = 12;

    private ThumbnailPanel() {
    }

    /** The panel title, naming how long a window each thumbnail covers. */
    static String title(List<Thumbnail> thumbs) {
        if (thumbs.isEmpty()) {
            return "recurrence plot";
        }
        Thumbnail t = thumbs.get(0);
        return "recurrence plot, " + (t.toRow() - t.fromRow()) + " rows ("
                + TimeText.duration(t.toSeconds() - t.fromSeconds()) + ") each";
    }

    /** The lines under the title, for a panel of {@code rows} rows, in the UTF-8 or the ASCII form. */
    static List<String> lines(List<Thumbnail> thumbs, String unit, TimeBase tb, int rows, boolean ascii) {
        boolean full = rows >= FULL_ROWS;
        List<List<String>> plots = new ArrayList<>();
        for (Thumbnail t : thumbs) {
            Thumbnail shown = full ? t : t.coarser(2, 2);
            plots.add(draw(ascii ? shown.coarser(1, 2) : shown, ascii));
        }
        List<String> out = new ArrayList<>();
        char bar = ascii ? '|' : '│';
        String radius = "radius " + Text.num(thumbs.get(0).radius(), 8).strip() + (unit.isEmpty() ? "" : " " + unit)
                + " (baseline's)";
        List<String> beside = new ArrayList<>();
        if (!full) {
            for (int k = 0; k < thumbs.size(); k++) {
                beside.add((k == 0 ? "L " : "R ") + thumbs.get(k).span().word() + " from");
                beside.add("  " + TimeText.moment(tb, thumbs.get(k).fromSeconds()));
            }
        }
        int lines = plots.get(0).size();
        for (int r = 0; r < lines; r++) {
            StringBuilder sb = new StringBuilder();
            for (List<String> p : plots) {
                sb.append(bar).append(p.get(r)).append(bar).append(' ');
            }
            if (r < beside.size()) {
                sb.append(beside.get(r));
            }
            out.add(sb.toString().stripTrailing());
        }
        if (full) {
            for (int k = 0; k < thumbs.size(); k++) {
                Thumbnail t = thumbs.get(k);
                String from = TimeText.moment(tb, t.fromSeconds());
                String to = TimeText.moment(tb, t.toSeconds());
                int day = from.indexOf(' ') + 1;
                if (tb.origin().isPresent() && day > 0 && to.length() == from.length()
                        && to.startsWith(from.substring(0, day))) {
                    to = to.substring(day);
                }
                out.add(String.format(Locale.ROOT, "%-6s%s %s to %s", k == 0 ? "left" : "right", t.span().word(),
                        from, to));
            }
            out.add(radius);
        }
        return out;
    }

    /** The cells as text lines, top line first. */
    private static List<String> draw(Thumbnail t, boolean ascii) {
        List<String> out = new ArrayList<>();
        if (ascii) {
            for (int y = t.height() - 1; y >= 0; y--) {
                StringBuilder sb = new StringBuilder();
                for (int x = 0; x < t.width(); x++) {
                    sb.append(t.at(x, y) ? '#' : '.');
                }
                out.add(sb.toString());
            }
            return out;
        }
        for (int top = t.height() - 1; top > 0; top -= 2) {
            StringBuilder sb = new StringBuilder();
            for (int x = 0; x < t.width(); x++) {
                boolean up = t.at(x, top);
                boolean down = t.at(x, top - 1);
                sb.append(up && down ? '█' : up ? '▀' : down ? '▄' : ' ');
            }
            out.add(sb.toString());
        }
        return out;
    }
}
