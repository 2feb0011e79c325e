package org.riffle.tui;

import java.util.concurrent.CancellationException;
import java.util.function.Consumer;
import org.riffle.log.Recording;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;

/**
 * Runs the triage of one log on its own thread and posts progress and results to the UI thread as
 * {@link Event}s. Progress is thinned to whole per cents so a fast engine cannot flood the screen.
 *
 * <p>Thread-safe: {@link #start} and {@link #cancel} are called from the UI thread; the listener
 * runs on the analyser's workers and only posts.
 */
final class AnalysisWork {
    private final int source;
    private final int generation;
    private final Thread thread;

    private AnalysisWork(int source, int generation, Recording recording, TriageParams params,
                         Consumer<Event> post) {
        this.source = source;
        this.generation = generation;
        this.thread = new Thread(() -> run(recording, params, post), "riffle-analysis-" + source);
        this.thread.setDaemon(true);
    }

    /** Starts the analysis of {@code recording}; events go to {@code post}. */
    static AnalysisWork start(int source, int generation, Recording recording, TriageParams params,
                              Consumer<Event> post) {
        AnalysisWork w = new AnalysisWork(source, generation, recording, params, post);
        w.thread.start();
        return w;
    }

    /** Asks the analysis to stop; a {@link Event.Stopped} follows. */
    void cancel() {
        thread.interrupt();
    }

    /** Waits for the thread to end, at most {@code millis}; for tests and shutdown. */
    void join(long millis) throws InterruptedException {
        thread.join(millis);
    }

    private void run(Recording recording, TriageParams params, Consumer<Event> post) {
        int channels = recording.channels().size();
        int[] lastPercent = new int[channels];
        java.util.Arrays.fill(lastPercent, -1);
        TriageListener listener = new TriageListener() {
            @Override
            public void progress(int channelIndex, String stage, double fraction) {
                int pc = (int) Math.floor(100 * Math.max(0, Math.min(1, fraction)));
                synchronized (lastPercent) {
                    if (pc == lastPercent[channelIndex] && pc != 100) {
                        return;
                    }
                    lastPercent[channelIndex] = pc;
                }
                post.accept(new Event.Progress(source, generation, channelIndex, stage, fraction));
            }

            @Override
            public void updated(int channelIndex, ChannelAssessment assessment) {
                post.accept(new Event.Updated(source, generation, channelIndex, assessment));
            }
        };
        try {
            Assessment a = new Analyzer(params).assess(recording, listener);
            post.accept(new Event.Done(source, generation, a));
        } catch (CancellationException e) {
            post.accept(new Event.Stopped(source, generation, true, "analysis cancelled"));
        } catch (RuntimeException e) {
            String why = e.getCause() != null ? e.getCause().toString() : e.toString();
            post.accept(new Event.Stopped(source, generation, false, "analysis failed: " + why));
        }
    }
}
