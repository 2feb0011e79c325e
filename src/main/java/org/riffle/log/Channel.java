package org.riffle.log;

import java.util.Arrays;
import java.util.Objects;

/**
 * One numeric channel of a recording: a name, a unit as written in the log, and its samples as a
 * primitive {@code float} array (4 bytes a sample). A missing sample is {@code NaN}.
 *
 * <p>Immutable: the samples are copied in, and {@link #values()} hands out a copy; hot loops use
 * {@link #value(int)} or {@link #copyTo(double[], int, int)}. A channel made by a reader may own an
 * array longer than its samples (the rows were allocated from an estimate); the rest is never read.
 */
public final class Channel {
    private final String name;
    private final String unit;
    private final float[] samples;
    private final int size;
    private final int missing;

    /**
     * @param name channel name as read (never empty)
     * @param unit unit text as read, {@code ""} when none
     * @param samples samples; {@code NaN} marks a missing one. Copied.
     */
    public Channel(String name, String unit, float[] samples) {
        this(name, unit, samples.clone(), samples.length);
    }

    /** Takes ownership of {@code owned}, of which the first {@code size} are the samples. */
    private Channel(String name, String unit, float[] owned, int size) {
        this.name = Objects.requireNonNull(name, "name");
        this.unit = Objects.requireNonNull(unit, "unit");
        if (size < 0 || size > owned.length) {
            throw new IllegalArgumentException(size + " samples of an array of " + owned.length);
        }
        this.samples = owned;
        this.size = size;
        int m = 0;
        for (int i = 0; i < size; i++) {
            if (Float.isNaN(owned[i])) {
                m++;
            }
        }
        this.missing = m;
    }

    /**
     * Builds a channel of the first {@code size} values of {@code samples}, taking ownership of the array
     * without copying it (readers only).
     */
    static Channel adopt(String name, String unit, float[] samples, int size) {
        return new Channel(name, unit, samples, size);
    }

    public String name() {
        return name;
    }

    public String unit() {
        return unit;
    }

    /** Number of samples, missing ones included. */
    public int size() {
        return size;
    }

    /** Number of missing ({@code NaN}) samples. */
    public int missing() {
        return missing;
    }

    /** Sample {@code i}, {@code NaN} when missing. */
    public float value(int i) {
        return samples[Objects.checkIndex(i, size)];
    }

    /** A copy of all samples. */
    public float[] values() {
        return Arrays.copyOf(samples, size);
    }

    /** The samples as doubles (a new array). */
    public double[] toDoubles() {
        double[] out = new double[size];
        copyTo(out, 0, size);
        return out;
    }

    /**
     * For each run k, the smallest and largest present sample of [from[k], to[k]) into min[k] and
     * max[k], or +∞ and −∞ when the run has none (the shape of {@code Sparkline.Runs}): a channel's
     * sparkline without a copy of its samples, which for a long log was megabytes of fresh memory on
     * the way to the first frame.
     */
    public void ranges(int[] from, int[] to, double[] min, double[] max) {
        for (int k = 0; k < from.length; k++) {
            Objects.checkFromToIndex(from[k], to[k], size);
            float mn = Float.POSITIVE_INFINITY;
            float mx = Float.NEGATIVE_INFINITY;
            for (int i = from[k]; i < to[k]; i++) {
                float v = samples[i];
                if (v - v == 0) { // finite: v − v is NaN for NaN and ±∞
                    mn = v < mn ? v : mn;
                    mx = v > mx ? v : mx;
                }
            }
            min[k] = mn;
            max[k] = mx;
        }
    }

    /** Copies samples {@code [from, to)} into {@code dest} starting at 0. */
    public void copyTo(double[] dest, int from, int to) {
        Objects.checkFromToIndex(from, to, size);
        for (int i = from; i < to; i++) {
            dest[i - from] = samples[i];
        }
    }

    @Override
    public String toString() {
        return "Channel[" + name + (unit.isEmpty() ? "" : " [" + unit + "]") + ", " + size
                + " samples, " + missing + " missing]";
    }
}
