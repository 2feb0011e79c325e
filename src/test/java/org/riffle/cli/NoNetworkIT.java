package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * No network: {@code riffle report} on the demo log, run under {@code strace -f -e trace=network},
 * never connects, binds, listens, sends or receives on an internet socket (AF_INET or AF_INET6).
 *
 * <p>What this can and cannot say: the JDK itself, when it loads its networking library (which every
 * NIO file channel pulls in, and riffle syncs its notes through one), creates three probe sockets in
 * that library's load hook ({@code IPv4_supported}, {@code IPv6_supported} and
 * {@code reuseport_supported} in OpenJDK 17's {@code libnet}, seen with {@code strace -k}) and closes
 * them unused; riffle cannot avoid that without giving up fsync. So the
 * check allows {@code socket(AF_INET...)} and {@code setsockopt} and nothing else on such a family,
 * and allows at most those three probes. A control run of {@code bash}'s {@code /dev/tcp} shows that
 * the same check catches a real connection attempt. AF_UNIX (the C library's name-service cache
 * lookup for the user's home folder) is local and allowed.
 */
class NoNetworkIT {
    private static final Pattern CALL = Pattern.compile("^\\d+\\s+(\\w+)\\((.*)$");
    private static final List<String> TRAFFIC = List.of("connect", "bind", "listen", "accept", "accept4",
            "sendto", "sendmsg", "sendmmsg", "recvfrom", "recvmsg", "recvmmsg");

    @TempDir
    Path dir;

    /** The offending lines of an strace network trace: internet traffic, or more than the JDK's probes. */
    static List<String> internetUse(List<String> trace) {
        List<String> bad = new ArrayList<>();
        int probes = 0;
        for (String line : trace) {
            Matcher m = CALL.matcher(line);
            if (!m.find()) {
                continue;
            }
            String call = m.group(1);
            String args = m.group(2);
            boolean inet = args.contains("AF_INET");
            if (call.equals("socket") && inet) {
                probes++;
            } else if (TRAFFIC.contains(call) && !args.contains("AF_UNIX")) {
                bad.add(line);
            }
        }
        if (probes > 3) {
            bad.add(probes + " internet sockets created, more than the JDK's three load-time probes");
        }
        return bad;
    }

    private List<String> trace(String... command) throws IOException, InterruptedException {
        Path out = dir.resolve("trace-" + System.nanoTime() + ".txt");
        List<String> cmd = new ArrayList<>(List.of("strace", "-f", "-qq", "-e", "trace=network", "-o",
                out.toString()));
        cmd.addAll(List.of(command));
        Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(dir.resolve("strace-out.txt").toFile()).start();
        assertTrue(p.waitFor(180, TimeUnit.SECONDS), "traced run did not finish");
        return Files.readAllLines(out);
    }

    private static boolean straceWorks() {
        try {
            Process p = new ProcessBuilder("strace", "-f", "-qq", "-e", "trace=network", "true")
                    .redirectErrorStream(true).start();
            return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException | InterruptedException e) {
            return false;
        }
    }

    @Test
    void theHeadlessReportOpensNoInternetConnection() throws Exception {
        assumeTrue(straceWorks(), "strace is installed and may trace (.ci/run installs it)");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String log = Path.of("fixtures", "demo", "af2-process.csv").toAbsolutePath().toString();
        List<String> t = trace(java, "-jar", ReportIT.JAR.toAbsolutePath().toString(), "report", log,
                "-o", dir.toString());
        assertTrue(Files.exists(dir.resolve("af2-process-note.txt")), "the report ran: " + t);
        assertEquals(List.of(), internetUse(t));
    }

    @Test
    void theCheckCatchesARealConnectionAttempt() throws Exception {
        assumeTrue(straceWorks(), "strace is installed and may trace (.ci/run installs it)");
        List<String> t = trace("bash", "-c", "exec 3<>/dev/tcp/127.0.0.1/9 || true");
        List<String> bad = internetUse(t);
        assertEquals(1, bad.size(), String.join("\n", t));
        assertTrue(bad.get(0).contains("connect(") && bad.get(0).contains("AF_INET"), bad.get(0));
    }
}
