package org.riffle.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Numbers as text for tables: plain decimal notation with a point, never an exponent, independent of
 * the default locale. Rounded half-even to a number of significant digits from the exact binary value,
 * trailing zeros dropped. Stateless.
 */
final class Decimal {
    /** Significant digits in CSV output: about what a {@code float} sample holds (24 bits ≈ 7.2 digits). */
    static final int CSV_DIGITS = 7;
    /** Significant digits in the text table: enough to read, short enough to scan. */
    static final int TEXT_DIGITS = 4;

    private Decimal() {
    }

    /** {@code v} to {@code digits} significant digits, or {@code missing} when {@code v} is not finite. */
    static String format(double v, int digits, String missing) {
        if (!Double.isFinite(v)) {
            return missing;
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        return d.toPlainString();
    }

    /** A time span in seconds as a short human text: {@code "59.5 s"}, {@code "17m 20s"}, {@code "1d 23h"}. */
    static String span(double seconds) {
        if (!Double.isFinite(seconds)) {
            return "-";
        }
        if (seconds < 120) {
            return format(seconds, 3, "-") + " s";
        }
        long s = Math.round(seconds);
        long d = s / 86_400;
        long h = s % 86_400 / 3_600;
        long m = s % 3_600 / 60;
        if (d > 0) {
            return d + "d " + h + "h " + m + "m";
        }
        return h > 0 ? h + "h " + m + "m" : m + "m " + s % 60 + "s";
    }
}
