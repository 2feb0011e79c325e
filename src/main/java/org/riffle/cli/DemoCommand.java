package org.riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.riffle.demo.Demo;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle demo DIR}: writes the invented demo fixtures (hidden: a developer's tool). */
@Command(name = "demo", hidden = true, mixinStandardHelpOptions = true,
        description = "Write the demo fixtures of the invented Kestrel Hill AF-2 scenario into DIR "
                + "(created when missing; existing files of the same name are replaced).")
final class DemoCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DIR", description = "The directory to write into.")
    private Path dir;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        try {
            for (Path p : Demo.writeTo(dir)) {
                out.println(p);
            }
            return ExitCode.OK;
        } catch (IOException e) {
            spec.commandLine().getErr().println("riffle: " + dir + ": cannot write the demo fixtures: " + reason(e));
            return ExitCode.FAILED;
        }
    }

    private static String reason(IOException e) {
        if (e instanceof FileAlreadyExistsException) {
            return "a file is in the way of " + e.getMessage();
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied on " + e.getMessage();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
