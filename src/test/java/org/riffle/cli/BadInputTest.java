package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every bad or hostile sample of {@code fixtures/bad/} through {@code riffle channels}: the status and
 * the exact one-line message of {@code fixtures/bad/expected.tsv}, nothing on standard output, no stack
 * trace. Rows with status 0 are hostile samples that must read cleanly: their message column holds the
 * exact warning lines on standard error, separated by {@code " | "} ({@code -} for none), and the
 * table goes to standard output.
 */
class BadInputTest {
    private static final Path DIR = Path.of("fixtures", "bad");

    static Stream<Arguments> cases() throws IOException {
        List<Arguments> out = new ArrayList<>();
        for (String line : Files.readAllLines(DIR.resolve("expected.tsv"), StandardCharsets.UTF_8)) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t", -1);
            assertEquals(4, f.length, "four tab-separated fields: " + line);
            out.add(Arguments.of(f[0], f[1], Integer.parseInt(f[2]), f[3]));
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void badInputGivesOneLineAndItsStatus(String file, String options, int status, String message) {
        List<String> args = new ArrayList<>(List.of("channels"));
        if (!options.equals("-")) {
            args.addAll(Arrays.asList(options.split(" ")));
        }
        args.add(DIR.resolve(file).toString());
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int got = Main.run(args.toArray(String[]::new), new PrintWriter(out, true), new PrintWriter(err, true));
        String e = err.toString();
        assertFalse(e.contains("Exception") || e.contains("\tat "), "no stack trace: " + e);
        assertEquals(status, got, file + ": " + e);
        if (status == ExitCode.OK) {
            List<String> warnings = message.equals("-") ? List.of() : List.of(message.split(" \\| "));
            assertEquals(warnings, e.strip().lines().toList(), file);
            assertTrue(out.toString().contains("kurt: Pearson"), "the table on standard output: " + out);
            return;
        }
        assertEquals(message, e.strip(), file);
        assertEquals(1, e.strip().lines().count(), "one line: " + e);
        assertEquals("", out.toString(), "nothing on standard output");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void everySampleButTheMissingOneIsCommittedAndSmall(String file, String options, int status, String message)
            throws IOException {
        Path p = DIR.resolve(file);
        if (file.equals("missing.csv")) {
            assertFalse(Files.exists(p), "must stay absent");
        } else {
            assertTrue(Files.exists(p), p.toString());
            assertTrue(Files.isDirectory(p) || Files.size(p) < 64 * 1024, "committed samples stay small: " + p);
        }
    }
}
