package org.riffle.tui;

import java.util.Locale;
import java.util.Optional;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.Level;
import org.riffle.triage.Measure;
import org.riffle.tui.Canvas.Style;

/**
 * The channel list: a header (logs, time span, sample rates, baseline, asset, progress), then one line
 * per channel with its mark, name and unit, a sparkline of the whole log, level, zone, DET and LAM
 * against baseline, health figure and word, and since when it departed.
 *
 * <p>Stateless; called on the UI thread.
 */
final class ListView {
    /** First row of the channel lines. */
    static final int FIRST_ROW = 5;

    private ListView() {
    }

    /** Column widths for a screen {@code cols} wide. */
    record Columns(int name, int spark, int since) {
        static Columns of(int cols, boolean longSince) {
            int since = !longSince ? 5 : cols >= 100 ? 11 : 8;
            int name = Math.max(16, Math.min(32, cols / 5));
            int fixed = 3 + name + 1 + 1 + 8 + 1 + 1 + 1 + 7 + 1 + 7 + 1 + 3 + 1 + 9 + 1 + since;
            return new Columns(name, Math.max(8, cols - fixed), since);
        }
    }

    /** Number of channel lines that fit. */
    static int visibleRows(int screenRows) {
        return Math.max(1, screenRows - FIRST_ROW - 1);
    }

    static void paint(Canvas c, ScreenState s) {
        header(c, s);
        boolean longSince = s.sources.stream().anyMatch(x -> x.recording.time().spanSeconds() > 86_400);
        Columns k = Columns.of(c.cols(), longSince);
        heading(c, k);
        int visible = visibleRows(c.rows());
        for (int i = 0; i < visible && s.top + i < s.rows.size(); i++) {
            int r = s.top + i;
            line(c, FIRST_ROW + i, s, s.rows.get(r), r == s.selected, k);
        }
        if (s.rows.isEmpty()) {
            c.text(2, FIRST_ROW, "No numeric channels in these logs.", Style.BOLD);
        }
    }

    private static void header(Canvas c, ScreenState s) {
        StringBuilder files = new StringBuilder(s.sources.size() == 1 ? "log: " : "logs: ");
        StringBuilder spans = new StringBuilder();
        for (int i = 0; i < s.sources.size(); i++) {
            Recording r = s.sources.get(i).recording;
            String n = java.nio.file.Path.of(r.source().file()).getFileName().toString();
            files.append(i == 0 ? "" : ", ").append(s.sources.size() > 1 ? (i + 1) + ":" : "").append(n);
            spans.append(i == 0 ? "" : " | ").append(s.sources.size() > 1 ? (i + 1) + ": " : "")
                    .append(TimeText.span(r.time())).append(", ").append(TimeText.rate(r.time().rateHz()))
                    .append(", ").append(r.channels().size()).append(" channels");
        }
        String reduced = reduced(s);
        if (reduced.isEmpty()) {
            c.field(0, 1, files.toString(), c.cols(), Style.BOLD);
        } else {
            int col = c.text(0, 1, files + "  ", Style.BOLD);
            c.field(col, 1, reduced, Math.max(0, c.cols() - col), Style.WATCH);
        }
        c.field(0, 2, "span: " + spans, c.cols(), Style.PLAIN);
        c.field(0, 3, baselineAndAsset(s), c.cols(), Style.PLAIN);
    }

    /** One line for the logs read in reduced form (too large for memory), {@code ""} when none was. */
    static String reduced(ScreenState s) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < s.sources.size(); i++) {
            Recording r = s.sources.get(i).recording;
            int at = i;
            r.source().reduction().ifPresent(x -> b.append(b.length() == 0 ? "" : "; ")
                    .append(s.sources.size() > 1 ? (at + 1) + ": " : "").append(x.brief()));
        }
        return b.toString();
    }

    private static String baselineAndAsset(ScreenState s) {
        StringBuilder b = new StringBuilder("baseline: ");
        for (int i = 0; i < s.sources.size(); i++) {
            b.append(i == 0 ? "" : "; ").append(s.sources.get(i).baseline().description());
        }
        String asset = s.remarks.entries().asset();
        b.append("   asset: ").append(asset.isEmpty() ? "- (a to set)" : asset);
        int done = 0;
        int all = 0;
        boolean running = false;
        for (Source src : s.sources) {
            done += src.completeChannels();
            all += src.recording.channels().size();
            running |= src.running();
        }
        b.append(String.format(Locale.ROOT, "   analysed: %d/%d%s", done, all, running ? " (working)" : ""));
        return b.toString();
    }

    private static void heading(Canvas c, Columns k) {
        StringBuilder h = new StringBuilder("   ");
        h.append(Text.fit("channel [unit]", k.name(), '~')).append(' ')
                .append(Text.fit(k.spark() >= 9 ? "whole log" : "log", k.spark(), '~')).append(' ')
                .append(Text.right("level", 8, '~')).append(' ').append('Z').append(' ')
                .append(Text.fit("DET", 7, '~')).append(' ').append(Text.fit("LAM", 7, '~')).append(' ')
                .append(Text.right("HI", 3, '~')).append(' ').append(Text.fit("state", 9, '~')).append(' ')
                .append(Text.fit("since", k.since(), '~'));
        c.field(0, 4, h.toString(), c.cols(), Style.BOLD);
    }

    private static void line(Canvas c, int row, ScreenState s, ScreenState.Row r, boolean sel, Columns k) {
        Source src = s.sources.get(r.source());
        Channel ch = src.recording.channels().get(r.channel());
        Optional<ChannelAssessment> a = src.channel(r.channel());
        Health h = a.map(ChannelAssessment::health).orElse(null);
        Level level = h != null && h.estimated() ? h.level() : null;
        Style base = sel ? Style.REVERSE : Style.PLAIN;
        int col = c.text(0, row, sel ? ">" : " ", base);
        col = c.text(col, row, level == null ? " " : level.mark(), styleOf(level, sel));
        col = c.text(col, row, s.remarks.comment(s.ref(r)).isEmpty() ? " " : "*", base);
        col = c.field(col, row, s.label(r), k.name(), base);
        col = c.text(col, row, " ", base);
        col = c.text(col, row, s.sparks.line(r, ch, src.recording.source().reduction()
                .flatMap(x -> x.blocks(ch.name())), k.spark(), !c.glyphs.ascii()), base);
        col = c.text(col, row, " ", base);
        col = c.right(col, row, levelText(a), 8, base);
        col = c.text(col, row, " " + a.flatMap(ChannelAssessment::vibration).map(v -> v.zone()).orElse(" ")
                .concat(" ").substring(0, 1) + " ", base);
        col = c.field(col, row, vsBase(a, "DET"), 7, base);
        col = c.text(col, row, " ", base);
        col = c.field(col, row, vsBase(a, "LAM"), 7, base);
        col = c.text(col, row, " ", base);
        col = c.right(col, row, h != null && h.estimated() ? String.format(Locale.ROOT, "%.0f", h.figure()) : "-",
                3, base);
        col = c.text(col, row, " ", base);
        col = c.field(col, row, state(src, r.channel(), a, level), 9, styleOf(level, sel));
        col = c.text(col, row, " ", base);
        String since = h != null && h.sinceIndex() >= 0 ? TimeText.moment(src.recording.time(), h.sinceSeconds(),
                k.since()) : "";
        col = c.field(col, row, since, k.since(), base);
        c.fill(col, row, base);
    }

    static Style styleOf(Level level, boolean selected) {
        if (level == Level.DEPARTED) {
            return Style.DEPARTED;
        }
        if (level == Level.WATCH) {
            return Style.WATCH;
        }
        return selected ? Style.REVERSE : Style.PLAIN;
    }

    /** RMS velocity in mm/s for a vibration channel, the mean otherwise. */
    static String levelText(Optional<ChannelAssessment> a) {
        if (a.isEmpty()) {
            return "";
        }
        ChannelAssessment x = a.get();
        if (x.vibration().isPresent() && !Double.isNaN(x.vibration().get().velocityRmsMmS())) {
            return Text.num(x.vibration().get().velocityRmsMmS(), 4) + "mm/s";
        }
        return Text.num(x.stats().mean(), 8);
    }

    private static String vsBase(Optional<ChannelAssessment> a, String name) {
        Optional<Measure> m = a.flatMap(x -> x.measure(name));
        return m.map(x -> Text.frac(x.current()) + "/" + Text.frac(x.baseline())).orElse("-");
    }

    /** The state word: the level word when judged, else what the analysis is doing. */
    static String state(Source src, int channel, Optional<ChannelAssessment> a, Level level) {
        if (level != null) {
            return level.word();
        }
        if (a.isPresent() && a.get().complete()) {
            return "no est.";
        }
        if (!src.failure().isEmpty()) {
            return "failed";
        }
        if (src.cancelled()) {
            return "stopped";
        }
        String stage = src.stage(channel);
        if (stage.equals("waiting")) {
            return stage;
        }
        return String.format(Locale.ROOT, "%.6s %d%%", stage, Math.round(100 * src.progress(channel)));
    }
}
