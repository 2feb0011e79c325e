package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.zip.Deflater;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A log whose samples alone need more than the whole heap, through the shaded jar under {@code -Xmx64m}:
 * read in reduced form, exit status 0, the reduction said in one line on standard output and standard
 * error, and no stack trace. The log is gzip (its length unknown until the end) and carries one spike in
 * the middle, outside both windows kept at full resolution, which the whole-log maximum must still show.
 */
class BigLogIT {
    private static final int ROWS = 2_000_000;
    private static final int CHANNELS = 8;
    private static final int SPIKE_ROW = ROWS / 2;

    /** 2,000,000 rows × 8 channels: 61 MiB of samples and 15 MiB of times, more than a 64 MiB heap. */
    private static Path write(Path file) throws IOException {
        Random r = new Random(8L);
        try (OutputStream os = Files.newOutputStream(file);
             OutputStream z = new GZIPOutputStream(os, 1 << 16) {
                 {
                     def.setLevel(Deflater.BEST_SPEED);
                 }
             };
             BufferedWriter w = new BufferedWriter(new OutputStreamWriter(z, StandardCharsets.US_ASCII), 1 << 16)) {
            StringBuilder sb = new StringBuilder("t_s");
            for (int c = 0; c < CHANNELS; c++) {
                sb.append(",ch").append(c);
            }
            w.write(sb.append('\n').toString());
            for (int i = 0; i < ROWS; i++) {
                sb.setLength(0);
                sb.append(i);
                for (int c = 0; c < CHANNELS; c++) {
                    int v = i == SPIKE_ROW && c == 0 ? 990 : r.nextInt(100);
                    sb.append(',').append(v / 10).append('.').append(v % 10);
                }
                w.write(sb.append('\n').toString());
            }
        }
        return file;
    }

    private record Run(int status, String out, String err) {
    }

    private static Run riffle(Path dir, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx64m", "-XX:-UsePerfData", "-jar", ReportIT.JAR.toAbsolutePath().toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(dir.toFile());
        pb.environment().put("LANG", "C.UTF-8");
        Process p = pb.redirectOutput(dir.resolve(".out").toFile()).redirectError(dir.resolve(".err").toFile()).start();
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "riffle did not finish in 300 s");
        Run r = new Run(p.exitValue(), Files.readString(dir.resolve(".out")), Files.readString(dir.resolve(".err")));
        for (String s : List.of(r.out(), r.err())) {
            assertFalse(s.contains("Exception") || s.contains("Error") || s.contains("\tat "), "a stack trace: " + s);
        }
        return r;
    }

    @Test
    void aLogLargerThanTheHeapIsReadReducedWithOneLineAndNoStackTrace(@TempDir Path dir) throws Exception {
        Path log = write(dir.resolve("long-run.csv.gz"));
        Run r = riffle(dir, "channels", "--ascii", log.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertTrue(lines.get(0).startsWith(log + ": 2000000 rows ("), lines.get(0));
        String said = lines.get(1);
        // 582 MiB and -Xmx2g on 2 cores; the analysis's share grows with the cores (MemoryBudget)
        assertTrue(said.matches("REDUCED to fit memory: the 2,000,000 rows \\(77 MiB of samples\\) and their"
                + " analysis need about [\\d,]+ MiB, riffle had .*"), said);
        assertTrue(said.contains(" of its 64 MiB heap; analysed at full resolution: rows 0-"), said);
        assertTrue(said.matches(".*; to read it whole: java -Xmx\\d+g -jar riffle\\.jar \\.\\.\\."), said);
        assertEquals(List.of("riffle: " + log + ": " + said), r.err().lines().toList(), "one line on stderr too");
        String[] ch0 = lines.stream().filter(l -> l.startsWith("ch0 ")).findFirst().orElseThrow().split("\\s+");
        assertEquals("2000000", ch0[2], "samples of the whole log");
        assertEquals("99", ch0[8], "the spike between the kept windows is the whole-log maximum");
        assertEquals("0", ch0[7], "the whole-log minimum");

        // the normal analysis runs on the kept rows: the note is written and says the log was reduced
        Run report = riffle(dir, "report", log.toString(), "-o", "note.txt");
        assertEquals(0, report.status(), report.err());
        assertTrue(report.err().startsWith("riffle: " + log + ": REDUCED to fit memory: "), report.err());
        String note = Files.readString(dir.resolve("note.txt"), StandardCharsets.UTF_8).replaceAll("\\s+", " ");
        assertTrue(note.contains("long-run.csv.gz: REDUCED to fit memory: the 2,000,000 rows"), note);
        assertTrue(note.contains("2000000 rows, of which "), note);
    }

    /**
     * A WAV whose samples need more than the heap (10,000,000 frames of 2 channels: 76 MiB as floats,
     * 38 MiB on disk), one spike in the middle: read reduced, not refused.
     */
    @Test
    void aRecordingLargerThanTheHeapIsReadReduced(@TempDir Path dir) throws Exception {
        int frames = 10_000_000;
        Path wav = dir.resolve("long-run.wav");
        try (OutputStream os = new java.io.BufferedOutputStream(Files.newOutputStream(wav), 1 << 16)) {
            java.nio.ByteBuffer h = java.nio.ByteBuffer.allocate(44).order(java.nio.ByteOrder.LITTLE_ENDIAN);
            h.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(36 + frames * 4)
                    .put("WAVEfmt ".getBytes(StandardCharsets.US_ASCII)).putInt(16).putShort((short) 1)
                    .putShort((short) 2).putInt(5120).putInt(5120 * 4).putShort((short) 4).putShort((short) 16)
                    .put("data".getBytes(StandardCharsets.US_ASCII)).putInt(frames * 4);
            os.write(h.array());
            byte[] frame = new byte[4];
            for (int i = 0; i < frames; i++) {
                int v = i == frames / 2 ? 30_000 : (i * 37) % 2000 - 1000;
                frame[0] = (byte) v;
                frame[1] = (byte) (v >> 8);
                frame[2] = (byte) v;
                frame[3] = (byte) (v >> 8);
                os.write(frame);
            }
        }
        Run r = riffle(dir, "channels", "--ascii", wav.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertTrue(lines.get(1).startsWith("REDUCED to fit memory: the 10,000,000 rows"), lines.get(1));
        String[] ch1 = lines.stream().filter(l -> l.startsWith("ch1 ")).findFirst().orElseThrow().split("\\s+");
        assertEquals("10000000", ch1[2], "frames of the whole recording");
        assertEquals(30_000 / 32_768.0, Double.parseDouble(ch1[8]), 1e-3, "the spike is the whole-file maximum");
    }
}
