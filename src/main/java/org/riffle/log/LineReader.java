package org.riffle.log;

import java.io.IOException;
import java.io.InputStream;

/**
 * Splits a byte stream into lines without decoding it: LF or CRLF endings, the line terminator not
 * included. After {@link #next()} returns true the line is {@code buffer()[start(), end())}, valid until
 * the next call. Lines longer than {@link #MAX_LINE} bytes are refused, so a file without line breaks
 * cannot exhaust the heap.
 *
 * <p>Mutable; confined to one thread.
 */
final class LineReader {
    /**
     * The longest line read, in bytes: 4 MiB, room for a row or header of 20,000 columns of up to 200
     * bytes each, while a file without line breaks is still refused after reading 4 MiB of it.
     */
    static final int MAX_LINE = 1 << 22;

    private final InputStream in;
    private byte[] buf;
    private int pos;
    private int lim;
    private boolean eof;
    private long line;
    private int start;
    private int end;
    private boolean quote;

    LineReader(InputStream in, int bufferSize) {
        this.in = in;
        this.buf = new byte[Math.max(bufferSize, 1 << 12)];
    }

    /** Thrown when a line exceeds {@link #MAX_LINE}; carries the 1-based line number. */
    static final class LineTooLong extends IOException {
        private static final long serialVersionUID = 1L;
        final long line;

        LineTooLong(long line) {
            super("line " + line + " is longer than " + MAX_LINE + " bytes");
            this.line = line;
        }
    }

    /** Advances to the next line; false at the end of the stream. */
    boolean next() throws IOException {
        int scan = pos;
        quote = false;
        while (true) {
            int nl = indexOfNewline(scan, lim);
            if (nl >= 0) {
                line++;
                start = pos;
                end = nl > pos && buf[nl - 1] == '\r' ? nl - 1 : nl;
                pos = nl + 1;
                return true;
            }
            if (eof) {
                if (pos == lim) {
                    return false;
                }
                line++;
                start = pos;
                end = buf[lim - 1] == '\r' ? lim - 1 : lim;
                pos = lim;
                return true;
            }
            scan = lim - pos;
            fill();
        }
    }

    private int indexOfNewline(int from, int to) {
        byte[] b = buf;
        for (int i = from; i < to; i++) {
            byte c = b[i];
            if (c == '\n') {
                return i;
            }
            if (c == '"') {
                quote = true;
            }
        }
        return -1;
    }

    /** Moves the unread part to the front and reads more; grows the buffer up to the line limit. */
    private void fill() throws IOException {
        int rest = lim - pos;
        if (rest > MAX_LINE) {
            throw new LineTooLong(line + 1);
        }
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, rest);
        } else if (rest == buf.length) {
            byte[] bigger = new byte[Math.min(buf.length * 2, MAX_LINE + 2)];
            System.arraycopy(buf, 0, bigger, 0, rest);
            buf = bigger;
        }
        pos = 0;
        lim = rest;
        int n = in.read(buf, lim, buf.length - lim);
        if (n < 0) {
            eof = true;
        } else {
            lim += n;
        }
    }

    byte[] buffer() {
        return buf;
    }

    int start() {
        return start;
    }

    int end() {
        return end;
    }

    /** True when the current line holds a double quote. */
    boolean quoted() {
        return quote;
    }

    /** 1-based number of the current line. */
    long lineNumber() {
        return line;
    }
}
