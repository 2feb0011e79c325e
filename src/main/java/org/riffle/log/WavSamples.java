package org.riffle.log;

import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;

/**
 * The samples of a WAV data chunk, decoded frame by frame into one growing {@code float[]} per channel
 * as fractions of full scale: 8-bit samples are unsigned with 128 as zero; 16, 24 and 32-bit samples
 * are signed two's complement over 2<sup>bits-1</sup>; float samples are taken as stored.
 *
 * <p>Mutable; confined to the reading thread.
 */
final class WavSamples {
    private static final int BLOCK = 1 << 16;
    private final WavReader.Format f;
    private float[][] data;
    private int frames;

    WavSamples(WavReader.Format f, int capacity) {
        this.f = f;
        this.data = new float[f.channels()][Math.max(16, capacity)];
    }

    /** Frames decoded a chunk at a time: {@code values[channel][0, count)} are frames {@code first} onwards. */
    interface Chunks {
        void take(float[][] values, int count, long first);
    }

    /** Reads up to {@code max} frames (to the end of the stream at most); returns the number read. */
    long readFrom(InputStream in, long max) throws IOException {
        return stream(in, max, (values, count, first) -> {
            if (frames + count > data[0].length) {
                int grown = (int) Math.min(Integer.MAX_VALUE - 16, Math.max(frames + (long) count,
                        data[0].length * 3L / 2));
                for (int c = 0; c < data.length; c++) {
                    data[c] = Arrays.copyOf(data[c], grown);
                }
            }
            for (int c = 0; c < data.length; c++) {
                System.arraycopy(values[c], 0, data[c], frames, count);
            }
            frames += count;
        });
    }

    /**
     * Reads up to {@code max} frames (to the end of the stream at most) without keeping them: each chunk
     * goes to {@code sink}, decoded as fractions of full scale. Returns the number read.
     */
    long stream(InputStream in, long max, Chunks sink) throws IOException {
        int align = f.blockAlign();
        byte[] buf = new byte[Math.max(align, BLOCK / align * align)];
        float[][] chunk = new float[f.channels()][buf.length / align];
        long read = 0;
        int have = 0;
        while (read < max) {
            int n = in.read(buf, have, buf.length - have);
            if (n < 0) {
                break;
            }
            have += n;
            int whole = (int) Math.min(have / align, max - read);
            decode(buf, whole, chunk);
            sink.take(chunk, whole, read);
            read += whole;
            int used = whole * align;
            System.arraycopy(buf, used, buf, 0, have - used);
            have -= used;
        }
        return read;
    }

    private void decode(byte[] b, int count, float[][] out) {
        int bytes = f.bits() / 8;
        boolean flt = f.tag() == 3;
        int p = 0;
        for (int i = 0; i < count; i++) {
            for (int c = 0; c < out.length; c++) {
                out[c][i] = sample(b, p, bytes, flt);
                p += bytes;
            }
        }
    }

    private static float sample(byte[] b, int p, int bytes, boolean flt) {
        switch (bytes) {
            case 1:
                return ((b[p] & 0xFF) - 128) / 128f;
            case 2:
                return (short) ((b[p] & 0xFF) | b[p + 1] << 8) / 32768f;
            case 3:
                return ((b[p] & 0xFF) | (b[p + 1] & 0xFF) << 8 | b[p + 2] << 16) / 8388608f;
            case 4:
                int v = (b[p] & 0xFF) | (b[p + 1] & 0xFF) << 8 | (b[p + 2] & 0xFF) << 16 | b[p + 3] << 24;
                return flt ? Float.intBitsToFloat(v) : (float) (v / 2147483648.0);
            default:
                long w = 0;
                for (int k = 7; k >= 0; k--) {
                    w = w << 8 | (b[p + k] & 0xFF);
                }
                return (float) Double.longBitsToDouble(w);
        }
    }

    /** Channel {@code c}, cut to the frames read and multiplied by {@code scale} (1: fractions of full scale). */
    float[] channel(int c, double scale) {
        float[] v = Arrays.copyOf(data[c], frames);
        if (scale != 1) {
            for (int i = 0; i < v.length; i++) {
                v[i] = (float) (v[i] * scale);
            }
        }
        return v;
    }
}
