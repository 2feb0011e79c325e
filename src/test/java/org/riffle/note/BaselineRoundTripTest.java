package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.Channel;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Assessment;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;
import org.riffle.triage.TriageListener;
import org.riffle.triage.TriageParams;

/** Triage's learned model through the store's text file and back, unchanged, and used for judging. */
class BaselineRoundTripTest {
    static Recording fixture;
    static BaselineModel model;
    static Path source;

    @TempDir
    static Path shared;

    @TempDir
    Path dir;

    /**
     * A log long enough for every part of the model to be learned: 2400 rows at 1 s, a noisy sine
     * (pressure) and a noisy logistic-map series (flow), seeded.
     */
    @BeforeAll
    static void learn() throws Exception {
        Random r = new Random(7);
        StringBuilder sb = new StringBuilder("time,pressure [bar],flow [m3/h]\n");
        double x = 0.3;
        for (int i = 0; i < 2400; i++) {
            x = 3.9 * x * (1 - x);
            sb.append(String.format(Locale.ROOT, "2026-03-14T%02d:%02d:%02d,%.4f,%.4f\n", 8 + i / 3600, i / 60 % 60,
                    i % 60, 5 + Math.sin(i * 0.21) + 0.05 * r.nextGaussian(), 400 + 50 * x + r.nextGaussian()));
        }
        source = Files.writeString(shared.resolve("trend.csv"), sb.toString());
        fixture = LogReader.read(source, ReadOptions.defaults());
        model = new Analyzer(new TriageParams(-1, -1, 2)).learn(fixture, new Baseline(0, 1200, "rows 0-1200"));
    }

    @Test
    void aLearnedModelReadsBackEqual() throws Exception {
        BaselineStore store = BaselineStore.at(dir);
        StoredBaseline b = store.save("P-3", model, source);
        assertEquals(List.of("pressure", "flow"), b.channels());
        assertEquals("rows 0-1200", b.span());
        KeyLines.Parsed parsed = KeyLines.parse(b.path(), Files.readString(b.path()), BaselineFile.KIND);
        assertEquals(model, BaselineCodec.read(b.path(), parsed), "the text reads back to an equal model");
        BaselineModel back = store.load(b, fixture);
        assertEquals(new Baseline(0, 1200, "rows 0-1200 of trend.csv (stored baseline " + b.id() + ")", false),
                back.baseline(), "seen from a later log, the span is another log's");
        assertEquals(model.channels(), back.channels());
        assertEquals(BaselineStore.asStored(model, b), back);
        assertTrue(model.channels().stream().anyMatch(c -> c.reservoir().isPresent()),
                "the round trip covers a trained reservoir");
    }

    @Test
    void nonDefaultRecurrenceSettingsReadBackToo() throws Exception {
        BaselineModel odd = new BaselineModel(model.source(), model.baseline(), model.window(), model.step(),
                0.95, 5, model.channels(), "max", 3, 4, 7);
        StoredBaseline b = BaselineStore.at(dir).save("P-3", odd, source);
        KeyLines.Parsed parsed = KeyLines.parse(b.path(), Files.readString(b.path()), BaselineFile.KIND);
        assertEquals(odd, BaselineCodec.read(b.path(), parsed));
    }

    @Test
    void aLaterLogJudgedAgainstTheStoredModelIsJudgedAsAgainstTheOriginal() throws Exception {
        BaselineStore store = BaselineStore.at(dir);
        StoredBaseline b = store.save("P-3", model, source);
        Analyzer a = new Analyzer(new TriageParams(-1, -1, 2));
        Assessment direct = a.assess(fixture, BaselineStore.asStored(model, b), TriageListener.NONE);
        Assessment viaStore = a.assess(fixture, store.load(b, fixture), TriageListener.NONE);
        assertEquals(direct.channels(), viaStore.channels());
        String note = NoteWriter.standard().withClock(NoteGoldenTest.CLOCK).withStoredBaseline(b)
                .render(viaStore, Findings.EMPTY);
        assertTrue(note.contains("  Stored baseline:      " + b.id() + " of asset P-3\n"), note);
        assertTrue(note.contains(b.sourceSha256()), note);
    }

    @Test
    void aLogInOtherUnitsIsRefused() throws Exception {
        BaselineStore store = BaselineStore.at(dir);
        StoredBaseline b = store.save("P-3", model, source);
        List<Channel> renamed = fixture.channels().stream().map(c -> c.name().equals("pressure")
                ? new Channel(c.name(), "psi", c.values()) : c).toList();
        Recording psi = new Recording(fixture.source(), fixture.time(), renamed, List.of(), List.of());
        NoteException e = assertThrows(NoteException.class, () -> store.load(b, psi));
        assertEquals(b.path() + ": baseline " + b.id() + " has channel 'pressure' in 'bar' but this log has it in"
                + " 'psi'; save a baseline from a log with the same units", e.getMessage());
    }

    @Test
    void aHandEditedBaselineIsRefusedByItsChecksum() throws Exception {
        BaselineStore store = BaselineStore.at(dir);
        StoredBaseline b = store.save("P-3", model, source);
        String text = Files.readString(b.path());
        int at = text.indexOf("\nchannel.mean: ") + "\nchannel.mean: ".length();
        Files.writeString(b.path(), text.substring(0, at) + "1" + text.substring(at));
        NoteException e = assertThrows(NoteException.class, () -> store.load(b, fixture));
        int line = (int) text.lines().takeWhile(l -> !l.startsWith("body-sha256: ")).count() + 1;
        assertEquals(b.path() + ": was changed after it was saved (its body does not match the checksum on line "
                + line + "); save the baseline again from its log", e.getMessage());
        assertEquals(b.id(), store.find("P-3", Optional.empty()).id(), "the header still lists");
    }

    @Test
    void theBodyReaderRefusesAnyEntryOutOfPlaceWithItsLine() throws Exception {
        StoredBaseline b = BaselineStore.at(dir).save("P-3", model, source);
        List<String> lines = Files.readAllLines(b.path());
        int i = lines.indexOf(lines.stream().filter(l -> l.startsWith("channel.mean: ")).findFirst().orElseThrow());
        lines.set(i, "channel.mean: 1,198");
        NoteException e = assertThrows(NoteException.class, () -> BaselineCodec.read(b.path(),
                KeyLines.parse(b.path(), String.join("\n", lines) + "\n", BaselineFile.KIND)));
        assertEquals(b.path() + ": line " + (i + 1) + ": 'channel.mean' is not a number as Java writes it;"
                + " the file is damaged", e.getMessage());
        lines.remove(i);
        e = assertThrows(NoteException.class, () -> BaselineCodec.read(b.path(),
                KeyLines.parse(b.path(), String.join("\n", lines) + "\n", BaselineFile.KIND)));
        assertEquals(b.path() + ": line " + (i + 1) + ": expected 'channel.mean', found 'channel.std';"
                + " the file is damaged", e.getMessage());
    }
}
