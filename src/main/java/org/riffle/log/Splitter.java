package org.riffle.log;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The general way to split one logical line into fields, quotes and all: Apache Commons CSV (RFC 4180
 * quoting, a doubled quote inside a quoted field) for a single-character delimiter, and a small
 * quote-aware splitter for whitespace-aligned columns. Used for sniffing and for every line the byte
 * fast path leaves alone (lines with a quote character).
 *
 * <p>Stateless and thread-safe.
 */
final class Splitter {
    private static final CSVFormat[] FORMATS = {format(','), format(';'), format('\t'), format('|')};

    private Splitter() {
    }

    private static CSVFormat format(char d) {
        return CSVFormat.RFC4180.builder().setDelimiter(d).setQuote('"').setRecordSeparator("\n")
                .setIgnoreEmptyLines(false).get();
    }

    /** The fields of {@code line}; never empty (a blank line has one empty field). */
    static List<String> split(String line, char delimiter) {
        if (delimiter == Dialect.WHITESPACE) {
            return splitWhitespace(line);
        }
        if (line.indexOf('"') < 0) {
            // without a quote, RFC 4180 splitting is plain splitting on the delimiter; a parser per line
            // was most of the time of reading a small log (sniffing splits every head line five ways)
            return naive(line, delimiter);
        }
        CSVFormat f = FORMATS[",;\t|".indexOf(delimiter)];
        try (CSVParser p = CSVParser.parse(line, f)) {
            List<CSVRecord> records = p.getRecords();
            if (records.size() != 1) {
                return records.isEmpty() ? List.of("") : naive(line, delimiter);
            }
            List<String> out = new ArrayList<>(records.get(0).size());
            records.get(0).forEach(out::add);
            return out;
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            return naive(line, delimiter);
        }
    }

    /** Fields split on {@code delimiter} ignoring quotes (for lines whose quotes do not balance). */
    static List<String> naive(String line, char delimiter) {
        List<String> out = new ArrayList<>();
        int from = 0;
        for (int i = line.indexOf(delimiter); i >= 0; i = line.indexOf(delimiter, from)) {
            out.add(line.substring(from, i));
            from = i + 1;
        }
        out.add(line.substring(from));
        return out;
    }

    /** Fields separated by runs of spaces or tabs; double quotes group a field that holds spaces. */
    static List<String> splitWhitespace(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean inQuotes = false;
        boolean inField = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (inQuotes) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    inQuotes = false;
                } else {
                    field.append(c);
                }
            } else if (c == ' ' || c == '\t') {
                if (inField) {
                    add(out, field.toString());
                    field.setLength(0);
                    inField = false;
                }
            } else if (c == '"') {
                inQuotes = true;
                inField = true;
            } else {
                field.append(c);
                inField = true;
            }
        }
        if (inField) {
            add(out, field.toString());
        }
        if (out.isEmpty()) {
            out.add("");
        }
        return out;
    }

    /** Adds a field; a bracketed unit ({@code [mm/s]}, {@code (g)}) stays with the name before it. */
    private static void add(List<String> out, String f) {
        if (!out.isEmpty() && (f.startsWith("[") || f.startsWith("(")) && !out.get(out.size() - 1).isEmpty()) {
            out.set(out.size() - 1, out.get(out.size() - 1) + " " + f);
        } else {
            out.add(f);
        }
    }

    /**
     * The index in {@code line} where field {@code field} (0-based) begins, as {@link #split} counts
     * fields (a doubled quote inside quotes toggles twice, which changes nothing); -1 when there are
     * fewer fields. For whitespace-aligned columns a field begins at its first non-blank character.
     */
    static int fieldStart(String line, char delimiter, int field) {
        boolean ws = delimiter == Dialect.WHITESPACE;
        boolean inQuotes = false;
        int seen = ws ? -1 : 0;
        boolean inField = false;
        if (!ws && field == 0) {
            return 0;
        }
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '"') {
                inQuotes = !inQuotes;
            }
            if (inQuotes && c != '"') {
                continue;
            }
            if (ws) {
                boolean blank = !inQuotes && (c == ' ' || c == '\t');
                if (!blank && !inField && ++seen == field) {
                    return i;
                }
                inField = !blank;
            } else if (!inQuotes && c == delimiter && ++seen == field) {
                return i + 1;
            }
        }
        return -1;
    }

    /** Number of double quotes in {@code s}: odd means a quoted field continues on the next line. */
    static int quotes(CharSequence s) {
        if (s instanceof String str) {
            int n = 0;
            for (int i = str.indexOf('"'); i >= 0; i = str.indexOf('"', i + 1)) {
                n++;
            }
            return n;
        }
        int n = 0;
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) == '"') {
                n++;
            }
        }
        return n;
    }
}
