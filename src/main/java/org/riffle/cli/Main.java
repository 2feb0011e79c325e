package org.riffle.cli;

import java.io.PrintWriter;
import org.riffle.log.LogException;
import picocli.CommandLine;

/** The entry point: builds the command line, runs it, exits with its status. */
public final class Main {
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
            return commandLine(new PrintWriter(new SafeWriter(out), true), e).execute(args);
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

    /** The configured command line, for tests and for {@link #run}. */
    static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new RiffleCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            PrintWriter e = commandLine.getErr();
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
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("riffle: " + ex.getMessage());
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for more.");
            return ExitCode.USAGE;
        });
        return cl;
    }
}
