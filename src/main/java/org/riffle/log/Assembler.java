package org.riffle.log;

import java.nio.charset.Charset;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Turns the columns of a finished {@link TablePass} into a {@link Recording}: refuses a table with too
 * many damaged rows, audits the time column, builds the time base (explicit times, else the given or
 * preamble sample rate, else indexed), and splits numeric from mostly-text columns (more text cells than
 * number cells).
 *
 * <p>Stateless and thread-safe.
 */
final class Assembler {
    private Assembler() {
    }

    static Recording build(Source src, Layout layout, TablePass pass, Charset cs, ReadOptions opt)
            throws LogException {
        Columns cols = pass.cols;
        cols.trim();
        int rows = cols.rows;
        List<String> warnings = new ArrayList<>(layout.notes());
        checkDamage(src.name, layout, pass.damage, rows, warnings);
        if (rows == 0) {
            throw new LogException(src.name, 0, 0, layout.dialect().header()
                    ? "no data rows under the header (line " + (layout.dataLine() - (layout.dialect().unitsRow() ? 2 : 1))
                    + ")" : "no data rows");
        }
        TimeBase time;
        List<TimeIssue> issues = List.of();
        if (layout.hasTime()) {
            TimeAudit.Result audit = TimeAudit.audit(cols.seconds, pass.rowLines);
            warnings.addAll(audit.notes());
            issues = audit.issues();
            long first = pass.firstNanos();
            Instant origin = layout.absoluteTime() && first != Stamps.FAIL
                    ? Instant.ofEpochSecond(Math.floorDiv(first, Stamps.NANOS_PER_SECOND),
                    Math.floorMod(first, Stamps.NANOS_PER_SECOND)) : null;
            time = TimeBase.adoptExplicit(cols.seconds, audit.rateHz(), origin);
            if (opt.sampleRateHz().isPresent()) {
                warnings.add("--rate ignored: the log has a time column (give --time-column none to use --rate)");
            }
        } else {
            time = untimed(rows, layout, opt, warnings);
        }
        List<Channel> channels = new ArrayList<>();
        List<TextChannel> texts = new ArrayList<>();
        for (int j = 0; j < layout.columns(); j++) {
            float[] v = cols.values[j];
            if (v == null) {
                continue;
            }
            int missing = 0;
            for (float x : v) {
                missing += x != x ? 1 : 0;
            }
            int text = cols.textCells(j);
            String name = layout.names()[j];
            if (text > rows - missing) {
                texts.add(new TextChannel(name, cols.distinct(j)));
            } else {
                channels.add(Channel.adopt(name, layout.units()[j], v));
                if (text > 0) {
                    warnings.add("column '" + name + "': " + text + " text cells read as missing samples (e.g. '"
                            + cols.distinct(j).get(0) + "')");
                }
            }
        }
        String format = layout.dialect().describe() + (src.gzipped ? ", gzip" : "")
                + (layout.timeText().isEmpty() ? ", no time column" : ", " + layout.timeText());
        SourceFacts facts = new SourceFacts(src.name, src.sizeBytes, format, cs.name(), layout.preamble(), warnings,
                Optional.of(layout.dialect()));
        return new Recording(facts, time, channels, texts, issues);
    }

    private static TimeBase untimed(int rows, Layout layout, ReadOptions opt, List<String> warnings) {
        if (opt.sampleRateHz().isPresent()) {
            return TimeBase.regular(rows, opt.sampleRateHz().getAsDouble(), null);
        }
        Preamble.Rate r = Preamble.rate(layout.preamble());
        if (r != null) {
            warnings.add(String.format(Locale.ROOT, "sample rate %s Hz taken from the preamble line '%s'",
                    fmt(r.hz()), r.line()));
            return TimeBase.regular(rows, r.hz(), null);
        }
        warnings.add("no time column: samples are numbered (give --rate to set a sample rate)");
        return TimeBase.indexed(rows);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** {@code "1 row"}, {@code "2 rows"}: a count with its noun. */
    private static String rows(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    /** Refuses more short rows or unreadable times than one per thousand rows (at least one); else warns. */
    private static void checkDamage(String file, Layout layout, TablePass.Damage d, int rows, List<String> warnings)
            throws LogException {
        int allowed = Math.max(1, rows / 1000);
        int columns = layout.columns();
        if (d.shortRows > allowed) {
            throw new LogException(file, d.firstShortLine, 0, d.firstShortFields + " of " + columns
                    + " fields, and " + rows(d.shortRows - 1, "more short row") + ": not a consistent table;"
                    + " check the delimiter (--delimiter) or the lines to skip (--skip-rows)");
        }
        if (d.shortRows > 0) {
            warnings.add(rows(d.shortRows, "row") + " with fewer fields than the "
                    + columns + " columns (first at line " + d.firstShortLine + "): the missing cells count as"
                    + " missing samples");
        }
        if (d.badTimeRows > allowed) {
            throw new LogException(file, d.firstBadTimeLine, 0, "'" + d.firstBadTime + "' is not a time like the"
                    + " rows above (" + layout.timeText() + "), and " + rows(d.badTimeRows - 1, "more such row"));
        }
        if (d.badTimeRows > 0) {
            warnings.add(rows(d.badTimeRows, "row") + " dropped: the time does not read"
                    + " (first at line " + d.firstBadTimeLine + ": '" + d.firstBadTime + "')");
        }
    }
}
