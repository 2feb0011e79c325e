package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.riffle.log.ReadOptions;
import picocli.CommandLine;

/** The read options as picocli parses them, and bad values as usage errors (status 2). */
class ReadOptionsMixinTest {
    /** A command that only carries the mixin. */
    @CommandLine.Command(name = "probe")
    static final class Probe {
        @CommandLine.Mixin
        ReadOptionsMixin read;
    }

    private static ReadOptions parse(String... args) {
        Probe p = new Probe();
        new CommandLine(p).parseArgs(args);
        return p.read.toReadOptions();
    }

    @Test
    void everyOptionReachesTheReader() {
        ReadOptions o = parse("--delimiter", "semicolon", "--decimal-comma", "--encoding", "windows-1252",
                "--month-first", "--time-column", "Zeit", "--rate", "25.6", "--skip-rows", "3", "--no-units-row",
                "--sensitivity", "50", "--sensitivity-unit", "m/s²");
        assertEquals(new ReadOptions(Optional.of(';'), Optional.of(true),
                Optional.of(java.nio.charset.Charset.forName("windows-1252")),
                Optional.of(ReadOptions.DateOrder.MONTH_FIRST), Optional.of("Zeit"), OptionalDouble.of(25.6),
                OptionalDouble.of(50), Optional.of("m/s²"), OptionalInt.of(3), Optional.of(false)), o);
        assertEquals(ReadOptions.defaults(), parse());
        assertEquals(Optional.of('\t'), parse("--delimiter", "tab").delimiter());
        assertEquals(Optional.of(' '), parse("--delimiter", "whitespace").delimiter());
        assertEquals(Optional.of(StandardCharsets.UTF_8), parse("--encoding", "utf8").charset());
    }

    private static MainTest.Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new MainTest.Run(status, out.toString(), err.toString());
    }

    @Test
    void badValuesAreUsageErrors() {
        String log = "fixtures/dialects/comma.csv";
        MainTest.Run r = run("channels", "--delimiter", "colon", log);
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: --delimiter 'colon' is not one of: comma, semicolon, tab, bar,"
                + " whitespace"), r.err());
        assertEquals(ExitCode.USAGE, run("channels", "--sensitivity", "5", log).status());
        assertTrue(run("channels", "--sensitivity", "5", log).err().startsWith(
                "riffle: --sensitivity and --sensitivity-unit go together"));
        assertEquals(ExitCode.USAGE, run("channels", "--day-first", "--month-first", log).status());
        assertEquals(ExitCode.USAGE, run("channels", "--encoding", "no-such-code", log).status());
        assertEquals(ExitCode.USAGE, run("channels", "--rate", "-3", log).status());
    }

    @Test
    void theOptionsSettleAnAmbiguousLog() {
        String log = "fixtures/dialects/slash-dates.csv";
        assertEquals(ExitCode.BAD_INPUT, run("channels", log).status());
        assertEquals(ExitCode.OK, run("channels", "--day-first", log).status());
    }
}
