package org.riffle.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.riffle.log.LogException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * The top-level {@code riffle} command: {@code riffle LOG...} opens the screen; alone it lists the
 * subcommands, which {@link Main} adds (only the one asked for, when one is).
 */
@Command(name = "riffle",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = {
            "Field triage of equipment sensor logs: every channel judged against its healthy baseline.",
            "Screening aid only: decisions belong to qualified maintenance staff under site procedures and local codes."
        })
final class RiffleCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "0..*", paramLabel = "LOG", description = "Logs to open on the screen (as 'riffle open').")
    private List<Path> logs;

    @Option(names = "--ascii", description = "Draw the screen with ASCII only.")
    private boolean ascii;

    @Override
    public Integer call() throws LogException, IOException {
        if (logs != null && !logs.isEmpty()) {
            return OpenCommand.open(logs, org.riffle.log.ReadOptions.defaults(), ascii, spec.commandLine().getErr());
        }
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.USAGE;
    }
}
