package org.riffle.tui;

import java.util.ArrayList;
import java.util.List;
import org.riffle.log.Channel;
import org.riffle.note.Findings.ChannelRef;

/**
 * Everything the painters read: the logs and what is known of them, the technician's remarks, and
 * the place on screen (view, selection, time window, cursor, prompt, mode, message).
 *
 * <p>Confined to the UI thread.
 */
final class ScreenState {
    /** A modal question or form in front of the view. */
    enum Mode {
        NONE, ASK_QUIT, ASK_DRAFT, ASSET_FORM
    }

    /** One channel row: which log, which channel. */
    record Row(int source, int channel) {
    }

    final List<Source> sources;
    final List<Row> rows;
    final Remarks remarks = new Remarks();
    View view = View.LIST;
    View beforeHelp = View.LIST;
    Mode mode = Mode.NONE;
    int selected;
    int top;
    int helpTop;
    int assetField;
    Prompt prompt;
    String message = "";
    /** Detail view: shown sample window [from, to) and the cursor sample; -1 before first use. */
    int from = -1;
    int to = -1;
    int cursor = -1;
    int panel;
    /** Sample where a baseline mark was started, -1 when not marking. */
    int baselineAnchor = -1;
    /** Ticks seen, for the busy marker. */
    long ticks;
    /** Drawn sparklines and traces, kept while their size stays the same. */
    final SparkCache sparks = new SparkCache();

    ScreenState(List<Source> sources) {
        this.sources = List.copyOf(sources);
        List<Row> r = new ArrayList<>();
        for (int s = 0; s < this.sources.size(); s++) {
            for (int c = 0; c < this.sources.get(s).recording.channels().size(); c++) {
                r.add(new Row(s, c));
            }
        }
        this.rows = List.copyOf(r);
    }

    Row row() {
        return rows.get(selected);
    }

    Source source() {
        return sources.get(row().source());
    }

    Channel channel() {
        return source().recording.channels().get(row().channel());
    }

    /** Sets the detail window to the whole log of the selected channel and the cursor to its middle. */
    void resetWindow() {
        int n = source().recording.rows();
        from = 0;
        to = Math.max(1, n);
        cursor = Math.max(0, n / 2);
        baselineAnchor = -1;
    }

    /** The note's name for a row's channel: the log file as the recording names it, and the channel. */
    ChannelRef ref(Row r) {
        Source src = sources.get(r.source());
        return new ChannelRef(src.recording.source().file(), src.recording.channels().get(r.channel()).name());
    }

    /** Name shown for a row: the channel name, prefixed by the log's number when there are several logs. */
    String label(Row r) {
        Channel c = sources.get(r.source()).recording.channels().get(r.channel());
        String unit = c.unit().isEmpty() ? "" : " [" + c.unit() + "]";
        return (sources.size() > 1 ? (r.source() + 1) + ":" : "") + c.name() + unit;
    }
}
