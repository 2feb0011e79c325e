package org.riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.riffle.log.LogException;
import org.riffle.note.Findings;
import org.riffle.note.MetricsCsv;
import org.riffle.note.NoteException;
import org.riffle.note.NoteSaver;
import org.riffle.note.NoteWriter;
import org.riffle.triage.Assessment;

/**
 * {@code riffle report FOLDER...}: every log in the folders (not their subfolders), one worker per
 * thread, each log read, assessed on one thread, its note written and its rows kept for the summary
 * CSV; the log itself is dropped as soon as its note is out. A bad log is reported and skipped; the
 * others go on. A progress line goes to standard error when that is a terminal.
 *
 * <p>Confined to the calling thread, apart from the workers it starts and joins.
 */
final class ReportBatch {
    /** What counts as a log in a folder: by name, case-insensitive. */
    static final Pattern LOG_NAME = Pattern.compile("(?i)^[^.].*\\.(csv|tsv|txt|dat|log|wav)(\\.gz)?$");
    /** riffle's own output, never taken for a log. */
    static final Pattern OWN_OUTPUT = Pattern.compile("(?i).*-note(-\\d+)?\\.txt$|^riffle-summary(-\\d+)?\\.csv$");
    static final String SUMMARY = "riffle-summary.csv";

    private final PrintWriter out;
    private final PrintWriter err;
    private final boolean progress;

    ReportBatch(PrintWriter out, PrintWriter err, Map<String, String> env) {
        this(out, err, Terminal.stderrIsTerminal() && !"dumb".equals(env.get("TERM")));
    }

    ReportBatch(PrintWriter out, PrintWriter err, boolean progress) {
        this.out = out;
        this.err = err;
        this.progress = progress;
    }

    /** The outcome for one log: its rows and where its note went, or the message why not. */
    private record Outcome(Path log, List<MetricsCsv.Row> rows, Path asked, Path written, String problem,
                           boolean badInput) {
    }

    int run(List<Path> folders, Path output, Path metrics, ReportCommand.Judging judging, NoteWriter writer,
            Findings findings) throws LogException {
        List<Path> logs = logsIn(folders);
        Path outDir = output == null ? Path.of("") : output;
        if (output != null && !Files.isDirectory(output)) {
            err.println("riffle: " + output + ": for folders of logs, -o names an existing folder for the notes");
            return ExitCode.USAGE;
        }
        int workers = Math.max(1, Math.min(judging.params().threads(), logs.size()));
        ReportCommand.Judging one = judging.threads(1);
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "riffle-report");
            t.setDaemon(true);
            return t;
        });
        List<Outcome> outcomes = new ArrayList<>();
        AtomicInteger done = new AtomicInteger();
        try {
            List<Future<Outcome>> futures = new ArrayList<>();
            for (Path log : logs) {
                futures.add(pool.submit(() -> {
                    Outcome o = one(log, outDir, one, writer, findings);
                    showProgress(done.incrementAndGet(), logs.size());
                    return o;
                }));
            }
            for (Future<Outcome> f : futures) {
                outcomes.add(f.get());
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            err.println();
            err.println("riffle: interrupted; notes already written are complete");
            return ExitCode.INTERRUPTED;
        } catch (ExecutionException e) {
            throw new IllegalStateException("a report worker failed", e.getCause());
        } finally {
            pool.shutdownNow();
        }
        if (progress) {
            err.print("\r" + " ".repeat(60) + "\r");
        }
        return summarise(outcomes, outDir, metrics);
    }

    private Outcome one(Path log, Path outDir, ReportCommand.Judging judging, NoteWriter writer, Findings findings) {
        Path asked = outDir.resolve(NoteSaver.defaultName(log.toString()));
        try {
            Assessment a = judging.assess(judging.read(log));
            String note = writer.render(a, findings);
            return new Outcome(log, MetricsCsv.rows(a), asked, NoteSaver.save(asked, note), "", false);
        } catch (LogException e) {
            return new Outcome(log, List.of(), asked, null, e.getMessage(), true);
        } catch (NoteException e) {
            return new Outcome(log, List.of(), asked, null, e.getMessage(), false);
        }
    }

    private int summarise(List<Outcome> outcomes, Path outDir, Path metrics) {
        int status = ExitCode.OK;
        List<MetricsCsv.Row> rows = new ArrayList<>();
        for (Outcome o : outcomes) {
            if (o.written() != null) {
                ReportCommand.report(out, err, "note", o.asked(), o.written());
                rows.addAll(o.rows());
            } else {
                err.println("riffle: " + o.problem());
                status = Math.max(status, o.badInput() ? ExitCode.BAD_INPUT : ExitCode.FAILED);
            }
        }
        String csv = MetricsCsv.toText(rows);
        try {
            if (ReportCommand.isDash(metrics)) {
                out.print(csv);
            } else {
                Path target = metrics != null ? metrics : outDir.resolve(SUMMARY);
                ReportCommand.report(out, err, "summary", target, NoteSaver.save(target, csv));
            }
        } catch (NoteException e) {
            err.println("riffle: " + e.getMessage());
            status = Math.max(status, ExitCode.FAILED);
        }
        out.flush();
        err.flush();
        return status;
    }

    private void showProgress(int done, int total) {
        if (progress) {
            synchronized (err) {
                err.print(String.format(Locale.ROOT, "\rriffle report: %d of %d logs done", done, total));
                err.flush();
            }
        }
    }

    /** The logs directly inside {@code folders}, sorted by name within each folder. */
    static List<Path> logsIn(List<Path> folders) throws LogException {
        List<Path> logs = new ArrayList<>();
        for (Path folder : folders) {
            List<Path> here;
            try (Stream<Path> s = Files.list(folder)) {
                here = s.filter(p -> Files.isRegularFile(p) && LOG_NAME.matcher(p.getFileName().toString()).matches()
                        && !OWN_OUTPUT.matcher(p.getFileName().toString()).matches()).sorted().toList();
            } catch (IOException e) {
                throw new LogException(folder, "cannot list this folder: " + e.getMessage());
            }
            if (here.isEmpty()) {
                throw new LogException(folder, "no logs in this folder (looked for .csv, .tsv, .txt, .dat, .log"
                        + " and .wav files, also gzipped)");
            }
            logs.addAll(here);
        }
        return logs;
    }
}
