package org.riffle.triage;

import java.util.List;
import java.util.Objects;
import org.riffle.log.Recording;

/**
 * The judgement of a whole recording: the recording read, the baseline used, one assessment per
 * numeric channel (in the recording's order), and the parameters shared by all channels. Immutable.
 */
public record Assessment(Recording recording, Baseline baseline, List<ChannelAssessment> channels,
                         List<Param> parameters) {
    public Assessment {
        Objects.requireNonNull(recording, "recording");
        Objects.requireNonNull(baseline, "baseline");
        channels = List.copyOf(channels);
        parameters = List.copyOf(parameters);
    }
}
