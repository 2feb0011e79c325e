package org.riffle.log;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a delimited text log: takes the first {@link #HEAD} bytes (more, up to the longest line allowed,
 * until they hold {@link #HEAD_LINES} lines: a log of thousands of columns) to choose the encoding and
 * sniff the layout, then streams every line once through a {@link TablePass} and hands the columns to
 * {@link Assembler}.
 *
 * <p>Stateless and thread-safe.
 */
final class TextReader {
    /** Bytes looked at before reading, at first: enough for hundreds of lines of an ordinary log. */
    static final int HEAD = 1 << 18;
    /** Complete lines the head must hold (preamble, header, units, data rows), read on for wide logs. */
    static final int HEAD_LINES = 16;
    /** Most bytes looked at before reading: one more than the longest line allowed. */
    static final int MAX_HEAD = LineReader.MAX_LINE + 1;
    private static final int BUFFER = 1 << 20;

    private TextReader() {
    }

    static Recording read(Source src, ReadOptions opt, boolean allGeneral) throws LogException {
        byte[] head;
        boolean whole;
        try {
            head = src.in.readNBytes(HEAD);
            whole = head.length < HEAD;
            while (!whole && head.length < MAX_HEAD && newlines(head, HEAD_LINES) < HEAD_LINES) {
                int want = Math.min(MAX_HEAD, 2 * head.length) - head.length;
                byte[] more = src.in.readNBytes(want);
                whole = more.length < want;
                byte[] grown = java.util.Arrays.copyOf(head, head.length + more.length);
                System.arraycopy(more, 0, grown, head.length, more.length);
                head = grown;
            }
        } catch (IOException e) {
            throw failure(src, e, 0);
        }
        Encodings.Choice enc = Encodings.choose(src.name, head, head.length, opt.charset(), whole);
        Charset cs = enc.charset();
        if (whole && head.length == enc.bomLength() && enc.bomLength() > 0) {
            throw new LogException(src.name, 0, 0, "empty file (only a UTF-8 byte-order mark)");
        }
        List<String> lines = headLines(src.name, head, enc.bomLength(), cs, whole,
                opt.charset().isPresent() && cs.equals(StandardCharsets.UTF_8), opt.skipRows().orElse(0));
        if (lines.isEmpty() && !whole) {
            throw new LogException(src.name, 1, 0, "line 1 is longer than " + LineReader.MAX_LINE
                    + " bytes: not a delimited text log (binary data, or no line breaks?)");
        }
        Layout layout = Sniffer.sniff(src.name, lines, opt, whole);
        long budget = MemoryBudget.of(opt);
        int values = layout.valueColumns();
        int blocks = Blocks.capacityFor(budget, values);
        long blockBytes = (long) blocks * values * Blocks.BYTES_PER_BLOCK;
        int rowCap = MemoryBudget.rowCap(budget, blockBytes, values, Columns.MAX_ROWS);
        int keep = MemoryBudget.keepCap(budget, blockBytes, values, rowCap);
        TablePass pass = new TablePass(src.name, layout, cs, capacity(src, head, whole), allGeneral,
                rowCap, keep, blocks);
        InputStream body = new SequenceInputStream(
                new ByteArrayInputStream(head, enc.bomLength(), head.length - enc.bomLength()), src.in);
        LineReader in = new LineReader(body, BUFFER);
        try {
            pass.run(in);
            pass.finish();
        } catch (LineReader.LineTooLong e) {
            throw new LogException(src.name, e.line, 0, "line is longer than " + LineReader.MAX_LINE
                    + " bytes: not a delimited text log (binary data, or no line breaks?)");
        } catch (IOException e) {
            throw failure(src, e, in.lineNumber());
        }
        return Assembler.build(src, layout, pass, cs, opt, budget);
    }

    /** The number of line feeds in {@code b}, counted up to {@code atMost}. */
    private static int newlines(byte[] b, int atMost) {
        int n = 0;
        for (int i = 0; i < b.length && n < atMost; i++) {
            n += b[i] == '\n' ? 1 : 0;
        }
        return n;
    }

    private static LogException failure(Source src, IOException e, long line) {
        String where = line > 0 ? " (after line " + line + ")" : "";
        return new LogException(src.name, 0, 0, e instanceof Source.Damaged ? e.getMessage() + where
                : "cannot read" + where + ": " + e.getMessage());
    }

    /**
     * The complete lines of the head, decoded, as far as the sniffer looks: to the end of the
     * {@link Sniffer#MAX_LINES}-th content line from line {@code skip + 1} on, counted as
     * {@link Sniffer#joinQuoted} counts (a quoted field spanning lines makes one line). When UTF-8 was
     * asked for, every complete line of the head is checked.
     */
    static List<String> headLines(String file, byte[] head, int from, Charset cs, boolean whole,
                                  boolean strictUtf8, int skip) throws LogException {
        List<String> out = new ArrayList<>();
        int content = 0;
        boolean inQuotes = false;
        boolean enough = false;
        long lineNo = 0;
        int s = from;
        for (int i = from; i <= head.length; i++) {
            boolean last = i == head.length;
            if (last && (!whole || s == head.length)) {
                break;
            }
            if (last || head[i] == '\n') {
                int e = i > s && head[i - 1] == '\r' ? i - 1 : i;
                lineNo++;
                if (strictUtf8) {
                    int bad = Encodings.firstBadUtf8(head, s, e);
                    if (bad >= 0) {
                        long column = new String(head, s, bad - s, cs).length() + 1;
                        throw new LogException(file, lineNo, column, "byte " + Encodings.hex(head[bad])
                                + " is not valid UTF-8; try --encoding windows-1252");
                    }
                } else if (enough) {
                    break;
                }
                if (!enough) {
                    String line = new String(head, s, e - s, cs);
                    if (!inQuotes && out.size() >= skip && !Sniffer.isBlankOrComment(line)) {
                        content++;
                    }
                    inQuotes ^= (Splitter.quotes(line) & 1) == 1;
                    out.add(line);
                    enough = content >= Sniffer.MAX_LINES && !inQuotes;
                }
                s = i + 1;
            }
        }
        return out;
    }

    /** Rows to allocate at first: from the file size and the head's bytes per line, else a small start. */
    private static int capacity(Source src, byte[] head, boolean whole) {
        int headLines = newlines(head, Integer.MAX_VALUE);
        if (whole) {
            return headLines + 1;
        }
        if (src.gzipped || src.sizeBytes <= 0 || headLines == 0) {
            return 1 << 12;
        }
        double perLine = head.length / (double) headLines;
        return (int) Math.min(1 << 28, src.sizeBytes / perLine * 1.02 + 64);
    }
}
