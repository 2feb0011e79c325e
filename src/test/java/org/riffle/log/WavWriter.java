package org.riffle.log;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Writes small WAV files for tests (RIFF little-endian, as in Microsoft's "Multimedia Programming
 * Interface and Data Specifications 1.0", 1991, with the WAVE_FORMAT_EXTENSIBLE layout): integer samples
 * given as raw integers of the format's width, float samples as floats. Deterministic.
 */
final class WavWriter {
    private WavWriter() {
    }

    /**
     * A WAV file. {@code frames[i][c]} is frame i of channel c: the raw integer for PCM (unsigned for
     * 8-bit), or {@code Float.floatToIntBits}/{@code Double.doubleToLongBits} for float formats.
     */
    static byte[] wav(int tag, int bits, int rate, boolean extensible, boolean listChunk, long[][] frames) {
        int channels = frames[0].length;
        int align = channels * bits / 8;
        ByteBuffer data = ByteBuffer.allocate(frames.length * align).order(ByteOrder.LITTLE_ENDIAN);
        for (long[] frame : frames) {
            for (long v : frame) {
                for (int k = 0; k < bits / 8; k++) {
                    data.put((byte) (v >> (8 * k)));
                }
            }
        }
        ByteBuffer fmt = ByteBuffer.allocate(extensible ? 40 : 16).order(ByteOrder.LITTLE_ENDIAN);
        fmt.putShort((short) (extensible ? 0xFFFE : tag)).putShort((short) channels).putInt(rate)
                .putInt(rate * align).putShort((short) align).putShort((short) bits);
        if (extensible) {
            fmt.putShort((short) 22).putShort((short) bits).putInt((1 << channels) - 1).putShort((short) tag)
                    .put(new byte[] {0x00, 0x00, 0x00, 0x00, 0x10, 0x00, (byte) 0x80, 0x00, 0x00, (byte) 0xAA, 0x00,
                        0x38, (byte) 0x9B, 0x71});
        }
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.writeBytes("WAVE".getBytes(StandardCharsets.US_ASCII));
        chunk(body, "fmt ", fmt.array());
        if (listChunk) {
            chunk(body, "LIST", "INFOICMT\u0005\u0000\u0000\u0000riff".getBytes(StandardCharsets.ISO_8859_1));
        }
        chunk(body, "data", data.array());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes("RIFF".getBytes(StandardCharsets.US_ASCII));
        out.writeBytes(le32(body.size()));
        out.writeBytes(body.toByteArray());
        return out.toByteArray();
    }

    private static void chunk(ByteArrayOutputStream out, String id, byte[] payload) {
        out.writeBytes(id.getBytes(StandardCharsets.US_ASCII));
        out.writeBytes(le32(payload.length));
        out.writeBytes(payload);
        if ((payload.length & 1) == 1) {
            out.write(0);
        }
    }

    private static byte[] le32(int v) {
        return ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(v).array();
    }
}
