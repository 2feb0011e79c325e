package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The screen end to end: {@code java -jar target/riffle.jar} on the demo log in a real terminal (a
 * detached tmux pane), driven by keys as a technician would; then the note, the exit status, the
 * alternate screen and the terminal settings are checked. Also: SIGTERM and hang-up restore the
 * terminal and keep the typed comment in the draft.
 */
class ScreenIT {
    private static final Path JAR = Path.of(System.getProperty("riffle.jar", "target/riffle.jar"));
    private static final Path DEMO = Path.of("fixtures/demo/af2-process.csv");
    /** The channel list starts on this pane line (0-based). */
    private static final int FIRST_ROW = 5;
    /** A pane line holding a line of two framed 16-cell thumbnails (UTF-8 half blocks). */
    private static final Pattern THUMBNAILS = Pattern.compile("│[ ▀▄█]{16}│ │[ ▀▄█]{16}│");

    @TempDir
    Path dir;

    @BeforeEach
    void prepare() throws IOException {
        assumeTrue(Tmux.available(), "tmux is not installed (CI installs it)");
        assertTrue(Files.isRegularFile(JAR), "build the jar first: " + JAR.toAbsolutePath());
        Files.copy(DEMO, dir.resolve("af2-process.csv"), StandardCopyOption.REPLACE_EXISTING);
    }

    /** The pane's script: remember the terminal settings, run riffle, record status and settings. */
    private Path script() throws IOException {
        return script("af2-process.csv");
    }

    private Path script(String log) throws IOException {
        String s = "cd '" + dir + "'\n"
                + "stty -g > stty-before.txt\n"
                + "LANG=C.UTF-8 LC_ALL= LC_CTYPE= XDG_STATE_HOME='" + dir.resolve("state") + "' java -jar '"
                + JAR.toAbsolutePath() + "' " + log + "\n"
                + "echo $? > exit.txt\n"
                + "stty -g > stty-after.txt\n"
                + "sleep 300\n";
        Path p = dir.resolve("run.sh");
        Files.writeString(p, s, StandardCharsets.UTF_8);
        return p;
    }

    private static String analysed(Tmux t) throws Exception {
        return t.waitFor(p -> p.contains("analysed: 8/8") && !p.contains("(working)"), 300, "the analysis");
    }

    /** Pane lines of the channels flagged departed ('!' beside the name, in the list's mark column). */
    private static List<Integer> flaggedRows(String pane) {
        List<String> lines = pane.lines().toList();
        List<Integer> rows = new ArrayList<>();
        for (int i = FIRST_ROW; i < lines.size(); i++) {
            if (lines.get(i).length() > 1 && lines.get(i).charAt(1) == '!') {
                rows.add(i);
            }
        }
        return rows;
    }

    /**
     * The demo's invented fault (a gearbox bearing wearing over the last day, see {@code org.riffle.demo})
     * must be flagged: the session moves down to that channel, opens it, finds its thumbnails, comments
     * on it and saves the note; the note must carry the comment in that channel's section.
     */
    @Test
    void aTriageSessionEndsInASavedNoteAndARestoredTerminal() throws Exception {
        try (Tmux t = Tmux.start(dir, script(), 120, 40)) {
            String pane = analysed(t);
            List<String> lines = pane.lines().toList();
            assertTrue(lines.get(0).startsWith("! Screening aid only"), pane);
            List<Integer> flagged = flaggedRows(pane);
            assertFalse(flagged.isEmpty(), "no channel of the demo log is flagged:\n" + pane);
            int row = flagged.get(flagged.size() - 1);
            assertTrue(lines.get(row).contains("gearbox vibration RMS"), "the demo's fault channel is the last"
                    + " flagged one:\n" + pane);
            assertTrue(lines.get(FIRST_ROW).startsWith(">") && row > FIRST_ROW, "the selection starts above it:\n"
                    + pane);
            for (int i = FIRST_ROW; i < row; i++) {
                t.keys("j");
            }
            t.waitFor(p -> p.lines().skip(row).findFirst().orElse("").startsWith(">!"), 20, "the selection");
            t.keys("Enter");
            String detail = t.waitFor(p -> p.contains("     DET ") && p.contains("cursor "), 20, "the detail view");
            String title = detail.lines().skip(1).findFirst().orElse("");
            assertTrue(title.startsWith("gearbox vibration RMS [mm/s]   !departed"), title);
            String channel = title.substring(0, title.indexOf("   "));
            for (int tab = 0; tab < 6 && !t.pane().contains("recurrence plot, "); tab++) {
                t.keys("Tab");
                Thread.sleep(200);
            }
            String plots = t.waitFor(p -> p.contains("recurrence plot, "), 5, "the thumbnail panel");
            long framed = plots.lines().filter(l -> THUMBNAILS.matcher(l).find()).count();
            assertEquals(8, framed, "eight lines of two thumbnails side by side:\n" + plots);
            t.keys("c");
            t.type("rising since the restart: check bearing");
            t.waitFor(p -> p.contains("rising since the restart: check bearing"), 20, "the typed comment");
            t.keys("Enter", "s");
            String saved = t.waitFor(p -> p.contains("note saved: "), 60, "the note");
            String where = saved.lines().filter(l -> l.startsWith("note saved: ")).findFirst().orElseThrow()
                    .substring("note saved: ".length()).strip();
            t.keys("q");
            assertEquals("0", Tmux.waitForFile(dir.resolve("exit.txt"), 30), "exit status");
            assertEquals("0", t.format("#{alternate_on}"), "the pane left the alternate screen");
            assertEquals(Files.readString(dir.resolve("stty-before.txt")),
                    Files.readString(dir.resolve("stty-after.txt")), "stty settings restored");
            Path note = dir.resolve("af2-process-note.txt");
            assertTrue(where.endsWith("af2-process-note.txt"), where);
            assertTrue(Files.isRegularFile(note), "no note at " + note);
            String text = Files.readString(note, StandardCharsets.UTF_8);
            int section = text.indexOf("] " + channel + "\n");
            assertTrue(section > 0, "no section for " + channel + " in the note:\n" + text);
            Matcher next = Pattern.compile("\n(  \\[|[A-Z])").matcher(text);
            String own = text.substring(section, next.find(section) ? next.start() : text.length())
                    .replaceAll("\\s+", " ");
            assertTrue(own.contains("rising since the restart: check bearing"), own);
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"TERM, 143", "HUP, 129"})
    void aSignalRestoresTheTerminalAndKeepsTheCommentDraft(String signal, String status) throws Exception {
        try (Tmux t = Tmux.start(dir, script(), 100, 30)) {
            t.waitFor(p -> p.contains("gearbox vibration"), 120, "the first frame");
            t.keys("C");
            t.type("left for the morning shift");
            t.waitFor(p -> p.contains("general comment: left for the morning shift"), 20, "the typed comment");
            t.keys("Enter");
            t.waitFor(p -> !p.contains("general comment:"), 20, "the prompt to close");
            long pid = t.java().pid();
            Process kill = new ProcessBuilder("kill", "-" + signal, String.valueOf(pid)).start();
            assertEquals(0, kill.waitFor());
            assertEquals(status, Tmux.waitForFile(dir.resolve("exit.txt"), 30), "exit status");
            assertEquals("0", t.format("#{alternate_on}"), "the pane left the alternate screen");
            assertEquals(Files.readString(dir.resolve("stty-before.txt")),
                    Files.readString(dir.resolve("stty-after.txt")), "stty settings restored");
            String draft = Files.readString(dir.resolve(".af2-process.csv.riffle-draft"), StandardCharsets.UTF_8);
            assertTrue(draft.contains("left for the morning shift"), draft);
        }
    }

    /**
     * The terminal is taken while the log is still being read; a Ctrl-C then stops riffle at once (status
     * 130) with the terminal restored, and no frame is ever drawn (the frame log stays empty). The log is
     * an invented 3,000,000-row one, which takes seconds to read.
     */
    @Test
    void ctrlCWhileTheLogIsReadStopsAtOnceAndRestoresTheTerminal() throws Exception {
        Path big = dir.resolve("long.csv");
        try (java.io.Writer w = Files.newBufferedWriter(big, StandardCharsets.US_ASCII)) {
            w.write("seconds,level [bar]\n");
            for (int i = 0; i < 3_000_000; i++) {
                w.write(i + "," + (i % 997) / 10.0 + "\n");
            }
        }
        Path frames = dir.resolve("frames.txt");
        Path s = script("long.csv");
        Files.writeString(s, Files.readString(s).replace("java -jar", "RIFFLE_FRAME_LOG='" + frames + "' java -jar"));
        try (Tmux t = Tmux.start(dir, s, 100, 30)) {
            // wait until riffle has set the terminal's modes (Ctrl-C is then a key, no longer a signal)
            String tty = t.format("#{pane_tty}");
            String before = Tmux.waitForFile(dir.resolve("stty-before.txt"), 30);
            boolean raw = false;
            for (int i = 0; i < 400 && !raw; i++) {
                Process p = new ProcessBuilder("sh", "-c", "stty -g < " + tty).start();
                raw = !new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip().equals(before);
                p.waitFor();
                Thread.sleep(raw ? 0 : 20);
            }
            assertTrue(raw, "riffle never set the terminal's modes");
            t.keys("C-c");
            assertEquals("130", Tmux.waitForFile(dir.resolve("exit.txt"), 30), "exit status");
            assertFalse(Files.exists(frames), "the screen had opened: the log was read before the Ctrl-C");
            assertEquals(before, Files.readString(dir.resolve("stty-after.txt")).strip(), "stty settings restored");
        }
    }

    /**
     * The real terminal's size is kept between frames (asking it is a round trip to the terminal), so
     * a resize must still reach the screen: the window shrinks and grows, and each time the screen is
     * drawn again for the new size (its bottom line moves to the new last row, the caution stays on top).
     */
    @Test
    void theScreenFollowsResizesOfTheRealTerminal() throws Exception {
        try (Tmux t = Tmux.start(dir, script(), 120, 40)) {
            String pane = analysed(t);
            String bottom = pane.lines().skip(39).findFirst().orElse("").strip();
            assertFalse(bottom.isEmpty(), "no bottom line at 120 x 40:\n" + pane);
            int[][] sizes = {{90, 30}, {130, 45}};
            for (int[] size : sizes) {
                t.run("resize-window", "-t", t.session(), "-x", String.valueOf(size[0]), "-y", String.valueOf(size[1]));
                int last = size[1] - 1;
                String caution = Chrome.caution(size[0]); // its short or long form, as the width allows
                t.waitFor(p -> p.startsWith(caution) && p.lines().skip(last).findFirst().orElse("").strip().equals(bottom),
                        20, "the caution on top and the bottom line on row " + last + " at " + size[0] + " x " + size[1]);
            }
        }
    }
}
