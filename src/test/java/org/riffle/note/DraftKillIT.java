package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A draft survives the death of the process that typed it: a real child JVM types comments through
 * {@link Autosave} and is then killed by a real signal; the log "reopened" through {@link DraftStore}
 * offers the comments back word for word.
 */
class DraftKillIT {
    /** Words that must come back exactly: line breaks, tabs, quotes, backslashes, non-ASCII, an escape. */
    static final String TEXT = "Bearing housing warm, 48 \u00b0C at 1480 r/min.\nGrease looked dark \u2014 \"check\""
            + "\n\n\tC:\\logs\\p3 stays on the stick; m\u00b3/h \u00b5m \ud83d\ude00 \u001b[31m (pasted)";

    @TempDir
    Path dir;
    Path log;
    Path state;
    Path text;

    @BeforeEach
    void setUp() throws IOException {
        log = Files.writeString(dir.resolve("booster p3.csv"), "time,discharge\n");
        state = dir.resolve("state");
        text = Files.writeString(dir.resolve("typed.txt"), TEXT, StandardCharsets.UTF_8);
    }

    private Process child(long intervalMs, String mode) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Process p = new ProcessBuilder(java, "-cp", cp, DraftChild.class.getName(), log.toString(), state.toString(),
                text.toString(), Long.toString(intervalMs), mode).redirectErrorStream(true).start();
        BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        String first = r.readLine();
        assertEquals("typed", first, "the child did not start");
        return p;
    }

    private static void signal(Process p, String sig) throws Exception {
        Process k = new ProcessBuilder("kill", "-" + sig, Long.toString(p.pid())).inheritIO().start();
        assertEquals(0, k.waitFor(), "kill -" + sig);
        assertTrue(p.waitFor(20, TimeUnit.SECONDS), "the child did not die on " + sig);
    }

    private DraftStore.Draft waitForDraft() throws Exception {
        DraftStore store = DraftStore.inFolder(state);
        long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
        while (System.nanoTime() < until) {
            var d = store.load(log);
            if (d.isPresent()) {
                return d.get();
            }
            Thread.sleep(20);
        }
        throw new AssertionError("no draft appeared within 20 s");
    }

    @Test
    void killedWithSigkillAfterAnAutosaveTheCommentsComeBackWordForWord() throws Exception {
        Process p = child(100, "wait");
        waitForDraft();
        signal(p, "KILL");
        assertEquals(137, p.exitValue(), "128 + SIGKILL: no shutdown hook ran");
        DraftStore.Draft d = DraftStore.inFolder(state).load(log).orElseThrow();
        assertEquals(DraftChild.typed(log, TEXT), d.findings());
        assertEquals(TEXT, d.findings().general());
    }

    @Test
    void hangUpInterruptAndTerminationSaveWhatTheTimerHadNotYetSaved() throws Exception {
        for (String sig : List.of("HUP", "INT", "TERM")) {
            DraftStore.inFolder(state).delete(log);
            Process p = child(3_600_000, "wait");
            Thread.sleep(200);
            assertTrue(DraftStore.inFolder(state).load(log).isEmpty(), "the hour-long timer has not fired");
            signal(p, sig);
            DraftStore.Draft d = DraftStore.inFolder(state).load(log).orElseThrow(
                    () -> new AssertionError("no draft after SIG" + sig));
            assertEquals(DraftChild.typed(log, TEXT), d.findings(), "after SIG" + sig);
        }
    }

    @Test
    void killedInTheMiddleOfSavingTheDraftIsOneCompleteVersionOrTheOther() throws Exception {
        Findings a = DraftChild.typed(log, TEXT);
        Findings b = a.withGeneral("the other version");
        for (int round = 0; round < 4; round++) {
            Process p = child(0, "churn");
            Thread.sleep(150 + 70L * round);
            signal(p, "KILL");
            Findings got = DraftStore.inFolder(state).load(log).orElseThrow().findings();
            assertTrue(got.equals(a) || got.equals(b), "round " + round + ": a torn draft " + got);
        }
    }
}
