package org.riffle.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The top-level {@code riffle} command: lists the subcommands. */
@Command(name = "riffle",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = {
            "Field triage of equipment sensor logs: every channel judged against its healthy baseline.",
            "Screening aid only: decisions belong to qualified maintenance staff under site procedures and local codes."
        },
        subcommands = {
            ChannelsCommand.class,
            ReportCommand.class,
            DemoCommand.class,
        })
final class RiffleCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.USAGE;
    }
}
