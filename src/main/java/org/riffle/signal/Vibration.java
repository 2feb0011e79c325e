package org.riffle.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The vibration analysis of one channel, in one call: Welch spectrum and its strongest peaks, shaft
 * speed (given or estimated), severity in the standard's band with its zone, order lines, and with a
 * bearing geometry the bearing lines in the spectrum and in the squared-envelope spectrum.
 *
 * <p>Stateless and thread-safe.
 */
public final class Vibration {
    /** The fewest samples analysed. */
    public static final int MIN_SAMPLES = 4 * WelchParams.MIN_SEGMENT;

    private Vibration() {
    }

    /**
     * Analyses {@code x[from, to)} sampled at {@code sampleRateHz} in {@code unit}.
     *
     * @throws IllegalArgumentException with a message fit to print when the run is shorter than
     *     {@link #MIN_SAMPLES} or than the segment asked for, or an envelope band lies above half the
     *     sample rate
     */
    public static VibrationReport analyse(double[] x, int from, int to, double sampleRateHz, Unit unit,
                                          VibrationParams p) {
        if (to - from < MIN_SAMPLES) {
            throw new IllegalArgumentException((to - from) + " samples are too few for a spectrum (at least "
                    + MIN_SAMPLES + ")");
        }
        Spectrum s = Welch.estimate(x, from, to, sampleRateHz, p.welch());
        List<Peak> peaks = s.peaks(p.peaks(), 0);
        Optional<ShaftSpeed> shaft = p.rpm().isPresent() ? Optional.of(ShaftSpeed.given(p.rpm().getAsDouble()))
                : ShaftSpeed.estimate(Severity.velocityMmS(s, unit).orElse(s));
        Severity severity = Severity.of(s, unit, shaft, p.table());
        List<FaultLine> lines = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        Optional<Band> envBand = Optional.empty();
        Optional<Spectrum> env = Optional.empty();
        if (shaft.isPresent()) {
            double hz = shaft.get().hz();
            lines.addAll(FaultLines.orders(s, "spectrum", hz, p.slip()));
            if (p.bearing().isPresent()) {
                lines.addAll(FaultLines.bearing(s, "spectrum", p.bearing().get(), hz, p.slip()));
                int[] run = longestRun(x, from, to);
                if (run[1] - run[0] < MIN_SAMPLES) {
                    notes.add("envelope: no run of " + MIN_SAMPLES + " samples without missing ones");
                } else {
                    if (run[1] - run[0] < to - from) {
                        notes.add(String.format(Locale.ROOT, "envelope on samples %d-%d, the longest run without "
                                + "missing samples", run[0], run[1]));
                    }
                    Band band = p.envelopeBand().orElseGet(() -> Envelope.chooseBand(x, run[0], run[1], sampleRateHz));
                    if (band.hiHz() > sampleRateHz / 2) {
                        throw new IllegalArgumentException("envelope band " + band.label() + " reaches above half "
                                + "the sample rate (" + sampleRateHz / 2 + " Hz)");
                    }
                    Spectrum e = Envelope.spectrum(x, run[0], run[1], sampleRateHz, band,
                            envelopeWelch(p.welch(), run[1] - run[0], sampleRateHz));
                    envBand = Optional.of(band);
                    env = Optional.of(e);
                    lines.addAll(FaultLines.orders(e, "envelope", hz, p.slip()));
                    lines.addAll(FaultLines.bearing(e, "envelope", p.bearing().get(), hz, p.slip()));
                }
            }
        } else {
            notes.add("no shaft speed: give it to see order and bearing lines");
        }
        return new VibrationReport(unit, s, peaks, severity, shaft, lines, envBand, env, p, notes);
    }

    /**
     * The overall severity of a whole channel without the rest of the analysis (for tables): the shaft
     * speed given or estimated, the RMS velocity in the standard's band and its zone. Never fails: a
     * channel that is not a vibration channel, too short, or does not fit the settings gets a
     * {@link Severity} without a value and with the reason.
     */
    public static Severity overall(double[] x, double sampleRateHz, Unit unit, VibrationParams p) {
        if (unit.quantity() != Unit.Quantity.VELOCITY && unit.quantity() != Unit.Quantity.ACCELERATION) {
            return new Severity(Double.NaN, null, p.table(), Optional.empty(), "severity needs a velocity or "
                    + "acceleration unit, not '" + unit.text() + "'");
        }
        if (x.length < MIN_SAMPLES) {
            return new Severity(Double.NaN, null, p.table(), Optional.empty(), x.length + " samples are too few "
                    + "for a spectrum (at least " + MIN_SAMPLES + ")");
        }
        try {
            Spectrum s = Welch.estimate(x, sampleRateHz, p.welch());
            Optional<ShaftSpeed> shaft = p.rpm().isPresent() ? Optional.of(ShaftSpeed.given(p.rpm().getAsDouble()))
                    : ShaftSpeed.estimate(Severity.velocityMmS(s, unit).orElse(s));
            return Severity.of(s, unit, shaft, p.table());
        } catch (IllegalArgumentException e) {
            return new Severity(Double.NaN, null, p.table(), Optional.empty(), e.getMessage());
        }
    }

    /** The RMS velocity in the standard's band of {@code x[from, to)}, for a baseline (see {@link Severity}). */
    public static Severity severity(double[] x, int from, int to, double sampleRateHz, Unit unit,
                                    Optional<ShaftSpeed> shaft, VibrationParams p) {
        Spectrum s = Welch.estimate(x, from, to, sampleRateHz, p.welch());
        return Severity.of(s, unit, shaft, p.table());
    }

    /**
     * The envelope spectrum's segment: the user's, or the automatic one shortened to the smallest power of
     * two spanning one second (bins of at most 1 Hz). Fault lines sit tens of hertz apart, so finer bins
     * would only trade averages (and a steadier floor) for resolution nobody needs.
     */
    static WelchParams envelopeWelch(WelchParams given, int n, double sampleRateHz) {
        if (given.segmentLength() != 0) {
            return given;
        }
        int oneSecond = Fft.nextPowerOfTwo((int) Math.min(1 << 30, Math.ceil(sampleRateHz)));
        return new WelchParams(Math.max(WelchParams.MIN_SEGMENT, Math.min(WelchParams.autoSegment(n), oneSecond)));
    }

    /** [start, end) of the longest run of {@code x[from, to)} without {@code NaN}. */
    static int[] longestRun(double[] x, int from, int to) {
        int bestStart = from;
        int bestLen = 0;
        int start = from;
        for (int i = from; i <= to; i++) {
            if (i == to || Double.isNaN(x[i])) {
                if (i - start > bestLen) {
                    bestLen = i - start;
                    bestStart = start;
                }
                start = i + 1;
            }
        }
        return new int[] {bestStart, bestStart + bestLen};
    }
}
