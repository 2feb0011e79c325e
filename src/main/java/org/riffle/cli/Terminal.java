package org.riffle.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Whether the standard streams are terminals; Java 17 has no isatty, so Linux's /proc is asked. */
final class Terminal {
    private Terminal() {
    }

    /**
     * True when standard error is a terminal: on Linux the target of {@code /proc/self/fd/2} is a
     * {@code /dev/pts} or {@code /dev/tty} device; elsewhere, when the JVM has a console.
     */
    static boolean stderrIsTerminal() {
        try {
            String target = Files.readSymbolicLink(Path.of("/proc/self/fd/2")).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            return System.console() != null;
        }
    }
}
