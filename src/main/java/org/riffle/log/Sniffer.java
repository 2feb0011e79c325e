package org.riffle.log;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Works out the layout of a delimited log from its first lines (at most {@link #MAX_LINES}): the
 * delimiter, where the table starts (lines before it are the preamble), whether its first row holds
 * names and its second row units, and the decimal mark. Columns and time are then typed by
 * {@link ColumnSniffer}.
 *
 * <p>The delimiter is the candidate (tab, semicolon, comma, bar, whitespace) that best splits the lines
 * into the table's number of fields with cells that read as numbers, times or missing-value tokens
 * (see {@link #chooseDelimiter}); ties go to the earlier in that order.
 *
 * <p>Stateless and thread-safe.
 */
final class Sniffer {
    static final int MAX_LINES = 400;
    private static final char[] CANDIDATES = {'\t', ';', ',', '|', Dialect.WHITESPACE};

    private Sniffer() {
    }

    /** The lines of the table as split: their 1-based line numbers and cells. */
    record Rows(List<Long> lines, List<List<String>> cells) {
        int size() {
            return lines.size();
        }
    }

    /**
     * Sniffs {@code head}, the first complete lines of the file (index 0 is line 1).
     *
     * @throws LogException when there is no table to read, or the options clash with the file
     */
    static Layout sniff(String file, List<String> head, ReadOptions opt, boolean wholeFile) throws LogException {
        int skip = opt.skipRows().orElse(0);
        head = joinQuoted(head, skip);
        List<Integer> content = new ArrayList<>();
        for (int i = skip; i < head.size() && content.size() < MAX_LINES; i++) {
            if (head.get(i) != null && !isBlankOrComment(head.get(i))) {
                content.add(i);
            }
        }
        if (content.isEmpty()) {
            throw new LogException(file, 0, 0, head.isEmpty() || !wholeFile ? "no table found in the first "
                    + head.size() + " lines" : "no table: only blank or comment lines");
        }
        char d = opt.delimiter().isPresent() ? opt.delimiter().get() : chooseDelimiter(head, content);
        List<List<String>> split = new ArrayList<>();
        for (int i : content) {
            split.add(Splitter.split(head.get(i), d));
        }
        int t0 = opt.skipRows().isPresent() ? 0 : tableStart(split);
        List<String> preamble = new ArrayList<>();
        int firstTableLine = content.get(t0);
        for (int i = 0; i < firstTableLine; i++) {
            if (head.get(i) != null && !head.get(i).isBlank()) {
                preamble.add(stripTrailingDelimiters(head.get(i), d));
            }
        }
        Rows rows = new Rows(new ArrayList<>(), new ArrayList<>());
        boolean quoted = false;
        for (int k = t0; k < content.size(); k++) {
            int i = content.get(k);
            rows.lines().add(i + 1L);
            rows.cells().add(split.get(k));
            quoted |= head.get(i).indexOf('"') >= 0;
        }
        return ColumnSniffer.type(file, rows, d, quoted, firstTableLine, preamble, opt);
    }

    /**
     * The lines with a quoted field that spans lines joined into the first of them (with a line feed);
     * the lines it swallowed become null, so indices stay line numbers. Only as far as the sniffer looks:
     * the head is cut after the {@link #MAX_LINES}-th content line from line {@code skip} on.
     */
    static List<String> joinQuoted(List<String> head, int skip) {
        List<String> out = new ArrayList<>(head);
        int content = 0;
        for (int i = 0; i < out.size(); i++) {
            if (i >= skip && content >= MAX_LINES) {
                return out.subList(0, i);
            }
            String l = out.get(i);
            int j = i;
            while ((Splitter.quotes(l) & 1) == 1 && j + 1 < out.size()) {
                l = l + "\n" + out.get(++j);
                out.set(j, null);
            }
            out.set(i, l);
            content += i >= skip && !isBlankOrComment(l) ? 1 : 0;
            i = j;
        }
        return out;
    }

    static boolean isBlankOrComment(String line) {
        String t = line.strip();
        return t.isEmpty() || t.startsWith("#") || t.startsWith("//");
    }

    private static String stripTrailingDelimiters(String line, char d) {
        int e = line.length();
        while (e > 0 && (line.charAt(e - 1) == d || Character.isWhitespace(line.charAt(e - 1)))) {
            e--;
        }
        return line.substring(0, e);
    }

    /**
     * The candidate delimiter that fits the lines best: the number of lines it splits into the table's
     * width, times the share of number, time or missing-value cells among those lines in the second half
     * of the head (the data, past any preamble and header). The share keeps dates and times, which hold
     * spaces, from making whitespace look like a delimiter. When only one candidate occurs in the second
     * half, any fit above zero chooses it, so its cells are looked at only until the first value.
     */
    static char chooseDelimiter(List<String> head, List<Integer> content) {
        List<Character> present = new ArrayList<>();
        for (char d : CANDIDATES) {
            if (inTail(head, content, d)) {
                present.add(d); // else no line of the second half can split on it: its width would be 1
            }
        }
        char best = ',';
        double bestFit = 0;
        for (char d : present) {
            List<List<String>> split = new ArrayList<>();
            for (int i : content) {
                split.add(Splitter.split(head.get(i), d));
            }
            int k = modalWidth(split);
            if (k < 2) {
                continue;
            }
            if (present.size() == 1) {
                bestFit = anyValueInTail(split, k) ? 1 : 0;
                best = d;
                break;
            }
            int lines = 0;
            int cells = 0;
            int values = 0;
            for (int i = 0; i < split.size(); i++) {
                List<String> f = split.get(i);
                if (f.size() == k) {
                    lines++;
                    if (i >= split.size() / 2) {
                        for (String c : f) {
                            cells++;
                            values += ColumnSniffer.valueLike(c) ? 1 : 0;
                        }
                    }
                }
            }
            double fit = cells == 0 ? 0 : lines * (values / (double) cells);
            if (fit > bestFit + 1e-9) {
                best = d;
                bestFit = fit;
            }
        }
        if (bestFit == 0 || (best == ',' && singleDecimalCommaColumn(head, content))) {
            return decimalCommaSeen(head, content) ? ';' : ',';
        }
        return best;
    }

    /** True when a line of {@code k} fields in the second half holds a value-like cell. */
    private static boolean anyValueInTail(List<List<String>> split, int k) {
        for (int i = split.size() / 2; i < split.size(); i++) {
            List<String> f = split.get(i);
            if (f.size() == k) {
                for (String c : f) {
                    if (ColumnSniffer.valueLike(c)) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    private static final Pattern DECIMAL_COMMA = Pattern.compile(".*\\d,\\d.*");
    private static final Pattern INTEGER = Pattern.compile("\\s*\"?[+-]?\\d+");
    private static final Pattern FRACTION = Pattern.compile("\\d+([eE][+-]?\\d+)?\"?\\s*");

    private static boolean decimalCommaSeen(List<String> head, List<Integer> content) {
        for (int i : content) {
            if (DECIMAL_COMMA.matcher(head.get(i)).matches()) {
                return true;
            }
        }
        return false;
    }

    /**
     * True for one column of numbers with a decimal comma and no quotes, which the comma splits in two:
     * every line has at most one comma, and where it has one, an integer stands before it and only
     * fraction digits after it, and some line has one.
     */
    private static boolean singleDecimalCommaColumn(List<String> head, List<Integer> content) {
        int split = 0;
        for (int i : content) {
            List<String> f = Splitter.naive(head.get(i), ',');
            if (f.size() > 2 || (f.size() == 2 && !(INTEGER.matcher(f.get(0)).matches()
                    && FRACTION.matcher(f.get(1)).matches()))) {
                return false;
            }
            split += f.size() == 2 ? 1 : 0;
        }
        return split > 0;
    }

    /**
     * Whether some content line of the second half (the lines {@link #modalWidth} counts) holds the
     * delimiter: a space or tab for whitespace-aligned columns.
     */
    private static boolean inTail(List<String> head, List<Integer> content, char d) {
        for (int k = content.size() / 2; k < content.size(); k++) {
            String line = head.get(content.get(k));
            boolean found = d == Dialect.WHITESPACE ? line.indexOf(' ') >= 0 || line.indexOf('\t') >= 0
                    : line.indexOf(d) >= 0;
            if (found) {
                return true;
            }
        }
        return false;
    }

    /**
     * The table's width: the most common number of fields (two or more) in the second half of the lines,
     * ties broken by how common it is among all lines, then by the wider; 1 when no line has two fields.
     */
    static int modalWidth(List<List<String>> split) {
        Map<Integer, Integer> tail = new HashMap<>();
        Map<Integer, Integer> all = new HashMap<>();
        for (int i = 0; i < split.size(); i++) {
            int w = split.get(i).size();
            if (w >= 2) {
                all.merge(w, 1, Integer::sum);
                if (i >= split.size() / 2) {
                    tail.merge(w, 1, Integer::sum);
                }
            }
        }
        int best = 1;
        long bestKey = -1;
        for (Map.Entry<Integer, Integer> e : tail.entrySet()) {
            long key = ((long) e.getValue() << 40) | ((long) all.get(e.getKey()) << 20) | e.getKey();
            if (key > bestKey) {
                best = e.getKey();
                bestKey = key;
            }
        }
        return best;
    }

    /**
     * Index of the table's first line among the split content lines: for a table of K ≥ 2 fields, the
     * first line of K fields followed by another of K fields (or last); for a single column, the line
     * before the run of values that ends the head (its header), or the run's first line.
     */
    static int tableStart(List<List<String>> split) {
        int k = modalWidth(split);
        if (k >= 2) {
            for (int i = 0; i < split.size(); i++) {
                if (split.get(i).size() == k && (i + 1 == split.size() || split.get(i + 1).size() == k)) {
                    return i;
                }
            }
            return 0;
        }
        int run = split.size();
        while (run > 0 && split.get(run - 1).size() == 1 && ColumnSniffer.valueLike(split.get(run - 1).get(0))) {
            run--;
        }
        if (run == split.size()) {
            return split.size() - 1;
        }
        if (run >= 2 && split.get(run - 1).size() == 1 && isBareUnit(split.get(run - 1).get(0))
                && !ColumnSniffer.valueLike(split.get(run - 2).get(0))) {
            return run - 2;
        }
        return run > 0 ? run - 1 : 0;
    }

    /** A units-row cell of a single column: a unit without spaces, or anything in brackets. */
    private static boolean isBareUnit(String cell) {
        String c = cell.strip();
        return (c.startsWith("[") && c.endsWith("]")) || (!c.contains(" ") && Units.looksLikeUnit(Units.strip(c)));
    }
}
