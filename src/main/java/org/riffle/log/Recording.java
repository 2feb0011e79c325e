package org.riffle.log;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One log as read: a time base, its numeric channels (all of the time base's length), its text
 * channels, the faults found in its time base, and the facts of its source.
 *
 * <p>Immutable and thread-safe.
 */
public final class Recording {
    private final SourceFacts source;
    private final TimeBase time;
    private final List<Channel> channels;
    private final List<TextChannel> textChannels;
    private final List<TimeIssue> timeIssues;

    public Recording(SourceFacts source, TimeBase time, List<Channel> channels,
                     List<TextChannel> textChannels, List<TimeIssue> timeIssues) {
        this.source = Objects.requireNonNull(source, "source");
        this.time = Objects.requireNonNull(time, "time");
        this.channels = List.copyOf(channels);
        this.textChannels = List.copyOf(textChannels);
        this.timeIssues = List.copyOf(timeIssues);
        for (Channel c : this.channels) {
            if (c.size() != time.size()) {
                throw new IllegalArgumentException("channel " + c.name() + " has " + c.size()
                        + " samples but the time base has " + time.size());
            }
        }
    }

    public SourceFacts source() {
        return source;
    }

    public TimeBase time() {
        return time;
    }

    /** The numeric channels, in file order. */
    public List<Channel> channels() {
        return channels;
    }

    /** The text channels, in file order. */
    public List<TextChannel> textChannels() {
        return textChannels;
    }

    /** Gaps, duplicates and backward steps found in the time base. */
    public List<TimeIssue> timeIssues() {
        return timeIssues;
    }

    /** Number of rows. */
    public int rows() {
        return time.size();
    }

    /** The numeric channel of that name (exact match first, then case-insensitive). */
    public Optional<Channel> channel(String name) {
        for (Channel c : channels) {
            if (c.name().equals(name)) {
                return Optional.of(c);
            }
        }
        for (Channel c : channels) {
            if (c.name().equalsIgnoreCase(name)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    @Override
    public String toString() {
        return "Recording[" + source.file() + ", " + rows() + " rows, " + channels.size() + " channels]";
    }
}
