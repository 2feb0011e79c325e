package org.riffle.log;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Finds the time column(s) of a table and how to read them. Without {@code --time-column}: the first
 * column whose cells (at least 90 % of the filled ones) read as dates; a date-only column followed by a
 * time-of-day column is a split date and time; else a time-of-day column; else a numeric column named
 * like time ({@code time}, {@code t}, {@code elapsed}, {@code epoch}, ...), read as epoch milliseconds
 * from 9.46e11 up, epoch seconds from 9.46e8 up (both about 2000-01-01) and elapsed seconds below.
 *
 * <p>Dates with dots are day first. Dates with slashes or dashes and the year last are read day first or
 * month first only when the user says so; day first is also taken when the file itself shows a first
 * field above 12. Otherwise they are refused with a message naming the options that settle it.
 *
 * <p>Stateless and thread-safe.
 */
final class TimeSniffer {
    private static final double SHARE = 0.9;
    private static final double EPOCH_S = 9.46e8;
    private static final double EPOCH_MS = 9.46e11;
    /** A date without a time of day, e.g. 2026-03-01 or 01.03.2026. */
    private static final Pattern DATE_ONLY = Pattern.compile("\\d{1,4}[-./]\\d{1,2}[-./]\\d{1,4}");
    /** A time stamp that ends in a UTC offset or Z. */
    private static final Pattern OFFSET = Pattern.compile(".*\\d(Z|z|[+-]\\d\\d(:?\\d\\d)?)");
    /** A time column named by its 1-based number. */
    private static final Pattern COLUMN_NUMBER = Pattern.compile("\\d{1,6}");
    private static final Pattern TIME_NAME = Pattern.compile("(time|t|timestamp|ts|elapsed|elapsedtime|seconds|secs?"
            + "|epoch|epochtime|unix|unixtime|unixtimestamp|zeit|reltime|relativetime)(s|sec|ms|millis|milliseconds"
            + "|seconds)?");

    private TimeSniffer() {
    }

    /** What was chosen: a role per column and how the time reads. */
    record Choice(byte[] roles, Stamps.Order order, double scale, boolean absolute, String text,
                  List<String> notes) {
    }

    /** Counts over one column's filled cells. */
    record Stats(int filled, int ymd, int dmy, int mdy, int dateOnly, int tod, int numeric, String example,
                 long exampleLine) {
    }

    static Choice choose(String file, List<String> header, List<List<String>> data, List<Long> lines, int columns,
                         ReadOptions opt) throws LogException {
        String[] names = new String[columns];
        String[] units = new String[columns];
        for (int j = 0; j < columns; j++) {
            Units.Split s = Units.split(header != null && j < header.size() ? header.get(j) : "");
            names[j] = s.name().isEmpty() ? "col" + (j + 1) : s.name();
            units[j] = s.unit();
        }
        if (opt.timeColumn().isPresent()) {
            String want = opt.timeColumn().get().strip();
            if (want.equalsIgnoreCase("none")) {
                return none(columns);
            }
            int j = find(want, header, names);
            if (j < 0) {
                throw new LogException(file, 0, 0, "no column '" + want + "' for --time-column; columns are: "
                        + String.join(", ", names));
            }
            Stats s = stats(data, lines, j);
            Choice c = stampChoice(file, s, j, data, lines, names, opt);
            if (c == null) {
                c = numericChoice(s, j, names[j], units[j], columns);
            }
            if (c == null) {
                throw new LogException(file, s.exampleLine(), 0, "time column '" + names[j] + "' holds '"
                        + s.example() + "', not a date, time or number of seconds");
            }
            return c;
        }
        for (int j = 0; j < columns; j++) {
            Choice c = stampChoice(file, stats(data, lines, j), j, data, lines, names, opt);
            if (c != null) {
                return c;
            }
        }
        for (int j = 0; j < columns; j++) {
            String key = names[j].toLowerCase(Locale.ROOT).replaceAll("[^a-z]", "");
            if (header != null && TIME_NAME.matcher(key).matches()) {
                Choice c = numericChoice(stats(data, lines, j), j, names[j], units[j], columns);
                if (c != null) {
                    return c;
                }
            }
        }
        return none(columns);
    }

    private static Choice none(int columns) {
        return new Choice(new byte[columns], Stamps.Order.YMD, 1, false, "", List.of());
    }

    private static int find(String want, List<String> header, String[] names) {
        for (int j = 0; j < names.length; j++) {
            String raw = header != null && j < header.size() ? header.get(j).strip() : "";
            if (names[j].equals(want) || raw.equals(want)) {
                return j;
            }
        }
        for (int j = 0; j < names.length; j++) {
            if (names[j].equalsIgnoreCase(want)) {
                return j;
            }
        }
        if (COLUMN_NUMBER.matcher(want).matches()) {
            int n = Integer.parseInt(want);
            return n >= 1 && n <= names.length ? n - 1 : -1;
        }
        return -1;
    }

    static Stats stats(List<List<String>> data, List<Long> lines, int j) {
        int filled = 0;
        int ymd = 0;
        int dmy = 0;
        int mdy = 0;
        int dateOnly = 0;
        int tod = 0;
        int numeric = 0;
        String example = "";
        long exampleLine = 0;
        for (int r = 0; r < data.size(); r++) {
            List<String> row = data.get(r);
            String c = j < row.size() ? row.get(j).strip() : "";
            if (Numbers.isMissingToken(c)) {
                continue;
            }
            if (filled++ == 0) {
                example = c;
                exampleLine = lines.get(r);
            }
            ymd += Stamps.parse(c, Stamps.Order.YMD) != Stamps.FAIL ? 1 : 0;
            dmy += Stamps.parse(c, Stamps.Order.DMY) != Stamps.FAIL ? 1 : 0;
            mdy += Stamps.parse(c, Stamps.Order.MDY) != Stamps.FAIL ? 1 : 0;
            dateOnly += c.length() <= 10 && DATE_ONLY.matcher(c).matches() ? 1 : 0;
            tod += Stamps.timeOfDay(c) != Stamps.FAIL ? 1 : 0;
            numeric += Numbers.looksNumeric(c) ? 1 : 0;
        }
        return new Stats(filled, ymd, dmy, mdy, dateOnly, tod, numeric, example, exampleLine);
    }

    static boolean most(int count, int filled) {
        return filled > 0 && count >= SHARE * filled;
    }

    /** A date column (perhaps split from its time of day), a time-of-day column, or null. */
    private static Choice stampChoice(String file, Stats s, int j, List<List<String>> data, List<Long> lines,
                                      String[] names, ReadOptions opt) throws LogException {
        int n = s.filled();
        Stamps.Order order;
        String layout;
        List<String> notes = new ArrayList<>();
        if (most(s.ymd(), n)) {
            order = Stamps.Order.YMD;
            layout = "ISO 8601";
        } else if (most(s.dmy(), n) || most(s.mdy(), n)) {
            order = DateOrders.settle(file, s, opt, notes);
            layout = order == Stamps.Order.DMY ? "day first" : "month first";
        } else if (most(s.tod(), n) && !most(s.numeric(), n)) {
            byte[] roles = new byte[names.length];
            roles[j] = Layout.TIME_OF_DAY;
            return new Choice(roles, Stamps.Order.YMD, 1, false, "time '" + names[j] + "' time of day", notes);
        } else {
            return null;
        }
        byte[] roles = new byte[names.length];
        String text = "time '" + names[j] + "' " + layout;
        if (most(s.dateOnly(), n) && j + 1 < names.length) {
            Stats next = stats(data, lines, j + 1);
            if (most(next.tod(), next.filled())) {
                roles[j] = Layout.DATE;
                roles[j + 1] = Layout.TIME_OF_DAY;
                text = "time '" + names[j] + "' + '" + names[j + 1] + "' " + layout;
                return new Choice(roles, order, 1, true, text + offsetText(hasOffset(data, j + 1), notes), notes);
            }
        }
        roles[j] = Layout.STAMP;
        return new Choice(roles, order, 1, true, text + offsetText(hasOffset(data, j), notes), notes);
    }

    /**
     * Whether a filled cell of column j ends in a UTC offset or Z; asked only of the column chosen as the
     * time (the regex is slow on a cold JVM, and every column's cells were once tried).
     */
    private static boolean hasOffset(List<List<String>> data, int j) {
        for (List<String> row : data) {
            String c = j < row.size() ? row.get(j).strip() : "";
            if (!Numbers.isMissingToken(c) && OFFSET.matcher(c).matches()) {
                return true;
            }
        }
        return false;
    }

    private static String offsetText(boolean offset, List<String> notes) {
        if (offset) {
            return " with UTC offset";
        }
        notes.add("timestamps carry no UTC offset: read as written (local time), so a daylight-saving change"
                + " shows as a gap or a backward step");
        return " local";
    }

    /** A numeric time column: epoch milliseconds, epoch seconds or elapsed time; null if not numeric. */
    private static Choice numericChoice(Stats s, int j, String name, String unit, int columns) {
        if (!most(s.numeric(), s.filled())) {
            return null;
        }
        double first = Numbers.parse(s.example(), false);
        String u = unit.toLowerCase(Locale.ROOT);
        String key = name.toLowerCase(Locale.ROOT);
        boolean ms = u.equals("ms") || key.endsWith("ms") || key.contains("milli");
        double scale = ms ? 0.001 : u.equals("min") ? 60 : u.equals("h") ? 3600 : 1;
        boolean epoch;
        String what;
        if (first >= EPOCH_MS || (ms && first >= EPOCH_S * 1000)) {
            scale = 0.001;
            epoch = true;
            what = "epoch ms";
        } else if (first >= EPOCH_S && !ms) {
            scale = 1;
            epoch = true;
            what = "epoch s";
        } else {
            epoch = false;
            what = "elapsed " + (scale == 1 ? "s" : scale == 0.001 ? "ms" : u);
        }
        byte[] roles = new byte[columns];
        roles[j] = Layout.NUMBER_TIME;
        return new Choice(roles, Stamps.Order.YMD, scale, epoch, "time '" + name + "' " + what, List.of());
    }
}
