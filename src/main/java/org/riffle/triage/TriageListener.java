package org.riffle.triage;

/**
 * Receives progress and partial results while a triage runs. Called from worker threads: an
 * implementation that touches a screen must hand the call over to its own UI thread.
 */
public interface TriageListener {
    /** A listener that ignores everything. */
    TriageListener NONE = new TriageListener() {
    };

    /**
     * Progress of one channel.
     *
     * @param channelIndex index into the recording's numeric channels
     * @param stage what is being computed, e.g. {@code "recurrence"}
     * @param fraction 0..1 of this channel's work done
     */
    default void progress(int channelIndex, String stage, double fraction) {
    }

    /** A channel's assessment as far as it has been computed ({@link ChannelAssessment#complete()} tells). */
    default void updated(int channelIndex, ChannelAssessment assessment) {
    }
}
