package org.riffle.log;

import java.util.Objects;

/**
 * One numeric channel of a recording: a name, a unit as written in the log, and its samples as a
 * primitive {@code float} array (4 bytes a sample). A missing sample is {@code NaN}.
 *
 * <p>Immutable: the samples are copied in, and {@link #values()} hands out a copy; hot loops use
 * {@link #value(int)} or {@link #copyTo(double[], int, int)}.
 */
public final class Channel {
    private final String name;
    private final String unit;
    private final float[] samples;
    private final int missing;

    /**
     * @param name channel name as read (never empty)
     * @param unit unit text as read, {@code ""} when none
     * @param samples samples; {@code NaN} marks a missing one. Copied.
     */
    public Channel(String name, String unit, float[] samples) {
        this(name, unit, samples.clone(), null);
    }

    /** Takes ownership of {@code owned}; the unused last parameter only tells this constructor apart. */
    private Channel(String name, String unit, float[] owned, Void adopted) {
        this.name = Objects.requireNonNull(name, "name");
        this.unit = Objects.requireNonNull(unit, "unit");
        this.samples = owned;
        int m = 0;
        for (float v : owned) {
            if (Float.isNaN(v)) {
                m++;
            }
        }
        this.missing = m;
    }

    /** Builds a channel that takes ownership of {@code samples} without copying (readers only). */
    static Channel adopt(String name, String unit, float[] samples) {
        return new Channel(name, unit, samples, null);
    }

    public String name() {
        return name;
    }

    public String unit() {
        return unit;
    }

    /** Number of samples, missing ones included. */
    public int size() {
        return samples.length;
    }

    /** Number of missing ({@code NaN}) samples. */
    public int missing() {
        return missing;
    }

    /** Sample {@code i}, {@code NaN} when missing. */
    public float value(int i) {
        return samples[i];
    }

    /** A copy of all samples. */
    public float[] values() {
        return samples.clone();
    }

    /** The samples as doubles (a new array). */
    public double[] toDoubles() {
        double[] out = new double[samples.length];
        copyTo(out, 0, samples.length);
        return out;
    }

    /** Copies samples {@code [from, to)} into {@code dest} starting at 0. */
    public void copyTo(double[] dest, int from, int to) {
        for (int i = from; i < to; i++) {
            dest[i - from] = samples[i];
        }
    }

    @Override
    public String toString() {
        return "Channel[" + name + (unit.isEmpty() ? "" : " [" + unit + "]") + ", " + samples.length
                + " samples, " + missing + " missing]";
    }
}
