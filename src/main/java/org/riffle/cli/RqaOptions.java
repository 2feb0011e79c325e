package org.riffle.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.stream.Collectors;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.recurrence.RqaParams;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The recurrence options shared by {@code riffle rqa} and {@code riffle trend}: the channel, the
 * embedding, the threshold policy (one of three), the norm, the minimum line lengths and the Theiler
 * window. A bad value or combination is a usage error (exit status 2).
 *
 * <p>Mutable (picocli fills it); confined to the command's thread.
 */
final class RqaOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    @Option(names = "--channel", required = true, paramLabel = "NAME",
            description = "The channel to analyse (exact name, else case-insensitive).")
    String channel;

    @Option(names = "--dim", paramLabel = "M", description = "Embedding dimension m. Default: false nearest"
            + " neighbours.")
    private Integer dim;

    @Option(names = "--delay", paramLabel = "T", description = "Embedding delay tau in samples. Default: first"
            + " minimum of the average mutual information.")
    private Integer delay;

    @ArgGroup(exclusive = true)
    private Threshold threshold;

    @Option(names = "--norm", paramLabel = "NORM", defaultValue = "euclidean",
            description = "Distance between delay vectors: euclidean or max. Default: ${DEFAULT-VALUE}.")
    private String norm;

    @Option(names = "--min-line", paramLabel = "L", defaultValue = "2",
            description = "Shortest diagonal line counted, l_min. Default: ${DEFAULT-VALUE}.")
    private int minLine;

    @Option(names = "--min-vert", paramLabel = "V", defaultValue = "2",
            description = "Shortest vertical line counted, v_min. Default: ${DEFAULT-VALUE}.")
    private int minVert;

    @Option(names = "--theiler", paramLabel = "W", defaultValue = "1",
            description = "Theiler window w: cells with |i-j| < w are excluded. Default: ${DEFAULT-VALUE}.")
    private int theiler;

    /** The threshold policies exclude each other. */
    static final class Threshold {
        @Option(names = "--radius", paramLabel = "R", description = "A fixed radius in the channel's unit.")
        Double radius;

        @Option(names = "--std-fraction", paramLabel = "F",
                description = "Radius = F x the population standard deviation of the raw samples.")
        Double stdFraction;

        @Option(names = "--recurrence-rate", paramLabel = "Q",
                description = "Radius = the k-th smallest eligible distance, k = ceil(Q x eligible cells)."
                        + " Default: 0.05.")
        Double rate;
    }

    /** The parameters the options ask for (m and τ may be automatic). */
    RqaParams toParams() {
        try {
            RqaParams.Threshold t = RqaParams.Threshold.rate(0.05);
            if (threshold != null && threshold.radius != null) {
                t = RqaParams.Threshold.radius(threshold.radius);
            } else if (threshold != null && threshold.stdFraction != null) {
                t = RqaParams.Threshold.stdFraction(threshold.stdFraction);
            } else if (threshold != null && threshold.rate != null) {
                t = RqaParams.Threshold.rate(threshold.rate);
            }
            return new RqaParams(positive("--dim", dim), positive("--delay", delay), norm(), t, minLine, minVert,
                    theiler);
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
    }

    private static int positive(String option, Integer v) {
        if (v != null && v < 1) {
            throw new IllegalArgumentException(option + " " + v + " must be at least 1");
        }
        return v == null ? RqaParams.AUTO : v;
    }

    private RqaParams.Norm norm() {
        for (RqaParams.Norm n : RqaParams.Norm.values()) {
            if (n.word().equals(norm.toLowerCase(Locale.ROOT))) {
                return n;
            }
        }
        throw new IllegalArgumentException("--norm '" + norm + "' is not one of: euclidean, max");
    }

    /** The chosen channel of {@code rec}, or a usage error naming the channels there are. */
    Channel pick(Recording rec, Path log) {
        return rec.channel(channel).orElseThrow(() -> usage("no numeric channel '" + channel + "' in " + log
                + "; channels: " + rec.channels().stream().map(Channel::name).collect(Collectors.joining(", "))));
    }

    /** A usage error (exit status 2) with {@code message}. */
    ParameterException usage(String message) {
        return new ParameterException(spec.commandLine(), message);
    }
}
