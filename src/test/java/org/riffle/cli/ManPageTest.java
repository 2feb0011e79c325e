package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The manual page documents the whole command line: every command and subcommand (hidden ones too),
 * found by walking picocli's model so commands added later are covered without editing this test, and
 * every option name of each; and {@code groff -man -ww -z} reports no warning.
 */
class ManPageTest {
    private static final Path MAN = Path.of("man", "riffle.1");

    /** The page's text with troff's escaped hyphens and font changes undone. */
    static String manText() throws IOException {
        String s = Files.readString(MAN, StandardCharsets.UTF_8);
        return s.replace("\\-", "-").replaceAll("\\\\f[BIRP]", "").replace("\\&", "").replace("\\%", "")
                .replace("\\:", "");
    }

    private static List<CommandSpec> allCommands() {
        CommandLine root = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        List<CommandSpec> all = new ArrayList<>();
        collect(root.getCommandSpec(), all);
        return all;
    }

    private static void collect(CommandSpec spec, List<CommandSpec> out) {
        out.add(spec);
        for (CommandLine sub : spec.subcommands().values()) {
            if (!out.contains(sub.getCommandSpec())) {
                collect(sub.getCommandSpec(), out);
            }
        }
    }

    @Test
    void everyCommandAndOptionIsInTheManPage() throws IOException {
        String text = manText();
        List<String> missing = new ArrayList<>();
        List<CommandSpec> commands = allCommands();
        assertTrue(commands.size() >= 3, "riffle, channels, demo at least: " + commands.size());
        for (CommandSpec c : commands) {
            if (!text.contains(c.qualifiedName())) {
                missing.add("command '" + c.qualifiedName() + "'");
            }
            for (OptionSpec o : c.options()) {
                for (String name : o.names()) {
                    Pattern p = Pattern.compile("(?<![\\w-])" + Pattern.quote(name) + "(?![\\w-])");
                    if (!p.matcher(text).find()) {
                        missing.add("option " + name + " of '" + c.qualifiedName() + "'");
                    }
                }
            }
        }
        assertEquals(List.of(), missing, "not documented in " + MAN);
    }

    @Test
    void groffReportsNoWarnings() throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder("groff", "-man", "-ww", "-z", MAN.toString()).redirectErrorStream(true).start();
        } catch (IOException e) {
            fail("groff is not installed (needed to check man/riffle.1; CI installs it, or: apt-get install groff): "
                    + e.getMessage());
            return;
        }
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "groff did not finish");
        assertEquals("", out, "groff warnings on " + MAN);
        assertEquals(0, p.exitValue(), "groff exit status");
    }
}
