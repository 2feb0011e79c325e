package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.riffle.log.LogException;
import org.riffle.log.ReadOptions;
import picocli.CommandLine;

/** The entry point: builds the command line, runs it, exits with its status. */
public final class Main {
    /**
     * The subcommands' names, in the order the help lists them; {@link #subcommand} makes each. Names
     * and a switch rather than a map of constructors: linking ten constructor references (and loading
     * their classes) was a cost on the way to the first frame.
     */
    private static final List<String> SUBCOMMANDS = List.of("channels", "spectrum", "open", "report", "baseline",
            "demo", "rqa", "trend", "health", "bench");

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /**
     * Runs riffle with {@code args}, writing to {@code out} and {@code err} through a {@link SafeWriter}
     * each (control characters from input neutralised); returns the exit status.
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        PrintWriter e = new PrintWriter(new SafeWriter(err), true);
        try {
            List<Path> logs = plainLogs(args);
            if (logs != null) {
                try {
                    return OpenCommand.open(logs, ReadOptions.defaults(), false, e);
                } catch (Exception ex) {
                    return failed(ex, e);
                }
            }
            return commandLine(new PrintWriter(new SafeWriter(out), true), e, args).execute(args);
        } catch (OutOfMemoryError oom) {
            // The arrays that held the log are unreachable once the command has unwound, so there is
            // room for this line. A log too large for the heap is read in reduced form (log.Reduction);
            // this is the last resort when even that, or the analysis of what was kept, does not fit.
            e.println(outOfMemory());
            return ExitCode.FAILED;
        }
    }

    /** The one line for a run that ran out of memory: the heap limit and how to raise it. */
    static String outOfMemory() {
        return "riffle: not enough memory: the Java heap limit is " + Runtime.getRuntime().maxMemory() / (1024 * 1024)
                + " MiB; raise it, e.g. java -Xmx4g -jar riffle.jar ..., or split the log into shorter files";
    }

    /** True when {@code t} or one of its causes is an {@link OutOfMemoryError} (a worker's, wrapped). */
    static boolean outOfMemory(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause() == c ? null : c.getCause()) {
            if (c instanceof OutOfMemoryError) {
                return true;
            }
        }
        return false;
    }

    /**
     * The logs of a plain {@code riffle LOG [LOG...]}: every argument a path, none an option, an
     * {@code @file} or {@code -} (standard input), the first not a subcommand's name; else null. Such a
     * command line opens the screen without building the command line parser, which on a cold JVM cost
     * about half a second before the first frame (measured on the 2-core bench machine).
     */
    static List<Path> plainLogs(String[] args) {
        if (args.length == 0 || SUBCOMMANDS.contains(args[0])) {
            return null;
        }
        List<Path> logs = new ArrayList<>();
        for (String a : args) {
            if (a.isEmpty() || a.startsWith("-") || a.startsWith("@")) {
                return null;
            }
            try {
                logs.add(Path.of(a));
            } catch (InvalidPathException bad) {
                return null;
            }
        }
        return logs;
    }

    /** A new instance of the subcommand named {@code name}, one of {@link #SUBCOMMANDS}. */
    private static Object subcommand(String name) {
        return switch (name) {
            case "channels" -> new ChannelsCommand();
            case "spectrum" -> new SpectrumCommand();
            case "open" -> new OpenCommand();
            case "report" -> new ReportCommand();
            case "baseline" -> new BaselineCommand();
            case "demo" -> new DemoCommand();
            case "rqa" -> new RqaCommand();
            case "trend" -> new TrendCommand();
            case "health" -> new HealthCommand();
            case "bench" -> new BenchCommand();
            default -> throw new IllegalArgumentException("no subcommand " + name);
        };
    }

    /** What a failed command prints and returns: one line, never a stack trace unless asked for. */
    static int failed(Exception ex, PrintWriter e) {
        if (ex instanceof LogException) {
            e.println("riffle: " + ex.getMessage());
            return ExitCode.BAD_INPUT;
        }
        if (outOfMemory(ex)) {
            e.println(outOfMemory());
            return ExitCode.FAILED;
        }
        e.println("riffle: internal error: " + ex + " (set RIFFLE_DEBUG=1 for details; please report)");
        if (System.getenv("RIFFLE_DEBUG") != null) {
            ex.printStackTrace(e);
        }
        return ExitCode.INTERNAL;
    }

    /** The configured command line with every subcommand, for tests and for the help. */
    static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        return commandLine(out, err, new String[0]);
    }

    /**
     * The configured command line for {@code args}: when the first argument names a subcommand, with that
     * subcommand alone (the others are not needed to run it, and building each costs start-up time); else
     * with all of them, in the order the help lists them.
     */
    static CommandLine commandLine(PrintWriter out, PrintWriter err, String[] args) {
        CommandLine cl = new CommandLine(new RiffleCommand());
        if (args.length > 0 && SUBCOMMANDS.contains(args[0])) {
            cl.addSubcommand(args[0], subcommand(args[0]));
        } else {
            for (String name : SUBCOMMANDS) {
                cl.addSubcommand(name, subcommand(name));
            }
        }
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> failed(ex, commandLine.getErr()));
        cl.setParameterExceptionHandler((ex, rest) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("riffle: " + ex.getMessage());
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for more.");
            return ExitCode.USAGE;
        });
        return cl;
    }
}
