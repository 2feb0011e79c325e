package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.ZoneTable;
import org.riffle.signal.ZoneTable.Group;
import org.riffle.signal.ZoneTable.Support;

/** The machine the user names reaches every vibration channel's assessment through the triage parameters. */
class AnalyzerVibrationTest {
    /**
     * 4 s at 5120 Hz, a 2.0 mm/s peak sine at 24.7 Hz: 1.414 mm/s RMS (analytic), zone B of group 2 rigid
     * (1.4 &lt; v ≤ 2.8; boundaries from memory — verify). A pressure channel beside it gets no figures.
     */
    @Test
    void zoneAppearsInTheAssessmentOfTheVelocityChannelOnly() {
        int n = 5120 * 4;
        float[] v = new float[n];
        float[] p = new float[n];
        for (int i = 0; i < n; i++) {
            v[i] = (float) (2.0 * Math.sin(2 * Math.PI * 24.7 * i / 5120.0));
            p[i] = (float) (3 + 0.01 * Math.sin(i * 0.01));
        }
        Recording rec = new Recording(new SourceFacts("test", 0, "test", "UTF-8", List.of(), List.of()),
                TimeBase.regular(n, 5120, null), List.of(new Channel("fan DE", "mm/s", v),
                new Channel("outlet", "bar", p)), List.of(), List.of());
        TriageParams params = new TriageParams(-1, -1, 1).withSearch(false).withVibration(VibrationParams.defaults()
                .withTable(new ZoneTable(Group.TWO, Support.RIGID)));
        Assessment a = new Analyzer(params).assess(rec, TriageListener.NONE);
        VibrationFigures f = a.channels().get(0).vibration().orElseThrow();
        assertEquals(Math.sqrt(2), f.velocityRmsMmS(), 0.01 * Math.sqrt(2));
        assertEquals("B", f.zone());
        assertTrue(f.table().startsWith("ISO 10816-3/20816-3 group 2, rigid"), f.table());
        assertTrue(a.channels().get(1).vibration().isEmpty());
    }
}
