package org.riffle.note;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TextChannel;
import org.riffle.log.TimeBase;
import org.riffle.log.TimeIssue;
import org.riffle.signal.Summary;
import org.riffle.triage.Assessment;
import org.riffle.triage.Baseline;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.Level;
import org.riffle.triage.Measure;
import org.riffle.triage.Param;
import org.riffle.triage.VibrationFigures;

/**
 * Hand-built assessments that use every field a note prints (zones, peaks, lines, measures, all three
 * levels, no estimate, an unfinished channel, time-base faults, preamble, two logs) and carry escape
 * sequences in every text that comes from input. The figures are arbitrary: these samples test the
 * layout, not the analysis.
 */
final class NoteSamples {
    static final String ESC = "\u001b";
    static final String FILE_A = "logs/af2 " + ESC + "[31mred.csv";
    static final String FILE_B = "gearbox-run.csv";

    private NoteSamples() {
    }

    static List<Assessment> twoLogs() {
        return List.of(first(), second());
    }

    static Assessment first() {
        float[] z = new float[1000];
        Recording r = new Recording(new SourceFacts(FILE_A, 123_456, "csv ';' decimal ','", "windows-1252",
                List.of("Device: DL-40 " + ESC + "]0;pwned\u0007", "Interval: 10 s"),
                List.of("3 cells 'ERR' read as missing")),
                TimeBase.regular(1000, 0.1, Instant.parse("2026-03-12T06:00:00Z")),
                List.of(new Channel("vib DE " + ESC + "[2J", "mm/s", z), new Channel("flow", "m\u00b3/h", z),
                        new Channel("temp", "\u00b0C", z)),
                List.of(new TextChannel("status", List.of("RUN", "STOP"))),
                List.of(new TimeIssue(TimeIssue.Kind.GAP, 500, 503, 65.0),
                        new TimeIssue(TimeIssue.Kind.DUPLICATE, 610, 613, 0.0),
                        new TimeIssue(TimeIssue.Kind.BACKWARD, 611, 614, -3600.0)));
        List<Param> p = List.of(new Param("embedding", "dimension 3 (false nearest neighbours), delay 4 samples"
                + " (first minimum of mutual information)"), new Param("threshold", "fixed recurrence rate 5 %"),
                new Param("window", "200 samples, step 50"),
                new Param("reservoir", "seed 42, 200 units, spectral radius 0.9, leak 0.3, ridge 1e-6"));
        ChannelAssessment vib = new ChannelAssessment("vib DE " + ESC + "[2J", "mm/s",
                new Summary(1000, 0, -9.5, 9.75, 0.01, 3.2, 3.21, 9.75, 3.04, 0.02, 4.9),
                Optional.of(new VibrationFigures(4.1, "C", "ISO 10816-3 group 2, rigid", "",
                        List.of(new VibrationFigures.Peak(24.6, 1.9), new VibrationFigures.Peak(96.3, 0.8)),
                        List.of(new VibrationFigures.Line("1x", 24.6, 1.9, true),
                                new VibrationFigures.Line("BPFO", 96.3, 0.8, true),
                                new VibrationFigures.Line("BPFI", 144.2, 0.01, false)))),
                List.of(new Measure("DET", 0.82, 0.61, -4.12), new Measure("LAM", 0.9, 0.7, -3.5),
                        new Measure("RR", 0.05, 0.05, 0.0), new Measure("rms", 2.1, 3.2, 5.25)),
                List.of(), new Health(42, Level.DEPARTED, 700, 7000.0, ""), p,
                List.of("correlation dimension: diagnostics only, not computed"), true);
        ChannelAssessment flow = new ChannelAssessment("flow", "m\u00b3/h",
                new Summary(998, 2, 410, 470, 440, 9.5, 440.1, 470, 1.07, -0.3, 2.9), Optional.empty(),
                List.of(new Measure("DET", 0.5, 0.58, 1.9)), List.of(),
                new Health(71.5, Level.WATCH, -1, Double.NaN, ""), p, List.of(), true);
        ChannelAssessment temp = new ChannelAssessment("temp", "\u00b0C",
                new Summary(1000, 0, 20, 20, 20, 0, 20, 20, 1, Double.NaN, Double.NaN), Optional.of(
                        new VibrationFigures(Double.NaN, "", "", "not a vibration channel", List.of(), List.of())),
                List.of(), List.of(), Health.none("flat channel: every sample is 20"), List.of(), List.of(), false);
        return new Assessment(r, new Baseline(0, 250, "first 25 % (rows 0-250)"), List.of(vib, flow, temp),
                List.of(new Param("baseline", "first 25 % (rows 0-250)")));
    }

    static Assessment second() {
        Recording r = new Recording(new SourceFacts(FILE_B, -1, "csv ','", "UTF-8", List.of(), List.of()),
                TimeBase.explicit(new double[] {0, 1, 2, 3}, 1.0, null),
                List.of(new Channel("oil pressure", "", new float[4])), List.of(), List.of());
        ChannelAssessment oil = new ChannelAssessment("oil pressure", "",
                new Summary(4, 0, 1, 4, 2.5, 1.29, 2.74, 4, 1.46, 0, 1.64), Optional.empty(),
                List.of(), List.of(), new Health(99, Level.STEADY, -1, Double.NaN, ""),
                List.of(new Param("window", "2 samples, step 1")), List.of(), true);
        return new Assessment(r, new Baseline(0, 1, "rows 0-1"), List.of(oil), List.of());
    }

    static StoredBaseline stored() {
        return new StoredBaseline("AF-2", "20260301-101500", Instant.parse("2026-03-01T10:15:00Z"), "0.1.0",
                "af2-commissioning.csv", "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef",
                "rows 0-5000", List.of("vib DE", "flow", "temp"), Path.of("/tmp/AF-2/20260301-101500.baseline"));
    }

    static Findings findings() {
        return Findings.EMPTY.withAsset("AF-2 " + ESC + "[8m").withSite("Kestrel Hill (invented)")
                .withComment(FILE_A, "vib DE " + ESC + "[2J", "Rumble at the drive end." + ESC + "[?1049h\r\nSee photo 3.")
                .withComment(FILE_B, "oil pressure", "Normal.")
                .withGeneral("Two logs from one visit.\n\u2022 second line with a bullet");
    }
}
