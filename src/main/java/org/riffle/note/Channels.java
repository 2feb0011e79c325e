package org.riffle.note;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.riffle.log.TimeBase;
import org.riffle.signal.Summary;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.Measure;
import org.riffle.triage.Param;

/**
 * The note's per-channel sections, its method parameters and its list of what could not be computed.
 * Prints what each {@link ChannelAssessment} holds; computes nothing. Stateless.
 */
final class Channels {
    private static final int LABEL = 18;
    private static final int[] TABLE = {14, 14, 14, 12};

    private Channels() {
    }

    static void render(Page p, List<Assessment> all, Findings f) {
        p.heading("CHANNELS");
        int total = all.stream().mapToInt(a -> a.channels().size()).sum();
        int k = 0;
        for (Assessment a : all) {
            for (ChannelAssessment c : a.channels()) {
                k++;
                if (k > 1) {
                    p.blank();
                }
                p.para(2, "[" + k + "/" + total + "] " + title(c, a, all.size() > 1));
                judgement(p, c, a);
                statistics(p, c.stats());
                Vibration.render(p, c, LABEL);
                measures(p, c.measures());
                String comment = f.comment(a.recording().source().file(), c.name());
                if (comment.isBlank()) {
                    p.field(4, LABEL, "Comment", "none");
                } else {
                    p.typed(4, LABEL, "Comment", comment);
                }
            }
        }
    }

    /** The channel's name and unit, and its file when a note covers several. */
    static String title(ChannelAssessment c, Assessment a, boolean withFile) {
        return c.name() + (c.unit().isEmpty() ? "" : " [" + c.unit() + "]")
                + (withFile ? " in " + Sources.fileName(a.recording().source().file()) : "");
    }

    /** Since when the channel departed, in the log's time, if it did. */
    static Optional<String> since(ChannelAssessment c, Assessment a) {
        Health h = c.health();
        if (!h.estimated() || h.sinceIndex() < 0) {
            return Optional.empty();
        }
        TimeBase t = a.recording().time();
        String where = "sample " + h.sinceIndex();
        if (t.isIndexed() || Double.isNaN(h.sinceSeconds())) {
            return Optional.of(where);
        }
        String after = Fmt.duration(h.sinceSeconds() - (t.size() > 0 ? t.seconds(0) : 0)) + " after the start";
        return Optional.of(t.origin().map(o -> Fmt.utc(Sources.at(o, h.sinceSeconds())) + " (" + where + ", "
                + after + ")").orElse(after + " (" + where + ")"));
    }

    private static void judgement(Page p, ChannelAssessment c, Assessment a) {
        Health h = c.health();
        if (!h.estimated() || h.level() == null) {
            p.field(4, LABEL, "Health", "no estimate (" + (h.estimated() ? "no level given" : h.noEstimateReason())
                    + ")");
        } else {
            String mark = h.level().mark().isBlank() ? "" : " (" + h.level().mark() + ")";
            p.field(4, LABEL, "Health", Fmt.num(h.figure()) + " of 100 (100 = like the baseline); level "
                    + h.level().word() + mark);
            since(c, a).ifPresent(s -> p.field(4, LABEL, "Departed since", s));
        }
        if (!c.complete()) {
            p.field(4, LABEL, "Caution", "analysis of this channel was still running when the note was written");
        }
    }

    private static void statistics(Page p, Summary s) {
        p.field(4, LABEL, "Samples", s.count() + " present, " + s.missing() + " missing");
        p.field(4, LABEL, "Statistics", "min " + Fmt.num(s.min()) + ", max " + Fmt.num(s.max()) + ", mean "
                + Fmt.num(s.mean()) + ", standard deviation " + Fmt.num(s.std()) + ", RMS " + Fmt.num(s.rms())
                + ", peak " + Fmt.num(s.peak()) + " (in the channel's unit); crest factor " + Fmt.num(s.crest())
                + ", skewness " + Fmt.num(s.skewness()) + ", kurtosis " + Fmt.num(s.kurtosis())
                + " (Pearson: 3 for a Gaussian)");
    }

    private static void measures(Page p, List<Measure> measures) {
        if (measures.isEmpty()) {
            p.field(4, LABEL, "Against baseline", "no measures computed (see below)");
            return;
        }
        p.field(4, LABEL, "Against baseline", "departure in spreads of the baseline");
        p.row(6, TABLE, "measure", "baseline", "current", "departure");
        for (Measure m : measures) {
            p.row(6, TABLE, m.name(), Fmt.num(m.baseline()), Fmt.num(m.current()), Fmt.signed(m.departure()));
        }
    }

    static void parameters(Page p, List<Assessment> all) {
        p.heading("METHOD PARAMETERS");
        for (Assessment a : all) {
            String file = Sources.fileName(a.recording().source().file());
            if (!a.parameters().isEmpty()) {
                p.para(2, "All channels of " + file + ":");
                params(p, a.parameters());
            }
            Map<List<Param>, List<String>> groups = new LinkedHashMap<>();
            for (ChannelAssessment c : a.channels()) {
                if (!c.parameters().isEmpty()) {
                    groups.computeIfAbsent(c.parameters(), x -> new ArrayList<>()).add(c.name());
                }
            }
            groups.forEach((params, names) -> {
                p.para(2, (names.size() == 1 ? "Channel " : "Channels ") + String.join(", ", names)
                        + (all.size() > 1 ? " of " + file : "") + ":");
                params(p, params);
            });
            if (a.parameters().isEmpty() && groups.isEmpty()) {
                p.para(2, file + ": no method parameters recorded.");
            }
        }
    }

    private static void params(Page p, List<Param> params) {
        for (Param x : params) {
            p.bullet(4, x.name() + " = " + x.value());
        }
    }

    static void notComputed(Page p, List<Assessment> all) {
        p.heading("WHAT COULD NOT BE COMPUTED");
        boolean any = false;
        for (Assessment a : all) {
            for (ChannelAssessment c : a.channels()) {
                List<String> why = new ArrayList<>(c.notComputed());
                if (!c.health().estimated()) {
                    why.add("health estimate: " + c.health().noEstimateReason());
                }
                if (!c.complete()) {
                    why.add("analysis was still running when the note was written");
                }
                if (!why.isEmpty()) {
                    any = true;
                    p.para(2, title(c, a, all.size() > 1) + ":");
                    why.forEach(w -> p.bullet(4, w));
                }
            }
        }
        if (!any) {
            p.para(2, "Everything was computed.");
        }
    }
}
