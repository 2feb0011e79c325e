package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.signal.Summary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code riffle channels LOG}: a summary of every channel, headless. */
@Command(name = "channels", mixinStandardHelpOptions = true,
        description = "Print a summary of every channel of a log.")
final class ChannelsCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Mixin
    private ReadOptionsMixin read;

    @Override
    public Integer call() throws LogException {
        Recording rec = LogReader.read(log, read.toReadOptions());
        PrintWriter out = spec.commandLine().getOut();
        for (Channel c : rec.channels()) {
            Summary s = Summary.of(c.toDoubles());
            out.println(String.format(Locale.ROOT, "%-20s %-8s %8d %10.4g %10.4g", c.name(), c.unit(),
                    s.count(), s.mean(), s.std()));
        }
        return ExitCode.OK;
    }
}
