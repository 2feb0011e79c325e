package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.log.TimeBase;
import org.riffle.recurrence.RqaParams;
import org.riffle.triage.Analyzer;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;
import org.riffle.triage.WindowRow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code riffle trend LOG --channel NAME}: RQA in windows over a whole channel, against its baseline, with
 * the reservoir novelty and the judgement of each window (the triage's window rows).
 */
@Command(name = "trend", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Recurrence quantification in sliding windows over a whole channel: one row per window,"
                + " every window measured with the baseline's embedding and radius, reused unchanged; with the"
                + " reservoir novelty and the window's flag against the baseline."},
        footer = {"", "The embedding is estimated on the baseline unless given; the threshold policy fixes the"
                + " radius on the baseline (a target rate over the baseline's windows taken together, at most 64"
                + " of them evenly spread). Sample indices are 0-based, end exclusive; a window with a missing sample prints NaN.",
                "novelty: the window's one-step prediction RMS error of the echo state network trained on the"
                + " baseline, divided by its held-out error there (about 1 on baseline-like data). flag: 1 when"
                + " the window's judgement is watch or departed, 0 when steady, NaN when the channel has no"
                + " estimate (the reason is printed in text mode).",
                "Exit status: 0 done, 2 usage error, 3 bad input (the message names the file)."})
final class TrendCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Mixin
    private RqaOptions rqa;

    @Option(names = "--window", paramLabel = "W", defaultValue = "1000",
            description = "Samples per window. Default: ${DEFAULT-VALUE}.")
    private int window;

    @Option(names = "--step", paramLabel = "S", description = "Samples between window starts. Default: W/2.")
    private Integer step;

    @Option(names = "--baseline", paramLabel = "A:B", description = "The baseline: sample indices (0:2500),"
            + " seconds from the first sample (0s:3600s) or ISO date-times. Default: the first 25 %%.")
    private String baseline;

    @Option(names = "--csv", description = "Write a header row and one row per window as CSV.")
    private boolean csv;

    @Mixin
    private ReadOptionsMixin read;

    @Override
    public Integer call() throws LogException {
        RqaParams params = rqa.toParams();
        int s = step == null ? Math.max(1, window / 2) : step;
        Recording rec = LogReader.read(log, read.toReadOptions());
        Reading.announce(rec, spec.commandLine().getErr());
        Channel ch = rqa.pick(rec, log);
        BaselineRange base;
        TriageParams tp;
        try {
            base = BaselineRange.parse(baseline, rec.time(), ch.size());
            tp = TriageParams.defaults().withBaseline(base.from(), base.to()).withWindow(window, s).withRqa(params);
        } catch (IllegalArgumentException e) {
            throw rqa.usage(e.getMessage());
        }
        Recording one = new Recording(rec.source(), rec.time(), List.of(ch), List.of(), rec.timeIssues());
        ChannelAssessment a = new Analyzer(tp).assess(one, TriageListener.NONE).channels().get(0);
        PrintWriter out = spec.commandLine().getOut();
        if (csv) {
            printCsv(a, rec.time(), out);
        } else {
            printText(a, base, ch, rec.time(), out);
        }
        out.flush();
        return ExitCode.OK;
    }

    private static String count(double v) {
        return Double.isNaN(v) ? "NaN" : Long.toString(Math.round(v));
    }

    private static String flag(WindowRow r) {
        return r.judged() ? Integer.toString(r.flag()) : "NaN";
    }

    private static void printCsv(ChannelAssessment a, TimeBase tb, PrintWriter out) {
        out.println("start_index,end_index,start_time,end_time,rr,det,l,lmax,entr,lam,tt,div,vmax,novelty,flag");
        for (WindowRow r : a.trend()) {
            out.println(String.join(",", Integer.toString(r.startIndex()), Integer.toString(r.endIndex()),
                    RqaText.time(tb, r.startIndex()), RqaText.time(tb, r.endIndex() - 1), RqaText.csv(r.rr()),
                    RqaText.csv(r.det()), RqaText.csv(r.l()), count(r.lmax()), RqaText.csv(r.entr()),
                    RqaText.csv(r.lam()), RqaText.csv(r.tt()), RqaText.csv(r.div()), count(r.vmax()),
                    RqaText.csv(r.novelty()), flag(r)));
        }
    }

    private void printText(ChannelAssessment a, BaselineRange base, Channel ch, TimeBase tb, PrintWriter out) {
        int w = a.trend().isEmpty() ? window : a.trend().get(0).endIndex() - a.trend().get(0).startIndex();
        out.println(log + ", channel " + ch.name() + (ch.unit().isEmpty() ? "" : " [" + ch.unit() + "]") + ", "
                + ch.size() + " samples; windows of " + w + " samples every "
                + (a.trend().size() > 1 ? a.trend().get(1).startIndex() - a.trend().get(0).startIndex() : w) + " ("
                + a.trend().size() + " windows)");
        out.println("baseline    " + base.description());
        a.parameters().forEach(p -> out.println("  " + p));
        a.notComputed().forEach(n -> out.println("  not computed: " + n));
        Health h = a.health();
        out.println("health      " + (h.estimated() ? String.format(Locale.ROOT, "%.0f, %s", h.figure(),
                h.level().word()) : "no estimate (" + h.noEstimateReason() + ")"));
        String head = String.format(Locale.ROOT, "%10s %10s  %-23s %-23s %8s %8s %8s %6s %8s %8s %8s %8s %4s",
                "start", "end", "start time", "end time", "RR", "DET", "L", "Lmax", "ENTR", "LAM", "TT", "novelty",
                "flag");
        out.println(head);
        for (WindowRow r : a.trend()) {
            out.println(String.format(Locale.ROOT, "%10d %10d  %-23s %-23s %8s %8s %8s %6s %8s %8s %8s %8s %4s",
                    r.startIndex(), r.endIndex(), RqaText.time(tb, r.startIndex()), RqaText.time(tb, r.endIndex() - 1),
                    RqaText.text(r.rr()), RqaText.text(r.det()), RqaText.text(r.l()), count(r.lmax()),
                    RqaText.text(r.entr()), RqaText.text(r.lam()), RqaText.text(r.tt()), RqaText.text(r.novelty()),
                    flag(r)) + (r.judged() ? "  " + r.level().word() : "") + missing(ch, r));
        }
    }

    /** "  missing sample at i" for the first missing sample of the window, else "". */
    private static String missing(Channel ch, WindowRow r) {
        for (int i = r.startIndex(); i < r.endIndex(); i++) {
            if (Float.isNaN(ch.value(i))) {
                return "  missing sample at " + i;
            }
        }
        return "";
    }
}
