package org.riffle.cli;

import java.io.PrintWriter;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.riffle.embed.EmbeddingEstimate;
import org.riffle.log.TimeBase;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;

/**
 * How {@code riffle rqa} and {@code riffle trend} write numbers, times and parameters. Numbers follow
 * {@link Decimal} (plain decimals, 7 significant digits in CSV, 4 in text); an undefined value prints
 * as {@code NaN}, as the recurrence conventions say. Stateless.
 */
final class RqaText {
    private RqaText() {
    }

    static String csv(double v) {
        return Decimal.format(v, Decimal.CSV_DIGITS, "NaN");
    }

    static String text(double v) {
        return Decimal.format(v, Decimal.TEXT_DIGITS, "NaN");
    }

    /** An integer measure, {@code NaN} when the result was skipped. */
    static String count(RqaResult r, int v) {
        return r.computed() ? Integer.toString(v) : "NaN";
    }

    /**
     * The time of sample {@code i}: an ISO date-time without zone when the log gave wall-clock times
     * (UTC for logs with an offset, the log's own clock otherwise), else seconds as the time base counts.
     */
    static String time(TimeBase tb, int i) {
        Optional<Instant> origin = tb.origin();
        if (origin.isEmpty()) {
            return Decimal.format(tb.seconds(i), 10, "NaN");
        }
        long nanos = Math.round(tb.seconds(i) * 1e9);
        return DateTimeFormatter.ISO_LOCAL_DATE_TIME.format(LocalDateTime.ofInstant(origin.get().plusNanos(nanos),
                ZoneOffset.UTC));
    }

    /** A field quoted as RFC 4180 asks when it holds a comma, quote or line break. */
    static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    /** The parameter lines printed above a text result, ASCII only. */
    static List<String> parameters(RqaParams p, double radius, String unit, Optional<EmbeddingEstimate> est) {
        List<String> out = new ArrayList<>();
        String dimHow = est.map(EmbeddingEstimate::dimensionMethod).orElse("given");
        String tauHow = est.map(EmbeddingEstimate::delayMethod).orElse("given");
        out.add("embedding   m = " + p.dimension() + " (" + dimHow + "), tau = " + p.delay() + " samples (" + tauHow
                + ")");
        out.add("norm        " + p.norm().word());
        out.add("threshold   " + policy(p.threshold()) + " -> radius " + text(radius) + (unit.isEmpty() ? "" : " "
                + unit));
        out.add("Theiler     w = " + p.theiler() + " (cells with |i-j| < w excluded)");
        out.add("lines       l_min = " + p.minLine() + ", v_min = " + p.minVert());
        return out;
    }

    private static String policy(RqaParams.Threshold t) {
        return switch (t.policy()) {
            case RADIUS -> "fixed radius";
            case STD_FRACTION -> csv(t.value()) + " x population std";
            case RATE -> "target recurrence rate " + csv(t.value());
        };
    }

    /** The measures of one result, one per line. */
    static void measures(RqaResult r, PrintWriter out) {
        out.println("RR     " + text(r.rr()));
        out.println("DET    " + text(r.det()));
        out.println("L      " + text(r.l()));
        out.println("Lmax   " + count(r, r.lmax()));
        out.println("DIV    " + text(r.div()));
        out.println("ENTR   " + text(r.entr()));
        out.println("LAM    " + text(r.lam()));
        out.println("TT     " + text(r.tt()));
        out.println("Vmax   " + count(r, r.vmax()));
    }
}
