package org.riffle.tui;

import java.util.Locale;

/**
 * Small text helpers for fixed-width columns: fitting, right alignment and the number formats the
 * screen uses. Every number is formatted in {@link Locale#ROOT} so the screen reads the same on any
 * machine.
 *
 * <p>Stateless.
 */
final class Text {
    private Text() {
    }

    /** {@code s} cut (with {@code ellipsis} as its last cell) or padded with blanks to {@code width}. */
    static String fit(String s, int width, char ellipsis) {
        if (width <= 0) {
            return "";
        }
        int n = s.codePointCount(0, s.length());
        if (n <= width) {
            return s + " ".repeat(width - n);
        }
        int end = s.offsetByCodePoints(0, width - 1);
        return s.substring(0, end) + ellipsis;
    }

    /** {@code s} right-aligned in {@code width} (cut from the left end when too long). */
    static String right(String s, int width, char ellipsis) {
        int n = s.codePointCount(0, s.length());
        if (n <= width) {
            return " ".repeat(width - n) + s;
        }
        return fit(s, width, ellipsis);
    }

    /** A value in at most {@code width} characters, about three significant digits. */
    static String num(double v, int width) {
        if (Double.isNaN(v)) {
            return "-";
        }
        double a = Math.abs(v);
        int d = a < 1 ? 3 : a < 10 ? 2 : a < 100 ? 1 : 0;
        for (; d >= 0; d--) {
            String s = String.format(Locale.ROOT, "%." + d + "f", v);
            if (s.length() <= width && a < 1e6) {
                return s;
            }
        }
        String s = String.format(Locale.ROOT, "%.1e", v);
        return s.length() <= width ? s : String.format(Locale.ROOT, "%.0e", v);
    }

    /** A fraction 0..1 (RQA measures) with two decimals, without the leading zero: {@code .82}. */
    static String frac(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.startsWith("0.") ? s.substring(1) : s;
    }
}
