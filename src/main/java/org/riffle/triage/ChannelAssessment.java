package org.riffle.triage;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.riffle.signal.Summary;

/**
 * Everything riffle has to say about one channel: statistics, vibration figures where they apply,
 * measures against the baseline, the windowed trend, the health estimate, the parameters used, and
 * what could not be computed and why. A face reads this and computes nothing. Immutable.
 *
 * @param name channel name as read
 * @param unit unit as read
 * @param stats statistics over the whole channel
 * @param vibration severity and spectrum figures, where the channel is a vibration channel
 * @param measures RQA and plain measures against their baseline values
 * @param trend the windowed trend, oldest first
 * @param health the health estimate, or "no estimate" with a reason
 * @param parameters the method parameters used for this channel, in print order
 * @param notComputed what could not be computed, one line each, with the reason
 * @param complete false while analysis is still filling this in
 * @param thumbnails recurrence-plot thumbnails, baseline first then latest (see {@link Thumbnail.Span});
 *     empty when the channel has no recurrence estimate
 */
public record ChannelAssessment(String name, String unit, Summary stats, Optional<VibrationFigures> vibration,
                                List<Measure> measures, List<WindowRow> trend, Health health,
                                List<Param> parameters, List<String> notComputed, boolean complete,
                                List<Thumbnail> thumbnails) {
    public ChannelAssessment {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(stats, "stats");
        Objects.requireNonNull(vibration, "vibration");
        Objects.requireNonNull(health, "health");
        measures = List.copyOf(measures);
        trend = List.copyOf(trend);
        parameters = List.copyOf(parameters);
        notComputed = List.copyOf(notComputed);
        thumbnails = List.copyOf(thumbnails);
    }

    /** An assessment without thumbnails. */
    public ChannelAssessment(String name, String unit, Summary stats, Optional<VibrationFigures> vibration,
                             List<Measure> measures, List<WindowRow> trend, Health health, List<Param> parameters,
                             List<String> notComputed, boolean complete) {
        this(name, unit, stats, vibration, measures, trend, health, parameters, notComputed, complete, List.of());
    }

    /** The same assessment with {@code t} as its thumbnails. */
    public ChannelAssessment withThumbnails(List<Thumbnail> t) {
        return new ChannelAssessment(name, unit, stats, vibration, measures, trend, health, parameters, notComputed,
                complete, t);
    }

    /** The measure of that name, if computed. */
    public Optional<Measure> measure(String measureName) {
        return measures.stream().filter(m -> m.name().equals(measureName)).findFirst();
    }
}
