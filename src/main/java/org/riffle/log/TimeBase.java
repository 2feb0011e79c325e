package org.riffle.log;

import java.time.Instant;
import java.util.Optional;

/**
 * When each sample was taken: seconds from an origin, one value per row. Either regular (a sample
 * rate, no array held) or explicit (a {@code double[]} of seconds, as read). The origin is an absolute
 * instant when the log gave wall-clock times, empty for elapsed time or indexed samples.
 *
 * <p>Immutable.
 */
public final class TimeBase {
    private final Instant origin;
    private final double[] seconds;
    private final int size;
    private final double rateHz;
    private final boolean indexed;

    private TimeBase(Instant origin, double[] seconds, int size, double rateHz, boolean indexed) {
        this.origin = origin;
        this.seconds = seconds;
        this.size = size;
        this.rateHz = rateHz;
        this.indexed = indexed;
    }

    /** Evenly spaced samples at {@code rateHz} from {@code origin} (which may be {@code null}). */
    public static TimeBase regular(int size, double rateHz, Instant origin) {
        if (!(rateHz > 0) || Double.isInfinite(rateHz)) {
            throw new IllegalArgumentException("sample rate " + rateHz + " Hz is not positive and finite");
        }
        return new TimeBase(origin, null, size, rateHz, false);
    }

    /** Samples known only by their index: 1 "sample" per second of nominal time, flagged as indexed. */
    public static TimeBase indexed(int size) {
        return new TimeBase(null, null, size, 1.0, true);
    }

    /**
     * Explicit times. {@code seconds} are seconds from {@code origin} (or from an arbitrary zero when
     * {@code origin} is {@code null}), in file order; copied. {@code rateHz} is the inferred nominal rate.
     */
    public static TimeBase explicit(double[] seconds, double rateHz, Instant origin) {
        return new TimeBase(origin, seconds.clone(), seconds.length, rateHz, false);
    }

    /**
     * Samples known only by their number, for rows that are not consecutive (a reduced log): {@code numbers}
     * holds each row's number in the log, as nominal seconds at 1 Hz; flagged as indexed. Takes ownership.
     */
    static TimeBase adoptIndexed(double[] numbers) {
        return new TimeBase(null, numbers, numbers.length, 1.0, true);
    }

    /**
     * As {@link #explicit} for the first {@code size} times of {@code seconds}, taking ownership of the
     * array (readers only; the rest of it is never read).
     */
    static TimeBase adoptExplicit(double[] seconds, int size, double rateHz, Instant origin) {
        if (size < 0 || size > seconds.length) {
            throw new IllegalArgumentException(size + " rows of " + seconds.length + " times");
        }
        return new TimeBase(origin, seconds, size, rateHz, false);
    }

    /** Number of rows. */
    public int size() {
        return size;
    }

    /** Seconds of row {@code i} from the origin. */
    public double seconds(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("row " + i + " of " + size);
        }
        return seconds == null ? i / rateHz : seconds[i];
    }

    /** The nominal sample rate in Hz (inferred from the median step for explicit times). */
    public double rateHz() {
        return rateHz;
    }

    /** True when no time was known and samples are only numbered. */
    public boolean isIndexed() {
        return indexed;
    }

    /** True when rows carry their own timestamps. */
    public boolean isExplicit() {
        return seconds != null && !indexed;
    }

    /** The absolute time of row 0's zero, when the log gave wall-clock times. */
    public Optional<Instant> origin() {
        return Optional.ofNullable(origin);
    }

    /** Span from the first to the last row in seconds (0 for fewer than two rows). */
    public double spanSeconds() {
        return size < 2 ? 0 : seconds(size - 1) - seconds(0);
    }
}
