package org.riffle.triage;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleConsumer;
import org.riffle.log.Channel;
import org.riffle.log.TimeBase;
import org.riffle.reservoir.Decimator;
import org.riffle.reservoir.Esn;
import org.riffle.signal.Summary;
import org.riffle.triage.BaselineModel.ChannelModel;
import org.riffle.triage.BaselineModel.MeasureModel;
import org.riffle.triage.BaselineModel.ReservoirModel;

/**
 * Learning one channel's baseline and judging the channel against it. The trend windows are one grid
 * from sample 0 ({@code k·step}); the baseline windows are the grid's windows that lie inside the
 * baseline rows. Stateless; each call works on its own copies of the samples.
 */
final class ChannelWork {
    /** Largest share of missing samples a channel (or its baseline) may have and still be judged. */
    static final double MAX_MISSING = 0.2;
    /** Fewest baseline windows to calibrate on. */
    static final int MIN_BASELINE_WINDOWS = 8;
    /** The measures, in the order of {@link BaselineModel.ChannelModel#measures()}. */
    static final List<String> NAMES = List.of("novelty", "RR", "DET", "LAM", "mean", "std", "kurtosis");
    /** Index of each measure's values in the recurrence rows of {@link RqaStep}: RR, DET, LAM. */
    private static final int[] RQA_ROW = {0, 1, 5};

    private ChannelWork() {
    }

    /**
     * What learning one channel gave: the model, and the baseline windows' recurrence measures, which a
     * judgement of the same log reuses instead of measuring them again.
     */
    record Learning(ChannelModel model, Optional<RqaStep.Known> rqa) {
    }

    /**
     * Learns channel {@code c} (its samples {@code x}, not modified) from rows [from, to); {@code resets}
     * marks rows after a time gap (or null).
     */
    static Learning learn(Channel c, double[] x, int from, int to, boolean[] resets, double rateHz, TriageParams p,
                              int window, int step, DoubleConsumer progress) {
        int n = to - from;
        double[] base = Arrays.copyOfRange(x, from, to);
        Summary s = Summary.of(base);
        Windows w = new Windows(n, window, step, Math.floorMod(-from, step));
        String problem = problem(s, n, "baseline");
        if (problem.isEmpty() && w.count() < MIN_BASELINE_WINDOWS) {
            problem = String.format(Locale.ROOT, "too short: the baseline (%d samples) holds %d windows of %d"
                    + " samples, at least %d are needed", n, w.count(), window, MIN_BASELINE_WINDOWS);
        }
        RqaStep.Outcome outcome = RqaStep.learn(x, from, to, window, step, p.rqa());
        Optional<RqaStep.Learned> rqa = outcome.learned();
        if (!problem.isEmpty()) {
            // no judgement, but the recurrence trend can still be shown with the baseline's ε
            return new Learning(new ChannelModel(c.name(), c.unit(), problem, s.mean(), s.std(), 1, rateHz,
                    rqa.map(RqaStep.Learned::dimension).orElse(0), rqa.map(RqaStep.Learned::delay).orElse(0),
                    rqa.map(RqaStep.Learned::radius).orElse(Double.NaN),
                    rqa.map(RqaStep.Learned::settings).orElse(""), Optional.empty(), List.of(), Double.NaN,
                    List.of()), rqa.map(RqaStep.Learned::baseline));
        }
        List<String> notes = new ArrayList<>();
        if (rqa.isEmpty()) {
            notes.add(outcome.reason());
        }
        int d = NoveltyStep.factorFor(base, window);
        boolean[] baseResets = resets == null ? null : Arrays.copyOfRange(resets, from, to);
        double[] u = Decimator.decimate(NoveltyStep.normalise(base, s.mean(), s.std(), baseResets), d);
        NoveltyStep.Learned nov = NoveltyStep.learn(u, p.reservoir(), p.search(), progress);
        if (!nov.reason().isEmpty()) {
            notes.add(nov.reason());
        }
        double[][] values = new double[NAMES.size()][];
        values[0] = nov.model().map(m -> w.novelty(nov.heldOutErrors(), d, 0, m.heldOutMse()))
                .orElse(nans(w.count()));
        for (int k = 0; k < RQA_ROW.length; k++) {
            int row = RQA_ROW[k];
            values[1 + k] = rqa.map(r -> r.baseline().values()[row]).orElse(nans(w.count()));
        }
        values[4] = w.means(base, 0);
        values[5] = w.stds(base, 0, values[4]);
        values[6] = w.kurtoses(base, 0, values[4]);
        MeasureModel[] models = new MeasureModel[NAMES.size()];
        double[] floors = {0.02, 0.01, 0.05, 0.05, 1e-3 * s.std(), 1e-3 * s.std(), 0.1};
        int present = 0;
        for (int k = 0; k < models.length; k++) {
            models[k] = Judge.model(NAMES.get(k), values[k], floors[k]);
            present += Double.isNaN(models[k].center()) ? 0 : 1;
        }
        double independent = (double) w.count() * step / window;
        double alert = Judge.alertLevel(Judge.scores(models, values), p.quantile(), present, independent);
        return new Learning(new ChannelModel(c.name(), c.unit(), "", s.mean(), s.std(), d, rateHz / d,
                rqa.map(RqaStep.Learned::dimension).orElse(0), rqa.map(RqaStep.Learned::delay).orElse(0),
                rqa.map(RqaStep.Learned::radius).orElse(Double.NaN), rqa.map(RqaStep.Learned::settings).orElse(""),
                nov.model(), Arrays.asList(models), alert, notes), rqa.map(RqaStep.Learned::baseline));
    }

    /** Why samples summarised by {@code s} (of {@code n} rows) cannot be judged, {@code ""} when they can. */
    static String problem(Summary s, int n, String what) {
        if (s.missing() > MAX_MISSING * n) {
            return String.format(Locale.ROOT, "too many gaps: %d of %d %s samples missing (%.0f %%, at most"
                    + " %.0f %% allowed)", s.missing(), n, what, 100.0 * s.missing() / n, 100 * MAX_MISSING);
        }
        if (s.count() < 2) {
            return "too short: " + s.count() + " " + what + " samples present";
        }
        if (!(s.std() > 1e-12 * Math.max(1, Math.abs(s.mean())))) {
            return String.format(Locale.ROOT, "flat: the %s is constant at %s, nothing to judge against", what,
                    Double.toString(s.mean()));
        }
        return "";
    }

    /**
     * Judges channel {@code c} (its samples {@code x}, not modified) against {@code m}; {@code resets} marks
     * rows after a time gap (or null);
     * {@code known} holds trend windows already measured with m's embedding and ε (or is empty).
     */
    static ChannelAssessment assess(Channel c, double[] x, ChannelModel m, BaselineModel bm, Baseline b,
                                    TimeBase time, boolean[] resets, Summary stats,
                                    Optional<VibrationFigures> vibration, Optional<RqaStep.Known> known) {
        List<Param> params = Reporting.channelParams(m, bm, time);
        int n = c.size();
        Windows w = new Windows(n, bm.window(), bm.step());
        double[][] rqa = m.embeddingDimension() > 0
                ? RqaStep.trend(x, w, bm.rqa(), m.embeddingDimension(), m.embeddingDelay(), m.rqaRadius(),
                        known)
                : null;
        String problem = m.learned() ? problem(stats, n, "channel") : m.noEstimateReason();
        if (problem.isEmpty() && w.count() == 0) {
            problem = "too short: " + n + " samples, one window is " + bm.window();
        }
        if (!problem.isEmpty()) {
            double[] means = w.means(x, 0);
            double[][] plain = {nans(w.count()), null, null, null, means, w.stds(x, 0, means), null};
            List<WindowRow> rows = new ArrayList<>(w.count());
            for (int k = 0; k < w.count(); k++) {
                rows.add(Reporting.row(w, k, time, plain, rqa, Double.NaN, null));
            }
            return new ChannelAssessment(c.name(), c.unit(), stats, vibration, List.of(), rows,
                    Health.none(problem), params, List.of(), true);
        }
        double[][] values = values(x, w, m, resets, rqa);
        MeasureModel[] models = m.measures().toArray(new MeasureModel[0]);
        double[] scores = Judge.scores(models, values);
        Level[] levels = Judge.levels(scores, m.alertLevel(), bm.sustained());
        boolean[] inBaseline = new boolean[w.count()];
        List<WindowRow> rows = new ArrayList<>(w.count());
        for (int k = 0; k < w.count(); k++) {
            inBaseline[k] = b.sameLog() && w.start(k) >= b.fromRow() && w.end(k) <= b.toRow();
            rows.add(Reporting.row(w, k, time, values, rqa, scores[k] / m.alertLevel(), levels[k]));
        }
        Health health = ChannelVerdict.judge(scores, levels, inBaseline, w, m.alertLevel(), bm.sustained(), time);
        List<Measure> measures = Reporting.measures(models, values, scores, bm.sustained());
        params.add(new Param("flagged after baseline", Reporting.percent(
                ChannelVerdict.flaggedShare(scores, inBaseline, m.alertLevel()))));
        return new ChannelAssessment(c.name(), c.unit(), stats, vibration, measures, rows, health, params,
                m.notes(), true);
    }

    /**
     * Every measure per window of the whole channel: [measure][window] in {@link #NAMES} order, the
     * recurrence ones taken from {@code rqa} (null when not computed).
     */
    static double[][] values(double[] x, Windows w, ChannelModel m, boolean[] resets, double[][] rqa) {
        double[][] v = new double[NAMES.size()][];
        v[0] = nans(w.count());
        if (m.reservoir().isPresent()) {
            ReservoirModel r = m.reservoir().get();
            Esn esn = NoveltyStep.rebuild(r);
            double[] u = Decimator.decimate(NoveltyStep.normalise(x, m.mean(), m.std(), resets), m.decimation());
            v[0] = w.novelty(esn.oneStepErrors(u), m.decimation(), 0, r.heldOutMse());
        }
        for (int k = 0; k < RQA_ROW.length; k++) {
            v[1 + k] = rqa == null ? nans(w.count()) : rqa[RQA_ROW[k]];
        }
        v[4] = w.means(x, 0);
        v[5] = w.stds(x, 0, v[4]);
        v[6] = w.kurtoses(x, 0, v[4]);
        return v;
    }

    static double[] nans(int n) {
        double[] a = new double[n];
        Arrays.fill(a, Double.NaN);
        return a;
    }
}
