package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.triage.Analyzer;
import org.riffle.triage.ChannelAssessment;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;
import org.riffle.triage.WindowRow;

/** {@code riffle trend}'s novelty and flag columns are the triage's window rows, row for row. */
class TrendFlagsTest {
    @TempDir
    Path dir;

    @Test
    void noveltyAndFlagMatchTheAnalyzer() throws Exception {
        Path p = HealthCommandTest.log(dir, "pump.csv", 4000, 6, true);
        MainTest.Run r = MainTest.run("trend", p.toString(), "--channel", "stepped", "--window", "200", "--csv");
        assertEquals(0, r.status(), r.err());
        List<Map<String, String>> rows = HealthCommandTest.parse(r.out());
        Recording rec = LogReader.read(p, ReadOptions.defaults());
        ChannelAssessment a = new Analyzer(TriageParams.defaults().withWindow(200, 100)).assess(
                new Recording(rec.source(), rec.time(), List.of(rec.channel("stepped").orElseThrow()), List.of(),
                        rec.timeIssues()), TriageListener.NONE).channels().get(0);
        assertEquals(a.trend().size(), rows.size());
        int flagged = 0;
        for (int k = 0; k < rows.size(); k++) {
            WindowRow w = a.trend().get(k);
            assertEquals(Integer.toString(w.startIndex()), rows.get(k).get("start_index"));
            assertEquals(w.novelty(), Double.parseDouble(rows.get(k).get("novelty")), 1e-6 * w.novelty(),
                    "printed to 7 significant digits");
            assertEquals(Integer.toString(w.flag()), rows.get(k).get("flag"));
            flagged += w.flag();
        }
        assertEquals(true, flagged > rows.size() / 3, "the step after row 2000 is flagged: " + flagged);
    }
}
