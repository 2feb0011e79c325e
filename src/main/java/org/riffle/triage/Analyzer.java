package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.FutureTask;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.TimeIssue;
import org.riffle.recurrence.RqaParams;
import org.riffle.signal.Summary;
import org.riffle.triage.BaselineModel.ChannelModel;

/**
 * Judges every numeric channel of a recording against its baseline, one channel a task on a fixed
 * thread pool: learn the baseline ({@link #learn}) and judge the recording against it ({@link #assess}),
 * or both in one go from the baseline rows of the same log. Results do not depend on the number of
 * threads: each channel's work is sequential and seeded.
 *
 * <p>Thread-safe; each call owns its own pool and shuts it down before returning. Interrupting the
 * calling thread (or cancelling the future of {@link #start}) cancels the work with a
 * {@link CancellationException}. Progress and partial results go to the {@link TriageListener} from
 * worker threads.
 */
public final class Analyzer {
    private final TriageParams params;

    public Analyzer(TriageParams params) {
        this.params = params;
    }

    public TriageParams params() {
        return params;
    }

    /** Runs {@link #assess(Recording, TriageListener)} on a thread of its own; never blocks the caller. */
    public Future<Assessment> start(Recording recording, TriageListener listener) {
        FutureTask<Assessment> task = new FutureTask<>(() -> assess(recording, listener));
        Thread t = new Thread(task, "riffle-triage");
        t.setDaemon(true);
        t.start();
        return task;
    }

    /**
     * Learns the baseline from the rows of {@link TriageParams#baselineFor} and judges all of
     * {@code recording} against it.
     *
     * @throws CancellationException when the calling thread is interrupted
     */
    public Assessment assess(Recording recording, TriageListener listener) {
        Baseline baseline = params.baselineFor(recording.rows());
        BaselineModel shell = shell(recording, baseline);
        boolean[] resets = resets(recording);
        List<ChannelAssessment> out = run(recording.channels().size(), i -> {
            Channel c = recording.channels().get(i);
            double[] x = c.toDoubles();
            Summary stats = started(i, c, x, listener);
            ChannelWork.Learning m = ChannelWork.learn(c, x, baseline.fromRow(), baseline.toRow(), resets,
                    recording.time().rateHz(), params, shell.window(), shell.step(),
                    f -> listener.progress(i, "reservoir", 0.05 + 0.8 * f));
            return finish(i, c, x, m.model(), shell, baseline, recording, resets, stats, listener, m.rqa());
        });
        return new Assessment(recording, baseline, out, sharedParams(shell));
    }

    /**
     * Learns every channel of {@code recording} from its rows in {@code baseline}.
     *
     * @throws CancellationException when the calling thread is interrupted
     */
    public BaselineModel learn(Recording recording, Baseline baseline, TriageListener listener) {
        if (baseline.toRow() > recording.rows()) {
            throw new IllegalArgumentException("baseline " + baseline.fromRow() + ":" + baseline.toRow()
                    + " ends after the last row " + recording.rows());
        }
        BaselineModel shell = shell(recording, baseline);
        boolean[] resets = resets(recording);
        List<ChannelModel> models = run(recording.channels().size(), i -> {
            Channel c = recording.channels().get(i);
            listener.progress(i, "baseline", 0);
            ChannelModel m = ChannelWork.learn(c, c.toDoubles(), baseline.fromRow(), baseline.toRow(), resets,
                    recording.time().rateHz(), params, shell.window(), shell.step(),
                    f -> listener.progress(i, "baseline", f)).model();
            listener.progress(i, "baseline", 1);
            return m;
        });
        return new BaselineModel(shell.source(), baseline, shell.window(), shell.step(), shell.quantile(),
                shell.sustained(), models, shell.rqaNorm(), shell.minLine(), shell.minVert(), shell.theiler());
    }

    /** Learns from {@code baseline} rows of {@code recording} without progress reports. */
    public BaselineModel learn(Recording recording, Baseline baseline) {
        return learn(recording, baseline, TriageListener.NONE);
    }

    /**
     * Judges all of {@code recording} against a baseline learned before (from this log or another log
     * of the same asset); channels are matched by name.
     *
     * @throws CancellationException when the calling thread is interrupted
     */
    public Assessment assess(Recording recording, BaselineModel model, TriageListener listener) {
        Baseline baseline = model.baseline();
        boolean[] resets = resets(recording);
        List<ChannelAssessment> out = run(recording.channels().size(), i -> {
            Channel c = recording.channels().get(i);
            double[] x = c.toDoubles();
            Summary stats = started(i, c, x, listener);
            ChannelModel m = model.channel(c.name()).orElse(ChannelModel.none(c.name(), c.unit(),
                    "no baseline: the baseline model has no channel named '" + c.name() + "'"));
            return finish(i, c, x, m, model, baseline, recording, resets, stats, listener, Optional.empty());
        });
        return new Assessment(recording, baseline, out, sharedParams(model));
    }

    /** {@code x}: the channel's samples as doubles, made once per channel and shared by every step. */
    private Summary started(int i, Channel c, double[] x, TriageListener listener) {
        listener.progress(i, "statistics", 0);
        Summary stats = Summary.of(x);
        listener.updated(i, new ChannelAssessment(c.name(), c.unit(), stats, Optional.empty(), List.of(),
                List.of(), Health.none("not yet computed"), List.of(), List.of(), false));
        return stats;
    }

    private ChannelAssessment finish(int i, Channel c, double[] x, ChannelModel m, BaselineModel bm, Baseline baseline,
                                     Recording recording, boolean[] resets, Summary stats,
                                     TriageListener listener, Optional<RqaStep.Known> known) {
        listener.progress(i, "judgement", 0.9);
        // vibration figures: filled by the vibration step where the channel is a vibration channel
        Optional<VibrationFigures> vibration = VibrationStep.figures(c, x, recording.time().rateHz(), baseline,
                params.vibration());
        ChannelAssessment a = ChannelWork.assess(c, x, m, bm, baseline, recording.time(), resets, stats,
                vibration, known);
        a = a.withThumbnails(ThumbnailStep.of(x, m, bm, baseline, recording.time()));
        listener.progress(i, "done", 1);
        listener.updated(i, a);
        return a;
    }

    private BaselineModel shell(Recording recording, Baseline baseline) {
        int rows = baseline.toRow() - baseline.fromRow();
        String source = baseline.sameLog() ? baseline.description() + " of " + fileName(recording)
                : baseline.description();
        RqaParams r = params.rqa();
        return new BaselineModel(source, baseline, params.windowFor(rows), params.stepFor(rows, recording.rows()),
                params.quantile(), params.sustained(), List.of(), r.norm().word(), r.minLine(), r.minVert(), r.theiler());
    }

    private static String fileName(Recording r) {
        String f = r.source().file();
        int slash = Math.max(f.lastIndexOf('/'), f.lastIndexOf('\\'));
        return f.substring(slash + 1);
    }

    private static List<Param> sharedParams(BaselineModel m) {
        return List.of(new Param("baseline", m.source()),
                new Param("window", m.window() + " samples, step " + m.step()),
                new Param("calibration quantile", Reporting.num(m.quantile())),
                new Param("sustained departure", m.sustained() + " windows in a row"));
    }

    /** Rows that follow a gap or a backward step in the time base: the reservoir restarts there. */
    static boolean[] resets(Recording recording) {
        boolean[] r = new boolean[recording.rows()];
        for (TimeIssue issue : recording.timeIssues()) {
            if (issue.kind() != TimeIssue.Kind.DUPLICATE && issue.row() >= 0 && issue.row() < r.length) {
                r[issue.row()] = true;
            }
        }
        return r;
    }

    /** Per-channel work for channel index i. */
    private interface ChannelTask<T> {
        T run(int channelIndex) throws Exception;
    }

    private <T> List<T> run(int channels, ChannelTask<T> task) {
        ExecutorService pool = Executors.newFixedThreadPool(params.threads(), r -> {
            Thread t = new Thread(r, "riffle-triage-worker");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<T>> futures = new ArrayList<>();
            for (int i = 0; i < channels; i++) {
                int index = i;
                Callable<T> call = () -> task.run(index);
                futures.add(pool.submit(call));
            }
            List<T> out = new ArrayList<>();
            for (Future<T> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("triage cancelled");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof CancellationException ce) {
                throw ce;
            }
            throw new IllegalStateException("triage failed on a channel: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
