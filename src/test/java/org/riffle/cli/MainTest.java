package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class MainTest {
    /** Output and status of one run. */
    record Run(int status, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(status, out.toString(), err.toString());
    }

    @Test
    void versionPrintsTheProjectVersion() {
        Run r = run("--version");
        assertEquals(0, r.status());
        assertTrue(r.out().matches("riffle \\d+\\.\\d+\\.\\d+\\R"), r.out());
    }

    /** A worker's OutOfMemoryError arrives wrapped (the triage pool's IllegalStateException): still the memory line. */
    @Test
    void aWrappedOutOfMemoryErrorIsTheMemoryLineNotAnInternalError() {
        assertTrue(Main.outOfMemory(new IllegalStateException("triage failed on a channel",
                new java.util.concurrent.ExecutionException(new OutOfMemoryError("Java heap space")))));
        assertFalse(Main.outOfMemory(new IllegalStateException("a bug", new ArithmeticException())));
        assertTrue(Main.outOfMemory().matches("riffle: not enough memory: the Java heap limit is \\d+ MiB; raise it,"
                + " e\\.g\\. java -Xmx4g -jar riffle\\.jar \\.\\.\\., or split the log into shorter files"),
                Main.outOfMemory());
    }

    @Test
    void missingFileIsOneLineWithTheFileNameAndStatus3() {
        Run r = run("channels", "no-such-file.csv");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: no-such-file.csv: no such file", r.err().strip());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        Run r = run("channels", "--no-such-option", "x.csv");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: Unknown option: '--no-such-option'"), r.err());
    }

    @Test
    void onlyAPlainListOfPathsSkipsTheParser() {
        assertEquals(List.of(Path.of("a.csv"), Path.of("logs/b.wav")), Main.plainLogs(new String[] {"a.csv", "logs/b.wav"}));
        assertNull(Main.plainLogs(new String[0]), "no arguments: the usage");
        assertNull(Main.plainLogs(new String[] {"--ascii", "a.csv"}), "an option");
        assertNull(Main.plainLogs(new String[] {"a.csv", "-"}), "standard input");
        assertNull(Main.plainLogs(new String[] {"@args.txt"}), "an argument file");
        assertNull(Main.plainLogs(new String[] {"report", "a.csv"}), "a subcommand");
        assertNull(Main.plainLogs(new String[] {"a.csv", ""}), "an empty argument");
    }

    /** The subcommands are added by name in Main; each name must be the one its class declares. */
    @Test
    void everySubcommandIsRegisteredUnderItsOwnNameAndAloneWhenAsked() {
        CommandLine all = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        assertEquals(List.of("channels", "spectrum", "open", "report", "baseline", "demo", "rqa", "trend", "health",
                "bench"), List.copyOf(all.getSubcommands().keySet()));
        all.getSubcommands().forEach((name, sub) -> assertEquals(name,
                sub.getCommand().getClass().getAnnotation(CommandLine.Command.class).name()));
        CommandLine lean = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()),
                new String[] {"report", "x.csv"});
        assertEquals(List.of("report"), List.copyOf(lean.getSubcommands().keySet()));
    }

    @Test
    void anUnknownWordIsALogToOpenAndWithoutATerminalThatIsOneLine() {
        Run r = run("no-such-file.csv");
        assertEquals(ExitCode.NO_TERMINAL, r.status());
        assertTrue(r.err().startsWith("riffle: no terminal"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }
}
