package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.ansi.UnixTerminal;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.riffle.log.Recording;

/**
 * The terminal screen: opens Lanterna's text terminal on standard input and output (never a Swing
 * window, whatever {@code DISPLAY} says), runs the screen until the technician quits, and always
 * restores the terminal: on quit, on Ctrl-C (read as a key, handled here), and on SIGTERM or hang-up
 * (Lanterna's own shutdown hook restores the terminal settings; the desk's draft autosave keeps the
 * comments).
 *
 * <p>The screen's thread is the caller's. One more thread reads keys (Lanterna's input side only) and
 * posts them to the screen's queue; analysis and note saving run on their own threads and post too.
 */
public final class TriageScreen {
    /** How the screen ended. */
    public enum Ending {
        /** The technician quit. */
        QUIT,
        /** Ctrl-C or the end of input (hang-up): the draft was saved when comments were unsaved. */
        INTERRUPTED
    }

    /** Exit status of a Ctrl-C before the screen opened: 128 + SIGINT, as a shell reports it. */
    static final int INTERRUPTED_STATUS = 130;

    private TriageScreen() {
    }


    /**
     * The process's terminal, taken on a thread of its own while the logs are read (setting its modes
     * runs a process, which takes a while on a slow machine), with its keys read from then on. A Ctrl-C
     * before the screen opens stops riffle at once: the terminal is restored and the process exits with
     * status 130, since nothing has been typed that could be lost. {@link #close} restores the terminal
     * when the screen never opened (a log could not be read).
     *
     * <p>Thread-safe.
     */
    public static final class Tty implements AutoCloseable {
        private final Thread taker;
        private final Object lock = new Object();
        private final List<KeyStroke> early = new ArrayList<>();
        private UnixTerminal terminal;
        private IOException failure;
        private Consumer<KeyStroke> keys;
        private boolean opened;

        private Tty(Charset charset) {
            taker = new Thread(() -> take(charset), "riffle-tty");
            taker.setDaemon(true);
            taker.start();
        }

        private void take(Charset charset) {
            try {
                UnixTerminal t = new TtyTerminal(charset);
                t.getTerminalSize(); // asked now, while the log is read, and kept (see TtyTerminal)
                synchronized (lock) {
                    terminal = t;
                }
                startKeyReader(t, this::key);
            } catch (IOException | RuntimeException e) {
                synchronized (lock) {
                    failure = e instanceof IOException io ? io : new IOException("cannot set up the terminal: " + e, e);
                }
            }
        }

        private void key(KeyStroke k) {
            Consumer<KeyStroke> to;
            UnixTerminal abandon = null;
            synchronized (lock) {
                to = keys;
                if (to == null) {
                    if (k.getKeyType() == KeyType.Character && k.isCtrlDown() && k.getCharacter() == 'c') {
                        abandon = terminal;
                    } else {
                        early.add(k);
                        return;
                    }
                }
            }
            if (abandon != null) {
                restore(abandon);
                System.exit(INTERRUPTED_STATUS);
            }
            to.accept(k);
        }

        /** The terminal, once taken (waits for it). */
        UnixTerminal terminal() throws IOException, InterruptedException {
            taker.join();
            synchronized (lock) {
                if (failure != null) {
                    throw failure;
                }
                return terminal;
            }
        }

        /**
         * Hands the terminal to the screen: keys go to {@code to} from now on, those typed before first,
         * and restoring the terminal is the screen's job.
         */
        void handOver(Consumer<KeyStroke> to) {
            synchronized (lock) {
                opened = true;
                early.forEach(to);
                early.clear();
                keys = to;
            }
        }

        /** Restores the terminal if the screen never opened on it; else nothing (the screen restores it). */
        @Override
        public void close() {
            try {
                taker.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            synchronized (lock) {
                if (!opened && terminal != null) {
                    restore(terminal);
                }
            }
        }

        private static void restore(UnixTerminal t) {
            try {
                t.close();
            } catch (IOException | RuntimeException e) {
                // Lanterna's shutdown hook tries again on exit
            }
        }
    }

    /**
     * Starts taking the process's terminal for a screen drawn in ASCII or UTF-8.
     *
     * @param ascii true to draw with ASCII only ({@link ScreenOptions#ascii()})
     */
    public static Tty take(boolean ascii) {
        return new Tty(charset(ascii));
    }

    /** The terminal's character set for a screen drawn in ASCII or UTF-8. */
    static Charset charset(boolean ascii) {
        return ascii ? StandardCharsets.US_ASCII : StandardCharsets.UTF_8;
    }

    /**
     * Runs the screen on the process's terminal until the technician quits.
     *
     * @param tty the terminal, from {@link #take} with the same ASCII choice as {@code options}
     * @param recordings the logs, in the order named
     * @param options drawing options (see {@link ScreenOptions#fromEnvironment})
     * @param desk makes the desk where notes and drafts go; called on a thread of its own once the first
     *     frame is out (see {@link LateDesk}), and the desk is closed when the screen ends
     * @throws IOException when the terminal cannot be driven
     */
    public static Ending open(Tty tty, List<Recording> recordings, ScreenOptions options,
                              Supplier<? extends NoteDesk> desk) throws IOException, InterruptedException {
        UnixTerminal terminal = tty.terminal();
        TerminalScreen screen = new TerminalScreen(terminal);
        LateDesk late = new LateDesk(desk);
        ScreenLoop loop = ScreenLoop.withLateDesk(screen, recordings, options, late);
        tty.handOver(k -> loop.post(new Event.Key(k)));
        FrameLog.fromEnvironment(System.getenv()).ifPresent(log -> loop.onFrame(keys -> log.frame(loop.settled())));
        try {
            screen.startScreen();
            terminal.addResizeListener((t, size) -> loop.post(new Event.Resized()));
            Controller.Outcome o = loop.run();
            return o == Controller.Outcome.QUIT ? Ending.QUIT : Ending.INTERRUPTED;
        } finally {
            loop.close();
            try {
                screen.stopScreen();
            } finally {
                try {
                    terminal.close();
                } finally {
                    late.close();
                }
            }
        }
    }

    private static void startKeyReader(UnixTerminal terminal, Consumer<KeyStroke> to) {
        Thread t = new Thread(() -> {
            try {
                while (true) {
                    KeyStroke k = terminal.readInput();
                    if (k == null) {
                        continue;
                    }
                    to.accept(k);
                    if (k.getKeyType() == KeyType.EOF) {
                        return;
                    }
                }
            } catch (IOException | RuntimeException e) {
                to.accept(new KeyStroke(KeyType.EOF));
            }
        }, "riffle-keys");
        t.setDaemon(true);
        t.start();
    }
}
