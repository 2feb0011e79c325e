package org.riffle.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs {@code riffle} in a fresh JVM with the default heap settings, exactly as a technician starts
 * it ({@code java -jar riffle.jar ...} is {@code java -cp riffle.jar org.riffle.cli.Main ...}), and
 * measures its wall time from start to exit and its peak resident set size: {@code VmHWM} of
 * {@code /proc/PID/status}, polled every 5 ms (the kernel's high-water mark only grows, so the last
 * reading before exit is the peak up to 5 ms before exit). Stateless.
 */
final class ChildJvm {
    /** Wall time (ms) and peak resident set (MB = 2^20 bytes; {@code NaN} where /proc is missing). */
    record Run(double wallMillis, double peakMegabytes, String stdout) {
    }

    private ChildJvm() {
    }

    /** The command that starts a riffle JVM with this JVM's java and class path. */
    static List<String> command(List<String> jvmOptions, String mainClass, List<String> args) {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.addAll(jvmOptions);
        cmd.add("-cp");
        cmd.add(absoluteClassPath());
        cmd.add(mainClass);
        cmd.addAll(args);
        return cmd;
    }

    /** This JVM's class path with every entry made absolute, so a child started elsewhere finds it. */
    static String absoluteClassPath() {
        String sep = java.io.File.pathSeparator;
        return java.util.Arrays.stream(System.getProperty("java.class.path").split(java.util.regex.Pattern.quote(sep)))
                .map(e -> Path.of(e).toAbsolutePath().toString())
                .collect(java.util.stream.Collectors.joining(sep));
    }

    /**
     * Runs {@code mainClass} with {@code args} in {@code dir}; fails with the child's error output
     * when it exits non-zero or runs longer than {@code timeoutSeconds}.
     */
    static Run run(String mainClass, List<String> args, Path dir, long timeoutSeconds)
            throws IOException, InterruptedException {
        return run(List.of(), mainClass, args, dir, timeoutSeconds);
    }

    /** As {@link #run(String, List, Path, long)}, the child started with {@code jvmOptions}. */
    static Run run(List<String> jvmOptions, String mainClass, List<String> args, Path dir, long timeoutSeconds)
            throws IOException, InterruptedException {
        Path out = Files.createTempFile(dir, "child-", ".out");
        Path err = Files.createTempFile(dir, "child-", ".err");
        try {
            long t0 = System.nanoTime();
            Process p = new ProcessBuilder(command(jvmOptions, mainClass, args)).directory(dir.toFile())
                    .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            Path status = Path.of("/proc", Long.toString(p.pid()), "status");
            long deadline = t0 + TimeUnit.SECONDS.toNanos(timeoutSeconds);
            double peak = Double.NaN;
            while (!p.waitFor(5, TimeUnit.MILLISECONDS)) {
                peak = Math.max(Double.isNaN(peak) ? 0 : peak, hwmMegabytes(status));
                if (System.nanoTime() > deadline) {
                    p.destroyForcibly().waitFor();
                    throw new IllegalStateException(String.join(" ", args) + ": still running after "
                            + timeoutSeconds + " s");
                }
            }
            double wall = (System.nanoTime() - t0) / 1e6;
            if (!Files.isReadable(Path.of("/proc/self/status"))) {
                peak = Double.NaN;
            }
            if (p.exitValue() != 0) {
                throw new IllegalStateException(String.join(" ", args) + ": exit status " + p.exitValue()
                        + ": " + Files.readString(err).strip());
            }
            return new Run(wall, peak, Files.readString(out));
        } finally {
            Files.deleteIfExists(out);
            Files.deleteIfExists(err);
        }
    }

    /** VmHWM in MB, or 0 when the file is gone or has no such line (the process is exiting). */
    static double hwmMegabytes(Path status) {
        try {
            for (String line : Files.readAllLines(status)) {
                if (line.startsWith("VmHWM:")) {
                    String[] f = line.substring(6).trim().split("\\s+");
                    return Long.parseLong(f[0]) / 1024.0;
                }
            }
        } catch (IOException | RuntimeException e) {
            return 0;
        }
        return 0;
    }
}
