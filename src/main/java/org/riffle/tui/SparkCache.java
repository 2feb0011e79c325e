package org.riffle.tui;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.riffle.log.BlockStats;
import org.riffle.log.Channel;
import org.riffle.signal.Sparkline;
import org.riffle.signal.Summary;

/**
 * Keeps drawn sparklines (one per channel row and width) and the last detail trace, so a key press
 * redraws from memory instead of walking every sample of a large log again. The drawing itself is
 * {@link Sparkline}'s; the trace's scale labels are {@link Summary}'s minimum and maximum.
 *
 * <p>Confined to the UI thread.
 */
final class SparkCache {
    /** A drawn trace: its rows (top first) and the smallest and largest sample it spans. */
    record Trace(List<String> rows, double min, double max) {
    }

    private final Map<String, String> lines = new HashMap<>();
    private String traceKey = "";
    private Trace trace;

    /**
     * The one-row sparkline of {@code ch} (the channel of {@code row}) over the whole log: from the block
     * statistics of a reduced log when {@code blocks} is present, else from the samples.
     */
    String line(ScreenState.Row row, Channel ch, Optional<BlockStats> blocks, int width, boolean unicode) {
        String key = row.source() + ":" + row.channel() + ":" + width + ":" + unicode;
        return lines.computeIfAbsent(key, k -> blocks.map(b -> Sparkline.renderRanges(b.minima(), b.maxima(),
                width, unicode)).orElseGet(() -> Sparkline.render(ch::ranges, ch.size(), width, unicode)));
    }

    /** The trace of samples {@code [from, to)} of {@code ch} in {@code width} × {@code height} cells. */
    Trace trace(ScreenState.Row row, Channel ch, int from, int to, int width, int height, boolean unicode) {
        String key = row + ":" + from + ":" + to + ":" + width + ":" + height + ":" + unicode;
        if (!key.equals(traceKey)) {
            double[] x = new double[to - from];
            ch.copyTo(x, from, to);
            Summary sum = Summary.of(x);
            trace = new Trace(Sparkline.render(x, width, height, unicode), sum.min(), sum.max());
            traceKey = key;
        }
        return trace;
    }
}
