package org.riffle.tui;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.riffle.log.Channel;
import org.riffle.log.TimeBase;
import org.riffle.signal.Sparkline;
import org.riffle.triage.Baseline;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Level;
import org.riffle.triage.WindowRow;
import org.riffle.tui.Canvas.Style;

/**
 * One channel in detail: a trace of the shown time window (each column the range of the samples it
 * covers, drawn by {@link Sparkline}) with the baseline span and the cursor marked, a time axis, the windowed trends (DET, LAM,
 * novelty, level) aligned column for column under it, a read-out at the cursor, and panels of figures
 * below ({@link Figures}).
 *
 * <p>Stateless; called on the UI thread.
 */
final class DetailView {
    /** Width of the label gutter left of the plots. */
    static final int GUTTER = 9;

    private DetailView() {
    }

    /** Row positions for a screen {@code rows} high. */
    record Layout(int traceTop, int traceRows, int axis, int marker, int trends, int readout, int panelTop,
                  int panelRows) {
        static Layout of(int rows) {
            int avail = rows - 3;
            int trace = Math.max(5, avail * 2 / 5);
            int axis = 2 + trace;
            int readout = axis + 2 + 4;
            return new Layout(2, trace, axis, axis + 1, axis + 2, readout, readout + 1, rows - 2 - readout);
        }
    }

    static void paint(Canvas c, ScreenState s) {
        Source src = s.source();
        Channel ch = s.channel();
        Optional<ChannelAssessment> a = src.channel(s.row().channel());
        Layout l = Layout.of(c.rows());
        int w = c.cols() - GUTTER;
        title(c, s, a);
        trace(c, s, ch, l, w);
        axis(c, src.recording.time(), s, l, w);
        marker(c, s, src.baseline(), l, w);
        List<WindowRow> trend = a.map(ChannelAssessment::trend).orElse(List.of());
        trendRow(c, s, trend, "DET", WindowRow::det, l.trends(), w);
        trendRow(c, s, trend, "LAM", WindowRow::lam, l.trends() + 1, w);
        trendRow(c, s, trend, "novelty", WindowRow::novelty, l.trends() + 2, w);
        levelRow(c, s, trend, l.trends() + 3, w);
        readout(c, s, ch, trend, l.readout());
        Figures.paint(c, s, a, l.panelTop(), l.panelRows());
    }

    /** Sample shown in plot column {@code col} of {@code w}. */
    static int sampleAt(ScreenState s, int col, int w) {
        return s.from + (int) ((long) (s.to - s.from) * col / w);
    }

    /** Plot column of sample {@code i}, possibly outside {@code [0, w)}. */
    static int columnOf(ScreenState s, int i, int w) {
        return (int) Math.floor((double) (i - s.from) * w / (s.to - s.from));
    }

    private static void title(Canvas c, ScreenState s, Optional<ChannelAssessment> a) {
        Source src = s.source();
        Level level = a.map(x -> x.health().estimated() ? x.health().level() : null).orElse(null);
        String state = ListView.state(src, s.row().channel(), a, level);
        StringBuilder t = new StringBuilder(s.label(s.row())).append("   ").append(level == null ? "" : level.mark())
                .append(state);
        a.ifPresent(x -> {
            if (x.health().estimated()) {
                t.append(String.format(Locale.ROOT, "  HI %.0f", x.health().figure()));
                if (x.health().sinceIndex() >= 0) {
                    t.append(" since ").append(TimeText.moment(src.recording.time(), x.health().sinceSeconds()));
                }
            }
            x.vibration().filter(v -> !v.zone().isEmpty()).ifPresent(v -> t.append("  zone ").append(v.zone()));
        });
        TimeBase tb = src.recording.time();
        t.append("   shown: ").append(TimeText.moment(tb, tb.seconds(s.from))).append(" to ")
                .append(TimeText.moment(tb, tb.seconds(Math.max(s.from, s.to - 1))));
        c.field(0, 1, t.toString(), c.cols(), Style.BOLD);
    }

    private static void trace(Canvas c, ScreenState s, Channel ch, Layout l, int w) {
        int h = l.traceRows();
        SparkCache.Trace t = s.sparks.trace(s.row(), ch, s.from, s.to, w, h, !c.glyphs.ascii());
        c.right(0, l.traceTop(), Text.num(t.max(), GUTTER - 1), GUTTER - 1, Style.PLAIN);
        c.right(0, l.traceTop() + h - 1, Text.num(t.min(), GUTTER - 1), GUTTER - 1, Style.PLAIN);
        c.right(0, l.traceTop() + h / 2, ch.unit(), GUTTER - 1, Style.DIM);
        Baseline b = s.source().baseline();
        int cursorCol = columnOf(s, s.cursor, w);
        for (int col = 0; col < w; col++) {
            int sample = sampleAt(s, col, w);
            boolean inBase = sample >= b.fromRow() && sample < b.toRow();
            Style st = col == cursorCol ? Style.REVERSE : inBase ? Style.BASELINE : Style.PLAIN;
            for (int y = 0; y < h; y++) {
                c.put(GUTTER + col, l.traceTop() + y, t.rows().get(y).charAt(col), st);
            }
        }
    }

    private static void axis(Canvas c, TimeBase tb, ScreenState s, Layout l, int w) {
        c.right(0, l.axis(), "time", GUTTER - 1, Style.DIM);
        int step = Math.max(14, w / 6);
        for (int col = 0; col < w - 4; col += step) {
            c.put(GUTTER + col, l.axis(), c.glyphs.vertical, Style.DIM);
            c.text(GUTTER + col + 1, l.axis(), TimeText.moment(tb, tb.seconds(sampleAt(s, col, w))), Style.DIM);
        }
    }

    private static void marker(Canvas c, ScreenState s, Baseline b, Layout l, int w) {
        c.right(0, l.marker(), "baseline", GUTTER - 1, Style.DIM);
        int cursorCol = columnOf(s, s.cursor, w);
        for (int col = 0; col < w; col++) {
            int sample = sampleAt(s, col, w);
            boolean inBase = sample >= b.fromRow() && sample < b.toRow();
            boolean marking = s.baselineAnchor >= 0 && sample >= Math.min(s.baselineAnchor, s.cursor)
                    && sample <= Math.max(s.baselineAnchor, s.cursor);
            char g = col == cursorCol ? c.glyphs.up : marking ? '~' : inBase ? '=' : ' ';
            c.put(GUTTER + col, l.marker(), g, marking ? Style.BOLD : inBase ? Style.BASELINE : Style.PLAIN);
        }
    }

    private static void trendRow(Canvas c, ScreenState s, List<WindowRow> trend, String label,
                                 ToDoubleFunction<WindowRow> f, int row, int w) {
        c.right(0, row, label, GUTTER - 1, Style.PLAIN);
        if (trend.isEmpty()) {
            c.text(GUTTER, row, String.valueOf(c.glyphs.dot).repeat(w), Style.DIM);
            return;
        }
        double[] v = new double[w];
        for (int col = 0; col < w; col++) {
            WindowRow x = windowAt(trend, sampleAt(s, col, w));
            v[col] = x == null ? Double.NaN : f.applyAsDouble(x);
        }
        c.text(GUTTER, row, Sparkline.render(v, w, !c.glyphs.ascii()), Style.PLAIN);
    }

    private static void levelRow(Canvas c, ScreenState s, List<WindowRow> trend, int row, int w) {
        c.right(0, row, "level", GUTTER - 1, Style.PLAIN);
        for (int col = 0; col < w; col++) {
            WindowRow x = windowAt(trend, sampleAt(s, col, w));
            Level lv = x == null ? null : x.level();
            c.text(GUTTER + col, row, lv == null ? (trend.isEmpty() ? String.valueOf(c.glyphs.dot) : " ")
                    : lv == Level.STEADY ? "-" : lv.mark(), ListView.styleOf(lv, false));
        }
    }

    /** The window whose start is the last at or before {@code sample}, if it still covers it. */
    static WindowRow windowAt(List<WindowRow> trend, int sample) {
        int lo = 0;
        int hi = trend.size() - 1;
        int found = -1;
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            if (trend.get(mid).startIndex() <= sample) {
                found = mid;
                lo = mid + 1;
            } else {
                hi = mid - 1;
            }
        }
        return found >= 0 && sample < trend.get(found).endIndex() ? trend.get(found) : null;
    }

    private static void readout(Canvas c, ScreenState s, Channel ch, List<WindowRow> trend, int row) {
        TimeBase tb = s.source().recording.time();
        int i = s.cursor;
        StringBuilder t = new StringBuilder("cursor ").append(TimeText.precise(tb, tb.seconds(i)))
                .append(" row ").append(i + 1).append("  value ").append(Text.num(ch.value(i), 10))
                .append(ch.unit().isEmpty() ? "" : " " + ch.unit());
        WindowRow x = windowAt(trend, i);
        if (x != null) {
            t.append("  | window DET ").append(Text.frac(x.det())).append(" LAM ").append(Text.frac(x.lam()))
                    .append(" novelty ").append(Text.num(x.novelty(), 6))
                    .append(x.level() == null ? "" : " " + x.level().word());
        }
        c.field(0, row, t.toString(), c.cols(), Style.PLAIN);
    }
}
