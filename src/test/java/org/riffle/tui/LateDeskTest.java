package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.note.Findings;

/**
 * The note desk made after the first frame: the frame does not wait for it, keys do (so an earlier
 * draft is still offered before any key acts), Ctrl-C does not, and a desk that cannot be made is
 * reported on the screen and when a note is saved.
 */
class LateDeskTest {
    @TempDir
    static Path dir;
    static Path log;

    private final CountDownLatch release = new CountDownLatch(1);
    private DefaultVirtualTerminal terminal;
    private ScreenLoop loop;
    private LateDesk late;

    @BeforeAll
    static void writeLog() throws Exception {
        log = DemoCsv.write(dir.resolve("fan-room.csv"), 600);
    }

    @AfterEach
    void tearDown() {
        release.countDown();
        if (loop != null) {
            loop.close();
        }
        if (late != null) {
            late.close();
        }
    }

    /** Opens the screen on a desk that {@code maker} makes; draws the first frame and starts it. */
    private void open(Supplier<NoteDesk> maker) throws Exception {
        terminal = new DefaultVirtualTerminal(new TerminalSize(80, 24));
        TerminalScreen screen = new TerminalScreen(terminal);
        screen.startScreen();
        late = new LateDesk(maker);
        loop = ScreenLoop.withLateDesk(screen, List.of(LogReader.read(log, ReadOptions.defaults())),
                new ScreenOptions(false, false, 1), late);
        loop.start();
    }

    /** A maker that waits for {@link #release}, then hands over {@code desk}. */
    private Supplier<NoteDesk> heldBack(NoteDesk desk) {
        return () -> {
            try {
                release.await(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return desk;
        };
    }

    /** Steps the loop until the desk has been made (or failed) and its event applied. */
    private void waitForDesk() throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
        while (System.nanoTime() < end) {
            loop.step(TimeUnit.MILLISECONDS.toNanos(20));
            if (loop.deskArrived()) {
                return;
            }
        }
        throw new AssertionError("the desk was not made in 30 s");
    }

    private void press(KeyStroke k) throws Exception {
        loop.post(new Event.Key(k));
        loop.step(0);
    }

    private String line(int r) {
        StringBuilder sb = new StringBuilder();
        for (int c = 0; c < terminal.getTerminalSize().getColumns(); c++) {
            sb.append(terminal.getCharacter(c, r).getCharacterString());
        }
        return sb.toString().stripTrailing();
    }

    @Test
    void keysWaitForTheDeskAndItsDraftIsOfferedBeforeThemAll() throws Exception {
        VirtualScreen.RecordingDesk desk = new VirtualScreen.RecordingDesk();
        Findings earlier = Findings.EMPTY.withGeneral("left from before");
        desk.earlier = Optional.of(earlier);
        open(heldBack(desk));
        assertEquals(Chrome.CAUTION_SHORT, line(0), "the first frame is out while the desk is being made");

        press(new KeyStroke('r', false, false));
        press(new KeyStroke('j', false, false));
        assertEquals(Findings.EMPTY, loop.controller.s.remarks.entries(), "no key acts before the desk");
        assertEquals(0, loop.controller.s.selected);

        release.countDown();
        waitForDesk();
        assertEquals(earlier, loop.controller.s.remarks.entries(), "the draft was offered, then 'r' restored it");
        assertEquals(1, loop.controller.s.selected, "then 'j' moved down");
        assertEquals(earlier, desk.latest, "the desk has the restored entries as its draft");
    }

    @Test
    void noHeldKeyActsAfterOneThatEndedTheScreen() throws Exception {
        open(heldBack(new VirtualScreen.RecordingDesk()));
        press(new KeyStroke('q', false, false)); // nothing typed: quits at once
        press(new KeyStroke('C', false, false)); // would open the general comment
        release.countDown();
        waitForDesk();
        assertEquals(Controller.Outcome.QUIT, loop.controller.outcome());
        assertNull(loop.controller.s.prompt, "the key after the quit was not applied");
    }

    @Test
    void ctrlCDoesNotWaitForTheDesk() throws Exception {
        open(heldBack(new VirtualScreen.RecordingDesk()));
        press(new KeyStroke('c', true, false));
        assertEquals(Controller.Outcome.INTERRUPTED, loop.controller.outcome());
    }

    @Test
    void aDeskThatCannotBeMadeIsReportedAndSavingANoteSaysWhy() throws Exception {
        open(() -> {
            throw new IllegalStateException("no home folder");
        });
        waitForDesk();
        String why = "notes and drafts cannot be saved: no home folder";
        assertEquals(why, line(23));
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (loop.controller.s.sources.stream().anyMatch(Source::running) && System.nanoTime() < end) {
            loop.step(TimeUnit.MILLISECONDS.toNanos(50));
        }
        press(new KeyStroke('s', false, false));
        for (int i = 0; i < 50 && !line(23).startsWith("note not saved"); i++) {
            loop.step(TimeUnit.MILLISECONDS.toNanos(20));
        }
        assertEquals("note not saved: " + why, line(23));
        assertEquals(Optional.of(why), late.saveDraftNow());
    }
}
