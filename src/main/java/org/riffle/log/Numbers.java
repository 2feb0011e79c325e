package org.riffle.log;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Number cells read straight from bytes. The common case (an optional sign, up to 18 digits, one
 * decimal mark, an optional exponent) is parsed without allocating; anything else falls back to
 * {@link Float#parseFloat} on a cleaned-up string. Both give the correctly rounded {@code float}, so
 * the fast path and the fallback never disagree.
 *
 * <p>Correct rounding on the fast path: a mantissa below 2<sup>24</sup> times a power of ten up to
 * 10<sup>10</sup> (both exact in {@code float}) is one correctly rounded IEEE operation (Clinger 1990,
 * "How to read floating point numbers accurately", PLDI, the "fast path"). Larger mantissas go through
 * the same exact {@code double} fast path and are narrowed to {@code float} unless the {@code double}
 * lands exactly on a midpoint between two floats, the only case where double rounding can differ.
 *
 * <p>Stateless and thread-safe.
 */
final class Numbers {
    /** Cells that mean "no value" rather than text: counted as missing samples. Upper case. */
    static final Set<String> MISSING = Set.of("", "NAN", "-NAN", "#N/A", "N/A", "NA", "#NV", "---", "--", "-",
            "ERR", "ERROR", "OVF", "OVER", "UNDER", "UNF", "NULL", "NONE", "INF", "-INF", "+INF", "INFINITY",
            "-INFINITY", "#VALUE!", "#DIV/0!", "#NUM!", "#REF!", "?", "*");
    /** The longest missing-value token: a longer cell (a date, a word) is none, without upper-casing it. */
    private static final int LONGEST_MISSING = longest(MISSING);

    private static final float[] FLOAT_POW10 = {1e0f, 1e1f, 1e2f, 1e3f, 1e4f, 1e5f, 1e6f, 1e7f, 1e8f, 1e9f, 1e10f};
    private static final double[] DOUBLE_POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
    /**
     * A plain decimal number. Possessive quantifiers throughout: the form has one reading, and with
     * ordinary (backtracking) ones a long run of digits ending in another character took time
     * quadratic in its length (a 250 kB cell ran for minutes).
     */
    private static final Pattern PLAIN = Pattern.compile("[+-]?+(?:\\d++(?:\\.\\d*+)?+|\\.\\d++)(?:[eE][+-]?+\\d++)?+");
    private static final Pattern GROUPED_POINT = Pattern.compile("[+-]?\\d{1,3}([,' \u00a0\u202f]\\d{3})+(\\.\\d*)?");
    private static final Pattern GROUPED_COMMA = Pattern.compile("[+-]?\\d{1,3}([.' \u00a0\u202f]\\d{3})+(,\\d*)?");
    private static final long MANTISSA_LIMIT = 1L << 53;

    private Numbers() {
    }

    /**
     * The number in {@code b[s, e)}, or {@code NaN} when the cell is not a finite number (missing token,
     * text, or out of {@code float} range). Surrounding spaces are ignored.
     */
    static float parse(byte[] b, int s, int e, boolean decimalComma) {
        while (s < e && b[s] == ' ') {
            s++;
        }
        while (e > s && b[e - 1] == ' ') {
            e--;
        }
        int i = s;
        boolean neg = false;
        if (i < e && (b[i] == '-' || b[i] == '+')) {
            neg = b[i] == '-';
            i++;
        }
        byte mark = decimalComma ? (byte) ',' : (byte) '.';
        long m = 0;
        int start = i;
        int d;
        while (i < e && (d = b[i] - '0') >= 0 && d <= 9) {
            m = m * 10 + d;
            i++;
        }
        int digits = i - start;
        int fraction = 0;
        if (i < e && b[i] == mark) {
            int from = ++i;
            while (i < e && (d = b[i] - '0') >= 0 && d <= 9) {
                m = m * 10 + d;
                i++;
            }
            fraction = i - from;
            digits += fraction;
        }
        if (digits == 0 && i < e && ((b[i] | 0x20) >= 'a' && (b[i] | 0x20) <= 'z')) {
            return Float.NaN; // a word (RUN, NaN, OVF): no number starts with a letter
        }
        if (digits == 0 || digits > 18) {
            return slow(b, s, e, decimalComma);
        }
        int exp = 0;
        if (i < e) {
            if (b[i] != 'e' && b[i] != 'E') {
                // only grouping marks, spaces or non-ASCII separators can still make a number (the
                // fallback's forms); a date's '-', a time's ':' or a unit's letter cannot
                return mayGroup(b[i]) ? slow(b, s, e, decimalComma) : Float.NaN;
            }
            i++;
            boolean expNeg = false;
            if (i < e && (b[i] == '-' || b[i] == '+')) {
                expNeg = b[i] == '-';
                i++;
            }
            if (i == e || e - i > 3) {
                return slow(b, s, e, decimalComma);
            }
            for (; i < e; i++) {
                d = b[i] - '0';
                if (d < 0 || d > 9) {
                    return slow(b, s, e, decimalComma);
                }
                exp = exp * 10 + d;
            }
            exp = expNeg ? -exp : exp;
        }
        return scale(m, exp - fraction, neg, b, s, e, decimalComma);
    }

    private static float scale(long m, int exp10, boolean neg, byte[] b, int s, int e, boolean decimalComma) {
        float f;
        if (m == 0) {
            f = 0f;
        } else if (m < (1 << 24) && exp10 >= -10 && exp10 <= 10) {
            f = exp10 >= 0 ? (float) m * FLOAT_POW10[exp10] : (float) m / FLOAT_POW10[-exp10];
        } else if (m < MANTISSA_LIMIT && exp10 >= -22 && exp10 <= 22) {
            double d = exp10 >= 0 ? (double) m * DOUBLE_POW10[exp10] : (double) m / DOUBLE_POW10[-exp10];
            long low = Double.doubleToRawLongBits(d) & ((1L << 29) - 1);
            if (low == (1L << 28) || Math.abs(d) < Float.MIN_NORMAL) {
                return slow(b, s, e, decimalComma);
            }
            f = (float) d;
        } else {
            return slow(b, s, e, decimalComma);
        }
        if (Float.isInfinite(f)) {
            return Float.NaN;
        }
        return neg ? -f : f;
    }

    /** True for a byte that may follow leading digits in a form only {@link #slow} reads. */
    private static boolean mayGroup(byte c) {
        return c <= ' ' || c == ',' || c == '.' || c == '\'';
    }

    /** The general case: thousands grouping, odd forms, huge or tiny numbers, non-numbers. */
    static float slow(byte[] b, int s, int e, boolean decimalComma) {
        String t = new String(b, s, e - s, StandardCharsets.ISO_8859_1).strip();
        t = t.replace("\u00c2\u00a0", "\u00a0").replace("\u00e2\u0080\u00af", "\u202f");
        if (decimalComma) {
            if (GROUPED_COMMA.matcher(t).matches()) {
                t = t.replaceAll("[.' \u00a0\u202f]", "");
            }
            t = t.replace(',', '.');
        } else if (GROUPED_POINT.matcher(t).matches()) {
            t = t.replaceAll("[,' \u00a0\u202f]", "");
        }
        if (!PLAIN.matcher(t).matches()) {
            return Float.NaN;
        }
        float f = Float.parseFloat(t);
        return Float.isInfinite(f) ? Float.NaN : f;
    }

    /** The number in {@code text}, as {@link #parse(byte[], int, int, boolean)} reads it. */
    static float parse(String text, boolean decimalComma) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        return parse(b, 0, b.length, decimalComma);
    }

    /**
     * A double for time columns (epoch or elapsed seconds need more than float precision): the exact
     * {@code double} fast path, else {@link Double#parseDouble}. {@code NaN} when not a number.
     */
    static double parseDouble(byte[] b, int s, int e, boolean decimalComma) {
        String t = new String(b, s, e - s, StandardCharsets.ISO_8859_1).strip();
        if (decimalComma) {
            t = t.replace(',', '.');
        }
        if (!PLAIN.matcher(t).matches()) {
            return Double.NaN;
        }
        return Double.parseDouble(t);
    }

    /** True when the cell is a known "no value" token (empty, NaN, #N/A, ---, ERR, OVF ...). */
    static boolean isMissingToken(String cell) {
        String t = cell.strip();
        return t.length() <= LONGEST_MISSING && MISSING.contains(t.toUpperCase(Locale.ROOT));
    }

    private static int longest(Set<String> words) {
        int n = 0;
        for (String w : words) {
            n = Math.max(n, w.length());
        }
        return n;
    }

    /** True when {@code text} reads as a number in either decimal mark. */
    static boolean looksNumeric(String text) {
        return !Float.isNaN(parse(text, false)) || !Float.isNaN(parse(text, true))
                || text.strip().equalsIgnoreCase("nan");
    }
}
