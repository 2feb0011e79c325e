package org.riffle.note;

import java.io.IOException;
import java.io.InputStream;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Properties;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Level;

/**
 * Renders the findings note: plain text, LF line ends, at most {@value #WIDTH} columns, UTF-8 or
 * ASCII only. It prints what the {@link Assessment}s and the technician's {@link Findings} hold and
 * computes no figure of its own (file sizes and SHA-256 digests aside). Every piece of text that came
 * from input is neutralised first, so a note never carries a control character or escape sequence.
 *
 * <p>Sections, in order: title and time; the caution; where and who; at a glance; source files with
 * their time bases and baselines; one section per channel; the general comment; method parameters;
 * what could not be computed and why; safety reminders.
 *
 * <p>Immutable and thread-safe; the {@code with...} methods return changed copies.
 */
public final class NoteWriter {
    /** The widest line of a note, in columns. */
    public static final int WIDTH = 78;

    private final String version;
    private final Clock clock;
    private final boolean ascii;
    private final StoredBaseline stored;

    private NoteWriter(String version, Clock clock, boolean ascii, StoredBaseline stored) {
        this.version = Objects.requireNonNull(version, "version");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.ascii = ascii;
        this.stored = stored;
    }

    /**
     * A writer with this riffle's version, the system clock in the system time zone, and ASCII
     * output exactly when the locale of this environment is not UTF-8.
     */
    public static NoteWriter standard() {
        return new NoteWriter(version(), Clock.systemDefaultZone(), !localeIsUtf8(System.getenv()), null);
    }

    /** This copy stamps notes with {@code c}'s time and zone (tests use a fixed clock). */
    public NoteWriter withClock(Clock c) {
        return new NoteWriter(version, c, ascii, stored);
    }

    /** This copy writes ASCII only ({@code true}) or UTF-8. */
    public NoteWriter withAscii(boolean asciiOnly) {
        return new NoteWriter(version, clock, asciiOnly, stored);
    }

    /** This copy names {@code v} as the riffle version. */
    public NoteWriter withVersion(String v) {
        return new NoteWriter(v, clock, ascii, stored);
    }

    /** This copy cites {@code b} as the stored baseline the logs were judged against. */
    public NoteWriter withStoredBaseline(StoredBaseline b) {
        return new NoteWriter(version, clock, ascii, Objects.requireNonNull(b, "baseline"));
    }

    /** True when this copy writes ASCII only. */
    public boolean ascii() {
        return ascii;
    }

    /**
     * True when the locale the environment names ({@code LC_ALL}, else {@code LC_CTYPE}, else
     * {@code LANG}, as POSIX orders them) uses UTF-8. Unset means the POSIX locale: not UTF-8.
     */
    public static boolean localeIsUtf8(Map<String, String> env) {
        for (String name : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String v = env.get(name);
            if (v != null && !v.isEmpty()) {
                String u = v.toUpperCase(Locale.ROOT);
                return u.contains("UTF-8") || u.contains("UTF8");
            }
        }
        return false;
    }

    /** The note for one assessed log. */
    public String render(Assessment assessment, Findings findings) {
        return render(List.of(assessment), findings);
    }

    /** The note for several logs of one visit, in the order given. */
    public String render(List<Assessment> assessments, Findings findings) {
        if (assessments.isEmpty()) {
            throw new IllegalArgumentException("a note needs at least one assessed log");
        }
        Page p = new Page(WIDTH, ascii);
        p.line("RIFFLE FINDINGS NOTE");
        p.line("Written " + Fmt.stamp(clock.instant(), clock.getZone()) + " by riffle " + version);
        caution(p);
        whereAndWho(p, findings);
        glance(p, assessments);
        Sources.render(p, assessments, Optional.ofNullable(stored));
        Channels.render(p, assessments, findings);
        p.heading("GENERAL COMMENT");
        if (findings.general().isBlank()) {
            p.para(2, "None given.");
        } else {
            p.typed(2, 0, "", findings.general());
        }
        Channels.parameters(p, assessments);
        Channels.notComputed(p, assessments);
        safety(p);
        p.blank().line("END OF NOTE");
        return p.text();
    }

    private static void caution(Page p) {
        p.heading("CAUTION: A SCREENING AID");
        p.para(2, "riffle is a screening aid. These findings support, and never replace, the judgement of"
                + " qualified maintenance staff: decisions about this machine belong to them, under site"
                + " procedures, site safety rules and local codes. Each finding below is a comparison with"
                + " a baseline or a named criterion, not a diagnosis; escalate it to a qualified analyst"
                + " before acting on it.");
    }

    private static void whereAndWho(Page p, Findings f) {
        p.heading("WHERE AND WHO");
        int w = 24;
        p.field(2, w, "Site", given(f.site()));
        p.field(2, w, "Asset", given(f.asset()));
        p.field(2, w, "Measuring point", given(f.point()));
        p.field(2, w, "Technician", given(f.technician()));
        if (f.conditions().isBlank()) {
            p.field(2, w, "Operating conditions", "not given");
        } else {
            p.typed(2, w, "Operating conditions", f.conditions());
        }
    }

    static String given(String s) {
        return s.isBlank() ? "not given" : s.strip();
    }

    private static void glance(Page p, List<Assessment> all) {
        p.heading("AT A GLANCE");
        int[] count = new int[Level.values().length];
        int none = 0;
        int total = 0;
        List<String> departed = new ArrayList<>();
        List<String> watch = new ArrayList<>();
        for (Assessment a : all) {
            for (ChannelAssessment c : a.channels()) {
                total++;
                if (!c.health().estimated() || c.health().level() == null) {
                    none++;
                    continue;
                }
                count[c.health().level().ordinal()]++;
                String name = Channels.title(c, a, all.size() > 1);
                if (c.health().level() == Level.DEPARTED) {
                    departed.add(name + Channels.since(c, a).map(s -> ", since " + s).orElse(""));
                } else if (c.health().level() == Level.WATCH) {
                    watch.add(name);
                }
            }
        }
        p.para(2, total + (total == 1 ? " channel" : " channels") + " judged against the baseline: "
                + count[Level.DEPARTED.ordinal()] + " " + Level.DEPARTED.word() + ", "
                + count[Level.WATCH.ordinal()] + " " + Level.WATCH.word() + ", "
                + count[Level.STEADY.ordinal()] + " " + Level.STEADY.word() + ", "
                + none + " without a health estimate.");
        for (String d : departed) {
            p.bullet(2, Level.DEPARTED.word() + ": " + d);
        }
        for (String w : watch) {
            p.bullet(2, Level.WATCH.word() + ": " + w);
        }
        for (Assessment a : all) {
            a.recording().source().reduction().ifPresent(r -> p.para(2, Sources.fileName(a.recording().source()
                    .file()) + ": " + r.message()));
        }
    }

    private static void safety(Page p) {
        p.heading("SAFETY");
        p.bullet(2, "Before any work where an unexpected start-up or stored energy could injure: lockout and"
                + " tagout (shut down, isolate, lock and tag, release stored energy, verify) under site"
                + " procedures.");
        p.bullet(2, "Readings on running machines are taken from safe positions with the guards on; keep"
                + " loose clothing, jewellery, hair and cables away from shafts and couplings.");
        p.bullet(2, "Connecting a laptop or removable media to a control network needs authorisation under"
                + " site policy. riffle reads copied files only; it never writes to or scans a network.");
        p.bullet(2, "This note makes no statement about time to failure; any such statement needs a stated"
                + " confidence (ISO 13381-1) from a qualified analyst.");
    }

    /** The riffle version the build recorded, {@code "unknown"} when missing. */
    static String version() {
        Properties props = new Properties();
        try (InputStream in = NoteWriter.class.getResourceAsStream("/org/riffle/version.properties")) {
            if (in != null) {
                props.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return props.getProperty("version", "unknown");
    }
}
