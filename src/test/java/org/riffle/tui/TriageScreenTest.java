package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.note.Findings;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Thumbnail;
import org.riffle.triage.TriageParams;

/** The screen on Lanterna's virtual terminal: what is shown, and what keys do. */
class TriageScreenTest {
    @TempDir
    static Path dir;
    static Path log;

    @BeforeAll
    static void writeLog() throws Exception {
        log = DemoCsv.write(dir.resolve("pump-skid.csv"), 2000);
    }

    static VirtualScreen open(int cols, int rows) throws Exception {
        return new VirtualScreen(List.of(log), cols, rows, false);
    }

    /** Row of the channel list on which {@code name} appears, -1 when absent. */
    static int rowOf(VirtualScreen v, String name) {
        for (int r = 0; r < v.terminal.getTerminalSize().getRows(); r++) {
            if (v.line(r).startsWith(name + " ", 3)) {
                return r;
            }
        }
        return -1;
    }

    @Test
    void firstFrameListsEveryChannelWithASparklineBeforeTheAnalysisRuns() throws Exception {
        VirtualScreen v = open(80, 24);
        for (String ch : DemoCsv.CHANNELS) {
            int r = rowOf(v, ch);
            assertTrue(r > 0, ch + " missing:\n" + v.text());
            assertTrue(v.line(r).matches(".*[▁▂▃▄▅▆▇█]{10,}.*"), "no sparkline on: " + v.line(r));
            assertTrue(v.line(r).contains("waiting"), "no progress shown: " + v.line(r));
        }
    }

    @Test
    void cautionStaysOnTopAtTheMinimumAndAfterResizes() throws Exception {
        VirtualScreen v = open(80, 24);
        assertEquals(Chrome.CAUTION_SHORT, v.line(0));
        v.resize(120, 40);
        assertTrue(v.line(0).startsWith("! Screening aid only"), v.line(0));
        v.resize(130, 40);
        assertEquals(Chrome.CAUTION_LONG, v.line(0));
        v.resize(80, 24);
        assertEquals(Chrome.CAUTION_SHORT, v.line(0));
        v.type("\n");
        assertEquals(Chrome.CAUTION_SHORT, v.line(0), "detail view");
        v.type("?");
        assertEquals(Chrome.CAUTION_SHORT, v.line(0), "help view");
    }

    @Test
    void belowTheMinimumOnlyTheCautionAndAnEnlargeRequestAreShown() throws Exception {
        VirtualScreen v = open(80, 24).resize(70, 20);
        assertTrue(v.line(0).startsWith("! Screening aid only"), v.line(0));
        assertEquals("Enlarge the window to at least 80x24 (now 70x20).", v.line(1));
        assertTrue(v.text().substring(v.line(0).length() + v.line(1).length() + 2).isBlank(), v.text());
        v.resize(80, 24);
        assertTrue(rowOf(v, DemoCsv.CHANNELS[0]) > 0, v.text());
    }

    @Test
    void navigationKeysMoveTheSelection() throws Exception {
        VirtualScreen v = open(80, 24);
        int first = rowOf(v, DemoCsv.CHANNELS[0]);
        assertTrue(v.line(first).startsWith(">"), v.text());
        v.type("j");
        assertTrue(v.line(first + 1).startsWith(">"), v.text());
        assertFalse(v.line(first).startsWith(">"), v.text());
        v.press(KeyType.ArrowDown);
        assertTrue(v.line(first + 2).startsWith(">"), v.text());
        v.type("k");
        assertTrue(v.line(first + 1).startsWith(">"), v.text());
        v.type("G");
        assertTrue(v.line(first + 3).startsWith(">"), v.text());
        v.press(KeyType.Home);
        assertTrue(v.line(first).startsWith(">"), v.text());
        v.press(KeyType.ArrowUp);
        assertTrue(v.line(first).startsWith(">"), "stays on the first: " + v.text());
    }

    @Test
    void detailViewShowsTraceAxisTrendsAndFigures() throws Exception {
        VirtualScreen v = open(80, 24).analysed().type("jj").press(KeyType.Enter);
        String t = v.text();
        assertTrue(v.line(1).startsWith("bearing_temp"), t);
        long traceCells = t.chars().filter(c -> c >= '\u2581' && c <= '\u2588').count();
        assertTrue(traceCells > 70, "trace has " + traceCells + " cells:\n" + t);
        assertTrue(t.contains("    time │06:00"), t);
        assertTrue(t.contains("baseline ===="), t);
        for (String trend : new String[] {"     DET", "     LAM", " novelty ", "   level "}) {
            assertTrue(t.contains(trend), trend + " missing:\n" + t);
        }
        assertTrue(t.contains("cursor 08:46:40 row 1001  value 54.8"), t);
        assertTrue(t.contains("statistics"), t);
        v.press(KeyType.Tab).press(KeyType.Tab);
        assertThumbnailsDrawn(v, v.loop.controller.s.sources.get(0).channel(2).orElseThrow(), false);
    }

    @Test
    void detailViewDrawsFullSizeThumbnailsWithTheirSpansWhenThereIsRoom() throws Exception {
        VirtualScreen v = open(120, 40).analysed().type("jj").press(KeyType.Enter).press(KeyType.Tab)
                .press(KeyType.Tab);
        ChannelAssessment a = v.loop.controller.s.sources.get(0).channel(2).orElseThrow();
        assertThumbnailsDrawn(v, a, false);
        String t = v.text();
        // windows of 100 rows every 50 from row 0; the baseline is rows 0-500 (the first quarter), so its last
        // window is rows 400-499: 06:00 + 4000 s to 06:00 + 4990 s; the log's last is rows 1900-1999
        assertTrue(t.contains(" left  baseline 07:06 to 07:23"), "rows 400-499 at 10 s from 06:00:\n" + t);
        assertTrue(t.contains(" right latest 11:16 to 11:33"), "rows 1900-1999:\n" + t);
        assertTrue(t.contains(" radius " + Text.num(a.thumbnails().get(0).radius(), 8).strip() + " (baseline's)"), t);
    }

    /**
     * The thumbnail panel shows both of the channel's thumbnails, cell for cell: each plot line, between
     * its bars, against the 16 × 16 grid's counts read directly (the oracle adds up the cells each
     * character stands for: 1 × 2 at full size, 2 × 4 when halved; half blocks in UTF-8 split the
     * vertical pair).
     */
    static void assertThumbnailsDrawn(VirtualScreen v, ChannelAssessment a, boolean ascii) {
        List<Thumbnail> th = a.thumbnails();
        assertEquals(List.of(Thumbnail.Span.BASELINE, Thumbnail.Span.LATEST),
                th.stream().map(Thumbnail::span).toList(), "both thumbnails computed");
        String text = v.text();
        List<String> lines = text.lines().toList();
        int title = -1;
        for (int r = 0; r < lines.size(); r++) {
            if (lines.get(r).startsWith("recurrence plot, ")) {
                title = r;
            }
        }
        assertTrue(title > 0, "no thumbnail panel:\n" + text);
        String bar = ascii ? "|" : "│";
        String plots = lines.get(title + 1).substring(1);
        int side = plots.indexOf(bar, 1) - 1;
        assertTrue(side == 8 || side == 16, "plot width " + side + ":\n" + text);
        int fx = 16 / side;
        int fy = 2 * fx;
        for (int r = 0; r < 16 / fy; r++) {
            String line = lines.get(title + 1 + r).substring(1);
            for (int k = 0; k < 2; k++) {
                String cells = line.substring(k * (side + 3), k * (side + 3) + side + 2);
                assertTrue(cells.startsWith(bar) && cells.endsWith(bar), "frame: " + line);
                for (int c = 0; c < side; c++) {
                    int yTop = 15 - r * fy;
                    boolean up = dense(th.get(k), c * fx, fx, yTop - fy / 2 + 1, fy / 2);
                    boolean down = dense(th.get(k), c * fx, fx, yTop - fy + 1, fy / 2);
                    // an ASCII character stands for the whole block, a half block for each half
                    boolean whole = dense(th.get(k), c * fx, fx, yTop - fy + 1, fy);
                    char want = ascii ? (whole ? '#' : '.') : up && down ? '█' : up ? '▀' : down ? '▄' : ' ';
                    assertEquals(want, cells.charAt(1 + c), "thumbnail " + k + " line " + r + " cell " + c + ":\n"
                            + text);
                }
            }
        }
    }

    /**
     * Whether the block of fine cells a character stands for is set: it holds a recurrence and its share
     * of recurrent pairs is at least the whole grid's (the rule of {@link Thumbnail}, from its counts).
     */
    private static boolean dense(Thumbnail t, int x0, int nx, int y0, int ny) {
        long r = 0;
        long q = 0;
        long allR = 0;
        long allQ = 0;
        for (int x = 0; x < t.width(); x++) {
            for (int y = 0; y < t.height(); y++) {
                allR += t.recurrences(x, y);
                allQ += t.pairs(x, y);
                if (x >= x0 && x < x0 + nx && y >= y0 && y < y0 + ny) {
                    r += t.recurrences(x, y);
                    q += t.pairs(x, y);
                }
            }
        }
        return r > 0 && r * allQ >= allR * q;
    }

    @Test
    void cursorMovesAlongTimeAndZoomNarrowsTheWindow() throws Exception {
        VirtualScreen v = open(80, 24).type("\n");
        String before = v.text();
        v.type("l");
        assertFalse(v.text().contains("row 1001 "), v.text());
        assertTrue(v.text().contains("row 1029 "), "one column of 2000/71 samples:\n" + v.text());
        v.type("h");
        assertTrue(v.text().contains("row 1001 "), v.text());
        assertTrue(before.contains("shown: 06:00 to 11:33"), before);
        v.type("+");
        assertTrue(v.line(1).contains("shown: 07:23 to 10:09"), v.line(1));
        v.type("0");
        assertTrue(v.line(1).contains("shown: 06:00 to 11:33"), v.line(1));
    }

    @Test
    void markingABaselineRecomputesAgainstIt() throws Exception {
        VirtualScreen v = open(80, 24).analysed().type("\n").type("b").type("lll").type("b");
        Source src = v.loop.controller.s.sources.get(0);
        assertEquals(1000, src.params().baselineFrom());
        assertEquals(1085, src.params().baselineTo());
        assertEquals(2, src.generation(), "analysed again");
        v.analysed();
        v.press(KeyType.Escape);
        assertTrue(v.line(3).startsWith("baseline: rows 1000-1085"), v.line(3));
    }

    @Test
    void markingABaselineKeepsEveryOtherSetting() throws Exception {
        VirtualScreen v = open(80, 24).analysed();
        Source src = v.loop.controller.s.sources.get(0);
        TriageParams custom = src.params().withThreads(1).withWindow(200, 100);
        src.restart(custom);
        v.type("\n").type("b").type("lll").type("b");
        assertEquals(custom.withBaseline(1000, 1085), src.params());
    }

    @Test
    void commentIsMarkedSavedAndQuitAsksWhileUnsaved() throws Exception {
        VirtualScreen v = open(80, 24).analysed().type("jjc").type("runs hot").press(KeyType.Enter);
        int r = rowOf(v, "bearing_temp");
        assertTrue(v.line(r).matches(">.?\\*bearing_temp.*"), v.line(r));
        v.type("q");
        assertTrue(v.line(23).startsWith("Comments not in a saved note."), v.line(23));
        v.press(KeyType.Escape);
        assertEquals(Controller.Outcome.RUNNING, v.loop.controller.outcome());
        v.type("s").settle(300);
        assertTrue(v.line(23).startsWith("note saved: /tmp/findings-1.txt"), v.line(23));
        assertEquals("runs hot", v.desk.notes.get(0).comment(log.toString(), "bearing_temp"));
        v.type("q");
        assertEquals(Controller.Outcome.QUIT, v.loop.controller.outcome());
    }

    @Test
    void ctrlCQuitsAtOnceAndKeepsUnsavedCommentsInTheDraft() throws Exception {
        VirtualScreen v = open(80, 24).type("C").type("pump B offline").press(KeyType.Enter);
        v.press(new KeyStroke('c', true, false));
        assertEquals(Controller.Outcome.INTERRUPTED, v.loop.controller.outcome());
        assertEquals("pump B offline", v.desk.drafts.get(0).general());
    }

    @Test
    void visitFormKeepsWhatIsTyped() throws Exception {
        VirtualScreen v = open(80, 24).type("aj").press(KeyType.Enter).type("P-101").press(KeyType.Enter)
                .type("jjjjj").press(KeyType.Enter).type("rigid").press(KeyType.Enter).press(KeyType.Escape);
        assertTrue(v.line(3).contains("asset: P-101"), v.line(3));
        assertEquals("rigid", v.loop.controller.s.remarks.machine().support());
        assertEquals("P-101", v.desk.latest.asset(), "the draft follows every change");
    }

    @Test
    void machineFactsThatCannotBeReadAreRefusedWithTheReason() throws Exception {
        VirtualScreen v = open(80, 24).type("ajjjjjjj").press(KeyType.Enter).type("1481x").press(KeyType.Enter)
                .press(KeyType.Escape);
        assertEquals("not applied: shaft speed '1481x' is not a number of r/min", v.line(23));
        v.type("a").press(KeyType.Enter).press(new KeyStroke('u', true, false)).type("1481")
                .press(KeyType.Enter).press(KeyType.Escape);
        assertEquals(1481.0, v.loop.controller.s.sources.get(0).params().vibration().rpm().getAsDouble());
        assertEquals(1, v.loop.controller.s.sources.get(0).generation(), "analysed again with the speed");
    }

    @Test
    void aDraftOfAnEarlierSessionIsOfferedAndRestored() throws Exception {
        Findings earlier = Findings.EMPTY.withGeneral("left from before").withComment(log.toString(), "flow", "noisy");
        VirtualScreen v = new VirtualScreen(List.of(log), 80, 24, false, Optional.of(earlier));
        assertTrue(v.line(23).startsWith("Comments from an earlier session of this log were kept."), v.line(23));
        v.type("r");
        assertEquals(earlier, v.loop.controller.s.remarks.entries());
        assertTrue(v.line(rowOf(v, "flow")).startsWith("  *"), v.text());
    }

    @Test
    void savingWhileTheAnalysisRunsWaitsForIt() throws Exception {
        VirtualScreen v = open(80, 24).type("C").type("check coupling").press(KeyType.Enter);
        v.loop.controller.startAll();
        v.type("s");
        assertTrue(v.desk.notes.isEmpty() || v.line(23).startsWith("note saved"), v.line(23));
        v.analysed().settle(300);
        assertEquals(1, v.desk.notes.size(), v.text());
        assertEquals("check coupling", v.desk.notes.get(0).general());
    }

    @Test
    void helpListsEveryKey() throws Exception {
        VirtualScreen v = open(100, 60).type("?");
        String t = v.text();
        for (Action a : Action.values()) {
            assertTrue(t.contains(a.keys()), a + " missing:\n" + t);
        }
        v.type("x");
        assertTrue(rowOf(v, DemoCsv.CHANNELS[0]) > 0, "any other key returns: " + v.text());
    }

    @Test
    void asciiFormDrawsNothingOutsideAscii() throws Exception {
        VirtualScreen v = new VirtualScreen(List.of(log), 80, 24, true).analysed();
        String list = v.text();
        String detail = v.type("\n").press(KeyType.Tab).press(KeyType.Tab).text();
        assertThumbnailsDrawn(v, v.loop.controller.s.sources.get(0).channel(0).orElseThrow(), true);
        for (String t : new String[] {list, detail}) {
            assertTrue(t.chars().allMatch(c -> c == '\n' || c >= 0x20 && c < 0x7f), t);
        }
        assertTrue(list.matches("(?s).*[_.\\-:=+*#]{10,}.*"), list);
    }
}
