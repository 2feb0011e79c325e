package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * A log the user may not read: status 3 and "permission denied". Tests (and CI) run as root, and root
 * reads a mode-000 file regardless, so a test that only did {@code chmod 000} would pass without
 * checking anything. Here the shaded jar runs as the unprivileged user 65534 ({@code setpriv
 * --reuid --regid --clear-groups}), which the kernel really refuses; without {@code setpriv}, or when
 * not root (then the plain mode is enough, checked the same way) the test says why it is skipped.
 */
class UnreadableLogIT {
    @Test
    void anUnreadableLogGivesPermissionDenied() throws Exception {
        boolean root = "root".equals(System.getProperty("user.name"));
        assumeTrue(!root || Files.isExecutable(Path.of("/usr/bin/setpriv")),
                "running as root without setpriv: root reads a mode-000 file, nothing to check");
        Path dir = Files.createTempDirectory("riffle-perm", PosixFilePermissions.asFileAttribute(
                PosixFilePermissions.fromString("rwxr-xr-x")));
        try {
            Path jar = Files.copy(ReportIT.JAR, dir.resolve("riffle.jar"), StandardCopyOption.REPLACE_EXISTING);
            Files.setPosixFilePermissions(jar, PosixFilePermissions.fromString("rw-r--r--"));
            Path log = dir.resolve("locked.csv");
            Files.writeString(log, "time,flow\n2026-03-01 08:00:00,1.5\n2026-03-01 08:00:01,1.6\n");
            Files.setPosixFilePermissions(log, PosixFilePermissions.fromString("---------"));
            List<String> cmd = new ArrayList<>();
            if (root) {
                cmd.addAll(List.of("/usr/bin/setpriv", "--reuid=65534", "--regid=65534", "--clear-groups"));
            }
            cmd.addAll(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-XX:-UsePerfData", "-jar", jar.toString(), "channels", log.toString()));
            Process p = new ProcessBuilder(cmd).directory(dir.toFile())
                    .redirectOutput(dir.resolve("out.txt").toFile()).redirectError(dir.resolve("err.txt").toFile())
                    .start();
            assertTrue(p.waitFor(120, TimeUnit.SECONDS), "riffle did not finish");
            String err = Files.readString(dir.resolve("err.txt")).strip();
            assertEquals("riffle: " + log + ": permission denied", err);
            assertEquals(ExitCode.BAD_INPUT, p.exitValue());
        } finally {
            try (Stream<Path> s = Files.walk(dir)) {
                for (Path q : s.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(q);
                }
            } catch (IOException e) {
                // best effort: a temp folder left behind is not worth failing the test for
            }
        }
    }
}
