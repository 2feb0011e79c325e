package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.log.TimeBase;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import org.riffle.recurrence.Trend;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle trend LOG --channel NAME}: RQA in windows over a whole channel, against its baseline. */
@Command(name = "trend", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Recurrence quantification in sliding windows over a whole channel: one row per window,"
                + " every window measured with the baseline's embedding and radius, reused unchanged."},
        footer = {"", "The embedding is estimated on the baseline unless given; the threshold policy fixes the"
                + " radius on the baseline (a target rate over the baseline's windows taken together). Sample"
                + " indices are 0-based, end exclusive; a window with a missing sample prints NaN.",
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
        Channel ch = rqa.pick(rec, log);
        Trend t;
        BaselineRange base;
        try {
            base = BaselineRange.parse(baseline, rec.time(), ch.size());
            t = Rqa.withAllCores().trend(ch.toDoubles(), base.from(), base.to(), window, s, params, null);
        } catch (IllegalArgumentException e) {
            throw rqa.usage(e.getMessage());
        }
        PrintWriter out = spec.commandLine().getOut();
        if (csv) {
            printCsv(t, rec.time(), out);
        } else {
            printText(t, base, ch, rec.time(), out);
        }
        out.flush();
        return ExitCode.OK;
    }

    private static void printCsv(Trend t, TimeBase tb, PrintWriter out) {
        out.println("start_index,end_index,start_time,end_time,rr,det,l,lmax,entr,lam,tt,div,vmax");
        for (RqaResult r : t.windows()) {
            out.println(String.join(",", Integer.toString(r.from()), Integer.toString(r.to()),
                    RqaText.time(tb, r.from()), RqaText.time(tb, r.to() - 1), RqaText.csv(r.rr()),
                    RqaText.csv(r.det()), RqaText.csv(r.l()), RqaText.count(r, r.lmax()), RqaText.csv(r.entr()),
                    RqaText.csv(r.lam()), RqaText.csv(r.tt()), RqaText.csv(r.div()), RqaText.count(r, r.vmax())));
        }
    }

    private void printText(Trend t, BaselineRange base, Channel ch, TimeBase tb, PrintWriter out) {
        out.println(log + ", channel " + ch.name() + (ch.unit().isEmpty() ? "" : " [" + ch.unit() + "]") + ", "
                + ch.size() + " samples; windows of " + t.window() + " samples every " + t.step() + " ("
                + t.windows().size() + " windows)");
        out.println("baseline    " + base.description());
        RqaText.parameters(t.params(), t.radius(), ch.unit(), t.estimate()).forEach(out::println);
        String head = String.format(Locale.ROOT, "%10s %10s  %-23s %-23s %8s %8s %8s %6s %8s %8s %8s", "start",
                "end", "start time", "end time", "RR", "DET", "L", "Lmax", "ENTR", "LAM", "TT");
        out.println(head);
        for (RqaResult r : t.windows()) {
            out.println(String.format(Locale.ROOT, "%10d %10d  %-23s %-23s %8s %8s %8s %6s %8s %8s %8s", r.from(),
                    r.to(), RqaText.time(tb, r.from()), RqaText.time(tb, r.to() - 1), RqaText.text(r.rr()),
                    RqaText.text(r.det()), RqaText.text(r.l()), RqaText.count(r, r.lmax()), RqaText.text(r.entr()),
                    RqaText.text(r.lam()), RqaText.text(r.tt())) + (r.computed() ? "" : "  " + r.skipped()));
        }
    }
}
