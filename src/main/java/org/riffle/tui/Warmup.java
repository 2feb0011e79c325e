package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.ansi.ANSITerminal;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.Charset;
import java.util.List;
import java.util.Map;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;

/**
 * Gets the screen's code ready while the logs are read: on a daemon thread, draws one frame of a small
 * invented recording on a {@link DryTerminal}, which loads the screen's classes (and Lanterna's) and
 * runs its drawing and terminal-output code on the second core instead of after reading, before the
 * first real frame. Nothing is shown and nothing is kept. Stateless.
 */
public final class Warmup {
    private Warmup() {
    }

    /**
     * Starts the warm-up for a screen drawn in ASCII or not; the returned thread ends by itself (it is a
     * daemon and may be ignored).
     */
    public static Thread start(boolean ascii) {
        Thread t = new Thread(() -> run(ascii), "riffle-screen-warmup");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
        return t;
    }

    private static void run(boolean ascii) {
        float[] x = new float[600];
        for (int i = 0; i < x.length; i++) {
            x[i] = (float) Math.sin(0.05 * i);
        }
        Recording r = new Recording(new SourceFacts("warm-up", 0, "none", "UTF-8", List.of(), List.of()),
                TimeBase.regular(x.length, 1.0, null), List.of(new Channel("warm-up", "", x)), List.of(),
                List.of());
        try {
            Charset charset = TriageScreen.charset(ascii);
            TerminalScreen screen = new TerminalScreen(new DryTerminal(charset, new TerminalSize(120, 40)));
            screen.startScreen();
            ScreenLoop loop = new ScreenLoop(screen, List.of(r), ScreenOptions.fromEnvironment(
                    Map.of("LANG", "C.UTF-8"), ascii), new ScreenProbe.NoDesk());
            loop.drawFirstFrame();
            loop.close();
        } catch (Exception | LinkageError e) {
            // a warm-up that fails costs nothing but the time it saved; the real screen reports its own errors
        }
    }

    /**
     * An ANSI terminal of a fixed size that reads nothing and writes into nothing, through the same
     * Lanterna code and output buffer as {@link TtyTerminal}: what the warm-up draws on.
     */
    static final class DryTerminal extends ANSITerminal {
        private final TerminalSize size;
    
        DryTerminal(Charset charset, TerminalSize size) {
            super(InputStream.nullInputStream(), new TtyTerminal.Output(OutputStream.nullOutputStream()), charset);
            this.size = size;
            }

        /** As {@link TtyTerminal} does. */
        @Override
        protected byte[] translateCharacter(char c) {
            byte[] b = CellBytes.of(c, getCharset());
            return b != null ? b : super.translateCharacter(c);
        }

        /** The fixed size: there is no terminal to ask. */
        @Override
        protected TerminalSize findTerminalSize() {
            return size;
        }
    }
}
