package org.riffle.signal;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything {@link Vibration#analyse} found for one channel. Immutable.
 *
 * @param unit the channel's unit as recognised
 * @param spectrum the Welch spectrum of the channel, in its own unit
 * @param peaks the strongest peaks, strongest first
 * @param severity RMS velocity in the standard's band and its zone, or why not
 * @param shaft the shaft speed used and how it was found, empty when unknown
 * @param lines order lines (and bearing lines when geometry was given), in the spectrum then the envelope
 * @param envelopeBand the band of the envelope spectrum, empty when none was computed
 * @param envelope the squared-envelope spectrum (unit²), empty when none was computed
 * @param params the parameters used
 * @param notes what was left out or adapted, one line each
 */
public record VibrationReport(Unit unit, Spectrum spectrum, List<Peak> peaks, Severity severity,
                              Optional<ShaftSpeed> shaft, List<FaultLine> lines, Optional<Band> envelopeBand,
                              Optional<Spectrum> envelope, VibrationParams params, List<String> notes) {
    public VibrationReport {
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(spectrum, "spectrum");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(shaft, "shaft");
        Objects.requireNonNull(envelopeBand, "envelopeBand");
        Objects.requireNonNull(envelope, "envelope");
        Objects.requireNonNull(params, "params");
        peaks = List.copyOf(peaks);
        lines = List.copyOf(lines);
        notes = List.copyOf(notes);
    }
}
