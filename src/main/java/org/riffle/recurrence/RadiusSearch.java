package org.riffle.recurrence;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

/**
 * Finds the k-th smallest distance value over the upper triangles of one or more segments, exactly,
 * without holding the matrix. Distance values are non-negative doubles, so their raw bits order them as
 * longs; the search keeps a bracket [lo, hi) of bits known to hold the answer:
 * <ol>
 * <li>a sample of evenly spaced cells of every row gives a narrow bracket around the wanted rank (skipped when the
 *     triangle is small enough to collect whole);</li>
 * <li>a streamed pass counts the values below the bracket, histograms the values inside it and collects
 *     them while they fit a fixed budget; the answer is then selected from the collected values, or the
 *     bracket is narrowed to one histogram bin (or moved below or above, if the sample misled it) and
 *     the pass repeats.</li>
 * </ol>
 * The result is the exact order statistic whatever the sample, the split into tasks or the thread count.
 *
 * <p>Stateless.
 */
final class RadiusSearch {
    /**
     * The search's budget: triangles of at most {@code collectAll} cells are collected whole; at most
     * {@code collectCap} values (8 bytes each) are collected in a pass; the sample holds about
     * {@code sample} values at most (and at most 1/64 of the triangle when that is more than 4096); a
     * histogram has {@code bins} bins.
     */
    record Budget(long collectAll, long collectCap, int sample, int bins) {
        static final Budget DEFAULT = new Budget(1L << 16, 1L << 22, 1 << 18, 4096);
    }

    private RadiusSearch() {
    }

    /**
     * The {@code rank}-th smallest (1-based) distance value over the upper triangles of {@code tasks}.
     *
     * @param upperTotal number of upper-triangle cells in all tasks (≥ rank ≥ 1)
     */
    static double kth(List<List<Piece>> tasks, int theiler, long rank, long upperTotal, int threads,
                      Budget budget) {
        long lo = 0;
        long hi = Long.MAX_VALUE;
        if (upperTotal > budget.collectAll()) {
            long[] bracket = sampleBracket(tasks, theiler, rank, upperTotal, threads, budget.sample());
            lo = bracket[0];
            hi = bracket[1];
        }
        while (true) {
            BracketPass p = pass(tasks, theiler, lo, hi, threads, budget);
            if (rank <= p.below) {
                hi = lo;
                lo = 0;
            } else if (rank > p.below + p.in) {
                lo = hi;
                hi = Long.MAX_VALUE;
            } else if (!p.overflow) {
                return Double.longBitsToDouble(Select.kth(p.values, (int) p.count, (int) (rank - p.below)));
            } else if (p.min == p.max) {
                return Double.longBitsToDouble(p.min);
            } else {
                long r = rank - p.below;
                int bin = 0;
                while (r > p.hist[bin]) {
                    r -= p.hist[bin];
                    bin++;
                }
                long newLo = lo + bin * p.width;
                hi = newLo + p.width >= hi || newLo + p.width < 0 ? hi : newLo + p.width;
                lo = newLo;
            }
        }
    }

    private static long[] sampleBracket(List<List<Piece>> tasks, int theiler, long rank, long upperTotal,
                                        int threads, int sampleSize) {
        long wanted = Math.min(sampleSize, Math.max(4096, upperTotal / 64));
        long stride = Math.max(1, upperTotal / wanted);
        List<Callable<long[]>> jobs = new ArrayList<>();
        long rowIndex = 0;
        for (List<Piece> t : tasks) {
            long first = rowIndex;
            jobs.add(() -> sampleRows(t, theiler, stride, first));
            for (Piece p : t) {
                rowIndex += p.rowTo() - p.rowFrom();
            }
        }
        List<long[]> parts = Parallel.run(threads, jobs);
        int size = 0;
        for (long[] part : parts) {
            size += part.length;
        }
        long[] sample = new long[size];
        int at = 0;
        for (long[] part : parts) {
            System.arraycopy(part, 0, sample, at, part.length);
            at += part.length;
        }
        double q = (double) rank / upperTotal;
        double margin = 5 * Math.sqrt(size * q * (1 - q)) + 0.002 * size + 16;
        long rLo = (long) Math.floor(q * size - margin);
        long rHi = (long) Math.ceil(q * size + margin);
        long lo = rLo < 1 ? 0 : Select.kth(sample, size, (int) rLo);
        long hi = rHi > size ? Long.MAX_VALUE : Select.kth(sample, size, (int) rHi) + 1;
        return new long[] {lo, hi};
    }

    /**
     * Every {@code stride}-th cell of each row, from an offset that varies from row to row, so the
     * sample spreads over the whole triangle.
     */
    private static long[] sampleRows(List<Piece> task, int theiler, long stride, long firstRow) {
        LongList out = new LongList(1024);
        long row = firstRow;
        for (Piece p : task) {
            int n = p.seg().vectors();
            for (int i = p.rowFrom(); i < p.rowTo(); i++, row++) {
                long offset = ((row + 1) * 0x9E3779B97F4A7C15L >>> 1) % stride;
                for (long j = i + theiler + offset; j < n; j += stride) {
                    out.add(Double.doubleToRawLongBits(p.seg().distance(i, (int) j)));
                }
            }
        }
        return out.toArray();
    }

    private static BracketPass pass(List<List<Piece>> tasks, int theiler, long lo, long hi, int threads,
                                    Budget budget) {
        int bins = budget.bins();
        long width = (hi - lo) / bins + 1;
        long cap = Math.max(1, budget.collectCap() / Math.max(1, tasks.size()));
        List<Callable<BracketPass>> jobs = new ArrayList<>();
        for (List<Piece> t : tasks) {
            jobs.add(() -> new BracketPass(lo, hi, width, bins, cap).scan(t, theiler));
        }
        BracketPass total = new BracketPass(lo, hi, width, bins, budget.collectCap());
        for (BracketPass p : Parallel.run(threads, jobs)) {
            total.merge(p);
        }
        return total;
    }
}
