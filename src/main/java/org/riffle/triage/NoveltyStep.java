package org.riffle.triage;

import java.util.Optional;
import java.util.function.DoubleConsumer;
import org.riffle.reservoir.Decimator;
import org.riffle.reservoir.Esn;
import org.riffle.reservoir.EsnParams;
import org.riffle.reservoir.OneStepFit;
import org.riffle.reservoir.OneStepTrainer;
import org.riffle.reservoir.Reservoir;
import org.riffle.reservoir.SearchSpace;
import org.riffle.triage.BaselineModel.ReservoirModel;

/**
 * The reservoir part of a channel's judgement: normalise by the baseline statistics, bring to the
 * analysis rate, train the one-step predictor on the baseline (held-out errors for calibration), and
 * score any stretch of the channel. Stateless.
 */
final class NoveltyStep {
    /** Fewest baseline samples at the analysis rate the reservoir is trained on. */
    static final int MIN_ANALYSIS_SAMPLES = 500;

    private NoveltyStep() {
    }

    /** What learning gives: the model (empty with a reason when it could not be learned), held-out errors. */
    record Learned(Optional<ReservoirModel> model, double[] heldOutErrors, String reason) {
    }

    /** Normalised copy of {@code raw}: (x − mean)/std, with the rows in {@code resets} made missing. */
    static double[] normalise(double[] raw, double mean, double std, boolean[] resets) {
        double[] u = new double[raw.length];
        for (int i = 0; i < raw.length; i++) {
            u[i] = resets != null && resets[i] ? Double.NaN : (raw[i] - mean) / std;
        }
        return u;
    }

    /** The decimation factor for a baseline {@code base} judged in windows of {@code window} samples. */
    static int factorFor(double[] base, int window) {
        int max = Math.max(1, Math.min(window / 50, base.length / (4 * MIN_ANALYSIS_SAMPLES)));
        return Decimator.factor(base, 0, base.length, max);
    }

    /** Trains on the normalised baseline {@code u} (already at the analysis rate). */
    static Learned learn(double[] u, EsnParams start, boolean search, DoubleConsumer progress) {
        int present = 0;
        for (double v : u) {
            present += Double.isNaN(v) ? 0 : 1;
        }
        if (present < MIN_ANALYSIS_SAMPLES) {
            return new Learned(Optional.empty(), new double[0], "reservoir novelty: the baseline holds " + present
                    + " samples at the analysis rate, at least " + MIN_ANALYSIS_SAMPLES + " are needed");
        }
        SearchSpace d = SearchSpace.defaults();
        int maxWashout = Math.max(OneStepTrainer.MIN_WASHOUT, Math.min(d.maxWashout(), present / 3));
        SearchSpace space = search
                ? new SearchSpace(d.radii(), d.leaks(), d.ridges(), d.folds(), d.searchRows(), maxWashout)
                : new SearchSpace(new double[] {start.spectralRadius()}, new double[] {start.leak()},
                        new double[] {start.ridge()}, d.folds(), Integer.MAX_VALUE, maxWashout);
        OneStepFit fit;
        try {
            fit = OneStepTrainer.train(u, start, space, progress);
        } catch (IllegalArgumentException e) {
            return new Learned(Optional.empty(), new double[0], "reservoir novelty: " + e.getMessage());
        }
        if (!(fit.heldOutMse() > 0)) {
            return new Learned(Optional.empty(), new double[0],
                    "reservoir novelty: the baseline is predicted without error, no scale to judge against");
        }
        Esn esn = fit.esn();
        EsnParams p = esn.reservoir().params();
        String how = search ? space.describe() + (fit.searchSteps() > 0 ? ", searched on " + space.folds()
                + " stretches (" + fit.searchSteps() + " steps) spread over the baseline" : "")
                : "fixed (no search)";
        ReservoirModel m = new ReservoirModel(p.seed(), p.units(), p.connections(), p.spectralRadius(), p.leak(),
                p.inputScaling(), p.biasScaling(), p.ridge(), esn.washout(), esn.weights(),
                esn.reservoir().fingerprint(), fit.heldOutMse(), fit.validationNrmse(), how);
        return new Learned(Optional.of(m), fit.heldOutErrors(), "");
    }

    /**
     * Rebuilds the network of {@code m}.
     *
     * @throws IllegalStateException when the rebuilt reservoir is not the one the readout was trained on
     */
    static Esn rebuild(ReservoirModel m) {
        Reservoir r = Reservoir.build(new EsnParams(m.units(), m.connections(), m.spectralRadius(), m.leak(),
                m.inputScaling(), m.biasScaling(), m.ridge(), m.seed()));
        if (r.fingerprint() != m.fingerprint()) {
            throw new IllegalStateException("the reservoir rebuilt from seed " + m.seed()
                    + " differs from the one the stored readout was trained on");
        }
        return Esn.of(r, m.weights(), m.washout());
    }
}
