package org.riffle.log;

/**
 * When riffle reads a log in reduced form ({@link Reduction}) and how many rows it then keeps at full
 * resolution, so that the reading and the analysis of what is kept both fit the heap.
 *
 * <p>The budget is the heap free when reading starts, less {@link #RESERVE} for the program itself
 * (or {@link ReadOptions#memoryBytes()} when given). A log is read whole while its rows fit at twice
 * their samples and time (the columns are copied once as they grow or are trimmed): the recording's
 * own size against the heap, with that margin. Past it the log is reduced, and the rows kept then cost
 * that plus {@link #ANALYSIS_PER_ROW} bytes each for the analysis: the {@code double} copies of the channels being judged (two at a time) and the
 * engines' working arrays. That figure is measured, not derived: {@code riffle report} of a log of 8
 * channels ran out of a 64 MiB heap with about 300,000 rows kept (samples 14 MiB) and of a 128 MiB heap
 * with 740,000 (35 MiB), and completed with 166,000 rows in 64 MiB and 400,000 in 128 MiB (2 cores,
 * Java 17, 2026-12); 192 bytes a row keeps below the failures with a margin, and the end-to-end test
 * {@code BigLogIT} reads a log larger than a 64 MiB heap under {@code -Xmx64m}.
 *
 * <p>Stateless and thread-safe.
 */
final class MemoryBudget {
    /** Heap left for the program, its libraries and the screen. */
    static final long RESERVE = 16L << 20;
    /**
     * Bytes the analysis takes for each kept row, whatever the number of channels (see above): measured
     * with two workers; the analysis runs one worker per core, so more cores hold more copies at once.
     */
    static final int ANALYSIS_PER_ROW = 192;
    /** Fewest rows kept, however short memory is. */
    static final int MIN_ROWS = 64;

    private MemoryBudget() {
    }

    /** The budget: as the options say, else the free heap less {@link #RESERVE} (at least 1 MiB). */
    static long of(ReadOptions opt) {
        if (opt.memoryBytes().isPresent()) {
            return opt.memoryBytes().getAsLong();
        }
        Runtime rt = Runtime.getRuntime();
        long free = rt.maxMemory() - (rt.totalMemory() - rt.freeMemory());
        return Math.max(1L << 20, free - RESERVE);
    }

    /** The heap limit of this JVM. */
    static long heap() {
        return Runtime.getRuntime().maxMemory();
    }

    /** Bytes a row of {@code values} columns costs while reading: its samples, a time and a line number. */
    static long rowBytes(int values) {
        return 4L * values + 16;
    }

    /** Bytes a row costs from reading to the end of the analysis, on this machine's cores. */
    static long keptRowBytes(int values) {
        int workers = Math.max(2, Runtime.getRuntime().availableProcessors());
        return 2 * rowBytes(values) + (long) ANALYSIS_PER_ROW * workers / 2;
    }

    /**
     * Rows read whole when they fit {@code budget} after {@code blockBytes} for the block statistics,
     * twice their samples and time each (the recording and one copy); more, and the log is reduced.
     */
    static int rowCap(long budget, long blockBytes, int values, int maxRows) {
        long rows = (budget - blockBytes) / (2 * rowBytes(values));
        return (int) Math.max(MIN_ROWS, Math.min(maxRows, rows)) & ~1;
    }

    /** Rows a reduced log keeps at full resolution: room for the analysis too (at most {@code rowCap}). */
    static int keepCap(long budget, long blockBytes, int values, int rowCap) {
        long rows = (budget - blockBytes) / keptRowBytes(values);
        return (int) Math.max(MIN_ROWS, Math.min(rowCap, rows)) & ~1;
    }

    /** The heap that reads and analyses {@code rows} rows of {@code values} columns whole. */
    static long wholeHeap(long rows, int values) {
        return rows * keptRowBytes(values) + 2 * RESERVE;
    }
}
