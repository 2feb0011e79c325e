package org.riffle.note;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * Number, size, time and duration spellings used in notes and CSV: locale-independent (a point as
 * decimal mark), four significant digits, no exponent between 0.001 and 999,999. Formatting only:
 * nothing here computes a figure.
 *
 * <p>Stateless and thread-safe.
 */
final class Fmt {
    /** A space that keeps its neighbours on one line; {@link Page} prints it as a plain space. */
    static final char GLUE = '\u00a0';

    /** How a missing or undefined figure is spelled. */
    static final String NONE = "n/a";

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss xxx",
            Locale.ROOT);
    private static final DateTimeFormatter UTC = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss.SSS'Z'",
            Locale.ROOT);

    private Fmt() {
    }

    /** {@code x} to four significant digits, trailing zeros dropped; {@code n/a} when not finite. */
    static String num(double x) {
        if (Double.isNaN(x)) {
            return NONE;
        }
        if (Double.isInfinite(x)) {
            return x > 0 ? "inf" : "-inf";
        }
        if (x == 0) {
            return "0";
        }
        BigDecimal bd = new BigDecimal(x).round(new MathContext(4, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        double a = Math.abs(bd.doubleValue());
        if (a >= 1e-3 && a < 1e6) {
            return bd.toPlainString();
        }
        String s = String.format(Locale.ROOT, "%.3e", bd.doubleValue());
        int e = s.indexOf('e');
        String mant = s.substring(0, e).replaceAll("\\.?0+$", "");
        int exp = Integer.parseInt(s.substring(e + 1));
        return mant + "e" + exp;
    }

    /** {@code x} as a signed figure with four significant digits, e.g. {@code +2.5}. */
    static String signed(double x) {
        String s = num(x);
        return x > 0 && Double.isFinite(x) ? "+" + s : s;
    }

    /** A byte count with thin grouping, e.g. {@code 1 234 567 bytes}. */
    static String bytes(long n) {
        return String.format(Locale.ROOT, "%,d", n).replace(',', GLUE) + (n == 1 ? GLUE + "byte" : GLUE + "bytes");
    }

    /** A wall-clock stamp with its offset, e.g. {@code 2026-03-14 10:15:00 +01:00}. */
    static String stamp(Instant t, ZoneId zone) {
        return STAMP.format(t.atZone(zone)).replace(' ', GLUE);
    }

    /** A time from a log, in UTC with milliseconds, e.g. {@code 2026-03-14 08:00:00.000Z}. */
    static String utc(Instant t) {
        return UTC.format(t.atOffset(ZoneOffset.UTC)).replace(' ', GLUE);
    }

    /** A duration in words, e.g. {@code 1 h 23 min 19 s}, {@code 2.5 s}, {@code 3 d 4 h}. */
    static String duration(double seconds) {
        return words(seconds).replace(' ', GLUE);
    }

    private static String words(double seconds) {
        if (!Double.isFinite(seconds)) {
            return NONE;
        }
        if (seconds < 60) {
            return num(seconds) + " s";
        }
        long s = Math.round(seconds);
        long d = s / 86_400;
        long h = s % 86_400 / 3600;
        long m = s % 3600 / 60;
        long r = s % 60;
        if (d > 0) {
            return d + " d " + h + " h" + (m > 0 ? " " + m + " min" : "");
        }
        if (h > 0) {
            return h + " h " + m + " min" + (r > 0 ? " " + r + " s" : "");
        }
        return m + " min" + (r > 0 ? " " + r + " s" : "");
    }
}
