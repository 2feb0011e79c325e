package org.riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
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

    /** The note desk made on its own thread; its failure as the unchecked exception it was. */
    private static VisitDesk desk(CompletableFuture<VisitDesk> ready) {
        try {
            return ready.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw e;
        }
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
        // the terminal and the note desk are made ready on threads of their own while the logs are read
        CompletableFuture<VisitDesk> deskReady = new CompletableFuture<>();
        Thread deskMaker = new Thread(() -> {
            try {
                deskReady.complete(VisitDesk.forLogs(logs, options.ascii()));
            } catch (RuntimeException | Error e) {
                deskReady.completeExceptionally(e);
            }
        }, "riffle-desk");
        deskMaker.setDaemon(true);
        deskMaker.start();
        try (TriageScreen.Tty tty = TriageScreen.take(options.ascii())) {
            List<Recording> recordings = new ArrayList<>();
            try {
                for (Path p : logs) {
                    recordings.add(LogReader.read(p, readOptions));
                }
            } catch (LogException | RuntimeException e) {
                deskReady.thenAccept(VisitDesk::close);
                throw e;
            }
            try (VisitDesk desk = desk(deskReady)) {
                TriageScreen.Ending end = TriageScreen.open(tty, recordings, options, desk);
                return end == TriageScreen.Ending.QUIT ? ExitCode.OK : ExitCode.INTERRUPTED;
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return ExitCode.INTERRUPTED;
        }
    }
}
