package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A log read under a memory budget too small for it ({@link ReadOptions#withMemoryBytes}): the reduced
 * form is checked against the data the test wrote, never against the reader itself. Block statistics
 * equal minimum, maximum, mean and count computed here directly from the written samples; the kept
 * rows are bit for bit the written rows at the log rows the {@link Reduction} names, and the same as a
 * whole read of the same file.
 */
class ReductionTest {
    /** Samples of three channels, written with {@link Float#toString} so they read back exactly. */
    private static final class Data {
        final int rows;
        final float[][] v;
        final long gapRow;

        Data(int rows, long seed, long gapRow) {
            this.rows = rows;
            this.gapRow = gapRow;
            Random r = new Random(seed);
            v = new float[3][rows];
            for (int i = 0; i < rows; i++) {
                v[0][i] = (float) (Math.sin(i * 0.01) + 0.1 * r.nextGaussian());
                v[1][i] = i % 97 == 0 ? Float.NaN : (float) (50 + 5 * r.nextGaussian());
                v[2][i] = (float) (-1e3 * r.nextDouble());
            }
        }

        /** Seconds of row i: 0.5 s steps, with one 60 s gap into row {@code gapRow}. */
        double seconds(long i) {
            return i * 0.5 + (i >= gapRow ? 60 : 0);
        }

        Path write(Path file, boolean timed, boolean gzip) throws IOException {
            try (OutputStream os = Files.newOutputStream(file);
                 OutputStream z = gzip ? new GZIPOutputStream(os) : os;
                 Writer w = new OutputStreamWriter(z, StandardCharsets.UTF_8)) {
                w.write(timed ? "t_s,wave,temp,load\n" : "wave,temp,load\n");
                StringBuilder sb = new StringBuilder();
                for (int i = 0; i < rows; i++) {
                    sb.setLength(0);
                    if (timed) {
                        sb.append(seconds(i)).append(',');
                    }
                    for (int c = 0; c < 3; c++) {
                        sb.append(c == 0 ? "" : ",").append(Float.isNaN(v[c][i]) ? "" : Float.toString(v[c][i]));
                    }
                    w.write(sb.append('\n').toString());
                }
            }
            return file;
        }
    }

    @Test
    void blockStatisticsEqualThoseOfTheWrittenSamples(@TempDir Path dir) throws Exception {
        Data d = new Data(20_011, 11L, 15_000);
        Path f = d.write(dir.resolve("big.csv"), true, false);
        Recording rec = LogReader.read(f, ReadOptions.defaults().withMemoryBytes(600_000));
        Reduction red = rec.source().reduction().orElseThrow(() -> new AssertionError("not reduced"));
        assertEquals(d.rows, red.rows());
        assertEquals(3, red.blocks().size());
        String[] names = {"wave", "temp", "load"};
        for (int c = 0; c < 3; c++) {
            BlockStats b = red.blocks().get(c);
            assertEquals(names[c], b.name());
            assertTrue(b.blocks() >= Blocks.MIN_BLOCKS, b + ": enough blocks for a sparkline");
            long next = 0;
            long present = 0;
            for (int k = 0; k < b.blocks(); k++) {
                assertEquals(next, b.fromRow(k), "blocks tile the log without gaps");
                next = b.toRow(k);
                float mn = Float.POSITIVE_INFINITY;
                float mx = Float.NEGATIVE_INFINITY;
                double sum = 0;
                long n = 0;
                for (long i = b.fromRow(k); i < b.toRow(k); i++) {
                    float x = d.v[c][(int) i];
                    if (!Float.isNaN(x)) {
                        mn = Math.min(mn, x);
                        mx = Math.max(mx, x);
                        sum += x;
                        n++;
                    }
                }
                String at = names[c] + " block " + k;
                assertEquals(n, b.count(k), at + " count");
                assertEquals(mn, (float) b.min(k), at + " min (exact: a sample)");
                assertEquals(mx, (float) b.max(k), at + " max (exact: a sample)");
                // the reader adds the same floats as pairs of partial sums: equal up to rounding (1e-12 relative)
                assertEquals(sum / n, b.mean(k), 1e-12 * Math.max(1, Math.abs(sum / n)), at + " mean");
                present += n;
            }
            assertEquals(d.rows, next, "the last block ends at the last row");
            assertEquals(present, b.count());
            assertEquals(d.rows - present, b.missing());
        }
        assertEquals(d.rows / 97 + 1, red.blocks().get(1).missing(), "every 97th temp is missing, row 0 included");
    }

    @Test
    void keptRowsAreTheWrittenRowsBitForBit(@TempDir Path dir) throws Exception {
        Data d = new Data(20_011, 12L, 19_500);
        Path f = d.write(dir.resolve("big.csv"), true, false);
        Recording rec = LogReader.read(f, ReadOptions.defaults().withMemoryBytes(600_000));
        Recording whole = LogReader.read(f, ReadOptions.defaults());
        assertFalse(whole.source().reduction().isPresent(), "the default budget holds 20,011 rows");
        Reduction red = rec.source().reduction().orElseThrow();
        int kept = rec.rows();
        assertEquals(kept, red.keptRows());
        assertTrue(kept < d.rows / 4, kept + " rows kept of " + d.rows);
        assertEquals(d.rows - (kept - red.head()), red.tailFrom(), "the tail runs to the last row");
        assertTrue(red.head() >= kept / 2 - 1 && red.head() <= kept / 2 + 1, "half start, half latest");
        for (int i = 0; i < kept; i++) {
            long logRow = red.logRow(i);
            assertEquals(i < red.head() ? i : red.tailFrom() + i - red.head(), logRow);
            for (int c = 0; c < 3; c++) {
                assertEquals(Float.floatToRawIntBits(d.v[c][(int) logRow]),
                        Float.floatToRawIntBits(rec.channels().get(c).value(i)), "row " + i + " channel " + c);
                assertEquals(Float.floatToRawIntBits(whole.channels().get(c).value((int) logRow)),
                        Float.floatToRawIntBits(rec.channels().get(c).value(i)), "as the whole read");
            }
            assertEquals(d.seconds(logRow), rec.time().seconds(i), "row " + i + " time");
        }
        assertEquals(1, rec.timeIssues().size(), "the written gap, not the seam between the windows: "
                + rec.timeIssues());
        TimeIssue gap = rec.timeIssues().get(0);
        assertEquals(TimeIssue.Kind.GAP, gap.kind());
        assertEquals(19_500, red.logRow(gap.row()));
        assertEquals(19_500 + 2, gap.line(), "the header is line 1, log row 0 is line 2");
        assertEquals(2.0, rec.time().rateHz(), 1e-9, "0.5 s steps");
        String m = red.message();
        // the analysis's share grows with the cores (MemoryBudget.keptRowBytes): 37 MiB on 2 cores
        assertTrue(m.matches("REDUCED to fit memory: the 20,011 rows \\(1 MiB of samples\\) and their analysis need"
                + " about \\d+ MiB, riffle had 1 MiB of its .*"), m);
        assertTrue(m.contains("rows 0-" + String.format("%,d", red.head() - 1) + " (start, baseline)"), m);
        long gib = (MemoryBudget.wholeHeap(d.rows, 3) + (1L << 30) - 1) / (1L << 30) + 1;
        assertTrue(m.contains("java -Xmx" + gib + "g -jar riffle.jar"), m);
    }

    @Test
    void aGzipLogOfUnknownLengthReducesAlike(@TempDir Path dir) throws Exception {
        Data d = new Data(9_001, 13L, Long.MAX_VALUE);
        Recording plain = LogReader.read(d.write(dir.resolve("a.csv"), true, false),
                ReadOptions.defaults().withMemoryBytes(40_000));
        Recording gz = LogReader.read(d.write(dir.resolve("a.csv.gz"), true, true),
                ReadOptions.defaults().withMemoryBytes(40_000));
        Reduction a = plain.source().reduction().orElseThrow();
        Reduction b = gz.source().reduction().orElseThrow();
        assertEquals(a.head(), b.head());
        assertEquals(a.tailFrom(), b.tailFrom());
        for (int c = 0; c < 3; c++) {
            for (int i = 0; i < plain.rows(); i++) {
                assertEquals(Float.floatToRawIntBits(plain.channels().get(c).value(i)),
                        Float.floatToRawIntBits(gz.channels().get(c).value(i)));
            }
            BlockStats x = a.blocks().get(c);
            BlockStats y = b.blocks().get(c);
            assertEquals(x.blocks(), y.blocks());
            for (int k = 0; k < x.blocks(); k++) {
                assertEquals(x.mean(k), y.mean(k), 0.0);
            }
        }
        assertEquals(List.of(), plain.timeIssues());
    }

    @Test
    void anUntimedLogKeepsEachRowAtItsOwnTime(@TempDir Path dir) throws Exception {
        Data d = new Data(5_000, 14L, Long.MAX_VALUE);
        Path f = d.write(dir.resolve("u.csv"), false, false);
        Recording rated = LogReader.read(f, ReadOptions.defaults().withMemoryBytes(20_000).withSampleRate(100));
        Reduction red = rated.source().reduction().orElseThrow();
        for (int i = 0; i < rated.rows(); i++) {
            assertEquals(red.logRow(i) / 100.0, rated.time().seconds(i), 0.0, "row " + i);
        }
        Recording numbered = LogReader.read(f, ReadOptions.defaults().withMemoryBytes(20_000));
        assertTrue(numbered.time().isIndexed());
        int last = numbered.rows() - 1;
        assertEquals(4_999.0, numbered.time().seconds(last), 0.0, "the last kept row is numbered as in the log");
    }
}
