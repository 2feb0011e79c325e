package org.riffle.signal;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What the user tells riffle about a vibration channel's machine, and how to compute its spectrum.
 * Immutable; the {@code with...} methods derive changed copies.
 *
 * @param table machine group and support for the zone, empty when not given (then no zone)
 * @param rpm shaft speed in r/min, empty to estimate it from the spectrum
 * @param bearing bearing geometry for FTF/BPFO/BPFI/BSF, empty when not given (then no envelope)
 * @param welch spectrum parameters
 * @param envelopeBand band for the envelope spectrum, empty to choose it by spectral kurtosis
 * @param peaks how many strongest peaks to report, 1 to 1000
 * @param slip relative tolerance for finding a line (slip, speed uncertainty), in (0, 0.2]
 */
public record VibrationParams(Optional<ZoneTable> table, OptionalDouble rpm, Optional<BearingGeometry> bearing,
                              WelchParams welch, Optional<Band> envelopeBand, int peaks, double slip) {
    /** Default number of peaks. */
    public static final int DEFAULT_PEAKS = 10;
    /** Default line tolerance: 2 % (bearing slip is 1–2 %, Randall &amp; Antoni 2011). */
    public static final double DEFAULT_SLIP = 0.02;

    public VibrationParams {
        Objects.requireNonNull(table, "table");
        Objects.requireNonNull(rpm, "rpm");
        Objects.requireNonNull(bearing, "bearing");
        Objects.requireNonNull(welch, "welch");
        Objects.requireNonNull(envelopeBand, "envelopeBand");
        if (rpm.isPresent() && !(rpm.getAsDouble() > 0 && rpm.getAsDouble() < 1e6)) {
            throw new IllegalArgumentException("speed " + rpm.getAsDouble() + " r/min is not between 0 and 1e6");
        }
        if (peaks < 1 || peaks > 1000) {
            throw new IllegalArgumentException("peaks " + peaks + " is not between 1 and 1000");
        }
        if (!(slip > 0 && slip <= 0.2)) {
            throw new IllegalArgumentException("line tolerance " + slip + " is not in (0, 0.2]");
        }
    }

    /** Nothing known about the machine; automatic spectrum. */
    public static VibrationParams defaults() {
        return new VibrationParams(Optional.empty(), OptionalDouble.empty(), Optional.empty(), WelchParams.auto(),
                Optional.empty(), DEFAULT_PEAKS, DEFAULT_SLIP);
    }

    public VibrationParams withTable(ZoneTable t) {
        return new VibrationParams(Optional.of(t), rpm, bearing, welch, envelopeBand, peaks, slip);
    }

    public VibrationParams withRpm(double r) {
        return new VibrationParams(table, OptionalDouble.of(r), bearing, welch, envelopeBand, peaks, slip);
    }

    public VibrationParams withBearing(BearingGeometry g) {
        return new VibrationParams(table, rpm, Optional.of(g), welch, envelopeBand, peaks, slip);
    }

    public VibrationParams withWelch(WelchParams w) {
        return new VibrationParams(table, rpm, bearing, w, envelopeBand, peaks, slip);
    }

    public VibrationParams withEnvelopeBand(Band b) {
        return new VibrationParams(table, rpm, bearing, welch, Optional.of(b), peaks, slip);
    }

    public VibrationParams withPeaks(int n) {
        return new VibrationParams(table, rpm, bearing, welch, envelopeBand, n, slip);
    }
}
