package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.signal.Band;
import org.riffle.signal.Unit;
import org.riffle.signal.Vibration;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.VibrationReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code riffle spectrum LOG --channel NAME}: one channel's spectrum, severity and fault lines, headless. */
@Command(name = "spectrum", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Print one channel's strongest spectral peaks, band RMS, severity zone and shaft and "
            + "bearing lines.",
            "Spectrum: Welch, Hann window, 50 % overlap, one-sided; amplitudes are RMS per line (a sine of peak "
                + "a reads a/sqrt(2)). Severity: RMS velocity over 10-1000 Hz (2-1000 Hz below 600 r/min), "
                + "acceleration integrated in the frequency domain; zones of ISO 10816-3/20816-3 with boundaries "
                + "from memory (verify against the standard)."},
        footer = {"", "The zones are guidelines: the machine maker's and the site's limits take precedence.",
            "Exit status: 0 done, 2 usage error, 3 bad input (the message names the file)."})
final class SpectrumCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Option(names = "--channel", required = true, paramLabel = "NAME", description = "The channel to analyse.")
    private String channel;

    @Mixin
    private ReadOptionsMixin read;

    @Mixin
    private VibrationOptions vibration;

    @Mixin
    private LineOptions lines;

    @Option(names = "--peaks", paramLabel = "N", defaultValue = "10",
            description = "How many strongest peaks to list (default: ${DEFAULT-VALUE}).")
    private int peaks;

    @Option(names = "--band", paramLabel = "LO:HI", description = "Also print the RMS over this band in Hz "
            + "(repeatable).")
    private List<String> bands = new ArrayList<>();

    @Option(names = "--csv", description = "Write one row per peak as CSV: rank,frequency_hz,amplitude_rms.")
    private boolean csv;

    @Override
    public Integer call() throws LogException {
        VibrationParams p = lines.apply(vibration.params());
        if (peaks < 1 || peaks > 1000) {
            throw new ParameterException(spec.commandLine(), "--peaks " + peaks + " is not between 1 and 1000");
        }
        List<Band> extra = new ArrayList<>();
        for (String b : bands) {
            try {
                extra.add(Band.parse(b));
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), e.getMessage(), e);
            }
        }
        Recording rec = LogReader.read(log, read.toReadOptions());
        Reading.announce(rec, spec.commandLine().getErr());
        Channel c = rec.channel(channel).orElseThrow(() -> new LogException(log, "no numeric channel '" + channel
                + "'; channels: " + String.join(", ", rec.channels().stream().map(Channel::name).toList())));
        double rate = rec.time().rateHz();
        double[] x = c.toDoubles();
        VibrationReport r;
        try {
            r = Vibration.analyse(x, 0, x.length, rate, Unit.parse(c.unit()), p.withPeaks(peaks));
        } catch (IllegalArgumentException e) {
            throw new LogException(log, "channel " + c.name() + ": " + e.getMessage());
        }
        PrintWriter out = spec.commandLine().getOut();
        if (csv) {
            SpectrumText.printCsv(r, out);
        } else {
            SpectrumText.printText(rec, c, r, extra, out);
        }
        out.flush();
        return ExitCode.OK;
    }
}
