package org.riffle.cli;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import org.riffle.log.TimeBase;

/**
 * The {@code --baseline A:B} option: a range of samples [from, to), given as sample indices
 * ({@code 0:2500}), as seconds from the first sample ({@code 0s:3600s}), or as ISO date-times
 * ({@code 2026-03-01T10:00:2026-03-01T12:00}; without an offset a time is read on the log's own clock,
 * with one it is converted to UTC as the log's offset times are). Either end may be left empty for the
 * start or end of the log. A time range holds the samples with A ≤ t &lt; B. Default: the first 25 %.
 *
 * <p>Immutable.
 *
 * @param from first sample (inclusive)
 * @param to end sample (exclusive)
 * @param description how it was chosen, ready to print
 */
record BaselineRange(int from, int to, String description) {

    /**
     * @param spec the option's value, or {@code null} for the default
     * @throws IllegalArgumentException with a message fit for a usage error
     */
    static BaselineRange parse(String spec, TimeBase tb, int n) {
        if (spec == null) {
            int to = Math.max(1, n / 4);
            return new BaselineRange(0, to, "first 25 % (samples 0:" + to + ")");
        }
        int[] r;
        if (spec.matches("\\d*:\\d*")) {
            int c = spec.indexOf(':');
            r = new int[] {c == 0 ? 0 : Integer.parseInt(spec.substring(0, c)),
                c == spec.length() - 1 ? n : Integer.parseInt(spec.substring(c + 1))};
        } else if (spec.matches("(\\d+(\\.\\d*)?s)?:(\\d+(\\.\\d*)?s)?")) {
            int c = spec.indexOf(':');
            double a = c == 0 ? Double.NEGATIVE_INFINITY : seconds(spec.substring(0, c));
            double b = c == spec.length() - 1 ? Double.POSITIVE_INFINITY : seconds(spec.substring(c + 1));
            double t0 = n > 0 ? tb.seconds(0) : 0;
            r = byTime(tb, n, t0 + a, t0 + b);
        } else {
            r = byDateTime(spec, tb, n);
        }
        if (r[0] < 0 || r[1] > n || r[1] <= r[0]) {
            throw new IllegalArgumentException("--baseline " + spec + " selects samples " + r[0] + ":" + r[1]
                    + ", not a non-empty range inside 0:" + n);
        }
        return new BaselineRange(r[0], r[1], "samples " + r[0] + ":" + r[1] + " (--baseline " + spec + ")");
    }

    private static double seconds(String s) {
        return Double.parseDouble(s.substring(0, s.length() - 1));
    }

    private static int[] byDateTime(String spec, TimeBase tb, int n) {
        for (int c = spec.indexOf(':'); c >= 0; c = spec.indexOf(':', c + 1)) {
            String sa = spec.substring(0, c);
            String sb = spec.substring(c + 1);
            Instant a = instant(sa);
            Instant b = instant(sb);
            if ((a == null && !sa.isEmpty()) || (b == null && !sb.isEmpty())) {
                continue;
            }
            if (tb.origin().isEmpty()) {
                throw new IllegalArgumentException("--baseline " + spec + ": the log has no wall-clock times;"
                        + " give sample indices (0:2500) or seconds (0s:3600s)");
            }
            Instant origin = tb.origin().get();
            return byTime(tb, n, a == null ? Double.NEGATIVE_INFINITY : secondsFrom(origin, a),
                    b == null ? Double.POSITIVE_INFINITY : secondsFrom(origin, b));
        }
        throw new IllegalArgumentException("--baseline '" + spec + "' is not A:B in sample indices (0:2500),"
                + " seconds (0s:3600s) or ISO date-times (2026-03-01T10:00:2026-03-01T12:00)");
    }

    private static double secondsFrom(Instant origin, Instant t) {
        return (t.getEpochSecond() - origin.getEpochSecond()) + (t.getNano() - origin.getNano()) / 1e9;
    }

    /** An ISO date-time with or without offset, or {@code null} when {@code s} is not one. */
    private static Instant instant(String s) {
        try {
            return OffsetDateTime.parse(s).toInstant();
        } catch (DateTimeParseException e) {
            try {
                return LocalDateTime.parse(s).toInstant(ZoneOffset.UTC);
            } catch (DateTimeParseException e2) {
                return null;
            }
        }
    }

    /** Samples with a ≤ t &lt; b, t in the time base's seconds: [first with t ≥ a, first after that with t ≥ b). */
    private static int[] byTime(TimeBase tb, int n, double a, double b) {
        int from = 0;
        while (from < n && tb.seconds(from) < a) {
            from++;
        }
        int to = from;
        while (to < n && tb.seconds(to) < b) {
            to++;
        }
        return new int[] {from, to};
    }
}
