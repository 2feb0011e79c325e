package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.terminal.ansi.UnixLikeTerminal.CtrlCBehaviour;
import com.googlecode.lanterna.terminal.ansi.UnixTerminal;
import java.io.BufferedOutputStream;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.Charset;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The process's text terminal: Lanterna's {@link UnixTerminal} on standard input and output, with two
 * changes that matter on an old laptop and over SSH.
 * <ul>
 * <li>Output is buffered until Lanterna flushes (at the end of each frame). {@code System.out} flushes
 *     every write, and Lanterna writes a character at a time, so a 200 × 60 frame was thousands of
 *     system calls (and, over SSH, as many small packets); it is now a few. Lanterna asks the terminal
 *     for the cursor position (to learn its size) without flushing, so that query goes out at once.</li>
 * <li>The size is asked once and kept until the terminal signals a resize, and the screen asks it
 *     while the log is read (see {@link TriageScreen#take}).</li>
 * <li>Characters are turned into bytes directly ({@link CellBytes}), not through an encoder each.</li>
 * <li>The terminal modes are set with one {@code stty} run instead of four (each run is a process,
 *     tens of milliseconds on a slow machine): no canonical input, reads of one byte, no echo, and no
 *     interrupt character (Ctrl-C arrives as a key, which the screen handles). They are undone, with
 *     everything else, by restoring the settings saved with {@code stty -g} before.</li>
 * </ul>
 * Confined to the screen's threads as Lanterna's terminal is.
 */
final class TtyTerminal extends UnixTerminal {
    /** The size the terminal last reported, until it signals a resize; null when it must be asked. */
    private volatile TerminalSize known;
    /** Counts resize signals, so that an answer to a question asked before one is not kept. */
    private final AtomicInteger resizes = new AtomicInteger();

    TtyTerminal(Charset charset) throws IOException {
        super(System.in, new Output(new FileOutputStream(FileDescriptor.out)), charset, CtrlCBehaviour.TRAP);
    }

    /**
     * The terminal's size: asked once (a round trip to the terminal, over SSH a network one) and kept
     * until the terminal signals a resize. Lanterna asks on every call, twice before a first frame.
     */
    @Override
    protected TerminalSize findTerminalSize() throws IOException {
        TerminalSize k = known;
        if (k != null) {
            return k;
        }
        int before = resizes.get();
        TerminalSize asked = super.findTerminalSize();
        if (resizes.get() == before) {
            known = asked;
        }
        return asked;
    }

    /** Forgets the kept size when the terminal signals a resize, then lets Lanterna ask again. */
    @Override
    protected void registerTerminalResizeListener(Runnable onResize) throws IOException {
        super.registerTerminalResizeListener(() -> {
            resizes.incrementAndGet();
            known = null;
            onResize.run();
        });
    }

    /** A character's bytes without an encoder per character (see {@link CellBytes}). */
    @Override
    protected byte[] translateCharacter(char c) {
        byte[] b = CellBytes.of(c, getCharset());
        return b != null ? b : super.translateCharacter(c);
    }

    @Override
    protected void canonicalMode(boolean enabled) throws IOException {
        if (enabled) {
            super.canonicalMode(true);
        } else {
            runSTTYCommand("-icanon", "min", "1", "-echo", "intr", "undef");
        }
    }

    /** Echo is switched off with the other modes and back on by restoring the saved settings. */
    @Override
    protected void keyEchoEnabled(boolean enabled) {
        // see canonicalMode and restoreTerminalSettings
    }

    /** The interrupt character is switched off with the other modes and back on by restoring the saved settings. */
    @Override
    protected void keyStrokeSignalsEnabled(boolean enabled) {
        // see canonicalMode and restoreTerminalSettings
    }

    /** Buffered terminal output that sends a cursor-position query (ESC [ 6 n) at once. */
    static final class Output extends BufferedOutputStream {
        Output(OutputStream out) {
            super(out, 1 << 16);
        }

        @Override
        public synchronized void write(byte[] b, int off, int len) throws IOException {
            super.write(b, off, len);
            if (len >= 3 && b[off + len - 3] == '[' && b[off + len - 2] == '6' && b[off + len - 1] == 'n') {
                flush();
            }
        }
    }
}
