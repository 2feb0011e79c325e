package org.riffle.tui;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import org.riffle.log.TimeBase;

/**
 * Times of a log as the screen writes them: wall-clock times in UTC when the log gave them (as the
 * note does; a log without offsets is read as if its times were UTC, so they show as written), elapsed
 * time otherwise. Durations in the largest fitting unit.
 *
 * <p>Stateless.
 */
final class TimeText {
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter SHORT = DateTimeFormatter.ofPattern("MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter FULL = DateTimeFormatter.ofPattern("MM-dd HH:mm:ss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter DAY_CLOCK = DateTimeFormatter.ofPattern("dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter MINUTE = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private TimeText() {
    }

    /** A moment of the log in few characters: {@code HH:mm} within a day's log, else {@code MM-dd HH:mm}. */
    static String moment(TimeBase tb, double seconds) {
        if (tb.origin().isEmpty()) {
            return "+" + duration(seconds);
        }
        Instant t = at(tb, seconds);
        return (tb.spanSeconds() <= 86_400 ? MINUTE : SHORT).format(t);
    }

    /** As {@link #moment(TimeBase, double)} in at most {@code width} characters: day of month and time at 8. */
    static String moment(TimeBase tb, double seconds, int width) {
        String m = moment(tb, seconds);
        if (m.length() <= width || tb.origin().isEmpty()) {
            return m;
        }
        return DAY_CLOCK.format(at(tb, seconds));
    }

    /** A moment to the second, for the cursor read-out. */
    static String precise(TimeBase tb, double seconds) {
        if (tb.origin().isEmpty()) {
            return String.format(Locale.ROOT, "+%.3f s", seconds);
        }
        return (tb.spanSeconds() <= 86_400 ? CLOCK : FULL).format(at(tb, seconds));
    }

    /** The log's span: first and last time and the duration. */
    static String span(TimeBase tb) {
        double s = tb.spanSeconds();
        if (tb.origin().isEmpty()) {
            return "elapsed 0 to " + duration(s) + (tb.isIndexed() ? " (no time column: sample numbers)" : "");
        }
        double first = tb.size() > 0 ? tb.seconds(0) : 0;
        return DAY.format(at(tb, first)) + " to " + (s <= 86_400 ? MINUTE : SHORT).format(at(tb, first + s))
                + " UTC (" + duration(s) + ")";
    }

    /** A duration in the largest fitting unit: {@code 12.5 s}, {@code 35 min}, {@code 24.0 h}, {@code 3.2 d}. */
    static String duration(double seconds) {
        double a = Math.abs(seconds);
        if (a < 120) {
            return String.format(Locale.ROOT, "%.1f s", seconds);
        }
        if (a < 7_200) {
            return String.format(Locale.ROOT, "%.0f min", seconds / 60);
        }
        if (a < 172_800) {
            return String.format(Locale.ROOT, "%.1f h", seconds / 3600);
        }
        return String.format(Locale.ROOT, "%.1f d", seconds / 86_400);
    }

    /** A sample rate: {@code 1 Hz}, {@code 25.6 kHz}, {@code 1/60 Hz} shown as {@code every 60 s}. */
    static String rate(double hz) {
        if (hz >= 1000) {
            return String.format(Locale.ROOT, "%.3g kHz", hz / 1000);
        }
        if (hz >= 0.9999) {
            return String.format(Locale.ROOT, "%.3g Hz", hz);
        }
        return "every " + String.format(Locale.ROOT, "%.3g", 1 / hz) + " s";
    }

    private static Instant at(TimeBase tb, double seconds) {
        return tb.origin().orElseThrow().plusMillis(Math.round(seconds * 1000));
    }
}
