package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.log.TimeBase;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.Param;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle health LOG}: per channel the health figure, level, since when, and the parameters. */
@Command(name = "health", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Judge every channel against its healthy baseline: health 0-100 (100 = like the"
                + " baseline), level (steady, watch, departed), since when, and every parameter used."},
        footer = {"", "Health = 100 while the channel's recent windows stay within the alert level calibrated on"
                + " the baseline (about 1 % of baseline-like windows exceed it), else 100 x alert level / score."
                + " A channel that is flat, too short or too gappy has no estimate, with the reason.",
                "Screening aid only: decisions belong to qualified maintenance staff under site procedures and"
                + " local codes.",
                "Exit status: 0 done, 2 usage error, 3 bad input (the message names the file)."})
final class HealthCommand implements Callable<Integer> {
    /** The parameter columns of the CSV, in order (a parameter a channel lacks is empty). */
    static final List<String> CSV_PARAMS = List.of("analysis rate", "reservoir seed", "reservoir units",
            "spectral radius", "leak rate", "input scaling", "ridge penalty", "washout", "held-out NRMSE",
            "recurrence", "alert level", "flagged after baseline", "baseline", "window", "calibration quantile",
            "sustained departure");

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Option(names = "--channel", paramLabel = "NAME", description = "Only this channel. Default: every channel.")
    private String channel;

    @Option(names = "--baseline", paramLabel = "A:B", description = "The baseline: sample indices (0:2500),"
            + " seconds from the first sample (0s:3600s) or ISO date-times. Default: the first 25 %%.")
    private String baseline;

    @Option(names = "--baseline-file", paramLabel = "FILE", description = "A separate baseline log of the same"
            + " asset (all its rows), instead of a range of LOG.")
    private Path baselineFile;

    @Option(names = "--csv", description = "Write a header row and one row per channel as CSV.")
    private boolean csv;

    @Mixin
    private ReadOptionsMixin read;

    @Override
    public Integer call() throws LogException {
        if (baseline != null && baselineFile != null) {
            throw usage("--baseline and --baseline-file exclude each other: give one");
        }
        ReadOptions ro = read.toReadOptions();
        Recording rec = only(LogReader.read(log, ro), log);
        Reading.announce(rec, spec.commandLine().getErr());
        TriageParams tp = TriageParams.defaults();
        Assessment a;
        if (baselineFile != null) {
            Recording base = only(LogReader.read(baselineFile, ro), baselineFile);
            Reading.announce(base, spec.commandLine().getErr());
            Analyzer an = new Analyzer(tp);
            BaselineModel model = an.learn(base, Baseline.separateLog(baselineFile.toString(), base.rows()));
            a = an.assess(rec, model, TriageListener.NONE);
        } else {
            if (baseline != null) {
                try {
                    BaselineRange r = BaselineRange.parse(baseline, rec.time(), rec.rows());
                    tp = tp.withBaseline(r.from(), r.to());
                } catch (IllegalArgumentException e) {
                    throw usage(e.getMessage());
                }
            }
            a = new Analyzer(tp).assess(rec, TriageListener.NONE);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (csv) {
            printCsv(a, out);
        } else {
            printText(a, out);
        }
        out.flush();
        return ExitCode.OK;
    }

    private ParameterException usage(String message) {
        return new ParameterException(spec.commandLine(), message);
    }

    /** {@code rec}, or only its channel {@code --channel} when given. */
    private Recording only(Recording rec, Path file) {
        if (channel == null) {
            return rec;
        }
        Channel c = rec.channel(channel).orElseThrow(() -> usage("no numeric channel '" + channel + "' in " + file
                + "; channels: " + rec.channels().stream().map(Channel::name).collect(Collectors.joining(", "))));
        return new Recording(rec.source(), rec.time(), List.of(c), List.of(), rec.timeIssues());
    }

    static String since(Health h, TimeBase tb) {
        if (!h.estimated() || h.sinceIndex() < 0) {
            return "-";
        }
        return RqaText.time(tb, h.sinceIndex()) + " (row " + h.sinceIndex() + ")";
    }

    private void printText(Assessment a, PrintWriter out) {
        TimeBase tb = a.recording().time();
        out.println(log + ": " + a.channels().size() + " channel" + (a.channels().size() == 1 ? "" : "s")
                + ", baseline " + a.baseline().description());
        int nw = Math.max(7, a.channels().stream().mapToInt(c -> c.name().length()).max().orElse(0));
        int uw = Math.max(4, a.channels().stream().mapToInt(c -> c.unit().length()).max().orElse(0));
        String fmt = "%-" + nw + "s %-" + uw + "s %6s  %-9s %s";
        out.println(String.format(Locale.ROOT, fmt, "channel", "unit", "health", "level", "since").stripTrailing());
        for (ChannelAssessment c : a.channels()) {
            Health h = c.health();
            String fig = h.estimated() ? String.format(Locale.ROOT, "%.0f", h.figure()) : "-";
            String level = h.estimated() ? h.level().word() : "no estimate: " + h.noEstimateReason();
            out.println(String.format(Locale.ROOT, fmt, c.name(), c.unit(), fig, level,
                    h.estimated() ? since(h, tb) : "").stripTrailing());
        }
        out.println();
        out.println("parameters, all channels:");
        a.parameters().forEach(p -> out.println("  " + p));
        for (ChannelAssessment c : a.channels()) {
            if (!c.parameters().isEmpty() || !c.notComputed().isEmpty()) {
                out.println("parameters, " + c.name() + ":");
                c.parameters().forEach(p -> out.println("  " + p));
                c.notComputed().forEach(n -> out.println("  not computed: " + n));
            }
        }
        out.println();
        out.println("Screening aid only: compare with site criteria and escalate to a qualified analyst.");
    }

    private static void printCsv(Assessment a, PrintWriter out) {
        List<String> head = new ArrayList<>(List.of("channel", "unit", "health", "level", "since_index",
                "since_time", "no_estimate"));
        CSV_PARAMS.forEach(p -> head.add(p.replace(' ', '_').replace("-", "_").toLowerCase(Locale.ROOT)));
        out.println(String.join(",", head));
        TimeBase tb = a.recording().time();
        for (ChannelAssessment c : a.channels()) {
            Health h = c.health();
            List<String> row = new ArrayList<>(List.of(RqaText.quote(c.name()), RqaText.quote(c.unit()),
                    h.estimated() ? RqaText.csv(h.figure()) : "", h.estimated() ? h.level().word() : "",
                    h.estimated() && h.sinceIndex() >= 0 ? Integer.toString(h.sinceIndex()) : "",
                    h.estimated() && h.sinceIndex() >= 0 ? RqaText.time(tb, h.sinceIndex()) : "",
                    RqaText.quote(h.noEstimateReason())));
            for (String name : CSV_PARAMS) {
                row.add(RqaText.quote(find(c.parameters(), name).or(() -> find(a.parameters(), name)).orElse("")));
            }
            out.println(String.join(",", row));
        }
    }

    private static Optional<String> find(List<Param> params, String name) {
        return params.stream().filter(p -> p.name().equals(name)).map(Param::value).findFirst();
    }
}
