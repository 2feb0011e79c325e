package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.note.Findings;
import org.riffle.triage.Assessment;

/**
 * The screen on Lanterna's virtual terminal, driven from the test thread (which plays the UI thread):
 * keys are posted and one loop step applied; the analysis runs on its real threads and is waited for.
 */
final class VirtualScreen {
    final DefaultVirtualTerminal terminal;
    final TerminalScreen screen;
    final ScreenLoop loop;
    final RecordingDesk desk = new RecordingDesk();

    VirtualScreen(List<Path> logs, int cols, int rows, boolean ascii) throws IOException, LogException {
        this(logs, cols, rows, ascii, Optional.empty());
    }

    /** As above, with a draft of an earlier session on offer. */
    VirtualScreen(List<Path> logs, int cols, int rows, boolean ascii, Optional<Findings> earlier)
            throws IOException, LogException {
        desk.earlier = earlier;
        terminal = new DefaultVirtualTerminal(new TerminalSize(cols, rows));
        screen = new TerminalScreen(terminal);
        screen.startScreen();
        List<Recording> recs = new ArrayList<>();
        for (Path p : logs) {
            recs.add(LogReader.read(p, ReadOptions.defaults()));
        }
        loop = new ScreenLoop(screen, recs, new ScreenOptions(ascii, false, Runtime.getRuntime().availableProcessors()), desk);
        loop.render();
    }

    /** Starts the analysis and waits (at most 60 s) until every log is assessed; then draws. */
    VirtualScreen analysed() throws Exception {
        loop.controller.startAll();
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (loop.controller.s.sources.stream().anyMatch(Source::running)) {
            if (System.nanoTime() > end) {
                throw new AssertionError("analysis did not finish in 60 s");
            }
            loop.step(TimeUnit.MILLISECONDS.toNanos(50));
        }
        loop.step(0);
        return this;
    }

    /** Types each character of {@code keys} (one step each). */
    VirtualScreen type(String keys) throws Exception {
        for (char c : keys.toCharArray()) {
            press(c == '\n' ? new KeyStroke(KeyType.Enter) : new KeyStroke(c, false, false));
        }
        return this;
    }

    VirtualScreen press(KeyType type) throws Exception {
        return press(new KeyStroke(type));
    }

    VirtualScreen press(KeyStroke k) throws Exception {
        loop.post(new Event.Key(k));
        loop.step(0);
        return this;
    }

    /** Resizes the terminal and lets the screen notice. */
    VirtualScreen resize(int cols, int rows) throws Exception {
        terminal.setTerminalSize(new TerminalSize(cols, rows));
        loop.post(new Event.Resized());
        loop.step(0);
        return this;
    }

    /** Waits for a background note save to be reported. */
    VirtualScreen settle(long millis) throws Exception {
        long end = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(millis);
        while (System.nanoTime() < end) {
            loop.step(TimeUnit.MILLISECONDS.toNanos(20));
        }
        return this;
    }

    /** Row {@code r} of the visible screen as text, trailing blanks removed. */
    String line(int r) {
        StringBuilder sb = new StringBuilder();
        TerminalSize size = terminal.getTerminalSize();
        for (int c = 0; c < size.getColumns(); c++) {
            sb.append(terminal.getCharacter(c, r).getCharacterString());
        }
        return sb.toString().stripTrailing();
    }

    /** The whole visible screen, one line per row. */
    String text() {
        StringBuilder sb = new StringBuilder();
        for (int r = 0; r < terminal.getTerminalSize().getRows(); r++) {
            sb.append(line(r)).append('\n');
        }
        return sb.toString();
    }

    /** A note desk that keeps what it was given, in memory. */
    static final class RecordingDesk implements NoteDesk {
        final List<Findings> notes = new ArrayList<>();
        final List<Findings> drafts = new ArrayList<>();
        Findings latest = Findings.EMPTY;
        Optional<Findings> earlier = Optional.empty();

        @Override
        public synchronized Path saveNote(List<Assessment> assessments, Findings f) {
            notes.add(f);
            return Path.of("/tmp/findings-" + notes.size() + ".txt");
        }

        @Override
        public synchronized void draft(Findings f) {
            latest = f;
        }

        @Override
        public synchronized Optional<String> saveDraftNow() {
            drafts.add(latest);
            return Optional.empty();
        }

        @Override
        public Optional<Findings> restorable() {
            return earlier;
        }

        @Override
        public void close() {
        }
    }
}
