package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.riffle.log.TimeBase;
import org.riffle.triage.BaselineModel.ChannelModel;
import org.riffle.triage.BaselineModel.MeasureModel;
import org.riffle.triage.BaselineModel.ReservoirModel;

/** Turns a channel's numbers into the records and printable parameters a face reads. Stateless. */
final class Reporting {
    private Reporting() {
    }

    /** Compact number text: up to 4 significant digits, plain where it can be. */
    static String num(double v) {
        if (Double.isNaN(v)) {
            return "NaN";
        }
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (s.contains("e")) {
            return s.replaceAll("\\.?0+e", "e");
        }
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }

    static String percent(double share) {
        return Double.isNaN(share) ? "no windows after the baseline"
                : String.format(Locale.ROOT, "%.1f %% of windows", 100 * share);
    }

    /**
     * The parameters of one channel's judgement, in print order (mutable list for the caller to extend);
     * the baseline, window and calibration shared by all channels are the assessment's parameters.
     */
    static List<Param> channelParams(ChannelModel m, BaselineModel bm, TimeBase time) {
        List<Param> p = new ArrayList<>();
        if (!m.learned()) {
            if (m.embeddingDimension() > 0) {
                p.add(new Param("recurrence", m.rqaSettings()));
            }
            return p;
        }
        String rate = time.isIndexed() ? (m.decimation() == 1 ? "every sample" : "every " + m.decimation()
                + "th sample, anti-aliased FIR decimation")
                : num(m.analysisRateHz()) + " Hz" + (m.decimation() == 1 ? " (every sample)" : " (1/"
                + m.decimation() + " of the sample rate, anti-aliased FIR decimation)");
        p.add(new Param("analysis rate", rate));
        p.add(new Param("normalisation", "mean " + num(m.mean()) + ", std " + num(m.std())
                + (m.unit().isEmpty() ? "" : " " + m.unit()) + " (baseline)"));
        m.reservoir().ifPresent(r -> reservoirParams(p, r));
        if (m.embeddingDimension() > 0) {
            p.add(new Param("recurrence", m.rqaSettings()));
        }
        p.add(new Param("alert level", num(m.alertLevel()) + " baseline spreads"));
        StringBuilder used = new StringBuilder();
        for (MeasureModel mm : m.measures()) {
            if (!Double.isNaN(mm.center())) {
                used.append(used.length() == 0 ? "" : ", ").append(mm.name());
            }
        }
        p.add(new Param("measures", used.toString()));
        return p;
    }

    private static void reservoirParams(List<Param> p, ReservoirModel r) {
        p.add(new Param("reservoir seed", Long.toString(r.seed())));
        p.add(new Param("reservoir units", r.units() + " (" + r.connections() + " connections each)"));
        p.add(new Param("spectral radius", num(r.spectralRadius())));
        p.add(new Param("leak rate", num(r.leak())));
        p.add(new Param("input scaling", num(r.inputScaling()) + " (bias " + num(r.biasScaling()) + ")"));
        p.add(new Param("ridge penalty", num(r.ridge()) + " per sample, bias unpenalised"));
        p.add(new Param("washout", r.washout() + " samples at the analysis rate"));
        p.add(new Param("reservoir search", r.search()));
        p.add(new Param("held-out NRMSE", num(r.validationNrmse())));
    }

    static WindowRow row(Windows w, int k, TimeBase time, double[][] values, double[][] rqa, double departure,
                         Level level) {
        double[] q = new double[RqaStep.MEASURES + 2];
        for (int i = 0; i < q.length; i++) {
            q[i] = rqa == null ? Double.NaN : rqa[i][k];
        }
        return new WindowRow(w.start(k), w.end(k), time.seconds(w.start(k)), time.seconds(w.end(k) - 1),
                q[0], q[1], q[2], q[3], q[4], q[5], q[6], q[7], q[8], values[4][k], values[5][k], values[0][k],
                departure, level);
    }

    /** Each measure present: baseline typical value, value over the last windows, departure of that. */
    static List<Measure> measures(MeasureModel[] models, double[][] values, double[] scores, int sustained) {
        List<Integer> judged = new ArrayList<>();
        for (int k = 0; k < scores.length; k++) {
            if (!Double.isNaN(scores[k])) {
                judged.add(k);
            }
        }
        List<Integer> last = judged.subList(Math.max(0, judged.size() - sustained), judged.size());
        List<Measure> out = new ArrayList<>();
        for (int m = 0; m < models.length; m++) {
            MeasureModel mm = models[m];
            if (Double.isNaN(mm.center())) {
                continue;
            }
            double[] series = values[m];
            double[] recent = last.stream().mapToDouble(k -> series[k]).toArray();
            double current = Judge.median(recent);
            double typical = "novelty".equals(mm.name()) ? Math.exp(mm.center()) : mm.center();
            out.add(new Measure(mm.name(), typical, current, Judge.departure(mm, current)));
        }
        return out;
    }
}
