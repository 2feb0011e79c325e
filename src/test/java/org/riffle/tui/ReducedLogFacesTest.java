package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.log.Reduction;
import org.riffle.note.Findings;
import org.riffle.note.NoteWriter;
import org.riffle.triage.Assessment;

/**
 * A log read in reduced form (a memory budget far below its size) says so on the screen's header, on an
 * 80-column screen too, and in the findings note, each in one statement that names the heap option to
 * read it whole; the note's row count gives both the log's rows and the rows kept.
 */
class ReducedLogFacesTest {
    static Recording reduced(Path dir) throws IOException, org.riffle.log.LogException {
        Path f = dir.resolve("long-run.csv");
        StringBuilder sb = new StringBuilder("time,flow,temp\n");
        for (int i = 0; i < 12_000; i++) {
            sb.append(String.format(Locale.ROOT, "2026-03-01T%02d:%02d:%02dZ,%.3f,%.2f%n", i / 3600, i / 60 % 60,
                    i % 60, 40 + 2 * Math.sin(i / 9.0), 55 + Math.cos(i / 13.0)));
        }
        Files.writeString(f, sb);
        return LogReader.read(f, ReadOptions.defaults().withMemoryBytes(80_000));
    }

    @Test
    void theHeaderAndTheNoteSayTheLogWasReduced(@TempDir Path dir) throws Exception {
        Recording rec = reduced(dir);
        Reduction red = rec.source().reduction().orElseThrow(() -> new AssertionError("not reduced"));
        assertEquals(12_000, red.rows());
        for (int cols : new int[] {80, 160}) {
            DefaultVirtualTerminal terminal = new DefaultVirtualTerminal(new TerminalSize(cols, 30));
            TerminalScreen screen = new TerminalScreen(terminal);
            screen.startScreen();
            ScreenLoop loop = new ScreenLoop(screen, List.of(rec), new ScreenOptions(false, false, 1),
                    new VirtualScreen.RecordingDesk());
            loop.render();
            StringBuilder row1 = new StringBuilder();
            for (int c = 0; c < cols; c++) {
                row1.append(terminal.getCharacter(c, 1).getCharacterString());
            }
            assertTrue(row1.toString().startsWith("log: long-run.csv  REDUCED to fit memory (java -Xmx2g reads it"
                    + " whole)"), cols + " columns: " + row1);
            if (cols == 160) {
                assertTrue(row1.toString().contains("analysed rows 0-" + String.format(Locale.ROOT, "%,d",
                        red.head() - 1) + " and "), row1.toString());
                loop.controller.startAll();
                long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
                while (loop.controller.s.sources.get(0).running()) {
                    assertTrue(System.nanoTime() < end, "analysis did not finish in 120 s");
                    loop.step(TimeUnit.MILLISECONDS.toNanos(50));
                }
                Assessment a = loop.controller.s.sources.get(0).assessment().orElseThrow();
                String note = NoteWriter.standard().render(a, Findings.EMPTY);
                String flat = note.replaceAll("\\s+", " ");
                assertTrue(flat.contains("long-run.csv: REDUCED to fit memory: the 12,000 rows (1 MiB of samples) and their"
                        + " analysis need about"),
                        note);
                assertTrue(flat.contains("to read it whole: java -Xmx2g -jar riffle.jar"), note);
                assertTrue(flat.contains("12000 rows, of which " + rec.rows() + " were kept and analysed"), note);
                assertTrue(note.indexOf("REDUCED") < note.indexOf("SOURCE FILES"), "said at a glance, up front");
            }
            screen.stopScreen();
        }
    }
}
