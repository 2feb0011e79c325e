package org.riffle.note;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;
import org.riffle.triage.BaselineModel.ChannelModel;
import org.riffle.triage.BaselineModel.MeasureModel;
import org.riffle.triage.BaselineModel.ReservoirModel;

/**
 * The body of a stored-baseline file: triage's {@link BaselineModel} as {@code key: value} lines in a
 * fixed order, one group per channel, then its reservoir and its measures. Numbers are written as Java
 * prints a {@code double} (the shortest decimal that reads back to the same bits, {@code NaN} and
 * {@code Infinity} included), arrays as numbers separated by spaces, so a model reads back equal.
 * Reading is strict: every key must come in its place, or the file is refused with its line.
 *
 * <p>Stateless and thread-safe.
 */
final class BaselineCodec {
    private BaselineCodec() {
    }

    static void write(BaselineModel m, KeyLines k) {
        k.text("model.source", m.source());
        Baseline b = m.baseline();
        k.raw("model.baseline", b.fromRow() + " " + b.toRow() + " " + (b.sameLog() ? "same-log" : "other-log"));
        k.text("model.baseline-description", b.description());
        k.raw("model.window", Integer.toString(m.window()));
        k.raw("model.step", Integer.toString(m.step()));
        k.raw("model.quantile", Double.toString(m.quantile()));
        k.raw("model.sustained", Integer.toString(m.sustained()));
        k.text("model.rqa-norm", m.rqaNorm());
        k.raw("model.min-line", Integer.toString(m.minLine()));
        k.raw("model.min-vert", Integer.toString(m.minVert()));
        k.raw("model.theiler", Integer.toString(m.theiler()));
        k.raw("model.channels", Integer.toString(m.channels().size()));
        for (ChannelModel c : m.channels()) {
            k.blank().comment("channel " + c.name());
            k.text("channel.name", c.name()).text("channel.unit", c.unit())
                    .text("channel.no-estimate", c.noEstimateReason())
                    .raw("channel.mean", Double.toString(c.mean())).raw("channel.std", Double.toString(c.std()))
                    .raw("channel.decimation", Integer.toString(c.decimation()))
                    .raw("channel.analysis-rate-hz", Double.toString(c.analysisRateHz()))
                    .raw("channel.embedding-dimension", Integer.toString(c.embeddingDimension()))
                    .raw("channel.embedding-delay", Integer.toString(c.embeddingDelay()))
                    .raw("channel.rqa-radius", Double.toString(c.rqaRadius()))
                    .text("channel.rqa-settings", c.rqaSettings())
                    .raw("channel.alert-level", Double.toString(c.alertLevel()))
                    .raw("channel.notes", Integer.toString(c.notes().size()));
            c.notes().forEach(n -> k.text("channel.note", n));
            k.raw("channel.reservoir", c.reservoir().isPresent() ? "yes" : "no");
            c.reservoir().ifPresent(r -> reservoir(r, k));
            k.raw("channel.measures", Integer.toString(c.measures().size()));
            for (MeasureModel x : c.measures()) {
                k.text("measure.name", x.name()).raw("measure.center", Double.toString(x.center()))
                        .raw("measure.spread", Double.toString(x.spread())).raw("measure.values", numbers(x.values()));
            }
        }
    }

    private static void reservoir(ReservoirModel r, KeyLines k) {
        k.raw("reservoir.seed", Long.toString(r.seed())).raw("reservoir.units", Integer.toString(r.units()))
                .raw("reservoir.connections", Integer.toString(r.connections()))
                .raw("reservoir.spectral-radius", Double.toString(r.spectralRadius()))
                .raw("reservoir.leak", Double.toString(r.leak()))
                .raw("reservoir.input-scaling", Double.toString(r.inputScaling()))
                .raw("reservoir.bias-scaling", Double.toString(r.biasScaling()))
                .raw("reservoir.ridge", Double.toString(r.ridge()))
                .raw("reservoir.washout", Integer.toString(r.washout()))
                .raw("reservoir.fingerprint", Long.toString(r.fingerprint()))
                .raw("reservoir.held-out-mse", Double.toString(r.heldOutMse()))
                .raw("reservoir.validation-nrmse", Double.toString(r.validationNrmse()))
                .text("reservoir.search", r.search())
                .raw("reservoir.weights", numbers(r.weights()));
    }

    private static String numbers(double[] xs) {
        StringBuilder sb = new StringBuilder();
        for (double x : xs) {
            sb.append(sb.length() == 0 ? "" : " ").append(x);
        }
        return sb.toString();
    }

    /** Reads the model that {@link #write} wrote into {@code p} (header entries are skipped). */
    static BaselineModel read(Path file, KeyLines.Parsed p) throws NoteException {
        Cursor c = new Cursor(file, p.entries());
        c.skipTo("model.source");
        String source = c.text("model.source");
        String[] span = c.raw("model.baseline").split(" ");
        if (span.length != 3 || !span[2].matches("same-log|other-log")) {
            throw c.bad("a baseline span 'FROM TO same-log|other-log'");
        }
        int from = c.parseInt(span[0]);
        int to = c.parseInt(span[1]);
        String description = c.text("model.baseline-description");
        int window = c.integer("model.window");
        int step = c.integer("model.step");
        double quantile = c.number("model.quantile");
        int sustained = c.integer("model.sustained");
        String norm = c.text("model.rqa-norm");
        int minLine = c.integer("model.min-line");
        int minVert = c.integer("model.min-vert");
        int theiler = c.integer("model.theiler");
        int n = c.integer("model.channels");
        List<ChannelModel> channels = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            channels.add(channel(c));
        }
        c.end();
        try {
            return new BaselineModel(source, new Baseline(from, to, description, span[2].equals("same-log")), window,
                    step, quantile, sustained, channels, norm, minLine, minVert, theiler);
        } catch (IllegalArgumentException e) {
            throw new NoteException(file, "does not hold a usable baseline (" + e.getMessage() + ")");
        }
    }

    private static ChannelModel channel(Cursor c) throws NoteException {
        String name = c.text("channel.name");
        String unit = c.text("channel.unit");
        String none = c.text("channel.no-estimate");
        double mean = c.number("channel.mean");
        double std = c.number("channel.std");
        int decimation = c.integer("channel.decimation");
        double rate = c.number("channel.analysis-rate-hz");
        int m = c.integer("channel.embedding-dimension");
        int tau = c.integer("channel.embedding-delay");
        double radius = c.number("channel.rqa-radius");
        String settings = c.text("channel.rqa-settings");
        double alert = c.number("channel.alert-level");
        int notes = c.integer("channel.notes");
        List<String> ns = new ArrayList<>();
        for (int i = 0; i < notes; i++) {
            ns.add(c.text("channel.note"));
        }
        String hasReservoir = c.raw("channel.reservoir");
        Optional<ReservoirModel> r = switch (hasReservoir) {
            case "yes" -> Optional.of(reservoir(c));
            case "no" -> Optional.empty();
            default -> throw c.bad("'yes' or 'no'");
        };
        int measures = c.integer("channel.measures");
        List<MeasureModel> ms = new ArrayList<>();
        for (int i = 0; i < measures; i++) {
            ms.add(new MeasureModel(c.text("measure.name"), c.number("measure.center"), c.number("measure.spread"),
                    c.numbers("measure.values")));
        }
        try {
            return new ChannelModel(name, unit, none, mean, std, decimation, rate, m, tau, radius, settings, r, ms,
                    alert, ns);
        } catch (IllegalArgumentException e) {
            throw c.bad("a usable channel model (" + e.getMessage() + ")");
        }
    }

    private static ReservoirModel reservoir(Cursor c) throws NoteException {
        long seed = c.longInt("reservoir.seed");
        int units = c.integer("reservoir.units");
        int connections = c.integer("reservoir.connections");
        double radius = c.number("reservoir.spectral-radius");
        double leak = c.number("reservoir.leak");
        double input = c.number("reservoir.input-scaling");
        double bias = c.number("reservoir.bias-scaling");
        double ridge = c.number("reservoir.ridge");
        int washout = c.integer("reservoir.washout");
        long fingerprint = c.longInt("reservoir.fingerprint");
        double mse = c.number("reservoir.held-out-mse");
        double nrmse = c.number("reservoir.validation-nrmse");
        String search = c.text("reservoir.search");
        double[] weights = c.numbers("reservoir.weights");
        try {
            return new ReservoirModel(seed, units, connections, radius, leak, input, bias, ridge, washout, weights,
                    fingerprint, mse, nrmse, search);
        } catch (IllegalArgumentException e) {
            throw c.bad("a usable reservoir (" + e.getMessage() + ")");
        }
    }
}
