package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;

class NoteWriterTest {
    private static final NoteWriter WRITER = NoteWriter.standard().withClock(NoteGoldenTest.CLOCK)
            .withVersion("0.0.0-golden").withAscii(false);

    static String sampleNote(boolean ascii) {
        return WRITER.withAscii(ascii).withStoredBaseline(NoteSamples.stored())
                .render(NoteSamples.twoLogs(), NoteSamples.findings());
    }

    @Test
    void everyFieldOfTheAssessmentIsLaidOutAsTheGoldenText() throws Exception {
        Golden.assertMatches("two-logs.note.txt", sampleNote(false));
    }

    @Test
    void noLineIsWiderThan78Columns() throws Exception {
        for (String note : List.of(sampleNote(false), sampleNote(true),
                Files.readString(Golden.DIR.resolve("booster-p3.note.txt")))) {
            for (String line : note.split("\n")) {
                assertTrue(line.codePointCount(0, line.length()) <= 78, "too wide: '" + line + "'");
            }
        }
    }

    @Test
    void theAsciiFormHoldsOnlyAscii() {
        String note = sampleNote(true);
        assertTrue(note.chars().allMatch(c -> c < 0x80), "non-ASCII in the ASCII form");
        assertTrue(note.contains("flow [m3/h]"), "m\u00b3/h transliterated");
        assertTrue(note.contains("temp [degC]"), "\u00b0C transliterated");
    }

    @Test
    void noControlCharacterOrEscapeSequenceFromInputReachesTheNote() {
        for (String note : List.of(sampleNote(false), sampleNote(true))) {
            assertEquals(-1, note.indexOf('\u001b'), "ESC in the note");
            for (int i = 0; i < note.length(); i++) {
                char c = note.charAt(i);
                boolean control = c < 0x20 && c != '\n' || c == 0x7f || c >= 0x80 && c < 0xa0
                        || Character.getType(c) == Character.FORMAT;
                assertFalse(control, "control character U+" + Integer.toHexString(c) + " at " + i);
            }
            assertTrue(note.contains("vib DE ^[[2J"), "the escape is shown, inert");
            assertTrue(note.contains("Device: DL-40 ^[]0;pwned^G"), "preamble neutralised");
            assertTrue(note.contains("Rumble at the drive end.^[[?1049h"), "comment neutralised");
        }
    }

    @Test
    void fieldsNotGivenAreLeftBlankNeverInvented() {
        String note = sampleNote(false);
        assertTrue(note.contains("  Measuring point:        not given\n"), note);
        assertTrue(note.contains("  Technician:             not given\n"), note);
        assertTrue(note.contains("  Operating conditions:   not given\n"), note);
    }

    @Test
    void theStoredBaselineIsCitedWithDateAndSourceHash() {
        String note = sampleNote(false);
        assertTrue(note.contains("Stored baseline:      20260301-101500 of asset AF-2\n  Saved:                2026-03-01"
                + " 10:15:00.000Z by riffle 0.1.0\n"), note);
        assertTrue(note.contains("0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef"), note);
    }

    @Test
    void anEscapeSequenceInAChannelNameReadFromAFileIsNeutralised(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("hostile.csv");
        // The reader refuses raw C0 bytes such as ESC as binary; a C1 CSI (U+009B) and a bidi override
        // (U+202E) are valid UTF-8 text and reach the channel name.
        Files.writeString(log, "time,a\u009b31mb\u202e2J\n2026-03-14 08:00:00,1\n2026-03-14 08:00:01,2\n"
                + "2026-03-14 08:00:02,3\n2026-03-14 08:00:03,4\n", StandardCharsets.UTF_8);
        Assessment a = new Analyzer(new TriageParams(-1, -1, 1)).assess(LogReader.read(log, ReadOptions.defaults()),
                TriageListener.NONE);
        String note = WRITER.render(a, Findings.EMPTY);
        assertEquals(-1, note.indexOf('\u009b'));
        assertEquals(-1, note.indexOf('\u202e'));
        assertTrue(note.contains("a<U+009B>31mb<U+202E>2J"), note);
    }

    @Test
    void aNoteNeedsAnAssessment() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WRITER.render(List.of(), Findings.EMPTY));
        assertEquals("a note needs at least one assessed log", e.getMessage());
    }

    @Test
    void theLocaleDecidesUtf8AsPosixOrdersTheVariables() {
        assertTrue(NoteWriter.localeIsUtf8(Map.of("LANG", "de_CH.UTF-8")));
        assertTrue(NoteWriter.localeIsUtf8(Map.of("LC_CTYPE", "C.utf8", "LANG", "C")));
        assertFalse(NoteWriter.localeIsUtf8(Map.of("LC_ALL", "C", "LANG", "en_GB.UTF-8")));
        assertFalse(NoteWriter.localeIsUtf8(Map.of()), "unset is the POSIX locale");
        assertTrue(NoteWriter.localeIsUtf8(Map.of("LC_ALL", "", "LANG", "en_GB.UTF-8")), "empty is unset");
    }
}
