package org.riffle.tui;

import java.util.Optional;
import org.riffle.log.Recording;
import org.riffle.triage.Assessment;
import org.riffle.triage.Baseline;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.TriageParams;

/**
 * One log on screen and what is known of it so far: the recording, the parameters of the analysis in
 * force, each channel's latest partial assessment and progress, and the finished assessment.
 *
 * <p>Confined to the UI thread.
 */
final class Source {
    final Recording recording;
    private TriageParams params;
    private int generation;
    private final ChannelAssessment[] latest;
    private final double[] progress;
    private final String[] stage;
    private Assessment done;
    private String failure = "";
    private boolean cancelled;

    Source(Recording recording, TriageParams params) {
        this.recording = recording;
        this.params = params;
        int n = recording.channels().size();
        this.latest = new ChannelAssessment[n];
        this.progress = new double[n];
        this.stage = new String[n];
        reset();
    }

    /** Forgets every result and starts a new generation with {@code p}; returns the generation. */
    int restart(TriageParams p) {
        this.params = p;
        reset();
        return ++generation;
    }

    private void reset() {
        java.util.Arrays.fill(latest, null);
        java.util.Arrays.fill(progress, 0);
        java.util.Arrays.fill(stage, "waiting");
        done = null;
        failure = "";
        cancelled = false;
    }

    int generation() {
        return generation;
    }

    TriageParams params() {
        return params;
    }

    /** The baseline in force (as the parameters select it on this log). */
    Baseline baseline() {
        return done != null ? done.baseline() : params.baselineFor(recording.rows());
    }

    void progress(int channel, String what, double fraction) {
        stage[channel] = what;
        progress[channel] = fraction;
    }

    void updated(int channel, ChannelAssessment a) {
        latest[channel] = a;
    }

    void finished(Assessment a) {
        done = a;
        for (int i = 0; i < latest.length && i < a.channels().size(); i++) {
            latest[i] = a.channels().get(i);
            progress[i] = 1;
            stage[i] = "done";
        }
    }

    void failed(String why) {
        failure = why;
    }

    void cancel() {
        cancelled = true;
    }

    /** The channel's assessment so far, empty before the first result. */
    Optional<ChannelAssessment> channel(int i) {
        return Optional.ofNullable(latest[i]);
    }

    double progress(int i) {
        return progress[i];
    }

    String stage(int i) {
        return stage[i];
    }

    Optional<Assessment> assessment() {
        return Optional.ofNullable(done);
    }

    /** True while analysis runs: not finished, not failed, not cancelled. */
    boolean running() {
        return done == null && failure.isEmpty() && !cancelled;
    }

    boolean cancelled() {
        return cancelled;
    }

    String failure() {
        return failure;
    }

    /** Channels with a complete assessment. */
    int completeChannels() {
        int n = 0;
        for (ChannelAssessment a : latest) {
            if (a != null && a.complete()) {
                n++;
            }
        }
        return n;
    }
}
