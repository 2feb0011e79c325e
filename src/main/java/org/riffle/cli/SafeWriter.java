package org.riffle.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;
import org.riffle.log.Printable;

/**
 * The last guard before standard output and standard error: every character that could drive a
 * terminal (C0 other than tab, CR and LF; DEL; C1; bidirectional and other format characters) is
 * written in the visible, inert spelling of {@link Printable#clean}, so a channel name or a cell from a
 * hostile log cannot clear the screen, retitle the window or hide text, whichever command prints it.
 * Surrogate pairs pass through whole (a lone surrogate is left to the encoder, which writes {@code ?}).
 *
 * <p>Not thread-safe on its own; wrapped in a {@link java.io.PrintWriter}, which locks.
 */
final class SafeWriter extends FilterWriter {
    SafeWriter(Writer out) {
        super(out);
    }

    @Override
    public void write(int c) throws IOException {
        char ch = (char) c;
        if (ch == '\n' || ch == '\r' || ch == '\t' || Character.isSurrogate(ch)) {
            out.write(ch);
        } else {
            String s = String.valueOf(ch);
            out.write(Printable.isClean(s) ? s : Printable.clean(s));
        }
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        for (int i = off; i < off + len; i++) {
            write(cbuf[i]);
        }
    }

    @Override
    public void write(String str, int off, int len) throws IOException {
        for (int i = off; i < off + len; i++) {
            write(str.charAt(i));
        }
    }
}
