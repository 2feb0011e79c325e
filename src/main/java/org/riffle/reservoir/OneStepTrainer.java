package org.riffle.reservoir;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;

/**
 * Trains an echo state network to predict the next sample of a (normalised) baseline series one step
 * ahead, choosing spectral radius, leak rate and ridge penalty by a small grid search on time-blocked
 * validation folds of that series only (Lukoševičius 2012, sections 3.2.7 and 4: choose the penalty on
 * a log grid against validation data; Bergmeir &amp; Benítez 2012, Information Sciences 191:192, for
 * blocked cross-validation of time series). Each setting's washout is the number of steps two differently
 * started copies need to agree to 1e-9 on the series itself (at least {@value #MIN_WASHOUT}); a setting
 * without that echo state property within the limit is skipped.
 *
 * <p>Deterministic: ties go to the earlier grid point. Stateless and thread-safe; runs on the calling
 * thread and stops with a {@link java.util.concurrent.CancellationException} when it is interrupted.
 */
public final class OneStepTrainer {
    /**
     * Most rows the final readout is fitted on: a longer baseline contributes every k-th row (the
     * reservoir still runs every step). 101 weights fitted on 25,000 rows differ from a fit on all rows
     * by far less than the held-out error, and the fit no longer grows with the baseline.
     */
    public static final int FIT_ROWS = 25_000;
    /** Shortest washout in steps. */
    public static final int MIN_WASHOUT = 50;
    /** The tolerance of the echo-state check. */
    public static final double ESP_TOLERANCE = 1e-9;

    private OneStepTrainer() {
    }

    /**
     * Searches {@code space} around {@code base} (units, connections, scalings and seed are kept) on
     * series {@code u} and returns the best setting trained on all of {@code u}.
     *
     * @param progress receives 0..1 as the search proceeds (may be {@code null})
     * @throws IllegalArgumentException when no setting can be trained on {@code u}
     */
    public static OneStepFit train(double[] u, EsnParams base, SearchSpace space, DoubleConsumer progress) {
        double[] y = Harvest.nextValues(u);
        Reservoir first = Reservoir.build(base);
        List<OneStepFit.Candidate> tried = new ArrayList<>();
        double bestMse = Double.POSITIVE_INFINITY;
        EsnParams best = null;
        int bestWashout = -1;
        double bestNrmse = Double.NaN;
        int usable = countPresent(y);
        double[] su = usable > space.searchRows() ? excerpt(u, space) : u;
        double[] sy = su == u ? y : Harvest.nextValues(su);
        // the stretches carry a washout's worth of spare steps each: keep about searchRows rows of them
        int stride = Math.max(1, countPresent(sy) / space.searchRows());
        int total = space.radii().length * space.leaks().length + 2;
        int done = 0;
        for (double rho : space.radii()) {
            for (double alpha : space.leaks()) {
                Reservoir r = first.with(base.withSpectralRadius(rho).withLeak(alpha));
                int washout = washoutFor(r, su, space.maxWashout());
                if (washout < 0) {
                    for (double lambda : space.ridges()) {
                        tried.add(new OneStepFit.Candidate(rho, alpha, lambda, -1, Double.NaN));
                    }
                } else {
                    Folds folds = Folds.harvest(r, su, sy, washout, space.folds(), stride);
                    for (double lambda : space.ridges()) {
                        double mse = validationMse(folds, lambda);
                        double nrmse = Math.sqrt(mse / folds.targetVariance());
                        tried.add(new OneStepFit.Candidate(rho, alpha, lambda, washout, nrmse));
                        if (mse < bestMse) {
                            bestMse = mse;
                            best = r.params().withRidge(lambda);
                            bestWashout = washout;
                            bestNrmse = nrmse;
                        }
                    }
                }
                report(progress, ++done, total);
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("no reservoir setting could be trained on " + u.length
                    + " samples (" + usable + " usable steps)");
        }
        Reservoir chosen = first.with(best);
        Folds full = Folds.harvest(chosen, u, y, bestWashout, space.folds(), Math.max(1, usable / FIT_ROWS));
        double[][] foldWeights = full.foldWeights(best.ridge());
        Esn esn = Esn.of(chosen, full.allWeights(best.ridge()), bestWashout);
        report(progress, ++done, total);
        double[] err = full.heldOutErrors(chosen, u, y, bestWashout, foldWeights);
        double sum = 0;
        int n = 0;
        for (double e : err) {
            if (!Double.isNaN(e)) {
                sum += e * e;
                n++;
            }
        }
        report(progress, total, total);
        return new OneStepFit(esn, err, n == 0 ? Double.NaN : sum / n, bestNrmse, tried,
                su == u ? 0 : su.length);
    }

    /**
     * The stretches of a long series the search runs on: {@code folds} contiguous stretches spread evenly
     * over {@code u}, each of searchRows / folds steps plus the longest washout, joined by a missing
     * sample (which restarts the reservoir). The search then costs the same however long the baseline,
     * and each fold still sees a different part of it.
     */
    static double[] excerpt(double[] u, SearchSpace space) {
        int k = space.folds();
        int len = space.searchRows() / k + space.maxWashout();
        if ((long) k * (len + 1) >= u.length) {
            return u;
        }
        double[] out = new double[k * (len + 1) - 1];
        for (int b = 0; b < k; b++) {
            int from = (int) ((long) b * (u.length - len) / (k - 1));
            System.arraycopy(u, from, out, b * (len + 1), len);
            if (b < k - 1) {
                out[b * (len + 1) + len] = Double.NaN;
            }
        }
        return out;
    }

    /** The folds' validation error, +∞ when a readout system is numerically singular. */
    private static double validationMse(Folds folds, double lambda) {
        try {
            return folds.validationMse(lambda);
        } catch (IllegalStateException e) {
            return Double.POSITIVE_INFINITY;
        }
    }

    /** Washout of {@code r} on {@code u}: 1.5 × the observed convergence time, at least the minimum. */
    static int washoutFor(Reservoir r, double[] u, int maxWashout) {
        int steps = r.convergenceSteps(u, maxWashout, ESP_TOLERANCE);
        if (steps < 0) {
            return -1;
        }
        return Math.min(maxWashout, Math.max(MIN_WASHOUT, steps + steps / 2));
    }

    private static int countPresent(double[] y) {
        int n = 0;
        for (double v : y) {
            if (!Double.isNaN(v)) {
                n++;
            }
        }
        return n;
    }

    private static void report(DoubleConsumer progress, int done, int total) {
        if (progress != null) {
            progress.accept(Math.min(1.0, (double) done / total));
        }
    }
}
