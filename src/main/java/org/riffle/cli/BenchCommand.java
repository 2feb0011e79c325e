package org.riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.concurrent.Callable;
import org.riffle.bench.BenchRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code riffle bench}: every speed benchmark on generated inputs, a table of medians against the targets. */
@Command(name = "bench", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Time riffle on large generated logs and print a table of medians against the speed "
                + "targets: reading, RQA, the windowed trend, the reservoir, Welch spectra and the whole report "
                + "(in a fresh JVM each run, with its peak resident memory).",
            "The inputs are invented and generated from fixed seeds; they need about 200 MB of disk."},
        footer = {"", "Timings are wall clock; on a busy machine they are inflated (the load average is printed).",
            "Exit status: 0 every target met (or --quick), 1 a target missed, 2 usage error."})
final class BenchCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--quick", description = "Small inputs, to check the harness in seconds; no verdicts.")
    private boolean quick;

    @Option(names = "--warmups", paramLabel = "N", defaultValue = "3",
            description = "Unmeasured runs first, so the JIT settles. Default: ${DEFAULT-VALUE}.")
    private int warmups;

    @Option(names = "--runs", paramLabel = "N", defaultValue = "5",
            description = "Measured runs; the median is reported. Default: ${DEFAULT-VALUE} (fewer for those in a "
                    + "fresh JVM: at most 1 warm-up and 3 to 5 runs, and one run of RQA at N = 100,000).")
    private int runs;

    @Option(names = "--only", paramLabel = "TEXT", defaultValue = "",
            description = "Run only the benchmarks whose name contains TEXT.")
    private String only;

    @Option(names = "--work", paramLabel = "DIR", description = "Where the generated inputs go and stay "
            + "(reused next time). Default: a temporary folder, deleted afterwards.")
    private Path work;

    @Option(names = "--list", description = "List the benchmarks and exit.")
    private boolean list;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (list) {
            BenchRunner.names(quick).forEach(out::println);
            out.flush();
            return ExitCode.OK;
        }
        if (warmups < 0 || runs < 1) {
            throw new ParameterException(spec.commandLine(), "--warmups " + warmups + " and --runs " + runs
                    + ": need --warmups >= 0 and --runs >= 1");
        }
        Path dir = work != null ? Files.createDirectories(work) : Files.createTempDirectory("riffle-bench");
        try {
            int missed = BenchRunner.runAll(quick, warmups, runs, only, dir, out);
            return missed == 0 ? ExitCode.OK : ExitCode.FAILED;
        } finally {
            if (work == null) {
                deleteTree(dir);
            }
        }
    }

    private static void deleteTree(Path dir) throws IOException {
        Files.walkFileTree(dir, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
