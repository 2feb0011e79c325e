package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.riffle.bench.ReadBench;

/**
 * The byte-level fast path and the general Commons CSV path give identical recordings, bit for bit: the
 * general path (every line through Commons CSV) is the slow, obvious oracle.
 */
class FastPathTest {
    static Stream<Path> textFixtures() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("fixtures", "dialects"))) {
            List<Path> all = s.filter(p -> !p.toString().endsWith(".wav")).sorted().toList();
            return Stream.concat(all.stream(), Stream.of(Path.of("fixtures", "demo", "af2-process.csv")));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("textFixtures")
    void bothPathsReadEveryFixtureAlike(Path file) throws LogException {
        ReadOptions o = file.toString().contains("slash-dates.csv") || file.toString().contains("us-am-pm")
                ? ReadOptions.defaults().withDateOrder(ReadOptions.DateOrder.MONTH_FIRST) : ReadOptions.defaults();
        Recording fast = LogReader.read(file, o);
        Recording general = LogReader.readAllGeneral(file, o);
        Recordings.assertIdentical(fast, general, file.toString());
    }

    @Test
    void bothPathsReadTheBenchLayoutAlike(@TempDir Path dir) throws IOException, LogException {
        Path f = ReadBench.writeCsv(dir.resolve("bench.csv"), 3000, 8, 7L);
        Recordings.assertIdentical(LogReader.read(f, ReadOptions.defaults()),
                LogReader.readAllGeneral(f, ReadOptions.defaults()), "bench layout");
    }

    @Test
    void bothPathsRefuseTheSameBadRow(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("extra.csv");
        Files.writeString(f, "time,a\n2026-03-01 08:00:00,1\n2026-03-01 08:00:01,2,3\n");
        LogException fast = assertThrows(LogException.class, () -> LogReader.read(f, ReadOptions.defaults()));
        LogException general = assertThrows(LogException.class,
                () -> LogReader.readAllGeneral(f, ReadOptions.defaults()));
        assertEquals(f + ":3:23: more fields than the 2 columns of the header; check the delimiter (--delimiter)"
                + " or quote fields that hold it", fast.getMessage());
        assertEquals(fast.getMessage(), general.getMessage(), "the general path names the column too");
    }

    /** Columns count characters from 1 on the line where the extra field begins, quoted line breaks and all. */
    @Test
    void theGeneralPathNamesTheLineAndColumnOfAnExtraField(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("quoted.csv");
        Files.writeString(f, "time,a,note\n2026-03-01 08:00:00,1,\"ok\"\n2026-03-01 08:00:01,2,\"two\nlines\",9\n");
        LogException e = assertThrows(LogException.class, () -> LogReader.read(f, ReadOptions.defaults()));
        assertEquals(f + ":4:8: more fields than the 3 columns of the header; check the delimiter (--delimiter)"
                + " or quote fields that hold it", e.getMessage(), "'9' after 'lines\",' on line 4");
        Path s = dir.resolve("semi.csv");
        Files.writeString(s, "time;a\n2026-03-01 08:00:00;1\n2026-03-01 08:00:01;2\n2026-03-01 08:00:02;\"1;5\";\"x\"\n");
        LogException e2 = assertThrows(LogException.class, () -> LogReader.read(s, ReadOptions.defaults()
                .withDelimiter(';')));
        assertEquals(s + ":4:27: more fields than the 2 columns of the header; check the delimiter (--delimiter)"
                + " or quote fields that hold it", e2.getMessage(), "the quoted ';' is no delimiter");
    }

    @Test
    void fieldStartsAreFoundAsTheSplitterCountsFields() {
        assertEquals(0, Splitter.fieldStart("a,b,c", ',', 0));
        assertEquals(4, Splitter.fieldStart("a,b,c", ',', 2));
        assertEquals(8, Splitter.fieldStart("\"a,\"\"b\",c", ',', 1), "a doubled quote stays inside");
        assertEquals(-1, Splitter.fieldStart("a,b", ',', 2));
        assertEquals(6, Splitter.fieldStart("  1   2  3", Dialect.WHITESPACE, 1));
        assertEquals(2, Splitter.fieldStart("  \"x y\" 2", Dialect.WHITESPACE, 0));
        assertEquals(8, Splitter.fieldStart("  \"x y\" 2", Dialect.WHITESPACE, 1));
    }
}
