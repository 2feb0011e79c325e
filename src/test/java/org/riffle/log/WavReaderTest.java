package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * WAV recordings: the committed samples in {@code fixtures/dialects/} are exactly what {@link WavWriter}
 * writes (regenerate with {@code -Driffle.fixtures.update=true}), and every format reads back to the
 * analytic fraction of full scale: a signed integer k of b bits reads as k / 2^(b-1), an unsigned 8-bit
 * one as (k - 128) / 128, a float as stored; all these are exact in a float.
 */
class WavReaderTest {
    private static final Path DIR = Path.of("fixtures", "dialects");

    static long[][] frames(int channels, long... flat) {
        long[][] f = new long[flat.length / channels][channels];
        for (int i = 0; i < flat.length; i++) {
            f[i / channels][i % channels] = flat[i];
        }
        return f;
    }

    /** The committed WAV samples and how to write each. */
    static Map<String, byte[]> samples() {
        return Map.of(
                "pcm16-mono.wav", WavWriter.wav(1, 16, 25600, false, false,
                        frames(1, 0, 16384, -16384, 32767, -32768, 1, -1, 8192)),
                "pcm24-stereo.wav", WavWriter.wav(1, 24, 48000, false, true,
                        frames(2, 0, 4194304, -4194304, 8388607, -8388608, 1, 2097152, -2097152)),
                "float32-mono.wav", WavWriter.wav(3, 32, 8000, false, false,
                        frames(1, bits(0.5f), bits(-0.25f), bits(1.0f), bits(-1.5f))),
                "extensible-pcm32-4ch.wav", WavWriter.wav(1, 32, 5120, true, false,
                        frames(4, 0, 1 << 30, -(1L << 30), Integer.MAX_VALUE, Integer.MIN_VALUE, 1 << 29, 1 << 28,
                                -(1L << 28))));
    }

    private static long bits(float f) {
        return Float.floatToIntBits(f);
    }

    @Test
    void committedSamplesAreWhatTheWriterWrites() throws IOException {
        boolean update = Boolean.getBoolean("riffle.fixtures.update");
        for (Map.Entry<String, byte[]> e : samples().entrySet()) {
            Path p = DIR.resolve(e.getKey());
            if (update) {
                Files.write(p, e.getValue());
            }
            assertArrayEquals(e.getValue(), Files.readAllBytes(p), p.toString());
        }
    }

    private static float[] ch(Recording r, int c) {
        return r.channels().get(c).values();
    }

    @Test
    void pcm16MonoInFractionsOfFullScale() throws LogException {
        Recording r = LogReader.read(DIR.resolve("pcm16-mono.wav"), ReadOptions.defaults());
        assertEquals("wav pcm 16-bit, 1 channel, 25600 Hz", r.source().format());
        assertEquals(25600.0, r.time().rateHz());
        assertEquals("FS", r.channels().get(0).unit());
        assertArrayEquals(new float[] {0, 0.5f, -0.5f, 32767 / 32768f, -1, 1 / 32768f, -1 / 32768f, 0.25f}, ch(r, 0));
    }

    @Test
    void pcm24StereoWithAnExtraChunk() throws LogException {
        Recording r = LogReader.read(DIR.resolve("pcm24-stereo.wav"), ReadOptions.defaults());
        assertEquals(List.of("ch1", "ch2"), r.channels().stream().map(Channel::name).toList());
        assertArrayEquals(new float[] {0, -0.5f, -1, 0.25f}, ch(r, 0));
        assertArrayEquals(new float[] {0.5f, 8388607 / 8388608f, 1 / 8388608f, -0.25f}, ch(r, 1));
        assertEquals(3 / 48000.0, r.time().seconds(3), 1e-15);
    }

    @Test
    void float32AndSensitivity() throws LogException {
        Path f = DIR.resolve("float32-mono.wav");
        assertArrayEquals(new float[] {0.5f, -0.25f, 1, -1.5f}, ch(LogReader.read(f, ReadOptions.defaults()), 0));
        Recording g = LogReader.read(f, ReadOptions.defaults().withSensitivity(50, "m/s²"));
        assertEquals("m/s²", g.channels().get(0).unit());
        assertArrayEquals(new float[] {25, -12.5f, 50, -75}, ch(g, 0));
    }

    @Test
    void extensiblePcm32FourChannels() throws LogException {
        Recording r = LogReader.read(DIR.resolve("extensible-pcm32-4ch.wav"), ReadOptions.defaults());
        assertEquals(4, r.channels().size());
        assertArrayEquals(new float[] {0, -1}, ch(r, 0));
        assertArrayEquals(new float[] {0.5f, 0.25f}, ch(r, 1));
        assertArrayEquals(new float[] {-0.5f, 0.125f}, ch(r, 2));
        assertArrayEquals(new float[] {Integer.MAX_VALUE / 2147483648f, -0.125f}, ch(r, 3));
    }

    @Test
    void eightBitUnsignedAndFloat64(@TempDir Path dir) throws IOException, LogException {
        Path u8 = Files.write(dir.resolve("u8.wav"), WavWriter.wav(1, 8, 1000, false, false, frames(1, 128, 192, 0, 255)));
        assertArrayEquals(new float[] {0, 0.5f, -1, 127 / 128f}, ch(LogReader.read(u8, ReadOptions.defaults()), 0));
        Path f64 = Files.write(dir.resolve("f64.wav"), WavWriter.wav(3, 64, 1000, false, false,
                frames(1, Double.doubleToLongBits(0.75), Double.doubleToLongBits(-2))));
        assertArrayEquals(new float[] {0.75f, -2}, ch(LogReader.read(f64, ReadOptions.defaults()), 0));
    }

    @Test
    void aDataChunkCutShortIsReadAsFarAsItGoesWithAWarning(@TempDir Path dir) throws IOException, LogException {
        byte[] full = samples().get("pcm16-mono.wav");
        Path cut = Files.write(dir.resolve("cut.wav"), Arrays.copyOf(full, full.length - 5));
        Recording r = LogReader.read(cut, ReadOptions.defaults());
        assertEquals(5, r.rows(), "16 bytes of 2-byte frames minus 5 bytes: 5 whole frames");
        assertEquals(List.of("the data chunk declares 8 frames but the file holds 5: the recording was cut short"),
                r.source().warnings());
    }

    @Test
    void unsupportedFormatsAreNamed(@TempDir Path dir) throws IOException {
        Path adpcm = Files.write(dir.resolve("adpcm.wav"), WavWriter.wav(2, 16, 8000, false, false, frames(1, 0)));
        LogException e = assertThrows(LogException.class, () -> LogReader.read(adpcm, ReadOptions.defaults()));
        assertEquals(adpcm + ": WAV: format 0x0002 with 16 bits is not supported: riffle reads PCM 8/16/24/32-bit and"
                + " float 32/64-bit", e.getMessage());
        Path avi = Files.write(dir.resolve("x.avi"), "RIFF\u0004\u0000\u0000\u0000AVI ".getBytes(
                java.nio.charset.StandardCharsets.ISO_8859_1));
        assertEquals(avi + ": WAV: a RIFF file of type 'AVI ', not WAVE audio", assertThrows(LogException.class,
                () -> LogReader.read(avi, ReadOptions.defaults())).getMessage());
    }

    /**
     * A recording too large for the memory budget is read in one pass into the reduced form: the first
     * and last frames exactly as a whole read gives them (sensitivity applied), at their own times, and
     * block statistics whose minimum, maximum, mean and count over all blocks are those of every frame
     * (computed here directly from the whole read).
     */
    @Test
    void aRecordingTooLargeForMemoryIsReadReduced(@TempDir Path dir) throws IOException, LogException {
        long[][] frames = new long[20_000][2];
        for (int i = 0; i < frames.length; i++) {
            frames[i][0] = Math.round(8000 * Math.sin(0.01 * i));
            frames[i][1] = i == 9_999 ? 32_000 : (i * 7L * 97) % 20_000 - 10_000;
        }
        Path f = dir.resolve("long.wav");
        Files.write(f, WavWriter.wav(1, 16, 5120, false, false, frames));
        ReadOptions opt = ReadOptions.defaults().withSensitivity(50, "m/s²");
        Recording whole = LogReader.read(f, opt);
        Recording red = LogReader.read(f, opt.withMemoryBytes(200_000));
        assertEquals(true, whole.source().reduction().isEmpty());
        Reduction r = red.source().reduction().orElseThrow();
        assertEquals(20_000, r.rows());
        assertEquals(r.keptRows(), red.rows());
        assertEquals(true, r.keptRows() < 2_000 && r.keptRows() >= 64, r.keptRows() + " kept");
        for (int c = 0; c < 2; c++) {
            Channel w = whole.channels().get(c);
            Channel k = red.channels().get(c);
            assertEquals("m/s²", k.unit());
            for (int i = 0; i < red.rows(); i++) {
                int row = (int) r.logRow(i);
                assertEquals(w.value(row), k.value(i), "channel " + c + " kept row " + i);
                assertEquals(row / 5120.0, red.time().seconds(i), 1e-12, "time of kept row " + i);
            }
            BlockStats b = r.blocks("ch" + (c + 1)).orElseThrow();
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            double sum = 0;
            for (float v : w.values()) {
                min = Math.min(min, v);
                max = Math.max(max, v);
                sum += v;
            }
            double bMin = Double.POSITIVE_INFINITY;
            double bMax = Double.NEGATIVE_INFINITY;
            double bSum = 0;
            long n = 0;
            for (int k2 = 0; k2 < b.blocks(); k2++) {
                bMin = Math.min(bMin, b.min(k2));
                bMax = Math.max(bMax, b.max(k2));
                bSum += b.mean(k2) * b.count(k2);
                n += b.count(k2);
            }
            assertEquals(20_000, n);
            assertEquals(min, bMin, 0);
            assertEquals(max, bMax, 0);
            assertEquals(sum / 20_000, bSum / n, 1e-9);
        }
        assertEquals(50.0 * 32_000 / 32_768, maxOf(r.blocks("ch2").orElseThrow()), 1e-3,
                "the spike at frame 9999, between the kept windows, is in the overview");
    }

    private static double maxOf(BlockStats b) {
        double m = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < b.blocks(); k++) {
            m = Math.max(m, b.max(k));
        }
        return m;
    }
}
