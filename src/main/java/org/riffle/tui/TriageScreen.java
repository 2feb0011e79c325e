package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.ansi.UnixTerminal;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.List;
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

    private TriageScreen() {
    }

    /** True when standard input and output are both a terminal (the screen needs both). */
    public static boolean hasTerminal() {
        return System.console() != null;
    }

    /**
     * Runs the screen on the process's terminal until the technician quits.
     *
     * @param recordings the logs, in the order named
     * @param options drawing options (see {@link ScreenOptions#fromEnvironment})
     * @param desk where notes and drafts go
     * @throws IOException when the terminal cannot be driven
     */
    public static Ending open(List<Recording> recordings, ScreenOptions options, NoteDesk desk)
            throws IOException, InterruptedException {
        Charset cs = options.ascii() ? StandardCharsets.US_ASCII : StandardCharsets.UTF_8;
        UnixTerminal terminal = new TtyTerminal(cs);
        TerminalScreen screen = new TerminalScreen(terminal);
        ScreenLoop loop = new ScreenLoop(screen, recordings, options, desk);
        FrameLog.fromEnvironment(System.getenv()).ifPresent(log -> loop.onFrame(keys -> log.frame(loop.settled())));
        try {
            screen.startScreen();
            terminal.addResizeListener((t, size) -> loop.post(new Event.Resized()));
            startKeyReader(terminal, loop);
            Controller.Outcome o = loop.run();
            return o == Controller.Outcome.QUIT ? Ending.QUIT : Ending.INTERRUPTED;
        } finally {
            loop.close();
            try {
                screen.stopScreen();
            } finally {
                terminal.close();
            }
        }
    }

    private static void startKeyReader(UnixTerminal terminal, ScreenLoop loop) {
        Thread t = new Thread(() -> {
            try {
                while (true) {
                    KeyStroke k = terminal.readInput();
                    if (k == null) {
                        continue;
                    }
                    loop.post(new Event.Key(k));
                    if (k.getKeyType() == KeyType.EOF) {
                        return;
                    }
                }
            } catch (IOException | RuntimeException e) {
                loop.post(new Event.Key(new KeyStroke(KeyType.EOF)));
            }
        }, "riffle-keys");
        t.setDaemon(true);
        t.start();
    }
}
