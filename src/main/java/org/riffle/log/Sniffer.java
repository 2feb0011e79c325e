package org.riffle.log;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Works out the layout of a delimited log from its first lines (at most {@link #MAX_LINES}): the
 * delimiter, where the table starts (lines before it are the preamble), whether its first row holds
 * names and its second row units, and the decimal mark. Columns and time are then typed by
 * {@link ColumnSniffer}.
 *
 * <p>The delimiter is the candidate (comma, semicolon, tab, bar, whitespace) that splits the most lines
 * into the same number of fields (at least two); ties go to the one whose fields read more often as
 * numbers, times or missing-value tokens, then to the order tab, semicolon, comma, bar, whitespace.
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
        head = joinQuoted(head);
        List<Integer> content = new ArrayList<>();
        int skip = opt.skipRows().orElse(0);
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
     * the lines it swallowed become null, so indices stay line numbers.
     */
    static List<String> joinQuoted(List<String> head) {
        List<String> out = new ArrayList<>(head);
        for (int i = 0; i < out.size(); i++) {
            String l = out.get(i);
            int j = i;
            while ((Splitter.quotes(l) & 1) == 1 && j + 1 < out.size()) {
                l = l + "\n" + out.get(++j);
                out.set(j, null);
            }
            out.set(i, l);
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

    /** The candidate delimiter that splits the most lines alike. */
    static char chooseDelimiter(List<String> head, List<Integer> content) {
        char best = ',';
        int bestScore = 0;
        double bestValues = -1;
        for (char d : CANDIDATES) {
            List<List<String>> split = new ArrayList<>();
            for (int i : content) {
                split.add(d == Dialect.WHITESPACE ? Splitter.splitWhitespace(head.get(i)) : Splitter.split(head.get(i), d));
            }
            int k = modalWidth(split.subList(split.size() / 2, split.size()));
            if (k < 2) {
                continue;
            }
            int score = 0;
            int cells = 0;
            int values = 0;
            for (List<String> f : split) {
                if (f.size() == k) {
                    score++;
                    for (String c : f) {
                        cells++;
                        values += ColumnSniffer.valueLike(c) ? 1 : 0;
                    }
                }
            }
            double valueShare = cells == 0 ? 0 : values / (double) cells;
            if (score > bestScore || (score == bestScore && valueShare > bestValues + 1e-9)) {
                best = d;
                bestScore = score;
                bestValues = valueShare;
            }
        }
        return best;
    }

    /** The most common number of fields among lines with two or more; ties go to the wider; 1 if none. */
    static int modalWidth(List<List<String>> split) {
        Map<Integer, Integer> freq = new HashMap<>();
        for (List<String> f : split) {
            if (f.size() >= 2) {
                freq.merge(f.size(), 1, Integer::sum);
            }
        }
        int best = 1;
        int bestCount = 0;
        for (Map.Entry<Integer, Integer> e : freq.entrySet()) {
            if (e.getValue() > bestCount || (e.getValue() == bestCount && e.getKey() > best)) {
                best = e.getKey();
                bestCount = e.getValue();
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
        int k = modalWidth(split.subList(split.size() / 2, split.size()));
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
        return run > 0 ? run - 1 : 0;
    }
}
