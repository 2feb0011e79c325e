package org.riffle.signal;

/**
 * Parameters of a Welch power-spectral-density estimate. The method itself is fixed: periodic Hann
 * window, 50 % overlap, each segment's mean removed, one-sided, averaged by the mean (Welch 1967,
 * IEEE Trans. Audio Electroacoust. 15:70). Immutable.
 *
 * @param segmentLength samples per segment; 0 chooses it from the data ({@link #autoSegment}). A
 *     length that is not a power of two is zero-padded to the next power of two for the FFT, which
 *     makes the frequency grid finer than 1/segment but adds no resolution.
 */
public record WelchParams(int segmentLength) {
    /** The shortest segment accepted. */
    public static final int MIN_SEGMENT = 8;
    /** The longest segment chosen automatically (a finer grid costs memory and averages). */
    public static final int MAX_AUTO_SEGMENT = 1 << 16;

    public WelchParams {
        if (segmentLength != 0 && segmentLength < MIN_SEGMENT) {
            throw new IllegalArgumentException("segment length " + segmentLength + " is below the minimum "
                    + MIN_SEGMENT + " (or 0 for automatic)");
        }
    }

    /** Segment length chosen from the data. */
    public static WelchParams auto() {
        return new WelchParams(0);
    }

    /**
     * The automatic segment length for {@code n} samples: the largest power of two not above n/4 (so
     * that at least 7 half-overlapping segments are averaged), between {@link #MIN_SEGMENT} and
     * {@link #MAX_AUTO_SEGMENT}; {@code n} itself when n/4 is below the minimum.
     */
    public static int autoSegment(int n) {
        int quarter = n / 4;
        if (quarter < MIN_SEGMENT) {
            return n;
        }
        return Math.min(Integer.highestOneBit(quarter), MAX_AUTO_SEGMENT);
    }

    /** The segment length used on {@code n} samples. */
    public int segmentFor(int n) {
        return segmentLength == 0 ? autoSegment(n) : segmentLength;
    }
}
