package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
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
        String s = "cd '" + dir + "'\n"
                + "stty -g > stty-before.txt\n"
                + "LANG=C.UTF-8 LC_ALL= LC_CTYPE= XDG_STATE_HOME='" + dir.resolve("state") + "' java -jar '"
                + JAR.toAbsolutePath() + "' af2-process.csv\n"
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

    /** Pane line of the first flagged channel ('!' mark), else of the channel the demo's fault is in. */
    private static int flaggedRow(String pane) {
        List<String> lines = pane.lines().toList();
        for (int i = FIRST_ROW; i < lines.size(); i++) {
            if (lines.get(i).length() > 1 && lines.get(i).charAt(1) == '!') {
                return i;
            }
        }
        for (int i = FIRST_ROW; i < lines.size(); i++) {
            if (lines.get(i).contains("gearbox vibration RMS")) {
                return i;
            }
        }
        throw new AssertionError("no flagged channel and no gearbox vibration:\n" + pane);
    }

    @Test
    void aTriageSessionEndsInASavedNoteAndARestoredTerminal() throws Exception {
        try (Tmux t = Tmux.start(dir, script(), 120, 40)) {
            String pane = analysed(t);
            assertTrue(pane.lines().findFirst().orElse("").startsWith("! Screening aid only"), pane);
            int row = flaggedRow(pane);
            for (int i = FIRST_ROW; i < row; i++) {
                t.keys("j");
            }
            t.waitFor(p -> p.lines().skip(row).findFirst().orElse("").startsWith(">"), 20, "the selection");
            t.keys("Enter");
            t.waitFor(p -> p.contains("     DET ") && p.contains("cursor "), 20, "the detail view");
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
            String text = Files.readString(note, StandardCharsets.UTF_8).replaceAll("\\s+", " ");
            assertTrue(text.contains("rising since the restart: check bearing"), text);
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
}
