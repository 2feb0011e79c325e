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

    static Recording build(Source src, Layout layout, TablePass pass, Charset cs, ReadOptions opt, long budget)
            throws LogException {
        Columns cols = pass.cols;
        cols.trim();
        int rows = cols.rows;
        Reducer red = pass.reducer;
        long total = red == null ? rows : red.rows();
        List<String> warnings = new ArrayList<>(layout.notes());
        checkDamage(src.name, layout, pass.damage, total, warnings);
        if (rows == 0) {
            throw new LogException(src.name, 0, 0, layout.dialect().header()
                    ? "no data rows under the header (line " + (layout.dataLine() - (layout.dialect().unitsRow() ? 2 : 1))
                    + ")" : "no data rows");
        }
        TimeBase time;
        List<TimeIssue> issues = List.of();
        if (layout.hasTime()) {
            TimeAudit.Result audit = TimeAudit.audit(cols.seconds, rows, pass.rowLines, red == null ? -1 : red.head());
            warnings.addAll(audit.notes());
            issues = audit.issues();
            long first = pass.firstNanos();
            Instant origin = layout.absoluteTime() && first != Stamps.FAIL
                    ? Instant.ofEpochSecond(Math.floorDiv(first, Stamps.NANOS_PER_SECOND),
                    Math.floorMod(first, Stamps.NANOS_PER_SECOND)) : null;
            time = TimeBase.adoptExplicit(cols.seconds, rows, audit.rateHz(), origin);
            if (opt.sampleRateHz().isPresent()) {
                warnings.add("--rate ignored: the log has a time column (give --time-column none to use --rate)");
            }
        } else {
            time = untimed(rows, layout, opt, warnings);
            if (red != null) {
                time = reducedTime(time, red, rows);
            }
        }
        List<Channel> channels = new ArrayList<>();
        List<TextChannel> texts = new ArrayList<>();
        List<BlockStats> blocks = new ArrayList<>();
        int k = -1;
        for (int j = 0; j < layout.columns(); j++) {
            float[] v = cols.values[j];
            if (v == null) {
                continue;
            }
            k++;
            BlockStats b = red == null ? null : red.blocks().snapshot(k, layout.names()[j]);
            long present = b != null ? b.count() : rows - missing(v, rows);
            int text = cols.textCells(j);
            String name = layout.names()[j];
            if (text > present) {
                texts.add(new TextChannel(name, cols.distinct(j)));
            } else {
                channels.add(Channel.adopt(name, layout.units()[j], v, rows));
                if (b != null) {
                    blocks.add(b);
                }
                if (text > 0) {
                    warnings.add("column '" + name + "': " + text + " text cells read as missing samples (e.g. '"
                            + cols.distinct(j).get(0) + "')");
                }
            }
        }
        String format = layout.dialect().describe() + (src.gzipped ? ", gzip" : "")
                + (layout.timeText().isEmpty() ? ", no time column" : ", " + layout.timeText());
        Optional<Reduction> reduction = red == null ? Optional.empty() : Optional.of(new Reduction(total,
                total * (4L * channels.size() + (layout.hasTime() ? 8 : 0)), budget,
                MemoryBudget.wholeHeap(total, layout.valueColumns()), MemoryBudget.heap(),
                red.head(), red.tailFrom(), blocks));
        SourceFacts facts = new SourceFacts(src.name, src.sizeBytes, format, cs.name(), layout.preamble(), warnings,
                Optional.of(layout.dialect()), reduction);
        return new Recording(facts, time, channels, texts, issues);
    }

    private static int missing(float[] v, int rows) {
        int missing = 0;
        for (int i = 0; i < rows; i++) {
            missing += v[i] != v[i] ? 1 : 0;
        }
        return missing;
    }

    /** The untimed base of a reduced log: each kept row at its own log row (seconds at the rate, or numbers). */
    private static TimeBase reducedTime(TimeBase regular, Reducer red, int rows) {
        double[] at = new double[rows];
        for (int i = 0; i < rows; i++) {
            long logRow = i < red.head() ? i : red.tailFrom() + (i - red.head());
            at[i] = regular.isIndexed() ? logRow : logRow / regular.rateHz();
        }
        return regular.isIndexed() ? TimeBase.adoptIndexed(at) : TimeBase.adoptExplicit(at, at.length, regular.rateHz(), null);
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
    private static String rows(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    /** Refuses more short rows or unreadable times than one per thousand rows (at least one); else warns. */
    private static void checkDamage(String file, Layout layout, TablePass.Damage d, long rows, List<String> warnings)
            throws LogException {
        long allowed = Math.max(1, rows / 1000);
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
