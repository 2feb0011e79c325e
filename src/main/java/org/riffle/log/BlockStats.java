package org.riffle.log;

import java.util.Arrays;
import java.util.Objects;

/**
 * One channel of a reduced log as a row of consecutive blocks: block {@code b} covers the log's rows
 * {@code [b · rowsPerBlock, min((b + 1) · rowsPerBlock, rows))} and holds the smallest, largest and mean
 * sample of those rows and how many were present (missing samples, {@code NaN}, skipped). Computed in
 * the one reading pass over every row of the log (see {@link Reduction}); a block with no sample present
 * has {@code NaN} for its minimum, maximum and mean.
 *
 * <p>Immutable: the arrays are copied in and never handed out. Values are in the channel's unit.
 */
public final class BlockStats {
    private final String name;
    private final long rows;
    private final long rowsPerBlock;
    private final float[] min;
    private final float[] max;
    private final double[] mean;
    private final long[] count;

    /**
     * @param name the channel's name
     * @param rows rows of the whole log
     * @param rowsPerBlock rows each block covers (the last may cover fewer)
     * @param min smallest sample per block (all four arrays of one length; copied)
     * @param max largest sample per block
     * @param mean mean sample per block
     * @param count samples present per block
     */
    BlockStats(String name, long rows, long rowsPerBlock, float[] min, float[] max, double[] mean, long[] count) {
        this.name = Objects.requireNonNull(name, "name");
        if (min.length != max.length || min.length != mean.length || min.length != count.length) {
            throw new IllegalArgumentException("block arrays of unequal length for " + name);
        }
        if (rowsPerBlock < 1 || (long) (min.length - 1) * rowsPerBlock >= Math.max(1, rows)) {
            throw new IllegalArgumentException(min.length + " blocks of " + rowsPerBlock + " rows do not tile "
                    + rows + " rows");
        }
        this.rows = rows;
        this.rowsPerBlock = rowsPerBlock;
        this.min = min.clone();
        this.max = max.clone();
        this.mean = mean.clone();
        this.count = count.clone();
    }

    public String name() {
        return name;
    }

    /** Number of blocks. */
    public int blocks() {
        return min.length;
    }

    /** Rows each block covers; the last block may cover fewer. */
    public long rowsPerBlock() {
        return rowsPerBlock;
    }

    /** First row of the log that block {@code b} covers. */
    public long fromRow(int b) {
        Objects.checkIndex(b, min.length);
        return b * rowsPerBlock;
    }

    /** One past the last row of the log that block {@code b} covers. */
    public long toRow(int b) {
        Objects.checkIndex(b, min.length);
        return Math.min(rows, (b + 1) * rowsPerBlock);
    }

    /** Smallest sample of block {@code b}, {@code NaN} when none is present. */
    public double min(int b) {
        return count[b] == 0 ? Double.NaN : min[b];
    }

    /** Largest sample of block {@code b}, {@code NaN} when none is present. */
    public double max(int b) {
        return count[b] == 0 ? Double.NaN : max[b];
    }

    /** Mean of the samples present in block {@code b}, {@code NaN} when none is present. */
    public double mean(int b) {
        return count[b] == 0 ? Double.NaN : mean[b];
    }

    /** Samples present in block {@code b}. */
    public long count(int b) {
        return count[b];
    }

    /** Each block's smallest sample ({@code NaN} where none is present), a new array. */
    public double[] minima() {
        double[] out = new double[min.length];
        for (int b = 0; b < out.length; b++) {
            out[b] = min(b);
        }
        return out;
    }

    /** Each block's largest sample ({@code NaN} where none is present), a new array. */
    public double[] maxima() {
        double[] out = new double[max.length];
        for (int b = 0; b < out.length; b++) {
            out[b] = max(b);
        }
        return out;
    }

    /** Samples present in the whole log. */
    public long count() {
        return Arrays.stream(count).sum();
    }

    /** Samples missing in the whole log. */
    public long missing() {
        return rows - count();
    }

    /** Smallest sample of the whole log, {@code NaN} when none is present. */
    public double min() {
        double m = Double.NaN;
        for (int b = 0; b < min.length; b++) {
            m = count[b] == 0 ? m : Double.isNaN(m) ? min[b] : Math.min(m, min[b]);
        }
        return m;
    }

    /** Largest sample of the whole log, {@code NaN} when none is present. */
    public double max() {
        double m = Double.NaN;
        for (int b = 0; b < max.length; b++) {
            m = count[b] == 0 ? m : Double.isNaN(m) ? max[b] : Math.max(m, max[b]);
        }
        return m;
    }

    /** Mean of every sample present in the log (the count-weighted mean of the block means). */
    public double mean() {
        double sum = 0;
        long n = 0;
        for (int b = 0; b < mean.length; b++) {
            if (count[b] > 0) {
                sum += mean[b] * count[b];
                n += count[b];
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    @Override
    public String toString() {
        return "BlockStats[" + name + ", " + min.length + " blocks of " + rowsPerBlock + " rows]";
    }
}
