package org.riffle.triage;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.signal.Summary;

/**
 * Judges every numeric channel of a recording against its baseline, one channel a task on a fixed
 * thread pool. Results do not depend on the number of threads.
 *
 * <p>Thread-safe; each call to {@link #assess} owns its own pool and shuts it down before returning.
 * Interrupting the calling thread cancels the work.
 */
public final class Analyzer {
    private final TriageParams params;

    public Analyzer(TriageParams params) {
        this.params = params;
    }

    /**
     * Assesses {@code recording}.
     *
     * @throws CancellationException when the calling thread is interrupted
     */
    public Assessment assess(Recording recording, TriageListener listener) {
        Baseline baseline = params.baselineFor(recording.rows());
        List<Channel> channels = recording.channels();
        ExecutorService pool = Executors.newFixedThreadPool(params.threads(), r -> {
            Thread t = new Thread(r, "riffle-triage");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<ChannelAssessment>> futures = new ArrayList<>();
            for (int i = 0; i < channels.size(); i++) {
                int index = i;
                futures.add(pool.submit(() -> assessChannel(index, channels.get(index), listener)));
            }
            List<ChannelAssessment> out = new ArrayList<>();
            for (Future<ChannelAssessment> f : futures) {
                out.add(f.get());
            }
            return new Assessment(recording, baseline, out, List.of(new Param("baseline", baseline.description())));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("triage cancelled");
        } catch (ExecutionException e) {
            throw new IllegalStateException("triage failed on a channel", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private ChannelAssessment assessChannel(int index, Channel channel, TriageListener listener) {
        listener.progress(index, "statistics", 0);
        Summary stats = Summary.of(channel.toDoubles());
        ChannelAssessment a = new ChannelAssessment(channel.name(), channel.unit(), stats, Optional.empty(),
                List.of(), List.of(), Health.none("reservoir health not implemented yet"), List.of(),
                List.of("recurrence and reservoir analysis: not implemented yet"), true);
        listener.progress(index, "done", 1);
        listener.updated(index, a);
        return a;
    }
}
