package org.riffle.note;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.riffle.signal.Summary;
import org.riffle.triage.Assessment;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.Health;
import org.riffle.triage.Measure;

/**
 * The per-channel figures of one or many assessed logs as CSV (RFC 4180, LF line ends), one row per
 * channel: {@code file, channel, unit}, the statistics, the severity figures, the health figure,
 * level and since when, then for every measure that occurs {@code NAME_baseline, NAME_current,
 * NAME_departure}, and {@code not_computed}. Numbers are plain decimals with a point, 7 significant
 * digits; an undefined figure is an empty field. Text fields are neutralised like the note, and a
 * text field starting with {@code =}, {@code +} or {@code @} gets a leading {@code '} so that a
 * spreadsheet never runs it as a formula.
 *
 * <p>Rows are taken from each assessment as soon as it is done ({@link #rows}), so a batch keeps
 * only these small rows, not the logs. Stateless and thread-safe.
 */
public final class MetricsCsv {
    /** The fixed leading columns, in order. */
    public static final List<String> FIXED = List.of("file", "channel", "unit", "samples", "missing", "min", "max",
            "mean", "std", "rms", "peak", "crest", "skewness", "kurtosis", "velocity_rms_mm_s", "zone", "zone_table",
            "health", "level", "since_sample", "since_s");

    private MetricsCsv() {
    }

    /**
     * One channel's cells, by column name. Immutable.
     *
     * @param cells column name to cell text, in column order
     */
    public record Row(Map<String, String> cells) {
        public Row {
            cells = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(Objects.requireNonNull(cells)));
        }
    }

    /** The rows of every channel of {@code a}, in channel order. */
    public static List<Row> rows(Assessment a) {
        List<Row> out = new ArrayList<>();
        for (ChannelAssessment c : a.channels()) {
            Map<String, String> m = new LinkedHashMap<>();
            m.put("file", text(a.recording().source().file()));
            m.put("channel", text(c.name()));
            m.put("unit", text(c.unit()));
            Summary s = c.stats();
            m.put("samples", Integer.toString(s.count()));
            m.put("missing", Integer.toString(s.missing()));
            double[] stats = {s.min(), s.max(), s.mean(), s.std(), s.rms(), s.peak(), s.crest(), s.skewness(),
                s.kurtosis()};
            for (int i = 0; i < stats.length; i++) {
                m.put(FIXED.get(5 + i), number(stats[i]));
            }
            m.put("velocity_rms_mm_s", c.vibration().map(v -> number(v.velocityRmsMmS())).orElse(""));
            m.put("zone", c.vibration().map(v -> text(v.zone())).orElse(""));
            m.put("zone_table", c.vibration().map(v -> text(v.table())).orElse(""));
            Health h = c.health();
            m.put("health", h.estimated() ? number(h.figure()) : "");
            m.put("level", h.estimated() && h.level() != null ? h.level().word() : "no estimate");
            m.put("since_sample", h.sinceIndex() >= 0 ? Integer.toString(h.sinceIndex()) : "");
            m.put("since_s", h.sinceIndex() >= 0 ? number(h.sinceSeconds()) : "");
            for (Measure x : c.measures()) {
                String k = text(x.name()).replaceAll("[^A-Za-z0-9]+", "_");
                m.put(k + "_baseline", number(x.baseline()));
                m.put(k + "_current", number(x.current()));
                m.put(k + "_departure", number(x.departure()));
            }
            List<String> why = new ArrayList<>(c.notComputed());
            if (!h.estimated()) {
                why.add("health estimate: " + h.noEstimateReason());
            }
            m.put("not_computed", text(String.join("; ", why)));
            out.add(new Row(m));
        }
        return out;
    }

    /** Writes {@code rows} under one header holding every column that any row has. */
    public static void write(List<Row> rows, Appendable out) throws IOException {
        Set<String> columns = new LinkedHashSet<>(FIXED);
        for (Row r : rows) {
            for (String k : r.cells().keySet()) {
                if (!k.equals("not_computed")) {
                    columns.add(k);
                }
            }
        }
        columns.add("not_computed");
        CSVFormat format = CSVFormat.RFC4180.builder().setRecordSeparator('\n').get();
        try (CSVPrinter p = new CSVPrinter(out, format)) {
            p.printRecord(columns);
            for (Row r : rows) {
                List<String> cells = new ArrayList<>(columns.size());
                for (String col : columns) {
                    cells.add(r.cells().getOrDefault(col, ""));
                }
                p.printRecord(cells);
            }
            p.flush();
        }
    }

    /** The CSV of {@code rows} as a string. */
    public static String toText(List<Row> rows) {
        StringBuilder sb = new StringBuilder();
        try {
            write(rows, sb);
        } catch (IOException e) {
            throw new IllegalStateException("a StringBuilder does not fail", e);
        }
        return sb.toString();
    }

    static String number(double x) {
        if (!Double.isFinite(x)) {
            return "";
        }
        if (x == 0) {
            return "0";
        }
        return new BigDecimal(x).round(new MathContext(7, RoundingMode.HALF_EVEN)).stripTrailingZeros()
                .toPlainString();
    }

    static String text(String s) {
        String c = Text.clean(s);
        return !c.isEmpty() && "=+@".indexOf(c.charAt(0)) >= 0 ? "'" + c : c;
    }
}
