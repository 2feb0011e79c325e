package org.riffle.note;

import java.io.IOException;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;
import org.riffle.log.TimeIssue;
import org.riffle.triage.Assessment;

/**
 * The note's source-file and baseline sections: each log with its size and SHA-256, how it was read,
 * its time span, sample rate and time-base faults, its preamble and the reader's warnings; then the
 * baseline each log was judged against. Stateless.
 */
final class Sources {
    private static final int LABEL = 16;
    private static final int SHOWN_ISSUES = 5;
    private static final int SHOWN_PREAMBLE = 20;

    private Sources() {
    }

    static void render(Page p, List<Assessment> all, Optional<StoredBaseline> stored) {
        p.heading("SOURCE FILES");
        for (int i = 0; i < all.size(); i++) {
            if (i > 0) {
                p.blank();
            }
            file(p, all.get(i).recording());
        }
        p.heading("BASELINE");
        for (Assessment a : all) {
            String label = all.size() > 1 ? fileName(a.recording().source().file()) : "Judged against";
            p.field(2, LABEL + 6, label, a.baseline().description() + (a.baseline().sameLog() ? "" : "; not rows"
                    + " of this log"));
        }
        stored.ifPresent(b -> {
            p.field(2, LABEL + 6, "Stored baseline", b.id() + " of asset " + b.asset());
            p.field(2, LABEL + 6, "Saved", Fmt.utc(b.saved()) + " by riffle " + b.riffleVersion());
            p.field(2, LABEL + 6, "Learned from", b.sourceFile() + ", " + b.span());
            p.field(2, LABEL + 6, "Its SHA-256", "");
            p.para(4, b.sourceSha256());
        });
    }

    private static void file(Page p, Recording r) {
        SourceFacts s = r.source();
        p.para(2, s.file());
        digest(p, s);
        p.field(4, LABEL, "Read as", s.format() + (s.encoding().isEmpty() ? "" : ", " + s.encoding()));
        p.field(4, LABEL, "Rows", s.reduction().map(x -> x.rows() + " rows, of which " + r.rows() + " were kept"
                + " and analysed (reduced to fit memory: see AT A GLANCE); ").orElse(r.rows() + " rows; ")
                + r.channels().size() + " numeric and " + r.textChannels().size() + " text channels");
        time(p, r.time());
        issues(p, r.timeIssues());
        if (!s.preamble().isEmpty()) {
            p.typed(4, LABEL, "Preamble", lines(s.preamble()));
        }
        if (!s.warnings().isEmpty()) {
            p.typed(4, LABEL, "Reader notes", lines(s.warnings()));
        }
    }

    private static void digest(Page p, SourceFacts s) {
        if (s.file().equals("-")) {
            p.field(4, LABEL, "Size", s.sizeBytes() >= 0 ? Fmt.bytes(s.sizeBytes()) : "not known");
            p.field(4, LABEL, "SHA-256", "not available (read from standard input)");
            return;
        }
        try {
            FileDigest d = FileDigest.of(Path.of(s.file()));
            p.field(4, LABEL, "Size", Fmt.bytes(d.sizeBytes()));
            p.field(4, LABEL, "SHA-256", d.sha256().length() + LABEL + 4 <= NoteWriter.WIDTH ? d.sha256() : "");
            if (d.sha256().length() + LABEL + 4 > NoteWriter.WIDTH) {
                p.para(6, d.sha256());
            }
            if (s.sizeBytes() >= 0 && s.sizeBytes() != d.sizeBytes()) {
                p.field(4, LABEL, "Caution", "the file was " + Fmt.bytes(s.sizeBytes())
                        + " when it was read and has changed since; the figures below are of the file as read");
            }
        } catch (IOException | InvalidPathException e) {
            p.field(4, LABEL, "Size", s.sizeBytes() >= 0 ? Fmt.bytes(s.sizeBytes()) + " when read" : "not known");
            p.field(4, LABEL, "SHA-256", "not available: the file could not be read again ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + ")");
        }
    }

    private static void time(Page p, TimeBase t) {
        int n = t.size();
        if (t.isIndexed()) {
            p.field(4, LABEL, "Time span", "no time in the log; samples numbered 0 to " + (n - 1));
            p.field(4, LABEL, "Sample rate", "not known");
            return;
        }
        if (n == 0) {
            p.field(4, LABEL, "Time span", "no rows");
        } else if (t.origin().isPresent()) {
            Instant o = t.origin().get();
            p.field(4, LABEL, "Time span", Fmt.utc(at(o, t.seconds(0))) + " to " + Fmt.utc(at(o, t.seconds(n - 1)))
                    + " (" + Fmt.duration(t.spanSeconds()) + ")");
        } else {
            p.field(4, LABEL, "Time span", Fmt.num(t.seconds(0)) + " s to " + Fmt.num(t.seconds(n - 1))
                    + " s of elapsed time (" + Fmt.duration(t.spanSeconds()) + "); no wall-clock time in the log");
        }
        p.field(4, LABEL, "Sample rate", Fmt.num(t.rateHz()) + " Hz"
                + (t.isExplicit() ? " (nominal, from the timestamps)" : " (regular)"));
    }

    private static void issues(Page p, List<TimeIssue> issues) {
        if (issues.isEmpty()) {
            p.field(4, LABEL, "Time base", "no gaps, repeated or backward timestamps found");
            return;
        }
        Map<TimeIssue.Kind, Integer> counts = new EnumMap<>(TimeIssue.Kind.class);
        for (TimeIssue i : issues) {
            counts.merge(i.kind(), 1, Integer::sum);
        }
        StringBuilder sb = new StringBuilder();
        counts.forEach((k, v) -> sb.append(sb.length() == 0 ? "" : ", ").append(v).append(' ')
                .append(kindWord(k, v)));
        sb.append(" (never filled in or reordered)");
        p.field(4, LABEL, "Time base", sb.toString());
        for (int i = 0; i < Math.min(SHOWN_ISSUES, issues.size()); i++) {
            TimeIssue t = issues.get(i);
            p.field(4, LABEL, "", kindWord(t.kind(), 1) + " of " + Fmt.num(t.stepSeconds()) + " s at data row "
                    + t.row() + (t.line() > 0 ? " (line " + t.line() + ")" : ""));
        }
        if (issues.size() > SHOWN_ISSUES) {
            p.field(4, LABEL, "", "and " + (issues.size() - SHOWN_ISSUES) + " more");
        }
    }

    private static String kindWord(TimeIssue.Kind k, int n) {
        String w = switch (k) {
            case GAP -> "gap";
            case DUPLICATE -> "repeated timestamp";
            case BACKWARD -> "backward step";
        };
        return n == 1 ? w : w + "s";
    }

    private static String lines(List<String> ls) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < Math.min(SHOWN_PREAMBLE, ls.size()); i++) {
            sb.append(i == 0 ? "" : "\n").append(Text.clean(ls.get(i)));
        }
        if (ls.size() > SHOWN_PREAMBLE) {
            sb.append("\n(and ").append(ls.size() - SHOWN_PREAMBLE).append(" more lines)");
        }
        return sb.toString();
    }

    /** The instant {@code seconds} after {@code origin} (formatting only). */
    static Instant at(Instant origin, double seconds) {
        return origin.plusNanos(Math.round(seconds * 1e9));
    }

    /** The last element of a file path, for labels. */
    static String fileName(String file) {
        int slash = Math.max(file.lastIndexOf('/'), file.lastIndexOf('\\'));
        return slash >= 0 && slash < file.length() - 1 ? file.substring(slash + 1) : file;
    }
}
