package org.riffle.tui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * For the benchmark of the real screen: when the environment names a file in {@value #VARIABLE}, appends
 * to it, in ms after the process started, when the first frame was on the terminal
 * ({@code first-frame MS}) and when the first frame showing every log's analysis finished was
 * ({@code analysed MS}). Off (and free) otherwise. Writing problems are ignored: the screen never
 * depends on it. Confined to the UI thread.
 *
 * <p>The age of the process is the kernel's: {@code /proc/uptime} now minus the process's start in
 * {@code /proc/self/stat} (field 22, in clock ticks of 1/100 s), both counted from boot, so a wall clock
 * that disagrees with the boot time (as it may in a virtual machine) cannot skew it; resolution 10 ms.
 * Linux only; elsewhere the lines say {@code -1}.
 */
final class FrameLog {
    /** The environment variable that turns the log on. */
    static final String VARIABLE = "RIFFLE_FRAME_LOG";

    /** Clock ticks per second of /proc/self/stat (USER_HZ, 100 on Linux). */
    private static final double TICKS_PER_SECOND = 100;

    private final Path file;
    private final double startSeconds;
    private boolean first = true;
    private boolean analysed;

    private FrameLog(Path file, double startSeconds) {
        this.file = file;
        this.startSeconds = startSeconds;
    }

    /** The log the environment asks for, if any. */
    static Optional<FrameLog> fromEnvironment(Map<String, String> env) {
        String f = env.get(VARIABLE);
        if (f == null || f.isBlank()) {
            return Optional.empty();
        }
        return Optional.of(new FrameLog(Path.of(f), processStartSeconds()));
    }

    /** Called after each frame is drawn; {@code settled}: no log's analysis is still running. */
    void frame(boolean settled) {
        if (first) {
            first = false;
            append("first-frame");
        }
        if (settled && !analysed) {
            analysed = true;
            append("analysed");
        }
    }

    /** Seconds from boot to this process's start, or NaN where /proc does not say. */
    private static double processStartSeconds() {
        try {
            String stat = Files.readString(Path.of("/proc/self/stat"));
            // the command name (field 2) is in parentheses and may hold spaces: count from after it
            String[] f = stat.substring(stat.lastIndexOf(')') + 2).trim().split(" ");
            return Long.parseLong(f[19]) / TICKS_PER_SECOND;
        } catch (IOException | RuntimeException e) {
            return Double.NaN;
        }
    }

    /** Seconds from boot to now, or NaN where /proc does not say. */
    private static double uptimeSeconds() {
        try {
            return Double.parseDouble(Files.readString(Path.of("/proc/uptime")).trim().split(" ")[0]);
        } catch (IOException | RuntimeException e) {
            return Double.NaN;
        }
    }

    private void append(String what) {
        double age = uptimeSeconds() - startSeconds;
        String line = String.format(Locale.ROOT, "%s %d%n", what, Double.isNaN(age) ? -1 : Math.round(1000 * age));
        try {
            Files.writeString(file, line, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.APPEND);
        } catch (IOException | RuntimeException e) {
            // the benchmark notices a missing line; the screen goes on
        }
    }
}
