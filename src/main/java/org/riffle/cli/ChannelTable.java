package org.riffle.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.Optional;
import org.riffle.log.BlockStats;
import org.riffle.log.Channel;
import org.riffle.log.Printable;
import org.riffle.log.Recording;
import org.riffle.log.Reduction;
import org.riffle.log.TimeIssue;
import org.riffle.signal.Severity;
import org.riffle.signal.Sparkline;
import org.riffle.signal.Summary;
import org.riffle.signal.Unit;
import org.riffle.signal.Vibration;
import org.riffle.signal.VibrationParams;

/**
 * The table that {@code riffle channels} prints: one row per numeric channel, as aligned text or as
 * CSV. Columns are declared once in {@link #COLUMNS} (CSV name, text heading, value); to add a column,
 * add one entry. Stateless.
 */
final class ChannelTable {
    /** One numeric channel with everything its row shows. */
    record Row(Channel channel, Summary stats, double rateHz, double spanSeconds, long gaps, String sparkline,
               Severity severity) {
    }

    /** A column: CSV name, text heading, whether it is text (left-aligned), and its value in each form. */
    record Column(String csvName, String heading, boolean text, Function<Row, String> csv,
                  Function<Row, String> shown) {
        static Column number(String csvName, String heading, Function<Row, Double> v) {
            return new Column(csvName, heading, false, r -> Decimal.format(v.apply(r), Decimal.CSV_DIGITS, ""),
                    r -> Decimal.format(v.apply(r), Decimal.TEXT_DIGITS, "-"));
        }

        static Column count(String csvName, String heading, Function<Row, Long> v) {
            return new Column(csvName, heading, false, r -> Long.toString(v.apply(r)),
                    r -> Long.toString(v.apply(r)));
        }
    }

    /** The columns, in CSV order; the text table shows those with a heading, and the sparkline last. */
    static final List<Column> COLUMNS = List.of(
            new Column("channel", "channel", true, r -> r.channel().name(), r -> r.channel().name()),
            new Column("unit", "unit", true, r -> r.channel().unit(),
                    r -> r.channel().unit().isEmpty() ? "-" : r.channel().unit()),
            Column.count("samples", "samples", r -> (long) r.stats().count()),
            Column.count("missing", "missing", r -> (long) r.stats().missing()),
            Column.number("rate_hz", "rate Hz", Row::rateHz),
            Column.number("mean", "mean", r -> r.stats().mean()),
            Column.number("std", "std", r -> r.stats().std()),
            Column.number("min", "min", r -> r.stats().min()),
            Column.number("max", "max", r -> r.stats().max()),
            Column.number("rms", "rms", r -> r.stats().rms()),
            Column.number("crest", "crest", r -> r.stats().crest()),
            Column.number("kurtosis", "kurt", r -> r.stats().kurtosis()),
            Column.number("peak", "peak", r -> r.stats().peak()),
            Column.number("skewness", "skew", r -> r.stats().skewness()),
            new Column("span_s", "span", false, r -> Decimal.format(r.spanSeconds(), Decimal.CSV_DIGITS, ""),
                    r -> Decimal.span(r.spanSeconds())),
            Column.count("gaps", "gaps", Row::gaps),
            Column.number("velocity_rms_mm_s", "vel mm/s", r -> r.severity().velocityRmsMmS()),
            new Column("zone", "zone", true, r -> r.severity().zone().map(Enum::name).orElse(""),
                    r -> r.severity().zone().map(Enum::name).orElse("-")));

    private ChannelTable() {
    }

    /**
     * The rows of {@code rec}, sparklines {@code sparkWidth} cells wide, severity as {@code vib} says. Of a
     * reduced log, the samples, missing, min, max and mean columns and the sparkline cover the whole log
     * (its block statistics); the other figures the rows kept at full resolution.
     */
    static List<Row> rows(Recording rec, int sparkWidth, boolean unicode, VibrationParams vib) {
        long gaps = rec.timeIssues().stream().filter(i -> i.kind() == TimeIssue.Kind.GAP).count();
        Optional<Reduction> red = rec.source().reduction();
        List<Row> rows = new ArrayList<>();
        for (Channel c : rec.channels()) {
            double[] x = c.toDoubles();
            Optional<BlockStats> b = red.flatMap(r -> r.blocks(c.name()));
            Summary s = Summary.of(x);
            String spark = b.map(k -> Sparkline.renderRanges(k.minima(), k.maxima(), sparkWidth, unicode))
                    .orElseGet(() -> Sparkline.render(x, sparkWidth, unicode));
            rows.add(new Row(c, b.map(k -> wholeLog(s, k)).orElse(s), rec.time().rateHz(),
                    rec.time().spanSeconds(), gaps, spark,
                    Vibration.overall(x, rec.time().rateHz(), Unit.parse(c.unit()), vib)));
        }
        return rows;
    }

    /** {@code kept} with its count, missing, min, max and mean those of the whole log's blocks. */
    private static Summary wholeLog(Summary kept, BlockStats b) {
        return new Summary((int) Math.min(Integer.MAX_VALUE, b.count()), (int) Math.min(Integer.MAX_VALUE,
                b.missing()), b.min(), b.max(), b.mean(), kept.std(), kept.rms(), kept.peak(), kept.crest(),
                kept.skewness(), kept.kurtosis());
    }

    /** The CSV table: a header row, then one row per channel; RFC 4180 quoting where needed. */
    static void printCsv(List<Row> rows, PrintWriter out) {
        out.println(String.join(",", COLUMNS.stream().map(Column::csvName).toList()));
        for (Row r : rows) {
            out.println(String.join(",", COLUMNS.stream().map(c -> quote(c.csv().apply(r))).toList()));
        }
    }

    /** The aligned text table, the sparkline in the last column. */
    static void printText(List<Row> rows, PrintWriter out) {
        List<String[]> cells = new ArrayList<>();
        int n = COLUMNS.size();
        String[] head = new String[n + 1];
        for (int i = 0; i < n; i++) {
            head[i] = COLUMNS.get(i).heading();
        }
        head[n] = "sparkline";
        cells.add(head);
        for (Row r : rows) {
            String[] line = new String[n + 1];
            for (int i = 0; i < n; i++) {
                // neutralised here, not only on the way out, so the widths are those printed
                line[i] = Printable.clean(COLUMNS.get(i).shown().apply(r));
            }
            line[n] = r.sparkline();
            cells.add(line);
        }
        int[] width = new int[n + 1];
        for (String[] line : cells) {
            for (int i = 0; i <= n; i++) {
                width[i] = Math.max(width[i], line[i].length());
            }
        }
        for (String[] line : cells) {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i <= n; i++) {
                boolean left = i == n || COLUMNS.get(i).text();
                String pad = " ".repeat(width[i] - line[i].length());
                sb.append(i == 0 ? "" : "  ").append(left ? line[i] + (i == n ? "" : pad) : pad + line[i]);
            }
            out.println(sb);
        }
    }

    private static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
