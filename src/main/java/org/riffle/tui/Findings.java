package org.riffle.tui;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.riffle.log.Recording;
import org.riffle.triage.Assessment;

/**
 * What the screen hands over when a note or a draft is saved: per log, the recording, its assessment
 * when the analysis has finished, and the technician's comments by channel name; the general comment;
 * and the asset facts entered. Immutable.
 *
 * @param parts one per log, in the order the logs were named
 * @param generalComment the general comment, {@code ""} when none
 * @param asset what was entered about the machine
 */
public record Findings(List<Part> parts, String generalComment, AssetFacts asset) {
    public Findings {
        parts = List.copyOf(parts);
        Objects.requireNonNull(generalComment, "generalComment");
        Objects.requireNonNull(asset, "asset");
    }

    /**
     * One log's share.
     *
     * @param recording the log as read
     * @param assessment the finished assessment, empty while the analysis runs or after it failed
     * @param comments comments by channel name, only channels that have one
     */
    public record Part(Recording recording, Optional<Assessment> assessment, Map<String, String> comments) {
        public Part {
            Objects.requireNonNull(recording, "recording");
            Objects.requireNonNull(assessment, "assessment");
            comments = Map.copyOf(comments);
        }
    }

    /** True when there is any comment at all. */
    public boolean hasComments() {
        return !generalComment.isEmpty() || parts.stream().anyMatch(p -> !p.comments().isEmpty());
    }
}
