package org.riffle.note;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * What the technician enters, as entered: where and who, the operating conditions, a comment per
 * channel and a general comment. Nothing here is ever invented: a field not given stays {@code ""}
 * and the note says "not given". Text is kept word for word (control characters are neutralised only
 * when it is printed).
 *
 * <p>Immutable and thread-safe; the {@code with...} methods return changed copies. A blank comment
 * removes the channel's comment.
 *
 * @param site site or plant name
 * @param asset asset (machine) identifier
 * @param point measuring point and direction
 * @param technician who took the readings
 * @param conditions operating conditions at the time (speed, load, process state), free text
 * @param comments comment per channel, keyed by log file and channel name
 * @param general the general comment
 */
public record Findings(String site, String asset, String point, String technician, String conditions,
                       Map<ChannelRef, String> comments, String general) {
    /** Nothing entered yet. */
    public static final Findings EMPTY = new Findings("", "", "", "", "", Map.of(), "");

    public Findings {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(asset, "asset");
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(technician, "technician");
        Objects.requireNonNull(conditions, "conditions");
        Objects.requireNonNull(general, "general");
        TreeMap<ChannelRef, String> kept = new TreeMap<>();
        comments.forEach((k, v) -> {
            if (!Objects.requireNonNull(v, "comment").isBlank()) {
                kept.put(Objects.requireNonNull(k, "channel"), v);
            }
        });
        comments = Collections.unmodifiableMap(kept);
    }

    /**
     * A channel of a log: the file as the recording names it ({@code SourceFacts.file()}) and the
     * channel name as read. Immutable; ordered by file, then channel.
     */
    public record ChannelRef(String file, String channel) implements Comparable<ChannelRef> {
        public ChannelRef {
            Objects.requireNonNull(file, "file");
            Objects.requireNonNull(channel, "channel");
        }

        @Override
        public int compareTo(ChannelRef o) {
            int c = file.compareTo(o.file);
            return c != 0 ? c : channel.compareTo(o.channel);
        }
    }

    /** The comment on that channel, {@code ""} when none. */
    public String comment(ChannelRef channel) {
        return comments.getOrDefault(channel, "");
    }

    /** The comment on channel {@code channel} of log {@code file}, {@code ""} when none. */
    public String comment(String file, String channel) {
        return comment(new ChannelRef(file, channel));
    }

    /** True when nothing at all has been entered. */
    public boolean isEmpty() {
        return equals(EMPTY);
    }

    public Findings withSite(String s) {
        return new Findings(s, asset, point, technician, conditions, comments, general);
    }

    public Findings withAsset(String s) {
        return new Findings(site, s, point, technician, conditions, comments, general);
    }

    public Findings withPoint(String s) {
        return new Findings(site, asset, s, technician, conditions, comments, general);
    }

    public Findings withTechnician(String s) {
        return new Findings(site, asset, point, s, conditions, comments, general);
    }

    public Findings withConditions(String s) {
        return new Findings(site, asset, point, technician, s, comments, general);
    }

    public Findings withGeneral(String s) {
        return new Findings(site, asset, point, technician, conditions, comments, s);
    }

    /** A copy with {@code text} as the comment on {@code channel} (blank removes it). */
    public Findings withComment(ChannelRef channel, String text) {
        TreeMap<ChannelRef, String> m = new TreeMap<>(comments);
        m.put(channel, text);
        return new Findings(site, asset, point, technician, conditions, m, general);
    }

    /** A copy with {@code text} as the comment on channel {@code channel} of log {@code file}. */
    public Findings withComment(String file, String channel, String text) {
        return withComment(new ChannelRef(file, channel), text);
    }
}
