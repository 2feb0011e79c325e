package org.riffle.note;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.TriageParams;

/**
 * The whole note for the invented booster-pump log, assessed by the real {@link Analyzer}, written
 * with a fixed clock, compared with checked-in golden text. When the analysis output changes on
 * purpose, regenerate with {@code -Driffle.golden.update=true} and review the diff.
 */
class NoteGoldenTest {
    static final Clock CLOCK = Clock.fixed(Instant.parse("2026-03-14T09:30:00Z"), ZoneOffset.ofHours(1));

    static Assessment assessFixture() throws Exception {
        return new Analyzer(new TriageParams(-1, -1, 2)).assess(
                LogReader.read(NoteFixture.FILE, ReadOptions.defaults()), org.riffle.triage.TriageListener.NONE);
    }

    static Findings findings() {
        String file = NoteFixture.FILE.toString();
        return Findings.EMPTY.withSite("Hollow Creek pumping station (invented)").withAsset("P-3")
                .withPoint("pump outboard bearing, horizontal")
                .withConditions("1480 r/min, discharge valve 70 % open\nsecond pump on standby")
                .withComment(file, "discharge", "Sags in the last third; valve position unchanged.")
                .withComment(file, "bearing temp", "Housing warm to the touch.\n\nCheck grease.")
                .withGeneral("Escalated to the site analyst. Re-check at the next visit.");
    }

    @Test
    void wholeNoteForTheFixtureLogMatchesGoldenText() throws Exception {
        String note = NoteWriter.standard().withClock(CLOCK).withVersion("0.0.0-golden").withAscii(false)
                .render(assessFixture(), findings());
        Golden.assertMatches("booster-p3.note.txt", note);
    }

    @Test
    void asciiNoteForTheFixtureLogMatchesGoldenText() throws Exception {
        String note = NoteWriter.standard().withClock(CLOCK).withVersion("0.0.0-golden").withAscii(true)
                .render(assessFixture(), findings());
        Golden.assertMatches("booster-p3.note.ascii.txt", note);
    }
}
