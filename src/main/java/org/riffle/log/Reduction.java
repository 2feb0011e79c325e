package org.riffle.log;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * How a log too large for the memory riffle may use was read instead of refused. Every row is still
 * read, once, in one streaming pass; what is kept is:
 * <ul>
 * <li>an analysis window at full resolution: the first {@code head} rows (the start of the log, where
 * the default baseline lies) and the last {@code rows - tailFrom} rows (the latest behaviour), back to
 * back in the {@link Recording} (recording row {@code head} is log row {@code tailFrom});</li>
 * <li>for every numeric channel, {@link BlockStats} over all rows: per-block minimum, maximum, mean and
 * count, for the overview and the sparklines.</li>
 * </ul>
 * A log is reduced when its rows, with the copies the reading makes and the memory the analysis takes
 * for each, would not fit the budget: {@code budgetBytes}, by default the heap free when reading starts
 * less a reserve for the program (see {@code MemoryBudget}).
 *
 * <p>Immutable.
 *
 * @param rows data rows in the whole log
 * @param neededBytes bytes the samples and times of the whole log would take (4 a sample, 8 a time)
 * @param budgetBytes bytes the reading and the analysis of the kept rows were allowed
 * @param wholeBytes heap estimated to read and analyse the whole log
 * @param heapBytes the Java heap limit ({@link Runtime#maxMemory()}) when the log was read
 * @param head log rows {@code [0, head)} kept at full resolution
 * @param tailFrom log rows {@code [tailFrom, rows)} kept at full resolution
 * @param blocks block statistics of every numeric channel, in the order of {@link Recording#channels()}
 */
public record Reduction(long rows, long neededBytes, long budgetBytes, long wholeBytes, long heapBytes, int head,
                       long tailFrom, List<BlockStats> blocks) {
    private static final long MIB = 1L << 20;
    private static final long GIB = 1L << 30;

    public Reduction {
        Objects.requireNonNull(blocks, "blocks");
        blocks = List.copyOf(blocks);
        if (head < 0 || tailFrom < head || tailFrom > rows) {
            throw new IllegalArgumentException("kept rows [0, " + head + ") and [" + tailFrom + ", " + rows
                    + ") are not two windows of " + rows + " rows");
        }
    }

    /** Rows kept at full resolution (the recording's rows). */
    public int keptRows() {
        return (int) (head + rows - tailFrom);
    }

    /** The log row of recording row {@code row}. */
    public long logRow(int row) {
        Objects.checkIndex(row, keptRows());
        return row < head ? row : tailFrom + (row - head);
    }

    /** The block statistics of the channel named {@code name}. */
    public Optional<BlockStats> blocks(String name) {
        return blocks.stream().filter(b -> b.name().equals(name)).findFirst();
    }

    /** The heap to ask for to read the log whole, e.g. {@code "-Xmx4g"}: the estimate, rounded up, plus 1 GiB. */
    public String heapOption() {
        return "-Xmx" + ((wholeBytes + GIB - 1) / GIB + 1) + "g";
    }

    /**
     * One line saying that the log was reduced, how, and how to read it whole; for the channels table,
     * the note and the screen alike.
     */
    public String message() {
        int nblocks = blocks.isEmpty() ? 0 : blocks.get(0).blocks();
        long per = blocks.isEmpty() ? 0 : blocks.get(0).rowsPerBlock();
        return String.format(Locale.ROOT, "REDUCED to fit memory: the %,d rows (%,d MiB of samples) and their"
                        + " analysis need about %,d MiB, riffle had %,d MiB of its %,d MiB heap; analysed at full"
                        + " resolution: rows 0-%,d (start, baseline) and %,d-%,d (latest); overview (sparklines,"
                        + " whole-log min/max/mean) from %,d blocks of %,d rows; to read it whole: java %s -jar"
                        + " riffle.jar ...",
                rows, mib(neededBytes), mib(wholeBytes), mib(budgetBytes), mib(heapBytes), head - 1, tailFrom,
                rows - 1, nblocks, per, heapOption());
    }

    /**
     * The same in fewer words, the most needed first, for a screen's header line: that the log was
     * reduced, how to read it whole, then which rows were analysed.
     */
    public String brief() {
        return String.format(Locale.ROOT, "REDUCED to fit memory (java %s reads it whole): analysed rows 0-%,d"
                + " and %,d-%,d of %,d; overview from blocks", heapOption(), head - 1, tailFrom, rows - 1, rows);
    }

    private static long mib(long bytes) {
        return (bytes + MIB - 1) / MIB;
    }
}
