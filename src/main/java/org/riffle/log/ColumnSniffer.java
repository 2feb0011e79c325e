package org.riffle.log;

import java.util.ArrayList;
import java.util.List;

/**
 * Types the table found by {@link Sniffer}: is its first row a header (a name where later rows hold
 * numbers or times), is the second a units row (no number or time in any cell), which decimal mark the
 * numbers use (the mark that ends more number cells; never a comma with the comma delimiter), and, via
 * {@link TimeSniffer}, which columns carry time.
 *
 * <p>Stateless and thread-safe.
 */
final class ColumnSniffer {
    private ColumnSniffer() {
    }

    /** True for a number in either decimal mark, a date or time, or a missing-value token (incl. empty). */
    static boolean valueLike(String cell) {
        String t = cell.strip();
        // numbers first: most cells are numbers, and the date and time parsers (four tries) cost more
        return t.isEmpty() || Numbers.looksNumeric(t) || Numbers.isMissingToken(t) || timeLike(t);
    }

    /** True for a number or a date or time (not for empty cells or missing-value tokens). */
    static boolean valueProper(String cell) {
        String t = cell.strip();
        return !t.isEmpty() && !Numbers.isMissingToken(t) && (Numbers.looksNumeric(t) || timeLike(t));
    }

    static boolean timeLike(String t) {
        return t.length() >= 4 && (Stamps.parse(t, Stamps.Order.YMD) != Stamps.FAIL
                || Stamps.parse(t, Stamps.Order.DMY) != Stamps.FAIL
                || Stamps.parse(t, Stamps.Order.MDY) != Stamps.FAIL || Stamps.timeOfDay(t) != Stamps.FAIL);
    }

    static Layout type(String file, Sniffer.Rows rows, char d, boolean quoted, int skipped, List<String> preamble,
                       ReadOptions opt) throws LogException {
        List<List<String>> cells = rows.cells();
        int k = Math.max(1, Sniffer.modalWidth(cells));
        List<List<String>> probe = cells.size() >= 3 ? cells.subList(2, cells.size())
                : cells.subList(Math.min(1, cells.size()), cells.size());
        boolean[] valueColumn = valueColumns(probe, k);
        List<String> first = cells.get(0);
        boolean header = isHeader(first, valueColumn, probe.isEmpty());
        int columns = k;
        if (header) {
            columns = Math.max(k, nonEmptyWidth(first));
        }
        boolean units = false;
        if (header && cells.size() >= 2) {
            units = opt.unitsRow().orElseGet(() -> isUnitsRow(cells.get(1)));
        }
        int start = (header ? 1 : 0) + (units ? 1 : 0);
        List<List<String>> data = cells.subList(Math.min(start, cells.size()), cells.size());
        List<Long> dataLines = rows.lines().subList(Math.min(start, cells.size()), cells.size());
        long dataLine = start == 0 ? rows.lines().get(0) : rows.lines().get(start - 1) + 1;
        TimeSniffer.Choice time = TimeSniffer.choose(file, header ? first : null, data, dataLines, columns, opt);
        boolean decimalComma = opt.decimalComma().orElseGet(() -> d != ',' && decimalCommaVotes(data, time.roles()));
        if (decimalComma && d == ',') {
            throw new LogException(file, 0, 0, "a decimal comma cannot go with the comma delimiter; give --delimiter");
        }
        String[] names = new String[columns];
        String[] unitsOf = new String[columns];
        for (int j = 0; j < columns; j++) {
            String raw = header && j < first.size() ? first.get(j).strip() : "";
            Units.Split s = Units.split(raw);
            names[j] = s.name();
            unitsOf[j] = s.unit();
            if (units && j < cells.get(1).size() && !cells.get(1).get(j).isBlank()) {
                unitsOf[j] = Units.strip(cells.get(1).get(j));
            }
        }
        Units.uniqueNames(names);
        Dialect dialect = new Dialect(d, decimalComma, quoted, skipped, header, units);
        List<String> notes = new ArrayList<>(time.notes());
        return new Layout(dialect, dataLine, names, unitsOf, time.roles(), time.order(), time.scale(),
                time.absolute(), time.text(), preamble, notes);
    }

    private static boolean[] valueColumns(List<List<String>> probe, int k) {
        boolean[] out = new boolean[k];
        for (int j = 0; j < k; j++) {
            int values = 0;
            int filled = 0;
            for (List<String> row : probe) {
                if (j < row.size() && !row.get(j).isBlank()) {
                    filled++;
                    values += valueLike(row.get(j)) ? 1 : 0;
                }
            }
            out[j] = filled > 0 && values * 2 >= filled;
        }
        return out;
    }

    /** A header holds a non-value where the rows below hold values (or, alone, any non-value). */
    private static boolean isHeader(List<String> first, boolean[] valueColumn, boolean alone) {
        boolean anyValueColumn = false;
        for (int j = 0; j < valueColumn.length; j++) {
            anyValueColumn |= valueColumn[j];
            if (valueColumn[j] && j < first.size() && !valueLike(first.get(j))) {
                return true;
            }
        }
        if (alone || !anyValueColumn) {
            for (String c : first) {
                if (!valueLike(c)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** A units row has no number and no time in any cell, and some cell that is not a missing token. */
    private static boolean isUnitsRow(List<String> row) {
        boolean some = false;
        for (String c : row) {
            if (valueProper(c)) {
                return false;
            }
            some |= !c.isBlank() && !Numbers.isMissingToken(c);
        }
        return some;
    }

    private static int nonEmptyWidth(List<String> row) {
        int w = row.size();
        while (w > 1 && row.get(w - 1).isBlank()) {
            w--;
        }
        return w;
    }

    /** True when more number cells end in a decimal comma than in a decimal point. */
    static boolean decimalCommaVotes(List<List<String>> data, byte[] roles) {
        int comma = 0;
        int point = 0;
        for (List<String> row : data) {
            for (int j = 0; j < row.size(); j++) {
                if (j < roles.length && roles[j] != Layout.VALUE) {
                    continue;
                }
                String c = row.get(j).strip();
                int lastComma = c.lastIndexOf(',');
                int lastPoint = c.lastIndexOf('.');
                if (lastComma > lastPoint && !Float.isNaN(Numbers.parse(c, true))) {
                    comma++;
                } else if (lastPoint > lastComma && !Float.isNaN(Numbers.parse(c, false))) {
                    point++;
                }
            }
        }
        return comma > point;
    }
}
