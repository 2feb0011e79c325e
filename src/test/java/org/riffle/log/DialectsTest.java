package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * One sample file per dialect in {@code fixtures/dialects/}, read with every setting detected. Expected
 * values are the decimal numbers written in the files, compared exactly as {@code float}s: the nearest
 * float to the decimal (analytic: IEEE 754 round-to-nearest, which the Java compiler also applies to the
 * literals here, JLS 17 §3.10.2), since the reader rounds correctly. Times are exact sums of the written
 * fields (analytic).
 */
class DialectsTest {
    static final Path DIR = Path.of("fixtures", "dialects");

    static Recording read(String name) throws LogException {
        return LogReader.read(DIR.resolve(name), ReadOptions.defaults());
    }

    static Recording read(String name, ReadOptions o) throws LogException {
        return LogReader.read(DIR.resolve(name), o);
    }

    static void assertChannel(Recording r, String name, String unit, float... expected) {
        Channel c = r.channel(name).orElseThrow(() -> new AssertionError("no channel " + name + " in "
                + r.channels()));
        assertEquals(unit, c.unit(), name);
        assertArrayEquals(expected, c.values(), name);
    }

    static void assertSeconds(Recording r, double... expected) {
        double[] got = new double[r.rows()];
        for (int i = 0; i < got.length; i++) {
            got[i] = r.time().seconds(i);
        }
        assertArrayEquals(expected, got, 1e-9, "seconds (tolerance: 1 ns, the resolution stored)");
    }

    @Test
    void commaWithIsoUtcTimes() throws LogException {
        Recording r = read("comma.csv");
        assertEquals(',', r.source().dialect().orElseThrow().delimiter());
        assertChannel(r, "flow", "m3/h", 12.5f, 12.6f, 12.4f);
        assertChannel(r, "pressure", "bar", 1.013f, 1.015f, 1.012f);
        assertChannel(r, "current", "A", 42.0f, 42.5f, 41.9f);
        assertSeconds(r, 0, 1, 2);
        assertEquals(Instant.parse("2026-03-01T08:00:00Z"), r.time().origin().orElseThrow());
        assertEquals(1.0, r.time().rateHz());
        assertTrue(r.timeIssues().isEmpty());
    }

    @Test
    void semicolonDecimalCommaWindows1252CrlfWithPreamble() throws LogException {
        Recording r = read("semicolon-decimal-comma.csv");
        Dialect d = r.source().dialect().orElseThrow();
        assertEquals(new Dialect(';', true, false, 4, true, false), d);
        assertEquals("windows-1252", r.source().encoding());
        assertEquals(List.of("Gerät: Lüfter 7 Messumformer", "Seriennummer: 4711-0815", "Intervall: 10 s"),
                r.source().preamble());
        assertChannel(r, "Luftstrom", "m³/h", 1234.5f, 1235.0f, 1233.75f);
        assertChannel(r, "Temperatur", "°C", 21.5f, 21.6f, 21.4f);
        assertChannel(r, "Druck", "mbar", -0.25f, -0.30f, -0.20f);
        assertSeconds(r, 0, 10, 20);
        assertEquals(0.1, r.time().rateHz(), 1e-12);
        assertEquals(Instant.parse("2026-03-01T08:00:00Z"), r.time().origin().orElseThrow());
    }

    @Test
    void unitsRowUnderTheNamesAndElapsedSeconds() throws LogException {
        Recording r = read("semicolon-units-row.csv");
        assertTrue(r.source().dialect().orElseThrow().unitsRow());
        assertChannel(r, "speed", "rpm", 1480f, 1481f, 1479f);
        assertChannel(r, "vibration", "mm/s", 2.31f, 2.35f, 2.29f);
        assertChannel(r, "bearing temperature", "°C", 45.2f, 45.3f, 45.3f);
        assertSeconds(r, 0, 0.5, 1.0);
        assertTrue(r.time().origin().isEmpty(), "elapsed time has no wall-clock origin");
        assertEquals(2.0, r.time().rateHz());
    }

    @Test
    void tabWithEpochSeconds() throws LogException {
        Recording r = read("tab-epoch.tsv");
        assertEquals('\t', r.source().dialect().orElseThrow().delimiter());
        assertChannel(r, "flow", "", 3.5f, 3.6f, 3.4f);
        assertChannel(r, "level", "", 0.75f, 0.80f, 0.85f);
        assertSeconds(r, 0, 60, 120);
        // analytic: 1772352000 s after 1970-01-01T00:00Z is 2026-03-01T08:00Z (20513 days + 8 h)
        assertEquals(Instant.parse("2026-03-01T08:00:00Z"), r.time().origin().orElseThrow());
    }

    @Test
    void whitespaceAlignedWithCommentAndBracketUnits() throws LogException {
        Recording r = read("whitespace.txt");
        assertEquals(Dialect.WHITESPACE, r.source().dialect().orElseThrow().delimiter());
        assertEquals(List.of("# vibration overall, fan 7 drive end"), r.source().preamble());
        assertChannel(r, "velocity", "mm/s", 1.25f, 1.375f, 1.125f);
        assertChannel(r, "accel", "g", 0.031f, -0.012f, 0.0f);
        assertSeconds(r, 0, 0.1, 0.2);
    }

    @Test
    void quotedFieldsWithDelimiterEscapedQuoteAndLineBreak() throws LogException {
        Recording r = read("quoted.csv");
        assertTrue(r.source().dialect().orElseThrow().quoted());
        assertChannel(r, "value", "", 3.25f, 3.5f, 3.75f);
        assertSeconds(r, 0, 1, 2);
        assertEquals(List.of("tag", "note"), r.textChannels().stream().map(TextChannel::name).toList());
        assertEquals(List.of("ok", "says \"check\", later", "two\nlines"), r.textChannels().get(1).distinct());
    }

    @Test
    void utf8WithByteOrderMarkAndMillisecondTimes() throws LogException {
        Recording r = read("utf8-bom.csv");
        assertEquals("UTF-8", r.source().encoding());
        assertChannel(r, "temperature", "°C", 20.5f, 20.6f, 20.7f);
        assertChannel(r, "displacement", "µm", 12.0f, 12.5f, 13.0f);
        assertSeconds(r, 0, 0.25, 0.5);
        assertEquals(4.0, r.time().rateHz());
    }

    @Test
    void headerlessNumbersAreNamedCol1ToColN() throws LogException {
        Recording r = read("headerless.csv", ReadOptions.defaults().withSampleRate(50));
        assertFalse(r.source().dialect().orElseThrow().header());
        assertChannel(r, "col1", "", 1.5f, 1.6f, 1.7f, 1.8f);
        assertChannel(r, "col3", "", 3.5f, 3.6f, 3.7f, 3.8f);
        assertEquals(50.0, r.time().rateHz());
        assertSeconds(r, 0, 0.02, 0.04, 0.06);
    }

    @Test
    void noTimeAndNoRateMeansIndexedSamples() throws LogException {
        Recording r = read("headerless.csv");
        assertTrue(r.time().isIndexed());
        assertTrue(r.source().warnings().contains("no time column: samples are numbered (give --rate to set a"
                + " sample rate)"), r.source().warnings().toString());
    }

    @Test
    void sampleRateFromThePreambleOfASingleColumn() throws LogException {
        Recording r = read("preamble-rate.csv");
        assertChannel(r, "accel", "g", 0.125f, -0.25f, 0.5f, -0.001f);
        assertEquals(2500.0, r.time().rateHz());
        assertEquals(List.of("Logger: FanVib 2", "Sample rate: 2.5 kHz"), r.source().preamble());
    }

    @Test
    void gzipIsUnpackedAndReadsLikeThePlainFile() throws LogException {
        Recording plain = read("comma.csv");
        Recording packed = read("comma.csv.gz");
        assertTrue(packed.source().format().contains("gzip"), packed.source().format());
        for (Channel c : plain.channels()) {
            assertArrayEquals(c.values(), packed.channel(c.name()).orElseThrow().values(), c.name());
        }
    }
}
