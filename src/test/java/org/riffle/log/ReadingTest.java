package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Behaviour of the reader beyond single dialects: streams, damage, overrides, encodings. */
class ReadingTest {
    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return Files.write(dir.resolve(name), text.getBytes(StandardCharsets.UTF_8));
    }

    private static float[] values(Recording r, String channel) {
        return r.channel(channel).orElseThrow().values();
    }

    @Test
    void standardInputIsReadLikeAFile() throws IOException, LogException {
        byte[] bytes = Files.readAllBytes(Path.of("fixtures", "dialects", "semicolon-decimal-comma.csv"));
        Recording r = LogReader.read(new ByteArrayInputStream(bytes), "-", ReadOptions.defaults());
        assertEquals("-", r.source().file());
        assertEquals(-1, r.source().sizeBytes());
        assertArrayEquals(new float[] {21.5f, 21.6f, 21.4f}, values(r, "Temperatur"));
    }

    @Test
    void gzipIsRecognisedByItsBytesWhateverTheName() throws IOException, LogException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(b)) {
            gz.write(Files.readAllBytes(Path.of("fixtures", "dialects", "tab-epoch.tsv")));
        }
        Path f = Files.write(dir.resolve("export.txt"), b.toByteArray());
        assertArrayEquals(new float[] {3.5f, 3.6f, 3.4f}, values(LogReader.read(f, ReadOptions.defaults()), "flow"));
    }

    @Test
    void aLastLineCutShortByAPowerLossKeepsTheLog() throws IOException, LogException {
        StringBuilder sb = new StringBuilder("time,a,b,c\n");
        for (int i = 0; i < 50; i++) {
            sb.append(String.format("2026-03-01 08:00:%02d,%d,%d,%d%n", i, i, 2 * i, 3 * i));
        }
        sb.append("2026-03-01 08:00:50,50,1");
        Recording r = LogReader.read(write("cut.csv", sb.toString()), ReadOptions.defaults());
        assertEquals(51, r.rows());
        assertEquals(1.0f, r.channel("b").orElseThrow().value(50), "the cut cell is read as written");
        assertTrue(Float.isNaN(r.channel("c").orElseThrow().value(50)));
        assertEquals(List.of("1 row with fewer fields than the 4 columns (first at line 52): the missing cells count"
                + " as missing samples"), r.source().warnings().subList(1, 2));
    }

    @Test
    void moreThanOneShortRowPerThousandIsRefused() throws IOException {
        StringBuilder sb = new StringBuilder("time,a,b\n");
        for (int i = 0; i < 1999; i++) {
            sb.append(i).append(i % 1000 == 500 ? ",1\n" : ",1,2\n");
        }
        sb.append("1999,1\n");
        LogException e = assertThrows(LogException.class, () -> LogReader.read(write("short.csv", sb.toString()),
                ReadOptions.defaults().withTimeColumn("time")));
        assertEquals(dir.resolve("short.csv") + ":502: 2 of 3 fields, and 2 more short rows: not a consistent"
                + " table; check the delimiter (--delimiter) or the lines to skip (--skip-rows)", e.getMessage());
    }

    @Test
    void optionsOverrideDetection() throws IOException, LogException {
        Path f = write("opts.csv", "Logger 7\nsecond line\nt;x;y\n1;2;3\n2;4;6\n3;6;9\n");
        Recording r = LogReader.read(f, ReadOptions.defaults().withSkipRows(2).withTimeColumn("none")
                .withSampleRate(4));
        assertEquals(List.of("Logger 7", "second line"), r.source().preamble());
        assertArrayEquals(new float[] {1, 2, 3}, values(r, "t"), "t is data when told there is no time column");
        assertEquals(0.5, r.time().seconds(2));
        Recording timed = LogReader.read(f, ReadOptions.defaults().withTimeColumn("2"));
        assertEquals(4.0, timed.time().seconds(1), "x is the time column: elapsed seconds as written");
        Path u = write("units.csv", "a,b\nV,A\n1,2\n3,4\n");
        assertEquals("V", LogReader.read(u, ReadOptions.defaults()).channel("a").orElseThrow().unit());
        Recording data = LogReader.read(u, ReadOptions.defaults().withUnitsRow(false));
        assertArrayEquals(new float[] {Float.NaN, 1, 3}, values(data, "a"), "V is then a text cell in the data");
    }

    @Test
    void anUnknownTimeColumnNamesTheColumns() throws IOException {
        LogException e = assertThrows(LogException.class, () -> LogReader.read(write("t.csv", "a,b\n1,2\n"),
                ReadOptions.defaults().withTimeColumn("zeit")));
        assertEquals(dir.resolve("t.csv") + ": no column 'zeit' for --time-column; columns are: a, b", e.getMessage());
    }

    @Test
    void whitespaceAlignedWithDecimalComma() throws IOException, LogException {
        Recording r = LogReader.read(write("ws.txt", "t   a      b\n0   1,5    -2,25\n1   1,75   -2,5\n"),
                ReadOptions.defaults());
        assertEquals(Dialect.WHITESPACE, r.source().dialect().orElseThrow().delimiter());
        assertArrayEquals(new float[] {1.5f, 1.75f}, values(r, "a"));
        assertArrayEquals(new float[] {-2.25f, -2.5f}, values(r, "b"));
    }

    @Test
    void aSingleColumnWithADecimalCommaIsNotSplitByTheComma() throws IOException, LogException {
        Recording r = LogReader.read(write("one.csv", "Wert [bar]\n1,5\n2,25\n-3,125\n"), ReadOptions.defaults());
        assertArrayEquals(new float[] {1.5f, 2.25f, -3.125f}, values(r, "Wert"));
    }

    @Test
    void utf8IsRefusedWhenItIsNotWhatTheUserSaid() throws IOException, LogException {
        Path f = Files.write(dir.resolve("l1.csv"), "a [\u00b5m]\n1\n".getBytes(Encodings.LEGACY));
        assertEquals("µm", LogReader.read(f, ReadOptions.defaults()).channels().get(0).unit());
        LogException e = assertThrows(LogException.class, () -> LogReader.read(f,
                ReadOptions.defaults().withCharset(StandardCharsets.UTF_8)));
        assertEquals(f + ":1:4: byte 0xB5 is not valid UTF-8; try --encoding windows-1252", e.getMessage());
    }

    @Test
    void utf8ValidityMatchesTheJdkDecoder() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(5L);
        for (int k = 0; k < 100_000; k++) {
            byte[] b = new byte[1 + rnd.nextInt(6)];
            for (int i = 0; i < b.length; i++) {
                b[i] = (byte) (rnd.nextInt(3) == 0 ? rnd.nextInt(128) : 0x80 + rnd.nextInt(128));
            }
            boolean jdk;
            try {
                StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(b));
                jdk = true;
            } catch (java.nio.charset.CharacterCodingException ex) {
                jdk = false;
            }
            assertEquals(jdk, Encodings.isUtf8(b, 0, b.length), java.util.Arrays.toString(b));
        }
    }
}
