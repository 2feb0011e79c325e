package org.riffle.signal;

import java.util.Objects;

/**
 * One named line (1x, 2x, 3x, FTF, BPFO, BPFI, BSF) looked for in a spectrum: where it was expected,
 * the strongest line found within the tolerance, and whether it stands above the local noise floor.
 * Immutable.
 *
 * @param name e.g. {@code "BPFO"}
 * @param where {@code "spectrum"} or {@code "envelope"}
 * @param expectedHz the frequency computed from the shaft speed (and geometry)
 * @param foundHz the interpolated frequency of the strongest bin in the tolerance, {@code NaN} when none
 * @param amplitudeRms the RMS amplitude of that line (unit, or unit² for the envelope), {@code NaN} when none
 * @param floorRms the local noise floor as an RMS amplitude per bin (median around the line)
 * @param present true when the line's strongest bin is at least {@link FaultLines#PRESENT_RATIO} times the
 *     floor in power
 */
public record FaultLine(String name, String where, double expectedHz, double foundHz, double amplitudeRms,
                        double floorRms, boolean present) {
    public FaultLine {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(where, "where");
    }
}
