package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.riffle.log.Channel;
import org.riffle.log.Printable;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;
import org.riffle.note.Findings;
import org.riffle.note.NoteWriter;
import org.riffle.triage.Assessment;

/**
 * An ANSI escape sequence in a channel name, a unit, a preamble line and the file name, carried all
 * the way through the screen (Lanterna's virtual terminal) and the findings note written from the same
 * assessment: both show the shared neutraliser's inert spelling and no control character at all.
 */
class HostileNamesTest {
    private static final String ESC = "\u001b";
    private static final String NAME = "flow" + ESC + "[2J" + ESC + "]0;owned" + "\u0007";
    private static final String UNIT = "m3/h" + ESC + "[8m";

    private static Recording hostile() {
        int n = 600;
        float[] flow = new float[n];
        float[] temp = new float[n];
        for (int i = 0; i < n; i++) {
            flow[i] = (float) (40 + 2 * Math.sin(i / 9.0));
            temp[i] = (float) (55 + Math.cos(i / 13.0));
        }
        return new Recording(new SourceFacts("skid" + ESC + "[31m.csv", 1234, "csv ','", "UTF-8",
                List.of("Device: " + ESC + "[?1049h logger"), List.of()),
                TimeBase.regular(n, 0.1, Instant.parse("2026-03-04T06:00:00Z")),
                List.of(new Channel(NAME, UNIT, flow), new Channel("temp", "degC", temp)), List.of(), List.of());
    }

    @Test
    void escapeSequencesReachNeitherTheScreenNorTheNote() throws Exception {
        DefaultVirtualTerminal terminal = new DefaultVirtualTerminal(new TerminalSize(120, 30));
        TerminalScreen screen = new TerminalScreen(terminal);
        screen.startScreen();
        ScreenLoop loop = new ScreenLoop(screen, List.of(hostile()), new ScreenOptions(false, false, 1),
                new VirtualScreen.RecordingDesk());
        loop.render();
        loop.controller.startAll();
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (loop.controller.s.sources.get(0).running()) {
            assertTrue(System.nanoTime() < end, "analysis did not finish in 60 s");
            loop.step(TimeUnit.MILLISECONDS.toNanos(50));
        }
        loop.step(0);
        StringBuilder shown = new StringBuilder();
        for (int r = 0; r < 30; r++) {
            for (int c = 0; c < 120; c++) {
                String cell = terminal.getCharacter(c, r).getCharacterString();
                assertTrue(cell.chars().allMatch(ch -> ch >= 0x20 && (ch < 0x7F || ch > 0x9F)),
                        "control character in cell " + c + "," + r);
                shown.append(cell);
            }
            shown.append('\n');
        }
        assertTrue(shown.toString().contains("flow^[[2J"), shown.toString());
        screen.stopScreen();

        Assessment a = loop.controller.s.sources.get(0).assessment().orElseThrow();
        String note = NoteWriter.standard().render(a, Findings.EMPTY);
        assertTrue(note.chars().allMatch(ch -> ch == '\n' || ch >= 0x20 && (ch < 0x7F || ch > 0x9F)),
                "no control character in the note");
        assertTrue(note.contains(Printable.clean(NAME)), note);
        assertTrue(note.contains("^[[?1049h"), "the preamble line, neutralised: " + note);
        assertEquals("flow^[[2J^[]0;owned^G", Printable.clean(NAME), "ECMA-48 ESC and BEL in caret notation");
    }
}
