package org.riffle.note;

import java.util.ArrayList;
import java.util.List;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.VibrationFigures;

/**
 * The note's severity lines for a vibration channel: overall RMS velocity, its zone against the named
 * table with the zone's meaning and the caution that site and maker limits come first, the strongest
 * peaks and the shaft and bearing lines. Zone meanings paraphrase ISO 10816-3 / ISO 20816-3 (A newly
 * commissioned; B unrestricted long-term operation; C not for long-term operation; D damage likely).
 * Stateless.
 */
final class Vibration {
    private static final int SHOWN_PEAKS = 5;

    private Vibration() {
    }

    static void render(Page p, ChannelAssessment c, int label) {
        if (c.vibration().isEmpty()) {
            return;
        }
        VibrationFigures v = c.vibration().get();
        String level = Double.isNaN(v.velocityRmsMmS()) ? "broadband RMS velocity not computed"
                : Fmt.num(v.velocityRmsMmS()) + " mm/s RMS velocity in the severity band";
        if (v.zone().isEmpty()) {
            p.field(4, label, "Severity", level + "; no zone" + (v.remark().isEmpty() ? "" : ": " + v.remark()));
        } else {
            p.field(4, label, "Severity", level + ": zone " + v.zone() + " of " + v.table() + " ("
                    + meaning(v.zone()) + "). Site limits and the machine maker's limits take precedence over"
                    + " this table." + (v.remark().isEmpty() ? "" : " " + v.remark()));
        }
        if (!v.peaks().isEmpty()) {
            List<String> ps = new ArrayList<>();
            for (int i = 0; i < Math.min(SHOWN_PEAKS, v.peaks().size()); i++) {
                VibrationFigures.Peak pk = v.peaks().get(i);
                ps.add(Fmt.num(pk.frequencyHz()) + " Hz (" + Fmt.num(pk.amplitudeRms()) + " RMS)");
            }
            p.field(4, label, "Strongest peaks", String.join(", ", ps) + (c.unit().isEmpty() ? ""
                    : "; amplitudes in " + c.unit()));
        }
        if (!v.lines().isEmpty()) {
            List<String> ls = new ArrayList<>();
            for (VibrationFigures.Line l : v.lines()) {
                ls.add(l.name() + " " + Fmt.num(l.frequencyHz()) + " Hz " + (l.present()
                        ? "present (" + Fmt.num(l.amplitudeRms()) + " RMS)" : "not above the floor"));
            }
            p.field(4, label, "Lines", String.join("; ", ls));
        }
    }

    private static String meaning(String zone) {
        return switch (zone) {
            case "A" -> "typical of newly commissioned machines";
            case "B" -> "acceptable for unrestricted long-term operation";
            case "C" -> "not acceptable for long-term operation; plan action";
            case "D" -> "severe enough to damage the machine";
            default -> "zone not known to riffle";
        };
    }
}
