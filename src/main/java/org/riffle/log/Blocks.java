package org.riffle.log;

import java.util.Arrays;

/**
 * The streaming accumulator behind {@link BlockStats}: rows arrive in order and are summed into at most
 * {@code capacity} blocks per column. Blocks start one row long; when all are full, neighbours are merged
 * in pairs (minimum of the minima, maximum of the maxima, sums and counts added) and the block length
 * doubles, so the log's length need not be known in advance and a block's figures are always those of
 * exactly the rows it covers. Means are kept as sums in {@code double} until the end.
 *
 * <p>Mutable; confined to the reading thread.
 */
final class Blocks {
    /** Bytes one block of one column takes (min, max floats; sum double; count long). */
    static final int BYTES_PER_BLOCK = 4 + 4 + 8 + 8;
    /** Most blocks kept: more than any screen's sparkline has cells. */
    static final int MAX_BLOCKS = 1024;
    /** Fewest blocks kept, even when memory is very short. */
    static final int MIN_BLOCKS = 16;

    private final int[] columns;
    private final int capacity;
    private final float[][] min;
    private final float[][] max;
    private final double[][] sum;
    private final long[][] count;
    private long per = 1;
    private int block;
    private long inBlock;
    private long rows;

    /** Blocks for the given source columns (indices into the pass's value arrays). */
    Blocks(int[] columns, int capacity) {
        if (capacity < 2 || (capacity & 1) == 1) {
            throw new IllegalArgumentException("block capacity " + capacity + " is not even and at least 2");
        }
        this.columns = columns.clone();
        this.capacity = capacity;
        int k = columns.length;
        min = new float[k][capacity];
        max = new float[k][capacity];
        sum = new double[k][capacity];
        count = new long[k][capacity];
        clear(0);
    }

    /** The most blocks that fit a quarter of {@code budgetBytes} for {@code columns} columns (even). */
    static int capacityFor(long budgetBytes, int columns) {
        long fit = budgetBytes / 4 / ((long) Math.max(1, columns) * BYTES_PER_BLOCK);
        return (int) Math.max(MIN_BLOCKS, Math.min(MAX_BLOCKS, fit)) & ~1;
    }

    /** Adds row {@code row} of {@code values} (indexed by source column) as the log's next row. */
    void add(float[][] values, int row) {
        if (inBlock == per) {
            if (++block == capacity) {
                halve();
            }
            clear(block);
            inBlock = 0;
        }
        for (int k = 0; k < columns.length; k++) {
            float v = values[columns[k]][row];
            if (v == v) {
                min[k][block] = Math.min(min[k][block], v);
                max[k][block] = Math.max(max[k][block], v);
                sum[k][block] += v;
                count[k][block]++;
            }
        }
        inBlock++;
        rows++;
    }

    private void clear(int b) {
        for (int k = 0; k < columns.length; k++) {
            min[k][b] = Float.POSITIVE_INFINITY;
            max[k][b] = Float.NEGATIVE_INFINITY;
            sum[k][b] = 0;
            count[k][b] = 0;
        }
    }

    /** Merges blocks 2b and 2b+1 into b for every b; the block length doubles. */
    private void halve() {
        int half = capacity / 2;
        for (int k = 0; k < columns.length; k++) {
            for (int b = 0; b < half; b++) {
                min[k][b] = Math.min(min[k][2 * b], min[k][2 * b + 1]);
                max[k][b] = Math.max(max[k][2 * b], max[k][2 * b + 1]);
                sum[k][b] = sum[k][2 * b] + sum[k][2 * b + 1];
                count[k][b] = count[k][2 * b] + count[k][2 * b + 1];
            }
        }
        per *= 2;
        block = half;
    }

    /** Rows added so far. */
    long rows() {
        return rows;
    }

    /** The figures of column {@code k} (in the order given at construction) over the rows added. */
    BlockStats snapshot(int k, String name) {
        int n = rows == 0 ? 1 : block + 1;
        double[] mean = new double[n];
        for (int b = 0; b < n; b++) {
            mean[b] = count[k][b] == 0 ? Double.NaN : sum[k][b] / count[k][b];
        }
        return new BlockStats(name, rows, per, Arrays.copyOf(min[k], n), Arrays.copyOf(max[k], n), mean,
                Arrays.copyOf(count[k], n));
    }
}
