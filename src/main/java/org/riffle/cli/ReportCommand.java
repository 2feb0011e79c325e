package org.riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.riffle.log.LogException;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.note.BaselineStore;
import org.riffle.note.Findings;
import org.riffle.note.MetricsCsv;
import org.riffle.note.NoteException;
import org.riffle.note.NoteSaver;
import org.riffle.note.NoteWriter;
import org.riffle.note.StoredBaseline;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code riffle report LOG...}: the findings note without the screen. Files make one note together;
 * folders are reported log by log on all cores ({@link ReportBatch}).
 */
@Command(name = "report", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Write the findings note for one or more logs without the screen.",
            "Several LOG files make one note. A folder makes one note per log in it plus one summary CSV, "
                + "using all cores. Nothing is ever overwritten: when a name is taken, a numbered one is used "
                + "and shown.",
            "Screening aid only: decisions belong to qualified maintenance staff under site procedures and "
                + "local codes."},
        footer = {"", "Exit status: 0 done, 1 a note or CSV could not be written, 2 usage error, "
                + "3 bad input (the message names the file)."})
final class ReportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "LOG", description = "Log files ('-' for standard input), "
            + "or folders of logs.")
    private List<Path> logs;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Where the note goes: a file, "
            + "a folder, or '-' for standard output. For folders of logs: the folder for the notes. "
            + "Default: the current folder, named after the (first) log, e.g. pump-note.txt.")
    private Path output;

    @Option(names = "--site", paramLabel = "NAME", description = "Site or plant, as printed in the note.")
    private String site = "";

    @Option(names = "--asset", paramLabel = "ID", description = "Asset (machine) identifier.")
    private String asset = "";

    @Option(names = "--point", paramLabel = "TEXT", description = "Measuring point and direction.")
    private String point = "";

    @Option(names = "--technician", paramLabel = "NAME", description = "Who took the readings.")
    private String technician = "";

    @Option(names = "--conditions", paramLabel = "TEXT", description = "Operating conditions at the time "
            + "(speed, load, process state), as free text.")
    private String conditions = "";

    @Option(names = "--comment", paramLabel = "TEXT", description = "The general comment.")
    private String comment = "";

    @Option(names = "--metrics", paramLabel = "FILE.csv", description = "Also write the per-channel figures "
            + "as CSV ('-' for standard output). For folders: the summary CSV, default riffle-summary.csv "
            + "beside the notes.")
    private Path metrics;

    @Option(names = "--baseline", paramLabel = "A:B", description = "Judge against rows A (inclusive) to B "
            + "(exclusive) of each log instead of the first 25 %.")
    private String baseline;

    @Option(names = "--stored-baseline", arity = "0..1", fallbackValue = "", paramLabel = "ID",
            description = "Judge against the asset's stored baseline (needs --asset): the one named, "
                    + "or the newest. See 'riffle baseline'.")
    private String storedBaseline;

    @Option(names = "--store", paramLabel = "DIR", description = "The baseline folder (default: "
            + "$RIFFLE_BASELINE_DIR, else $XDG_DATA_HOME/riffle/baselines).")
    private Path store;

    @Option(names = "--ascii", description = "Write the note in ASCII only even when the locale says UTF-8.")
    private boolean ascii;

    @Mixin
    private VibrationOptions vibration;

    @Mixin
    private ReadOptionsMixin read;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: one per core).")
    private int threads = Runtime.getRuntime().availableProcessors();

    private final Map<String, String> env;

    ReportCommand() {
        this(System.getenv());
    }

    /** For tests: {@code env} stands in for the process environment. */
    ReportCommand(Map<String, String> env) {
        this.env = Map.copyOf(env);
    }

    @Override
    public Integer call() throws LogException {
        int[] span = span();
        TriageParams params = new TriageParams(span[0], span[1], Math.max(1, threads))
                .withVibration(vibration.params());
        NoteWriter writer = NoteWriter.standard().withAscii(ascii || !NoteWriter.localeIsUtf8(env));
        Findings findings = new Findings(site, asset, point, technician, conditions, Map.of(), comment);
        long folders = logs.stream().filter(Files::isDirectory).count();
        if (folders > 0 && folders < logs.size()) {
            throw new ParameterException(spec.commandLine(), "give either log files or folders of logs, not both");
        }
        ReadOptions readOptions = read.toReadOptions();
        Judging judging = new Judging(params, null, null, readOptions);
        if (storedBaseline != null) {
            if (asset.isBlank()) {
                throw new ParameterException(spec.commandLine(), "--stored-baseline needs --asset ID");
            }
            BaselineStore s = BaselineCommand.store(store, env);
            try {
                StoredBaseline b = s.find(asset, storedBaseline.isEmpty() ? Optional.empty()
                        : Optional.of(storedBaseline));
                judging = new Judging(params, s, b, readOptions);
                writer = writer.withStoredBaseline(b);
            } catch (NoteException e) {
                spec.commandLine().getErr().println("riffle: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
        }
        if (folders > 0) {
            return new ReportBatch(spec.commandLine().getOut(), spec.commandLine().getErr(), env)
                    .run(logs, output, metrics, judging, writer, findings);
        }
        return single(judging, writer, findings);
    }

    /**
     * How each log is read ({@code read}, the read options) and judged: against rows of itself
     * ({@code stored} null), or against a stored baseline, which is checked against every log before
     * use. Immutable.
     */
    record Judging(TriageParams params, BaselineStore store, StoredBaseline stored, ReadOptions read) {
        /** The same judging on {@code n} threads. */
        Judging threads(int n) {
            return new Judging(params.withThreads(n), store, stored, read);
        }

        /** Reads {@code log} with the read options. */
        Recording read(Path log) throws LogException {
            return LogReader.read(log, read);
        }

        Assessment assess(Recording rec) throws LogException {
            checkSpan(params, rec);
            Analyzer analyzer = new Analyzer(params);
            if (stored == null) {
                return analyzer.assess(rec, TriageListener.NONE);
            }
            try {
                return analyzer.assess(rec, store.load(stored, rec), TriageListener.NONE);
            } catch (NoteException e) {
                throw new LogException((String) null, 0, 0, e.getMessage());
            }
        }
    }

    private int single(Judging judging, NoteWriter writer, Findings findings) throws LogException {
        List<Assessment> all = new ArrayList<>();
        for (Path log : logs) {
            Recording rec = judging.read(log);
            Reading.announce(rec, spec.commandLine().getErr());
            all.add(judging.assess(rec));
        }
        String note = writer.render(all, findings);
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            if (isDash(output)) {
                out.print(note);
            } else {
                Path target = noteTarget(output, logs.get(0).toString());
                report(out, err, "note", target, NoteSaver.save(target, note));
            }
            if (metrics != null) {
                List<MetricsCsv.Row> rows = new ArrayList<>();
                all.forEach(a -> rows.addAll(MetricsCsv.rows(a)));
                String csv = MetricsCsv.toText(rows);
                if (isDash(metrics)) {
                    out.print(csv);
                } else {
                    report(out, err, "metrics", metrics, NoteSaver.save(metrics, csv));
                }
            }
        } catch (NoteException e) {
            err.println("riffle: " + e.getMessage());
            return ExitCode.FAILED;
        }
        out.flush();
        return ExitCode.OK;
    }

    /** The note's path: {@code output} as given, inside it when it is a folder, else the default name. */
    static Path noteTarget(Path output, String firstLog) {
        String name = NoteSaver.defaultName(firstLog);
        if (output == null) {
            return Path.of(name);
        }
        return Files.isDirectory(output) ? output.resolve(name) : output;
    }

    /** Prints where {@code what} went, and says so on standard error when the name asked for was taken. */
    static void report(PrintWriter out, PrintWriter err, String what, Path asked, Path written) {
        if (!written.equals(asked.toAbsolutePath().normalize())) {
            err.println("riffle: " + asked + " exists and was kept; the " + what + " went to " + written);
        }
        out.println(what + ": " + written);
    }

    /** Refuses a baseline span that ends after the log's last row (a user error, not a bug). */
    static void checkSpan(TriageParams params, Recording rec) throws LogException {
        if (params.baselineTo() > rec.rows()) {
            throw new LogException(rec.source().file(), 0, 0, "--baseline " + params.baselineFrom() + ":"
                    + params.baselineTo() + " ends after the last row of this log (" + rec.rows() + " rows)");
        }
    }

    static boolean isDash(Path p) {
        return p != null && p.toString().equals("-");
    }

    private int[] span() {
        if (baseline == null) {
            return new int[] {-1, -1};
        }
        if (storedBaseline != null) {
            throw new ParameterException(spec.commandLine(), "--baseline and --stored-baseline exclude each other");
        }
        return parseSpan(spec.commandLine(), "--baseline", baseline);
    }

    /** Rows {@code A:B} with {@code 0 <= A < B}, or a usage error naming {@code option}. */
    static int[] parseSpan(CommandLine cl, String option, String text) {
        String[] ab = text.split(":", -1);
        try {
            if (ab.length == 2) {
                int a = Integer.parseInt(ab[0].trim());
                int b = Integer.parseInt(ab[1].trim());
                if (a >= 0 && b > a) {
                    return new int[] {a, b};
                }
            }
        } catch (NumberFormatException e) {
            // fall through to the usage message
        }
        throw new ParameterException(cl, option + " '" + text + "' must be A:B with whole row numbers 0 <= A < B");
    }
}
