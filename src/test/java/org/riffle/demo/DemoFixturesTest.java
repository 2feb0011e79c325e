package org.riffle.demo;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The committed demo fixtures are exactly what the generator writes, and stay within their size budget. */
class DemoFixturesTest {
    private static final Path COMMITTED = Path.of("fixtures", "demo");

    @Test
    void committedFixturesAreByteIdenticalToAFreshGeneration(@TempDir Path tmp) throws IOException {
        List<Path> written = Demo.writeTo(tmp);
        assertEquals(3, written.size());
        for (Path p : written) {
            Path committed = COMMITTED.resolve(p.getFileName());
            assertTrue(Files.isRegularFile(committed), committed + " is missing: run 'riffle demo fixtures/demo'");
            assertArrayEquals(Files.readAllBytes(committed), Files.readAllBytes(p),
                    committed + " differs from the generator's output: regenerate with 'riffle demo fixtures/demo'");
        }
        try (Stream<Path> s = Files.list(COMMITTED)) {
            assertEquals(written.stream().map(p -> p.getFileName().toString()).sorted().toList(),
                    s.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList()),
                    "fixtures/demo holds exactly the generated files");
        }
        try (Stream<Path> s = Files.list(tmp)) {
            assertEquals(3, s.count(), "no temporary files left behind");
        }
    }

    @Test
    void twoGenerationsAreIdentical() {
        Map<String, byte[]> a = Demo.files();
        Map<String, byte[]> b = Demo.files();
        assertEquals(a.keySet(), b.keySet());
        a.forEach((name, bytes) -> assertArrayEquals(bytes, b.get(name), name));
    }

    @Test
    void fixturesStayWithinTheirSizeBudget() {
        Map<String, byte[]> f = Demo.files();
        assertTrue(f.get(ProcessLog.FILE).length <= 2_000_000, "process log " + f.get(ProcessLog.FILE).length);
        assertTrue(f.get(VibrationRecording.FILE).length <= 1_500_000, "wav " + f.get(VibrationRecording.FILE).length);
    }

    @Test
    void processLogHasThePromisedShape() {
        String text = new String(ProcessLog.bytes(), StandardCharsets.UTF_8);
        String[] lines = text.split("\r\n", -1);
        assertEquals("", lines[lines.length - 1], "ends with CRLF");
        assertTrue(lines[0].startsWith("# device "), lines[0]);
        assertEquals("# interval 10 s", lines[3]);
        assertEquals(ProcessLog.HEADER, lines[5]);
        int rows = lines.length - 7;
        assertEquals(ProcessLog.GRID_ROWS - ProcessLog.GAP_ROWS, rows);
        assertTrue(text.contains(",NaN,") && text.contains(",---,"), "missing tokens present");
        assertTrue(lines[lines.length - 2].endsWith(",STOP") && lines[6].endsWith(",RUN"));
        assertTrue(lines[6].startsWith("2026-02-16T00:00:00+01:00,"), lines[6]);
        // the restart: 17 min of rows lost, and the grid shifted by 4 s
        String before = lines[6 + ProcessLog.GAP_FROM - 1].substring(0, 25);
        String after = lines[6 + ProcessLog.GAP_FROM].substring(0, 25);
        assertEquals("2026-02-16T20:09:30+01:00", before);
        assertEquals("2026-02-16T20:26:44+01:00", after); // 102 rows lost: a 1034 s step
    }

    @Test
    void demoImportsOnlyTheJdk() {
        noClasses().that().resideInAPackage("org.riffle.demo..")
                .should().dependOnClassesThat().resideOutsideOfPackages("java..", "org.riffle.demo..")
                .check(new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                        .importPackages("org.riffle.demo"));
    }
}
