package org.riffle.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The screen as a technician starts it, timed from outside: {@code riffle LOG} (the same entry point as
 * {@code java -jar riffle.jar LOG}) in a fresh JVM in a detached tmux pane of 200 × 60, on a tmux server
 * of its own. The screen writes its frame times to the file named by {@code RIFFLE_FRAME_LOG} (ms after
 * the process started, by the kernel's clock): the first frame, and the first frame that shows every
 * channel's finished analysis. Then {@code q} ends it. Nothing of the screen is replaced or skipped:
 * the real terminal, its {@code stty} setup, the note desk and the draft store are all on the way.
 * Stateless.
 */
final class RealScreen {
    /** What one run measured, ms after the process started; NaN when tmux is missing. */
    record Figures(double firstFrameMs, double analysedMs) {
    }

    private static final String SOCKET = "riffle-bench";

    private RealScreen() {
    }

    /** True when a tmux binary runs here. */
    static boolean available() {
        try {
            Process p = new ProcessBuilder("tmux", "-V").redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            return p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    /** Opens {@code log} on the real screen once, in {@code dir}; waits at most {@code timeoutSeconds}. */
    static Figures run(Path log, Path dir, int run, long timeoutSeconds) throws IOException, InterruptedException {
        if (!available()) {
            return new Figures(Double.NaN, Double.NaN);
        }
        Path frames = dir.resolve("frames-" + run + ".txt");
        Path exit = dir.resolve("exit-" + run + ".txt");
        Files.deleteIfExists(frames);
        Files.deleteIfExists(exit);
        Path script = dir.resolve("screen-" + run + ".sh");
        List<String> cmd = ChildJvm.command(List.of(), "org.riffle.cli.Main", List.of(log.toAbsolutePath().toString()));
        Files.writeString(script, "cd " + quote(dir.toAbsolutePath().toString()) + "\n"
                + "LANG=C.UTF-8 XDG_STATE_HOME=" + quote(dir.resolve("state").toAbsolutePath().toString())
                + " RIFFLE_FRAME_LOG=" + quote(frames.toAbsolutePath().toString()) + " " + String.join(" ",
                cmd.stream().map(RealScreen::quote).toList()) + "\n"
                + "echo $? > " + quote(exit.toAbsolutePath().toString()) + "\n", StandardCharsets.UTF_8);
        String session = "bench" + run;
        tmux("kill-server");
        tmux("new-session", "-d", "-s", session, "-x", "200", "-y", "60", "sh " + quote(script.toString()));
        try {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(timeoutSeconds);
            List<String> lines = List.of();
            while (lines.stream().noneMatch(l -> l.startsWith("analysed "))) {
                if (System.nanoTime() > deadline) {
                    throw new IllegalStateException("the screen on " + log + " showed no finished analysis in "
                            + timeoutSeconds + " s; frame log: " + lines);
                }
                if (Files.exists(exit)) {
                    throw new IllegalStateException("the screen on " + log + " ended early: " + lines);
                }
                Thread.sleep(200);
                lines = Files.exists(frames) ? Files.readAllLines(frames) : List.of();
            }
            tmux("send-keys", "-t", session, "q");
            for (int i = 0; i < 100 && !Files.exists(exit); i++) {
                Thread.sleep(100);
            }
            return new Figures(value(lines, "first-frame "), value(lines, "analysed "));
        } finally {
            tmux("kill-server");
        }
    }

    private static double value(List<String> lines, String prefix) {
        for (String l : lines) {
            if (l.startsWith(prefix)) {
                double v = Double.parseDouble(l.substring(prefix.length()).strip());
                return v < 0 ? Double.NaN : v;
            }
        }
        return Double.NaN;
    }

    private static void tmux(String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of("tmux", "-L", SOCKET));
        cmd.addAll(List.of(args));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        p.getInputStream().readAllBytes();
        p.waitFor(10, TimeUnit.SECONDS);
    }

    private static String quote(String s) {
        return "'" + s.replace("'", "'\\''") + "'";
    }
}
