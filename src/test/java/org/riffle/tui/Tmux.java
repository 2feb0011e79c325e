package org.riffle.tui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;

/**
 * A detached tmux session holding one shell script in one pane: send keys, read the pane, wait for
 * text, find the processes in it. Each session has its own socket so nothing touches the user's tmux.
 */
final class Tmux implements AutoCloseable {
    private final String socket;
    private final String session;

    private Tmux(String socket, String session) {
        this.socket = socket;
        this.session = session;
    }

    /** Starts {@code script} (run by {@code sh}) in a new detached session {@code cols} × {@code rows}. */
    static Tmux start(Path dir, Path script, int cols, int rows) throws IOException, InterruptedException {
        String name = "riffle-it-" + ProcessHandle.current().pid() + "-" + System.nanoTime() % 100_000;
        Tmux t = new Tmux(dir.resolve("tmux.sock").toString(), name);
        t.run("new-session", "-d", "-s", name, "-x", String.valueOf(cols), "-y", String.valueOf(rows),
                "sh " + script.toAbsolutePath());
        return t;
    }

    /** The session's name, for tmux commands that take a target. */
    String session() {
        return session;
    }

    /** True when tmux can be run here. */
    static boolean available() {
        try {
            return new ProcessBuilder("tmux", "-V").redirectErrorStream(true).start().waitFor() == 0;
        } catch (IOException | InterruptedException e) {
            return false;
        }
    }

    String run(String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of("tmux", "-S", socket));
        cmd.addAll(List.of(args));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(20, TimeUnit.SECONDS) || p.exitValue() != 0) {
            throw new IOException("tmux " + String.join(" ", args) + " failed: " + out);
        }
        return out;
    }

    /** Sends keys as tmux names them ({@code "Enter"}, {@code "Down"}) or literal text with {@code -l}. */
    void keys(String... keys) throws IOException, InterruptedException {
        List<String> a = new ArrayList<>(List.of("send-keys", "-t", session));
        a.addAll(List.of(keys));
        run(a.toArray(new String[0]));
    }

    /** Types {@code text} literally. */
    void type(String text) throws IOException, InterruptedException {
        run("send-keys", "-t", session, "-l", text);
    }

    /** The visible pane text. */
    String pane() throws IOException, InterruptedException {
        return run("capture-pane", "-p", "-t", session);
    }

    /** A tmux format value of the pane, e.g. {@code #{alternate_on}}. */
    String format(String f) throws IOException, InterruptedException {
        return run("display-message", "-p", "-t", session, f).strip();
    }

    /** Waits up to {@code seconds} until the pane satisfies {@code ok}; returns the pane. */
    String waitFor(Predicate<String> ok, int seconds, String what) throws IOException, InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        String p = pane();
        while (!ok.test(p)) {
            if (System.nanoTime() > end) {
                throw new AssertionError("waited " + seconds + " s for " + what + "; pane:\n" + p);
            }
            Thread.sleep(100);
            p = pane();
        }
        return p;
    }

    /** Waits until {@code file} exists (the script writes it when riffle has ended). */
    static String waitForFile(Path file, int seconds) throws IOException, InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        while (!Files.exists(file) || Files.size(file) == 0) {
            if (System.nanoTime() > end) {
                throw new AssertionError("no " + file + " after " + seconds + " s");
            }
            Thread.sleep(100);
        }
        Thread.sleep(100);
        return Files.readString(file).strip();
    }

    /** The java process running in the pane. */
    ProcessHandle java() throws IOException, InterruptedException {
        long shell = Long.parseLong(format("#{pane_pid}"));
        return ProcessHandle.of(shell).orElseThrow().children()
                .filter(c -> c.info().command().map(x -> x.endsWith("java")).orElse(false))
                .findFirst().orElseThrow(() -> new AssertionError("no java process in the pane"));
    }

    @Override
    public void close() throws IOException, InterruptedException {
        try {
            run("kill-server");
        } catch (IOException e) {
            // already gone
        }
    }
}
