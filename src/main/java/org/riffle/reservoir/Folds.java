package org.riffle.reservoir;

import java.util.Arrays;

/**
 * The readout statistics of one reservoir run split into contiguous time blocks: block k covers input
 * indices [k·T/K, (k+1)·T/K). Each block keeps its first {@code washout} steps ("head") apart, so that
 * when block k is validated the head of block k+1, whose states still remember block k, can be left out
 * of training as a gap.
 *
 * <p>Mutable, confined to one thread.
 */
final class Folds {
    private final int k;
    private final int length;
    private final Gram[] head;
    private final Gram[] body;
    private Gram all;
    private Gram[] train;

    private Folds(int k, int length, int dim) {
        this.k = k;
        this.length = length;
        this.head = new Gram[k];
        this.body = new Gram[k];
        for (int i = 0; i < k; i++) {
            head[i] = new Gram(dim);
            body[i] = new Gram(dim);
        }
    }

    int foldOf(int t) {
        return (int) ((long) t * k / length);
    }

    private int foldStart(int fold) {
        return (int) (((long) fold * length + k - 1) / k);
    }

    /** Runs {@code r} over {@code u} and sorts every {@code stride}-th usable row into its block. */
    static Folds harvest(Reservoir r, double[] u, double[] y, int washout, int k, int stride) {
        Folds f = new Folds(k, u.length, r.units() + 2);
        int[] seen = {0};
        Harvest.run(r, u, y, washout, (t, z, target) -> {
            if (seen[0]++ % stride != 0) {
                return;
            }
            int fold = f.foldOf(t);
            (t - f.foldStart(fold) < washout ? f.head[fold] : f.body[fold]).add(z, target);
        });
        for (int i = 0; i < k; i++) {
            f.head[i].flush();
            f.body[i].flush();
        }
        return f;
    }

    private Gram total() {
        if (all == null) {
            all = head[0].copy();
            all.accumulate(body[0], 1);
            for (int i = 1; i < k; i++) {
                all.accumulate(head[i], 1);
                all.accumulate(body[i], 1);
            }
        }
        return all;
    }

    /** Rows of every block but {@code fold}, less the head of the next block (the gap). */
    private Gram trainingFor(int fold) {
        if (train == null) {
            train = new Gram[k];
        }
        if (train[fold] == null) {
            Gram g = total().copy();
            g.accumulate(head[fold], -1);
            g.accumulate(body[fold], -1);
            if (fold + 1 < k) {
                g.accumulate(head[fold + 1], -1);
            }
            train[fold] = g;
        }
        return train[fold];
    }

    /** Variance of the targets over all harvested rows. */
    double targetVariance() {
        Gram a = total();
        double mean = a.b[0] / a.count;
        return Math.max(a.yy / a.count - mean * mean, Double.MIN_NORMAL);
    }

    /** Mean squared validation error over all blocks for penalty {@code lambda}. */
    double validationMse(double lambda) {
        double sse = 0;
        long n = 0;
        for (int fold = 0; fold < k; fold++) {
            long rows = head[fold].count + body[fold].count;
            Gram train = trainingFor(fold);
            if (rows == 0 || train.count == 0) {
                continue;
            }
            double[] w = train.solve(lambda);
            sse += head[fold].sse(w) + body[fold].sse(w);
            n += rows;
        }
        return n == 0 ? Double.POSITIVE_INFINITY : sse / n;
    }

    /** The readout of each block's training set (null where a block or its training set is empty). */
    double[][] foldWeights(double lambda) {
        double[][] w = new double[k][];
        for (int fold = 0; fold < k; fold++) {
            Gram train = trainingFor(fold);
            if (train.count > 0 && head[fold].count + body[fold].count > 0) {
                w[fold] = train.solve(lambda);
            }
        }
        return w;
    }

    /** The readout of every row. */
    double[] allWeights(double lambda) {
        return total().solve(lambda);
    }

    /** Held-out one-step errors: each row predicted by the readout of its own block's training set. */
    double[] heldOutErrors(Reservoir r, double[] u, double[] y, int washout, double[][] foldWeights) {
        double[] err = new double[u.length];
        Arrays.fill(err, Double.NaN);
        Harvest.run(r, u, y, washout, (t, z, target) -> {
            double[] w = foldWeights[foldOf(t)];
            if (w != null) {
                err[t] = target - Harvest.dot(w, z);
            }
        });
        return err;
    }
}
