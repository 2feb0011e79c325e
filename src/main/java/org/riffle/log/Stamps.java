package org.riffle.log;

import java.nio.charset.StandardCharsets;

/**
 * Timestamp cells read straight from bytes, as nanoseconds since 1970-01-01T00:00 (UTC when the cell
 * carries an offset; the wall-clock time as written when it does not). One hand-written parser covers
 * the layouts loggers write:
 * <ul>
 * <li>ISO 8601 date and time, {@code T} or a space between: {@code 2026-03-01T12:00:00.250+01:00},
 * {@code 2026-03-01 12:00:00,25Z}, {@code 2026-03-01 12:00}; also {@code 2026/03/01 ...};</li>
 * <li>day first with dots: {@code 01.03.2026 12:00:00};</li>
 * <li>slashes or dashes with the year last, {@code 01/03/2026}, read day first or month first only as
 * the {@link Order} says;</li>
 * <li>a date alone, and a time of day alone ({@code 12:00:00.5}, optionally {@code AM}/{@code PM}).</li>
 * </ul>
 * Fractions of a second take a point or a comma and up to 9 digits. Offsets are {@code Z},
 * {@code +hh:mm}, {@code +hhmm} or {@code +hh}.
 *
 * <p>Days from the civil date follow H. Hinnant, "chrono-Compatible Low-Level Date Algorithms"
 * ({@code days_from_civil}), proleptic Gregorian calendar.
 *
 * <p>Stateless and thread-safe.
 */
final class Stamps {
    /** Returned when a cell is not a timestamp of the asked layout. */
    static final long FAIL = Long.MIN_VALUE;
    static final long NANOS_PER_SECOND = 1_000_000_000L;
    static final long NANOS_PER_DAY = 86_400L * NANOS_PER_SECOND;

    /** How the numbers of a date are ordered. */
    enum Order {
        /** year, month, day: ISO 8601 ({@code -} or {@code /}). */
        YMD,
        /** day, month, year: {@code dd.MM.yyyy}, {@code dd/MM/yyyy}, {@code dd-MM-yyyy}. */
        DMY,
        /** month, day, year: {@code MM/dd/yyyy}, only when the user says so. */
        MDY
    }

    private Stamps() {
    }

    /**
     * Parses a date with an optional time of day and offset; {@link #FAIL} when {@code b[s, e)} is not
     * one in {@code order}. Surrounding spaces are ignored.
     */
    static long parse(byte[] b, int s, int e, Order order) {
        return parse(b, s, e, order, null);
    }

    /** Remembers the last date read, so rows of the same day skip the calendar. Mutable; one thread. */
    static final class DayCache {
        private final byte[] text = new byte[12];
        private int length = -1;
        private long day;
        private Order order;
    }

    /** As {@link #parse(byte[], int, int, Order)}, reusing {@code cache} (may be null) for a repeated date. */
    static long parse(byte[] b, int s, int e, Order order, DayCache cache) {
        while (s < e && b[s] == ' ') {
            s++;
        }
        while (e > s && b[e - 1] == ' ') {
            e--;
        }
        long day;
        int i;
        if (cache != null && cache.order == order && sameDate(b, s, e, cache)) {
            day = cache.day;
            i = s + cache.length;
        } else {
            day = date(b, s, e, order);
            if (day == FAIL) {
                return FAIL;
            }
            i = s + (int) (day >>> 40);
            day = (day << 24) >> 24;
            if (cache != null && i - s <= cache.text.length) {
                System.arraycopy(b, s, cache.text, 0, i - s);
                cache.length = i - s;
                cache.day = day;
                cache.order = order;
            }
        }
        if (i == e) {
            return day * NANOS_PER_DAY;
        }
        if (b[i] != 'T' && b[i] != ' ') {
            return FAIL;
        }
        i++;
        while (i < e && b[i] == ' ') {
            i++;
        }
        long tod = timeOfDay(b, i, e);
        return tod == FAIL ? FAIL : day * NANOS_PER_DAY + tod;
    }

    private static boolean sameDate(byte[] b, int s, int e, DayCache c) {
        int n = c.length;
        if (n < 0 || e - s < n || (e - s > n && isDigit(b[s + n]))) {
            return false;
        }
        for (int k = 0; k < n; k++) {
            if (b[s + k] != c.text[k]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Parses a time of day with optional fraction, AM/PM and offset, as nanoseconds since midnight
     * minus the offset (so it may fall outside one day); {@link #FAIL} when it is not one.
     */
    static long timeOfDay(byte[] b, int s, int e) {
        while (s < e && b[s] == ' ') {
            s++;
        }
        while (e > s && b[e - 1] == ' ') {
            e--;
        }
        int i = s;
        int h = 0;
        int n = 0;
        while (i < e && n < 2 && isDigit(b[i])) {
            h = h * 10 + b[i++] - '0';
            n++;
        }
        if (n == 0 || i + 2 >= e || b[i] != ':' || !isDigit(b[i + 1]) || !isDigit(b[i + 2])) {
            return FAIL;
        }
        int min = (b[i + 1] - '0') * 10 + b[i + 2] - '0';
        i += 3;
        int sec = 0;
        long frac = 0;
        if (i < e && b[i] == ':') {
            if (i + 2 >= e || !isDigit(b[i + 1]) || !isDigit(b[i + 2])) {
                return FAIL;
            }
            sec = (b[i + 1] - '0') * 10 + b[i + 2] - '0';
            i += 3;
            if (i < e && (b[i] == '.' || b[i] == ',')) {
                i++;
                long scale = 100_000_000L;
                int start = i;
                while (i < e && isDigit(b[i])) {
                    frac += (b[i++] - '0') * scale;
                    scale /= 10;
                }
                if (i == start || i - start > 9) {
                    return FAIL;
                }
            }
        }
        while (i < e && b[i] == ' ') {
            i++;
        }
        if (i + 1 < e && (b[i + 1] == 'M' || b[i + 1] == 'm')) {
            boolean pm = b[i] == 'P' || b[i] == 'p';
            if ((!pm && b[i] != 'A' && b[i] != 'a') || h < 1 || h > 12) {
                return FAIL;
            }
            h = h % 12 + (pm ? 12 : 0);
            i += 2;
            while (i < e && b[i] == ' ') {
                i++;
            }
        }
        long offset = offsetSeconds(b, i, e);
        if (offset == FAIL || h > 23 || min > 59 || sec > 60) {
            return FAIL;
        }
        return ((h * 3600L + min * 60L + sec) - offset) * NANOS_PER_SECOND + frac;
    }

    /** Seconds east of UTC for {@code Z}, {@code +hh:mm}, {@code +hhmm}, {@code +hh}, 0 for none. */
    private static long offsetSeconds(byte[] b, int i, int e) {
        if (i == e) {
            return 0;
        }
        if (b[i] == 'Z' || b[i] == 'z') {
            return i + 1 == e ? 0 : FAIL;
        }
        if (b[i] != '+' && b[i] != '-') {
            return FAIL;
        }
        int sign = b[i] == '-' ? -1 : 1;
        int len = e - i - 1;
        int j = i + 1;
        if (len != 2 && len != 4 && !(len == 5 && b[j + 2] == ':')) {
            return FAIL;
        }
        int hh = two(b, j);
        int mm = len == 2 ? 0 : two(b, len == 5 ? j + 3 : j + 2);
        if (hh < 0 || mm < 0 || hh > 18 || mm > 59) {
            return FAIL;
        }
        return sign * (hh * 3600L + mm * 60L);
    }

    private static int two(byte[] b, int j) {
        return isDigit(b[j]) && isDigit(b[j + 1]) ? (b[j] - '0') * 10 + b[j + 1] - '0' : -1;
    }

    /**
     * The date at the start of {@code b[s, e)} as epoch days in the low 40 bits and its length in
     * bytes above them; {@link #FAIL} when there is none in {@code order}.
     */
    static long date(byte[] b, int s, int e, Order order) {
        int i = s;
        int f0 = 0;
        int n0 = 0;
        while (i < e && n0 < 4 && isDigit(b[i])) {
            f0 = f0 * 10 + b[i++] - '0';
            n0++;
        }
        if (n0 == 0 || i >= e || (b[i] != '-' && b[i] != '.' && b[i] != '/')) {
            return FAIL;
        }
        byte sep = b[i++];
        int f1 = 0;
        int n1 = 0;
        while (i < e && n1 < 2 && isDigit(b[i])) {
            f1 = f1 * 10 + b[i++] - '0';
            n1++;
        }
        if (n1 == 0 || i >= e || b[i] != sep) {
            return FAIL;
        }
        i++;
        int f2 = 0;
        int n2 = 0;
        while (i < e && n2 < 4 && isDigit(b[i])) {
            f2 = f2 * 10 + b[i++] - '0';
            n2++;
        }
        if (n2 == 0 || (i < e && isDigit(b[i]))) {
            return FAIL;
        }
        int y;
        int m;
        int d;
        if (order == Order.YMD) {
            if (n0 != 4 || n2 > 2 || sep == '.') {
                return FAIL;
            }
            y = f0;
            m = f1;
            d = f2;
        } else {
            if (n2 != 4 || n0 > 2 || (sep == '.' && order == Order.MDY)) {
                return FAIL;
            }
            y = f2;
            m = order == Order.DMY ? f1 : f0;
            d = order == Order.DMY ? f0 : f1;
        }
        if (m < 1 || m > 12 || d < 1 || d > daysInMonth(y, m)) {
            return FAIL;
        }
        return ((long) (i - s) << 40) | (epochDay(y, m, d) & ((1L << 40) - 1));
    }

    /** Days from 1970-01-01 to {@code y-m-d} (Hinnant's {@code days_from_civil}). */
    static long epochDay(int y, int m, int d) {
        int yy = m <= 2 ? y - 1 : y;
        int era = Math.floorDiv(yy, 400);
        int yoe = yy - era * 400;
        int doy = (153 * (m + (m > 2 ? -3 : 9)) + 2) / 5 + d - 1;
        int doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
        return era * 146_097L + doe - 719_468L;
    }

    private static int daysInMonth(int y, int m) {
        if (m == 2) {
            return (y % 4 == 0 && y % 100 != 0) || y % 400 == 0 ? 29 : 28;
        }
        return m == 4 || m == 6 || m == 9 || m == 11 ? 30 : 31;
    }

    private static boolean isDigit(byte c) {
        return c >= '0' && c <= '9';
    }

    /** {@link #parse(byte[], int, int, Order)} on text (sniffing and tests). */
    static long parse(String text, Order order) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        return parse(b, 0, b.length, order);
    }

    /** {@link #timeOfDay(byte[], int, int)} on text. */
    static long timeOfDay(String text) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        return timeOfDay(b, 0, b.length);
    }
}
