package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.log.TextChannel;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle channels LOG}: descriptive statistics and a sparkline of every channel, headless. */
@Command(name = "channels", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Print a summary of every channel of a log: statistics and a sparkline.",
            "For every numeric channel: unit, samples, missing samples, sample rate, "
                + "statistics (missing samples skipped), time span, gaps in the time base, and a sparkline "
                + "of the whole channel (each cell shows the top of the range of the samples it covers)."},
        footer = {"", "std is the sample standard deviation (divisor n-1); skew is the moment coefficient m3/m2^1.5; "
                + "kurt is Pearson's kurtosis m4/m2^2 (3 for a Gaussian, not the excess); crest = peak / rms. "
                + "CSV numbers are rounded to 7 significant digits, the text table to 4; an empty CSV field "
                + "or '-' means undefined.",
                "What the reader noticed (a time base without UTC offsets, gaps, cells read as missing) goes to "
                + "standard error, one line each, beginning with 'riffle: LOG: warning:'.",
                "Exit status: 0 done, 2 usage error, 3 bad input (the message names the file)."})
final class ChannelsCommand implements Callable<Integer> {
    /** Cells in the sparkline column. */
    static final int SPARK_WIDTH = 24;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Mixin
    private ReadOptionsMixin read;

    @Mixin
    private VibrationOptions vibration;

    @Option(names = "--csv", description = "Write the table as CSV to standard output (no sparkline).")
    private boolean csv;

    @Option(names = "--ascii", description = "Draw sparklines with ASCII characters even when the locale "
            + "(LC_ALL, LC_CTYPE or LANG) says UTF-8.")
    private boolean ascii;

    private final Map<String, String> env;

    ChannelsCommand() {
        this(System.getenv());
    }

    /** For tests: {@code env} stands in for the process environment. */
    ChannelsCommand(Map<String, String> env) {
        this.env = Map.copyOf(env);
    }

    @Override
    public Integer call() throws LogException {
        Recording rec = LogReader.read(log, read.toReadOptions());
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Reading.announce(rec, err);
        for (String w : rec.source().warnings()) {
            err.println("riffle: " + rec.source().file() + ": warning: " + w);
        }
        err.flush();
        List<ChannelTable.Row> rows = ChannelTable.rows(rec, SPARK_WIDTH, !ascii && utf8(env),
                vibration.params());
        if (csv) {
            ChannelTable.printCsv(rows, out);
        } else {
            out.println(rec.source().file() + ": " + rec.source().reduction().map(r -> r.rows() + " rows ("
                    + rec.rows() + " kept at full resolution)").orElse(rec.rows() + " rows") + ", "
                    + count(rec.channels().size(), "numeric channel") + ", "
                    + count(rec.textChannels().size(), "text channel"));
            rec.source().reduction().ifPresent(r -> out.println(r.message()));
            ChannelTable.printText(rows, out);
            for (TextChannel t : rec.textChannels()) {
                out.println("text channel " + t.name() + " (not analysed): " + String.join(", ", t.distinct()));
            }
            out.println("kurt: Pearson (3 for a Gaussian); std: sample (n-1); see 'riffle channels --help'.");
        }
        out.flush();
        return ExitCode.OK;
    }

    private static String count(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    /**
     * True when the locale in {@code env} uses UTF-8: the first of LC_ALL, LC_CTYPE, LANG that is set
     * and not empty decides (the POSIX precedence); none set means the "C" locale, so ASCII.
     */
    static boolean utf8(Map<String, String> env) {
        for (String name : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String v = env.get(name);
            if (v != null && !v.isEmpty()) {
                String s = v.toLowerCase(Locale.ROOT);
                return s.contains("utf-8") || s.contains("utf8");
            }
        }
        return false;
    }
}
