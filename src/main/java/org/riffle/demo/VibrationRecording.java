package org.riffle.demo;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.Random;

/**
 * Writes {@code af2-vibration.wav}: 60 s from two accelerometers on the gearbox input shaft (channel 1
 * drive end, channel 2 non-drive end), 16-bit PCM, 5120 Hz, full scale ±{@value Af2#FULL_SCALE_MS2}
 * m/s² (sample value / 32768 × 50 = m/s²). Content: shaft lines of the motor (1x, 2x) and the fan
 * shaft, the gear mesh with ±1x sidebands, broadband noise, and outer-race impacts at BPFO (with a
 * random 1 % spacing jitter, as slip gives) each ringing a damped structural resonance near 1.8 kHz,
 * growing from barely visible to dominant over the recording. A RIFF {@code LIST/INFO} chunk names the
 * source. Stateless.
 */
final class VibrationRecording {
    static final String FILE = "af2-vibration.wav";
    static final long SEED = 20_260_217L;
    static final int RATE_HZ = 5120;
    static final int SECONDS = 60;
    static final int CHANNELS = 2;
    private static final double DAMPING = 0.04;
    private static final double IMPACT_PEAK_MS2 = 14;
    private static final double NDE_SHARE = 0.3;

    private VibrationRecording() {
    }

    /** The file's bytes. */
    static byte[] bytes() {
        int n = RATE_HZ * SECONDS;
        double[] de = new double[n];
        double[] nde = new double[n];
        shaftAndMesh(de, nde);
        impacts(de, nde);
        return wav(de, nde);
    }

    private static void shaftAndMesh(double[] de, double[] nde) {
        double fm = Af2.RECORDING_RPM / 60;
        double ff = Af2.fanRpm(Af2.RECORDING_RPM) / 60;
        double mesh = fm * Af2.PINION_TEETH;
        Random noise = new Random(SEED);
        double w = 2 * StrictMath.PI / RATE_HZ;
        for (int i = 0; i < de.length; i++) {
            double x1 = 0.197 * StrictMath.sin(w * fm * i + 0.3)       // motor 1x: 0.9 mm/s RMS
                    + 0.154 * StrictMath.sin(w * 2 * fm * i + 1.1)      // motor 2x: 0.35 mm/s RMS
                    + 0.085 * StrictMath.sin(w * ff * i + 2.0);         // fan shaft 1x: 0.6 mm/s RMS
            double g = 1.6 * StrictMath.sin(w * mesh * i + 0.4)
                    + 0.3 * StrictMath.sin(w * (mesh - fm) * i + 1.9)
                    + 0.3 * StrictMath.sin(w * (mesh + fm) * i + 2.6)
                    + 0.5 * StrictMath.sin(w * 2 * mesh * i + 0.8);
            de[i] = x1 + g + 0.25 * noise.nextGaussian();
            nde[i] = 0.8 * x1 + 0.7 * g + 0.25 * noise.nextGaussian();
        }
    }

    /** Adds the outer-race impacts: a damped resonance ring per impact, amplitude growing over the file. */
    private static void impacts(double[] de, double[] nde) {
        Random jitter = new Random(SEED + 1);
        double bpfo = Af2.BEARING.bpfo(Af2.RECORDING_RPM / 60);
        double wn = 2 * StrictMath.PI * Af2.RESONANCE_HZ;
        double wd = wn * StrictMath.sqrt(1 - DAMPING * DAMPING);
        double span = SECONDS;
        int ring = RATE_HZ / 80; // 12.5 ms: the ring has decayed below 1e-6 by then
        for (double t = 0.5 / bpfo; t < span; t += (1 + 0.01 * jitter.nextGaussian()) / bpfo) {
            double growth = t / span;
            double a = IMPACT_PEAK_MS2 * (0.04 + 0.96 * growth * growth) * (1 + 0.15 * jitter.nextGaussian());
            int first = (int) StrictMath.ceil(t * RATE_HZ);
            for (int i = first; i < Math.min(de.length, first + ring); i++) {
                double tau = i / (double) RATE_HZ - t;
                double r = a * StrictMath.exp(-DAMPING * wn * tau) * StrictMath.sin(wd * tau);
                de[i] += r;
                double tau2 = tau - 0.0003; // the wave reaches the far sensor 0.3 ms later
                if (tau2 >= 0) {
                    nde[i] += NDE_SHARE * a * StrictMath.exp(-DAMPING * wn * tau2) * StrictMath.sin(wd * tau2 + 0.5);
                }
            }
        }
    }

    private static byte[] wav(double[] de, double[] nde) {
        byte[] info = info("Kestrel Hill AF-2 gearbox input shaft DE/NDE, 50 m/s2 full scale");
        int dataBytes = de.length * CHANNELS * 2;
        ByteBuffer b = ByteBuffer.allocate(12 + 24 + info.length + 8 + dataBytes).order(ByteOrder.LITTLE_ENDIAN);
        b.put(ascii("RIFF")).putInt(4 + 24 + info.length + 8 + dataBytes).put(ascii("WAVE"));
        b.put(ascii("fmt ")).putInt(16).putShort((short) 1).putShort((short) CHANNELS).putInt(RATE_HZ)
                .putInt(RATE_HZ * CHANNELS * 2).putShort((short) (CHANNELS * 2)).putShort((short) 16);
        b.put(info);
        b.put(ascii("data")).putInt(dataBytes);
        for (int i = 0; i < de.length; i++) {
            b.putShort(quantise(de[i]));
            b.putShort(quantise(nde[i]));
        }
        return b.array();
    }

    /** A {@code LIST} chunk of type {@code INFO} with one {@code INAM} (name) entry, padded to even length. */
    private static byte[] info(String name) {
        byte[] text = (name + "\0").getBytes(StandardCharsets.US_ASCII);
        int padded = text.length + (text.length & 1);
        ByteBuffer b = ByteBuffer.allocate(8 + 4 + 8 + padded).order(ByteOrder.LITTLE_ENDIAN);
        b.put(ascii("LIST")).putInt(4 + 8 + padded).put(ascii("INFO"));
        b.put(ascii("INAM")).putInt(text.length).put(text);
        return b.array();
    }

    private static short quantise(double ms2) {
        long s = Math.round(ms2 / Af2.FULL_SCALE_MS2 * 32768);
        return (short) Math.max(-32768, Math.min(32767, s));
    }

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.US_ASCII);
    }
}
