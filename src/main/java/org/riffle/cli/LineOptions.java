package org.riffle.cli;

import org.riffle.signal.Band;
import org.riffle.signal.BearingGeometry;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.WelchParams;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The options for the spectrum itself and the bearing lines: a mixin for the commands that show lines. */
final class LineOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    @Option(names = "--bearing", paramLabel = "N,d,D[,ANGLE]", description = "Bearing geometry: rolling "
            + "elements, element diameter, pitch diameter (same unit), contact angle in degrees (default 0). "
            + "Adds FTF, BPFO, BPFI, BSF and the envelope spectrum.")
    private String bearing;

    @Option(names = "--segment", paramLabel = "N", description = "Welch segment length in samples (default: "
            + "the largest power of two up to a quarter of the samples, at most 65536).")
    private int segment;

    @Option(names = "--envelope-band", paramLabel = "LO:HI", description = "Band in Hz for the envelope "
            + "spectrum (default: the band of highest spectral kurtosis).")
    private String envelopeBand;

    /** {@code p} with these options applied; a bad value is a usage error naming the option. */
    VibrationParams apply(VibrationParams p) {
        VibrationParams out = p;
        try {
            if (bearing != null) {
                out = out.withBearing(BearingGeometry.parse(bearing));
            }
            if (segment != 0) {
                out = out.withWelch(new WelchParams(segment));
            }
            if (envelopeBand != null) {
                out = out.withEnvelopeBand(Band.parse(envelopeBand));
            }
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        return out;
    }
}
