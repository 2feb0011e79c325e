package org.riffle.tui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.riffle.signal.Summary;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Measure;
import org.riffle.triage.Param;
import org.riffle.triage.VibrationFigures;
import org.riffle.tui.Canvas.Style;

/**
 * The panels of figures under the detail plots: statistics, measures against baseline, severity and
 * spectrum, recurrence-plot thumbnail, parameters used, what was not computed, and the comment. Laid
 * out in columns as room allows; Tab starts the layout at the next panel.
 *
 * <p>Stateless; called on the UI thread.
 */
final class Figures {
    /** A titled block of lines. */
    record Panel(String title, List<String> lines) {
    }

    private Figures() {
    }

    static void paint(Canvas c, ScreenState s, Optional<ChannelAssessment> a, int top, int rows) {
        List<Panel> panels = panels(s, a, rows, c.glyphs.ascii());
        int colWidth = Math.max(38, c.cols() / Math.max(1, c.cols() / 40));
        int columns = Math.max(1, (c.cols() + 1) / (colWidth + 1));
        int start = Math.floorMod(s.panel, panels.size());
        int col = 0;
        int y = 0;
        for (int p = 0; p < panels.size() && col < columns; p++) {
            Panel panel = panels.get((start + p) % panels.size());
            List<String> lines = new ArrayList<>();
            lines.add(panel.title());
            lines.addAll(panel.lines());
            for (int i = 0; i < lines.size() && col < columns; i++) {
                c.field(col * (colWidth + 1), top + y, (i == 0 ? "" : " ") + lines.get(i), colWidth,
                        i == 0 ? Style.BOLD : Style.PLAIN);
                if (++y >= rows) {
                    y = 0;
                    col++;
                }
            }
        }
    }

    static List<Panel> panels(ScreenState s, Optional<ChannelAssessment> a, int rows, boolean ascii) {
        List<Panel> out = new ArrayList<>();
        if (a.isEmpty()) {
            out.add(new Panel("figures", List.of("analysis still running")));
        } else {
            ChannelAssessment x = a.get();
            out.add(new Panel("statistics", stats(x.stats())));
            out.add(new Panel("against baseline", measures(x.measures())));
            x.vibration().ifPresent(v -> out.add(new Panel("severity and spectrum", vibration(v))));
            out.add(thumbnails(s, x, rows, ascii));
            List<String> params = new ArrayList<>();
            s.source().assessment().map(Assessment::parameters).orElse(List.of())
                    .forEach(p -> params.add(p.toString()));
            x.parameters().stream().map(Param::toString).forEach(params::add);
            out.add(new Panel("parameters used", params.isEmpty() ? List.of("-") : params));
            if (!x.notComputed().isEmpty()) {
                out.add(new Panel("not computed", x.notComputed()));
            }
        }
        String comment = s.remarks.comment(s.ref(s.row()));
        out.add(new Panel("comment (c to edit)", List.of(comment.isEmpty() ? "-" : comment)));
        return out;
    }

    private static Panel thumbnails(ScreenState s, ChannelAssessment x, int rows, boolean ascii) {
        if (x.thumbnails().isEmpty()) {
            return new Panel(ThumbnailPanel.title(x.thumbnails()), List.of(x.complete()
                    ? "no thumbnail: the channel has no recurrence estimate" : "thumbnail after the analysis"));
        }
        return new Panel(ThumbnailPanel.title(x.thumbnails()), ThumbnailPanel.lines(x.thumbnails(), x.unit(),
                s.source().recording.time(), rows, ascii));
    }

    private static List<String> stats(Summary m) {
        return List.of(
                String.format(Locale.ROOT, "samples %d, missing %d", m.count(), m.missing()),
                "min " + Text.num(m.min(), 10) + "  max " + Text.num(m.max(), 10),
                "mean " + Text.num(m.mean(), 10) + "  std " + Text.num(m.std(), 10),
                "RMS " + Text.num(m.rms(), 10) + "  peak " + Text.num(m.peak(), 10),
                "crest " + Text.num(m.crest(), 8) + "  kurtosis " + Text.num(m.kurtosis(), 8) + " (Pearson)",
                "skewness " + Text.num(m.skewness(), 8));
    }

    private static List<String> measures(List<Measure> ms) {
        if (ms.isEmpty()) {
            return List.of("none computed");
        }
        List<String> out = new ArrayList<>();
        for (Measure m : ms) {
            out.add(String.format(Locale.ROOT, "%-6s %s now, %s base, %s", m.name(), Text.num(m.current(), 8),
                    Text.num(m.baseline(), 8), Double.isNaN(m.departure()) ? "departure -"
                            : String.format(Locale.ROOT, "%+.1f spreads", m.departure())));
        }
        return out;
    }

    private static List<String> vibration(VibrationFigures v) {
        List<String> out = new ArrayList<>();
        out.add("RMS velocity " + Text.num(v.velocityRmsMmS(), 8) + " mm/s"
                + (v.zone().isEmpty() ? "" : ", zone " + v.zone()));
        if (!v.table().isEmpty()) {
            out.add("against " + v.table());
            out.add("site and maker limits take precedence");
        }
        if (!v.remark().isEmpty()) {
            out.add(v.remark());
        }
        for (VibrationFigures.Peak p : v.peaks()) {
            out.add("peak " + Text.num(p.frequencyHz(), 8) + " Hz  " + Text.num(p.amplitudeRms(), 8));
        }
        for (VibrationFigures.Line l : v.lines()) {
            out.add(l.name() + " " + Text.num(l.frequencyHz(), 8) + " Hz  " + Text.num(l.amplitudeRms(), 8)
                    + (l.present() ? "  present" : "  not above floor"));
        }
        return out;
    }
}
