package org.riffle.log;

/**
 * How many bytes the samples of one log may take before it is read in reduced form ({@link Reduction}).
 * By default a third of the heap that is free when reading starts: while reading, the columns may be
 * copied once as they grow or are trimmed (twice their size for a moment), and the analysis then makes
 * {@code double} copies of the channels it works on (twice a {@code float} channel each); a third leaves
 * room for both. The factor is a rule of thumb, checked by the end-to-end test that reads a log several
 * times the heap under {@code -Xmx64m}.
 *
 * <p>Stateless and thread-safe.
 */
final class MemoryBudget {
    /** Share of the free heap the samples may take. */
    static final int SHARE = 3;
    /** Bytes each row costs besides its samples: a time (8) and, when reduced, its line number (8). */
    static final int ROW_OVERHEAD = 16;
    /** Fewest rows kept, however short memory is. */
    static final int MIN_ROWS = 64;

    private MemoryBudget() {
    }

    /** The budget: as the options say, else a third of the free heap. */
    static long of(ReadOptions opt) {
        if (opt.memoryBytes().isPresent()) {
            return opt.memoryBytes().getAsLong();
        }
        Runtime rt = Runtime.getRuntime();
        long free = rt.maxMemory() - (rt.totalMemory() - rt.freeMemory());
        return Math.max(1L << 20, free / SHARE);
    }

    /** The heap limit of this JVM. */
    static long heap() {
        return Runtime.getRuntime().maxMemory();
    }

    /** Bytes a row of {@code values} numeric columns costs while reading. */
    static long rowBytes(int values) {
        return 4L * values + ROW_OVERHEAD;
    }

    /** Rows that fit {@code budget} after {@code blockBytes} for the block statistics (even, at least {@link #MIN_ROWS}). */
    static int rowCap(long budget, long blockBytes, int values, int maxRows) {
        long rows = (budget - blockBytes) / rowBytes(values);
        return (int) Math.max(MIN_ROWS, Math.min(maxRows, rows)) & ~1;
    }
}
