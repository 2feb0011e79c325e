package org.riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.tui.ScreenOptions;
import org.riffle.tui.TriageScreen;
import org.riffle.tui.VisitDesk;
import org.riffle.tui.Warmup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle open LOG...} (and plain {@code riffle LOG...}): the terminal screen. */
@Command(name = "open", mixinStandardHelpOptions = true,
        description = "Open the triage screen on one or more logs (needs a terminal; over SSH use 'ssh -t').")
final class OpenCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "LOG", description = "The log files to read.")
    private List<Path> logs;

    @Mixin
    private ReadOptionsMixin read;

    @Option(names = "--ascii", description = "Draw with ASCII only (default: when the locale is not UTF-8).")
    private boolean ascii;

    @Override
    public Integer call() throws LogException, IOException {
        return open(logs, read.toReadOptions(), ascii, spec.commandLine().getErr());
    }

    /** Opens the screen on {@code logs}; the shared body of {@code riffle open} and {@code riffle LOG}. */
    static int open(List<Path> logs, ReadOptions readOptions, boolean ascii, PrintWriter err)
            throws LogException, IOException {
        if (!ScreenOptions.hasTerminal()) {
            err.println("riffle: no terminal: the screen needs one (over SSH use 'ssh -t'); without one use"
                    + " a headless command such as 'riffle channels LOG'");
            return ExitCode.NO_TERMINAL;
        }
        ScreenOptions options = ScreenOptions.fromEnvironment(System.getenv(), ascii);
        Warmup.start(options.ascii());
        // the terminal is made ready on a thread of its own while the logs are read; the note desk once
        // the first frame is out (it took CPU from reading on a 2-core machine)
        try (TriageScreen.Tty tty = TriageScreen.take(options.ascii())) {
            List<Recording> recordings = new ArrayList<>();
            for (Path p : logs) {
                recordings.add(LogReader.read(p, readOptions));
            }
            TriageScreen.Ending end = TriageScreen.open(tty, recordings, options,
                    () -> VisitDesk.forLogs(logs, options.ascii()));
            return end == TriageScreen.Ending.QUIT ? ExitCode.OK : ExitCode.INTERRUPTED;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return ExitCode.INTERRUPTED;
        }
    }
}
