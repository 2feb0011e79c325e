package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.riffle.log.Channel;
import org.riffle.signal.FaultLine;
import org.riffle.signal.Peak;
import org.riffle.signal.Severity;
import org.riffle.signal.Unit;
import org.riffle.signal.Unit.Quantity;
import org.riffle.signal.Vibration;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.VibrationReport;
import org.riffle.signal.ZoneTable;

/**
 * Builds a channel's {@link VibrationFigures} from the {@code signal} package's vibration analysis:
 * velocity and zone over the whole channel, the alarm level of the common practice from the baseline
 * rows, the strongest peaks, the order lines from the spectrum and the bearing lines from the envelope
 * spectrum (from the spectrum when no envelope was computed). Stateless.
 */
final class VibrationStep {
    /** Peaks carried into the figures. */
    static final int PEAKS = 5;

    private VibrationStep() {
    }

    /**
     * The figures of {@code channel} sampled at {@code rateHz}, or empty when its unit is not a
     * vibration unit (velocity, acceleration, displacement) or it is too short for a spectrum.
     */
    static Optional<VibrationFigures> figures(Channel channel, double rateHz, Baseline baseline, VibrationParams p) {
        return figures(channel, null, rateHz, baseline, p);
    }

    /** As the other {@code figures}, with the samples as doubles already made ({@code samples}, or null). */
    static Optional<VibrationFigures> figures(Channel channel, double[] samples, double rateHz, Baseline baseline,
                                              VibrationParams p) {
        Unit unit = Unit.parse(channel.unit());
        Quantity q = unit.quantity();
        if (q != Quantity.VELOCITY && q != Quantity.ACCELERATION && q != Quantity.DISPLACEMENT) {
            return Optional.empty();
        }
        double[] x = samples != null ? samples : channel.toDoubles();
        if (x.length < Vibration.MIN_SAMPLES) {
            return Optional.empty();
        }
        VibrationReport r;
        try {
            r = Vibration.analyse(x, 0, x.length, rateHz, unit, p.withPeaks(PEAKS));
        } catch (IllegalArgumentException e) {
            // the user's settings do not fit this channel (segment too long, band above Nyquist)
            return Optional.of(new VibrationFigures(Double.NaN, "", "", "not analysed: " + e.getMessage(),
                    List.of(), List.of()));
        }
        Severity s = r.severity();
        boolean waveform = rateHz >= Severity.RATE_FACTOR * Severity.BAND_TOP_HZ;
        List<VibrationFigures.Peak> peaks = new ArrayList<>();
        List<VibrationFigures.Line> lines = new ArrayList<>();
        if (waveform) {
            for (Peak pk : r.peaks()) {
                peaks.add(new VibrationFigures.Peak(pk.frequencyHz(), pk.amplitudeRms()));
            }
            boolean envelope = r.envelope().isPresent();
            for (FaultLine l : r.lines()) {
                boolean order = l.name().endsWith("x");
                if (order ? l.where().equals("spectrum") : l.where().equals(envelope ? "envelope" : "spectrum")) {
                    String name = l.where().equals("envelope") ? l.name() + " (envelope)" : l.name();
                    lines.add(new VibrationFigures.Line(name, l.present() ? l.foundHz() : l.expectedHz(),
                            l.amplitudeRms(), l.present()));
                }
            }
        }
        String zone = s.zone().map(Enum::name).orElse("");
        String table = s.table().map(t -> t.name() + " (" + ZoneTable.STATUS + ")").orElse("");
        return Optional.of(new VibrationFigures(s.velocityRmsMmS(), zone, table, remark(x, rateHz, unit, r,
                baseline, p, waveform), peaks, lines));
    }

    private static String remark(double[] x, double rateHz, Unit unit, VibrationReport r, Baseline b,
                                 VibrationParams p, boolean waveform) {
        Severity s = r.severity();
        if (!s.computed()) {
            String hint = !waveform && unit.quantity() == Quantity.VELOCITY
                    ? "; if it logs overall RMS values, compare them with the table directly" : "";
            return s.remark() + hint;
        }
        List<String> parts = new ArrayList<>();
        if (s.table().isEmpty()) {
            parts.add("name the machine group and support for a zone");
        }
        parts.add("Band " + s.band().label() + " (" + s.band().how() + ")");
        if (s.table().isPresent()) {
            int to = Math.min(b.toRow(), x.length);
            if (to - b.fromRow() >= Vibration.MIN_SAMPLES) {
                Severity base = Vibration.severity(x, b.fromRow(), to, rateHz, unit, r.shaft(), p);
                if (base.computed()) {
                    double alarm = s.table().get().alarm(base.velocityRmsMmS());
                    parts.add(String.format(Locale.ROOT, "baseline %.3g mm/s; alarm %.3g mm/s (common practice: "
                            + "baseline + 25 %% of B/C, at most 1.25 x B/C)%s", base.velocityRmsMmS(), alarm,
                            s.velocityRmsMmS() > alarm ? "; above the alarm" : ""));
                }
            }
        }
        return String.join("; ", parts);
    }
}
