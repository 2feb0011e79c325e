package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.riffle.log.Channel;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code riffle rqa LOG --channel NAME}: the recurrence quantification of one stretch of a channel. */
@Command(name = "rqa", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Recurrence quantification (RQA) of one stretch of a channel: RR, DET, L, Lmax, DIV, ENTR,"
                + " LAM, TT, Vmax and the parameters used."},
        footer = {"", "A pair of delay vectors recurs when their distance is <= the radius. Counts run over the"
                + " full recurrence matrix (both triangles) without the Theiler band; lines at the border keep"
                + " their truncated length; undefined values print as NaN. See 'man riffle' for the definitions.",
                "Exit status: 0 done, 2 usage error, 3 bad input (the message names the file)."})
final class RqaCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOG", description = "The log file to read ('-' for standard input).")
    private Path log;

    @Mixin
    private RqaOptions rqa;

    @Option(names = "--from", paramLabel = "I", description = "First sample, 0-based. Default: 0.")
    private Integer from;

    @Option(names = "--to", paramLabel = "J", description = "End sample, exclusive. Default: the end of the log.")
    private Integer to;

    @Option(names = "--csv", description = "Write a header row and one value row as CSV.")
    private boolean csv;

    @Mixin
    private ReadOptionsMixin read;

    @Override
    public Integer call() throws LogException {
        RqaParams params = rqa.toParams();
        Recording rec = LogReader.read(log, read.toReadOptions());
        Reading.announce(rec, spec.commandLine().getErr());
        Channel ch = rqa.pick(rec, log);
        int a = from == null ? 0 : from;
        int b = to == null ? ch.size() : to;
        if (a < 0 || b > ch.size() || b <= a) {
            throw rqa.usage("--from " + a + " --to " + b + " is not a range inside 0:" + ch.size() + " of channel "
                    + ch.name());
        }
        double[] x = ch.toDoubles();
        for (int i = a; i < b; i++) {
            if (Double.isNaN(x[i])) {
                throw new LogException(log, "channel " + ch.name() + " has a missing sample at index " + i
                        + " in " + a + ":" + b + "; choose --from/--to without gaps");
            }
        }
        RqaResult r;
        try {
            r = Rqa.withAllCores().analyse(x, a, b, params);
        } catch (IllegalArgumentException e) {
            throw rqa.usage(e.getMessage());
        }
        print(r, ch, spec.commandLine().getOut());
        return ExitCode.OK;
    }

    private void print(RqaResult r, Channel ch, PrintWriter out) {
        RqaParams p = r.params();
        if (csv) {
            out.println("n,radius,rr,det,l,lmax,div,entr,lam,tt,vmax,channel,from,to,dim,delay,norm,policy,"
                    + "policy_value,min_line,min_vert,theiler,recurrent,eligible");
            out.println(String.join(",", Integer.toString(r.vectors()), RqaText.csv(r.radius()), RqaText.csv(r.rr()),
                    RqaText.csv(r.det()), RqaText.csv(r.l()), Integer.toString(r.lmax()), RqaText.csv(r.div()),
                    RqaText.csv(r.entr()), RqaText.csv(r.lam()), RqaText.csv(r.tt()), Integer.toString(r.vmax()),
                    RqaText.quote(ch.name()), Integer.toString(r.from()), Integer.toString(r.to()),
                    Integer.toString(p.dimension()), Integer.toString(p.delay()), p.norm().word(),
                    p.threshold().policy().word(), RqaText.csv(p.threshold().value()), Integer.toString(p.minLine()),
                    Integer.toString(p.minVert()), Integer.toString(p.theiler()), Long.toString(r.recurrent()),
                    Long.toString(r.eligible())));
        } else {
            out.println(log + ", channel " + ch.name() + (ch.unit().isEmpty() ? "" : " [" + ch.unit() + "]")
                    + ", samples " + r.from() + ":" + r.to() + " (" + (r.to() - r.from()) + " samples, "
                    + r.vectors() + " delay vectors)");
            RqaText.parameters(p, r.radius(), ch.unit(), r.estimate()).forEach(out::println);
            RqaText.measures(r, out);
        }
        out.flush();
    }
}
