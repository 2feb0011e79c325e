package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.Recording;
import org.riffle.note.BaselineStore;
import org.riffle.note.NoteException;
import org.riffle.note.StoredBaseline;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;
import org.riffle.triage.TriageParams;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code riffle baseline save|list|remove}: per-asset baselines kept between visits in the store
 * ({@link BaselineStore}). Wiring only; the subcommands are methods of this one class.
 */
@Command(name = "baseline", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Keep an asset's healthy baseline between visits: save it from a log, list, remove.",
            "Later logs of the asset are judged against it with 'riffle report LOG --asset ID --stored-baseline'."},
        footer = {"", "Exit status: 0 done, 1 the store could not be written, 2 usage error, 3 bad input "
                + "(a log, or a stored baseline that is damaged, of another version or for other channels)."})
final class BaselineCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    private final Map<String, String> env;

    BaselineCommand() {
        this(System.getenv());
    }

    /** For tests: {@code env} stands in for the process environment. */
    BaselineCommand(Map<String, String> env) {
        this.env = Map.copyOf(env);
    }

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.USAGE;
    }

    /** The store: {@code --store}, else the environment's. */
    static BaselineStore store(Path store, Map<String, String> env) {
        return store != null ? BaselineStore.at(store) : BaselineStore.standard(env);
    }

    @Command(name = "save", mixinStandardHelpOptions = true, sortOptions = false,
            description = "Learn the baseline of every channel from a healthy LOG and store it for the asset.")
    int save(@Parameters(paramLabel = "LOG", description = "A log of the asset in healthy running.") Path log,
             @Option(names = "--asset", required = true, paramLabel = "ID", description = "Asset identifier.")
             String asset,
             @Option(names = "--span", paramLabel = "A:B", description = "Learn from rows A (inclusive) to B "
                     + "(exclusive) only; default: the whole log.") String span,
             @Option(names = "--store", paramLabel = "DIR", description = "The baseline folder (default: "
                     + "$RIFFLE_BASELINE_DIR, else $XDG_DATA_HOME/riffle/baselines).") Path store,
             @Mixin ReadOptionsMixin read)
            throws LogException {
        Recording rec = LogReader.read(log, read.toReadOptions());
        Reading.announce(rec, spec.commandLine().getErr());
        Baseline b;
        if (span == null) {
            b = new Baseline(0, Math.max(1, rec.rows()), "whole log (rows 0-" + rec.rows() + ")");
        } else {
            int[] ab = ReportCommand.parseSpan(spec.commandLine(), "--span", span);
            if (ab[1] > rec.rows()) {
                throw new LogException(rec.source().file(), 0, 0, "--span " + span
                        + " ends after the last row of this log (" + rec.rows() + " rows)");
            }
            b = new Baseline(ab[0], ab[1], "rows " + ab[0] + "-" + ab[1]);
        }
        BaselineModel model = new Analyzer(TriageParams.defaults()).learn(rec, b);
        try {
            StoredBaseline s = store(store, env).save(asset, model, log);
            PrintWriter out = spec.commandLine().getOut();
            out.println("baseline: " + s.path());
            out.println("asset " + s.asset() + ", id " + s.id() + ", " + s.channels().size() + " channels, "
                    + s.span() + " of " + s.sourceFile());
            out.flush();
            return ExitCode.OK;
        } catch (NoteException e) {
            spec.commandLine().getErr().println("riffle: " + e.getMessage());
            return ExitCode.FAILED;
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true, sortOptions = false,
            description = "List the stored baselines: asset, id, date, source log and its SHA-256, channels.")
    int list(@Option(names = "--asset", paramLabel = "ID", description = "Only this asset.") String asset,
             @Option(names = "--store", paramLabel = "DIR", description = "The baseline folder.") Path store) {
        BaselineStore s = store(store, env);
        BaselineStore.Listing l = s.list();
        PrintWriter out = spec.commandLine().getOut();
        List<StoredBaseline> shown = l.baselines().stream().filter(b -> asset == null || b.asset().equals(asset))
                .toList();
        out.println(shown.size() + (shown.size() == 1 ? " baseline" : " baselines") + " in " + s.root());
        for (StoredBaseline b : shown) {
            b.describe().forEach(out::println);
        }
        out.flush();
        PrintWriter err = spec.commandLine().getErr();
        l.problems().forEach(p -> err.println("riffle: skipped: " + p));
        err.flush();
        return ExitCode.OK;
    }

    @Command(name = "remove", mixinStandardHelpOptions = true, sortOptions = false,
            description = "Remove stored baselines of an asset: the ids given, or all with --all.")
    int remove(@Option(names = "--asset", required = true, paramLabel = "ID", description = "Asset identifier.")
               String asset,
               @Option(names = "--all", description = "Remove every baseline of the asset.") boolean all,
               @Parameters(paramLabel = "BASELINE", arity = "0..*", description = "Baseline ids, as listed.")
               List<String> ids,
               @Option(names = "--store", paramLabel = "DIR", description = "The baseline folder.") Path store) {
        if (all == (ids != null && !ids.isEmpty())) {
            throw new ParameterException(spec.commandLine(), "name the baselines to remove, or give --all");
        }
        BaselineStore s = store(store, env);
        PrintWriter out = spec.commandLine().getOut();
        try {
            List<String> which = all ? s.list().baselines().stream().filter(b -> b.asset().equals(asset))
                    .map(StoredBaseline::id).toList() : ids;
            if (which.isEmpty()) {
                s.find(asset, Optional.empty());
            }
            for (String id : which) {
                out.println("removed: " + s.remove(asset, id).path());
            }
            out.flush();
            return ExitCode.OK;
        } catch (NoteException e) {
            out.flush();
            spec.commandLine().getErr().println("riffle: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        }
    }
}
