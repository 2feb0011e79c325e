package org.riffle.log;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.zip.GZIPOutputStream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * Random byte mutations of valid logs (flipped, overwritten, inserted, deleted and duplicated bytes;
 * plain text, gzip and WAV) give a clean {@link Recording} or a {@link LogException} with a one-line
 * message, never another exception and never a hang (each read gets {@value #SECONDS} s on a worker).
 * Bounded: a fixed number of tries with a fixed seed, so CI time stays small and a failure replays.
 */
class MutationProperties {
    private static final int SECONDS = 20;
    private static final int[] NOISE = {0, '"', ',', ';', '\n', '\r', 0xFF, 0xC3, '9', 'e'};
    private static final ExecutorService WORKER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "mutation-read");
        t.setDaemon(true);
        return t;
    });
    private static final byte[] CSV = csv();
    private static final byte[] GZ = gzip(CSV);
    private static final byte[] WAV = WavWriter.wav(1, 16, 5120, false, true, frames(400));

    @AfterContainer
    static void stop() {
        WORKER.shutdownNow();
    }

    @Property(tries = 400, seed = "20261202")
    void mutatedLogsReadCleanlyOrFailWithTheDomainError(@ForAll @IntRange(min = 0, max = 2) int kind,
                                                        @ForAll @IntRange(min = 1, max = 12) int edits,
                                                        @ForAll @LongRange(min = 1, max = 1L << 40) long seed)
            throws Exception {
        byte[] base = kind == 0 ? CSV : kind == 1 ? GZ : WAV;
        byte[] bad = mutate(base, edits, new Random(seed));
        Future<String> f = WORKER.submit(() -> {
            try {
                Recording r = LogReader.read(new ByteArrayInputStream(bad), "mutant", ReadOptions.defaults());
                return r.rows() >= 0 ? "ok" : "bad";
            } catch (LogException e) {
                if (e.getMessage().lines().count() != 1 || !e.getMessage().startsWith("mutant")) {
                    throw new AssertionError("not one line naming the file: " + e.getMessage(), e);
                }
                return "refused";
            }
        });
        try {
            f.get(SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            throw new AssertionError("read did not finish in " + SECONDS + " s (kind " + kind + ", seed " + seed + ")");
        } catch (ExecutionException e) {
            throw new AssertionError("kind " + kind + ", seed " + seed + ": " + e.getCause(), e.getCause());
        }
    }

    /** {@code edits} random edits of {@code b}: flip a bit, overwrite, insert, delete, or duplicate a run. */
    static byte[] mutate(byte[] b, int edits, Random rnd) {
        byte[] cur = b.clone();
        for (int k = 0; k < edits; k++) {
            int at = rnd.nextInt(Math.max(1, cur.length));
            ByteArrayOutputStream out = new ByteArrayOutputStream(cur.length + 64);
            switch (rnd.nextInt(5)) {
                case 0 -> {
                    cur[at] ^= (byte) (1 << rnd.nextInt(8));
                    continue;
                }
                case 1 -> {
                    cur[at] = (byte) rnd.nextInt(256);
                    continue;
                }
                case 2 -> {
                    out.write(cur, 0, at);
                    for (int i = rnd.nextInt(8) + 1; i > 0; i--) {
                        out.write(NOISE[rnd.nextInt(NOISE.length)]);
                    }
                    out.write(cur, at, cur.length - at);
                }
                case 3 -> {
                    int n = Math.min(cur.length - at, rnd.nextInt(16) + 1);
                    out.write(cur, 0, at);
                    out.write(cur, at + n, cur.length - at - n);
                }
                default -> {
                    int n = Math.min(cur.length - at, rnd.nextInt(64) + 1);
                    out.write(cur, 0, at + n);
                    out.write(cur, at, cur.length - at);
                }
            }
            cur = out.toByteArray();
        }
        return cur;
    }

    private static byte[] csv() {
        StringBuilder sb = new StringBuilder("# logger DL-7 (invented)\ntime,flow [m3/h],temp [degC],state\n");
        for (int i = 0; i < 300; i++) {
            sb.append(String.format(Locale.ROOT, "2026-03-01 08:%02d:%02d,%.2f,%.1f,%s%n", i / 60, i % 60,
                    40 + Math.sin(i / 7.0), 55 + i * 0.01, i % 50 == 0 ? "STOP" : "RUN"));
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] gzip(byte[] b) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(out)) {
            gz.write(b);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toByteArray();
    }

    private static long[][] frames(int n) {
        long[][] f = new long[n][2];
        for (int i = 0; i < n; i++) {
            f[i][0] = (i * 3L * 97) % 20000 - 10000;
            f[i][1] = (i * 7L * 97) % 20000 - 10000;
        }
        return f;
    }
}
