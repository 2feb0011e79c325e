package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;

/**
 * What reaches the UI thread: keys, resizes, timer ticks, and the analysis's progress and results
 * (tagged with the source and the generation they belong to, so stale results of cancelled work are
 * dropped). Immutable.
 */
sealed interface Event {
    /** A key. */
    record Key(KeyStroke stroke) implements Event {
    }

    /** The terminal changed size. */
    record Resized() implements Event {
    }

    /** The note desk, made after the first frame, is ready (or failed; see {@link LateDesk}). */
    record DeskReady() implements Event {
    }

    /** Time passed (drives the draft autosave and the busy marker). */
    record Tick() implements Event {
    }

    /** Progress of one channel. */
    record Progress(int source, int generation, int channel, String stage, double fraction) implements Event {
    }

    /** A channel's assessment so far. */
    record Updated(int source, int generation, int channel, ChannelAssessment assessment) implements Event {
    }

    /** The whole log is assessed. */
    record Done(int source, int generation, Assessment assessment) implements Event {
    }

    /** The analysis stopped: cancelled or failed, with a one-line reason. */
    record Stopped(int source, int generation, boolean cancelled, String reason) implements Event {
    }

    /**
     * A note save ended: where it went and the entries it holds, or why it failed ({@code ""} when it
     * did not).
     */
    record Saved(String path, org.riffle.note.Findings entries, String error) implements Event {
    }
}
