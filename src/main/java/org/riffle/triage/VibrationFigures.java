package org.riffle.triage;

import java.util.List;
import java.util.Objects;

/**
 * What a face shows of a vibration channel: the overall RMS velocity in the severity band, its zone
 * against a named table (with the caution that site and maker limits take precedence), the strongest
 * spectral peaks, and the shaft and bearing lines found. Immutable.
 *
 * @param velocityRmsMmS broadband RMS velocity in mm/s, {@code NaN} when not computed
 * @param zone "A".."D", or {@code ""} when no zone applies
 * @param table the table used, e.g. {@code "ISO 10816-3 group 2, rigid"}, {@code ""} when none
 * @param remark why no zone, or other one-line remark, {@code ""} when none
 * @param peaks strongest peaks, strongest first
 * @param lines shaft and bearing lines with their amplitudes
 */
public record VibrationFigures(double velocityRmsMmS, String zone, String table, String remark,
                               List<Peak> peaks, List<Line> lines) {
    public VibrationFigures {
        Objects.requireNonNull(zone, "zone");
        Objects.requireNonNull(table, "table");
        Objects.requireNonNull(remark, "remark");
        peaks = List.copyOf(peaks);
        lines = List.copyOf(lines);
    }

    /** A spectral peak: frequency in Hz, RMS amplitude in the channel's unit. */
    public record Peak(double frequencyHz, double amplitudeRms) {
    }

    /** A named fault-frequency line (1x, BPFO, ...) and whether it carries energy above the floor. */
    public record Line(String name, double frequencyHz, double amplitudeRms, boolean present) {
    }
}
