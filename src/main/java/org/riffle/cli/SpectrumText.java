package org.riffle.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.signal.Band;
import org.riffle.signal.FaultLine;
import org.riffle.signal.FaultLines;
import org.riffle.signal.Peak;
import org.riffle.signal.Severity;
import org.riffle.signal.Spectrum;
import org.riffle.signal.VibrationReport;
import org.riffle.signal.ZoneTable;

/** The text and CSV faces of {@code riffle spectrum}. Stateless. */
final class SpectrumText {
    private static final String CAUTION = "Screening aid only: decisions belong to qualified maintenance staff "
            + "under site procedures and local codes.";

    private SpectrumText() {
    }

    private static String num(double v) {
        return Decimal.format(v, Decimal.TEXT_DIGITS, "-");
    }

    /** One row per peak: {@code rank,frequency_hz,amplitude_rms}. */
    static void printCsv(VibrationReport r, PrintWriter out) {
        out.print("rank,frequency_hz,amplitude_rms\r\n");
        int rank = 1;
        for (Peak p : r.peaks()) {
            out.print(rank++ + "," + Decimal.format(p.frequencyHz(), Decimal.CSV_DIGITS, "") + ","
                    + Decimal.format(p.amplitudeRms(), Decimal.CSV_DIGITS, "") + "\r\n");
        }
    }

    static void printText(Recording rec, Channel c, VibrationReport r, List<Band> bands, PrintWriter out) {
        Spectrum s = r.spectrum();
        String unit = c.unit().isEmpty() ? "(no unit)" : c.unit();
        out.println(rec.source().file() + ", channel " + c.name() + " [" + unit + "]: " + c.size() + " samples at "
                + num(s.sampleRateHz()) + " Hz" + (r.unit().known() ? "" : "; unit not recognised, not converted"));
        out.println("spectrum: " + s.description());
        out.println("amplitudes: RMS per line in " + unit + " (a sine of peak a reads a/sqrt(2))");
        out.println();
        out.println("strongest peaks");
        out.println(String.format(Locale.ROOT, "  %4s %14s %14s", "rank", "frequency_hz", "amplitude_rms"));
        int rank = 1;
        for (Peak p : r.peaks()) {
            out.println(String.format(Locale.ROOT, "  %4d %14s %14s", rank++, num(p.frequencyHz()),
                    num(p.amplitudeRms())));
        }
        out.println();
        out.println("band RMS (" + unit + ")");
        out.println("  " + new Band(0, s.sampleRateHz() / 2, "all").label() + "  "
                + num(s.bandRms(0, s.sampleRateHz() / 2)) + "  (whole spectrum, mean removed)");
        for (Band b : bands) {
            out.println("  " + b.label() + "  " + num(s.bandRms(b.loHz(), b.hiHz())));
        }
        out.println();
        printSeverity(r.severity(), out);
        out.println();
        out.println("shaft speed");
        out.println(r.shaft().map(sh -> "  " + num(sh.hz()) + " Hz (" + num(sh.rpm()) + " r/min), " + sh.how())
                .orElse("  unknown: give --rpm"));
        printLines(r, unit, out);
        for (String n : r.notes()) {
            out.println("note: " + n);
        }
        out.println();
        out.println(CAUTION);
    }

    private static void printSeverity(Severity v, PrintWriter out) {
        out.println("severity");
        if (!v.computed()) {
            out.println("  no velocity figure: " + v.remark());
            return;
        }
        out.println("  RMS velocity " + num(v.velocityRmsMmS()) + " mm/s over " + v.band().label() + " ("
                + v.band().how() + ")");
        if (v.zone().isEmpty()) {
            out.println("  " + v.remark());
            return;
        }
        ZoneTable t = v.table().orElseThrow();
        out.println("  zone " + v.zone().get() + " (" + v.zone().get().meaning() + ") of " + t.describe());
        double bc = t.boundaries()[1];
        out.println("  alarm practice (common practice): baseline + " + num(0.25 * bc) + " mm/s (25 % of B/C), "
                + "at most " + num(1.25 * bc) + " mm/s (1.25 x B/C)");
        out.println("  " + ZoneTable.CAUTION);
    }

    private static void printLines(VibrationReport r, String unit, PrintWriter out) {
        if (r.lines().isEmpty()) {
            return;
        }
        out.println();
        out.println(String.format(Locale.ROOT, "lines (tolerance +-%s %%; present = top bin at least %s x the "
                + "local median floor in power)", num(100 * r.params().slip()), num(FaultLines.PRESENT_RATIO)));
        r.envelopeBand().ifPresent(b -> out.println("envelope: squared envelope of " + b.label() + " ("
                + b.how() + "); amplitudes in (" + unit + ")^2"));
        out.println(String.format(Locale.ROOT, "  %-5s %-9s %11s %11s %14s %11s %s", "line", "where", "expected_hz",
                "found_hz", "amplitude_rms", "floor_rms", "present"));
        for (FaultLine l : r.lines()) {
            out.println(String.format(Locale.ROOT, "  %-5s %-9s %11s %11s %14s %11s %s", l.name(), l.where(),
                    num(l.expectedHz()), num(l.foundHz()), num(l.amplitudeRms()), num(l.floorRms()),
                    l.present() ? "yes" : "no"));
        }
    }
}
