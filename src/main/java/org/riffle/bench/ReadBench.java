package org.riffle.bench;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;

/**
 * Benchmark of the log reader for the speed target of issue 2: a CSV of 1,000,000 rows, an ISO 8601
 * timestamp with milliseconds and offset, and 8 channels (about 93 MB) read in at most 0.5 s (median of
 * several runs after warm-up, every timestamp parsed) in a 150 MB heap. The file is invented and
 * written by {@link #writeCsv} from a fixed seed into a folder the caller gives (never committed).
 *
 * <p>Stateless; the harness ({@code riffle bench}) times the benchmark.
 */
public final class ReadBench {
    /** Rows of the target case. */
    public static final int ROWS = 1_000_000;
    /** Channels of the target case. */
    public static final int CHANNELS = 8;

    private ReadBench() {
    }

    /**
     * Writes the bench CSV: a header, then {@code rows} rows of a timestamp every 100 ms from
     * 2026-03-01T08:00:00.000+01:00 and {@code channels} values with two decimals (slow sines plus
     * seeded noise, around different levels). The same arguments give the same bytes.
     */
    public static Path writeCsv(Path file, int rows, int channels, long seed) throws IOException {
        SplittableRandom rnd = new SplittableRandom(seed);
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            StringBuilder sb = new StringBuilder(256);
            sb.append("time");
            for (int c = 0; c < channels; c++) {
                sb.append(",ch").append(c + 1).append(" [unit]");
            }
            out.write(sb.append('\n').toString().getBytes(StandardCharsets.US_ASCII));
            byte[] line = new byte[64 + 16 * channels];
            for (int i = 0; i < rows; i++) {
                int n = stamp(line, i * 100L);
                for (int c = 0; c < channels; c++) {
                    line[n++] = ',';
                    double level = 10.0 * (c + 1) * (c + 1);
                    double v = level + level * 0.1 * Math.sin(i * 1e-4 * (c + 1)) + rnd.nextGaussian();
                    n = fixed2(line, n, v);
                }
                line[n++] = '\n';
                out.write(line, 0, n);
            }
        }
        return file;
    }

    /** Writes {@code 2026-03-01T08:00:00.000+01:00} plus {@code ms} into b; returns the length. */
    private static int stamp(byte[] b, long ms) {
        long t = ms / 1000 + 8 * 3600;
        int day = (int) (t / 86400);
        int sod = (int) (t % 86400);
        String s = String.format(Locale.ROOT, "2026-03-%02d", 1 + day);
        for (int k = 0; k < 10; k++) {
            b[k] = (byte) s.charAt(k);
        }
        b[10] = 'T';
        two(b, 11, sod / 3600);
        b[13] = ':';
        two(b, 14, sod / 60 % 60);
        b[16] = ':';
        two(b, 17, sod % 60);
        b[19] = '.';
        int milli = (int) (ms % 1000);
        b[20] = (byte) ('0' + milli / 100);
        b[21] = (byte) ('0' + milli / 10 % 10);
        b[22] = (byte) ('0' + milli % 10);
        byte[] off = {'+', '0', '1', ':', '0', '0'};
        System.arraycopy(off, 0, b, 23, off.length);
        return 29;
    }

    private static void two(byte[] b, int at, int v) {
        b[at] = (byte) ('0' + v / 10);
        b[at + 1] = (byte) ('0' + v % 10);
    }

    /** Writes v rounded to two decimals (half away from zero) into b at n; returns the new end. */
    private static int fixed2(byte[] b, int n, double v) {
        long cents = Math.round(Math.abs(v) * 100);
        if (v < 0 && cents != 0) {
            b[n++] = '-';
        }
        String whole = Long.toString(cents / 100);
        for (int k = 0; k < whole.length(); k++) {
            b[n++] = (byte) whole.charAt(k);
        }
        b[n++] = '.';
        b[n++] = (byte) ('0' + cents / 10 % 10);
        b[n++] = (byte) ('0' + cents % 10);
        return n;
    }

    /** Reading the bench CSV of {@code rows} rows, every timestamp parsed; target 0.5 s at 1,000,000 rows. */
    static Benchmark read(int rows) {
        return new Timed<Path>("read CSV " + Sizes.count(rows) + " rows x " + CHANNELS + " ch", rows == ROWS ? 500
                : Double.NaN, dir -> Inputs.csv(dir, rows), f -> checksum(LogReader.read(f, ReadOptions.defaults())));
    }

    /** Sum of the last row's values and its time: keeps the work from being optimised away. */
    private static double checksum(Recording r) {
        int last = r.rows() - 1;
        double s = r.time().seconds(last);
        for (int c = 0; c < r.channels().size(); c++) {
            s += r.channels().get(c).value(last);
        }
        return s;
    }
}
