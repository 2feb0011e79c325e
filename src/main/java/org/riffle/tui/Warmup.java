package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.util.List;
import java.util.Map;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;

/**
 * Gets the screen's code ready while the logs are read: on a daemon thread, draws one frame of a small
 * invented recording on a virtual terminal, which loads the screen's classes (and Lanterna's) on the
 * second core instead of after reading, before the first real frame. Nothing is shown and nothing is
 * kept. Stateless.
 */
public final class Warmup {
    private Warmup() {
    }

    /** Starts the warm-up; the returned thread ends by itself (it is a daemon and may be ignored). */
    public static Thread start() {
        Thread t = new Thread(Warmup::run, "riffle-screen-warmup");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
        return t;
    }

    private static void run() {
        float[] x = new float[600];
        for (int i = 0; i < x.length; i++) {
            x[i] = (float) Math.sin(0.05 * i);
        }
        Recording r = new Recording(new SourceFacts("warm-up", 0, "none", "UTF-8", List.of(), List.of()),
                TimeBase.regular(x.length, 1.0, null), List.of(new Channel("warm-up", "", x)), List.of(),
                List.of());
        try {
            TerminalScreen screen = new TerminalScreen(new DefaultVirtualTerminal(new TerminalSize(120, 40)));
            screen.startScreen();
            ScreenLoop loop = new ScreenLoop(screen, List.of(r), ScreenOptions.fromEnvironment(
                    Map.of("LANG", "C.UTF-8"), false), new ScreenProbe.NoDesk());
            loop.render();
            loop.close();
        } catch (Exception | LinkageError e) {
            // a warm-up that fails costs nothing but the time it saved; the real screen reports its own errors
        }
    }
}
