package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The store's mechanics: layout, header, versioning, atomic no-clobber writes, refusals. */
class BaselineStoreTest {
    static final Instant T = Instant.parse("2026-03-14T09:15:02Z");
    static final List<String> CHANNELS = List.of("suction", "discharge", "motor current", "bearing temp");

    @TempDir
    Path dir;
    Path root;
    BaselineStore store;

    @BeforeEach
    void setUp() {
        root = dir.resolve("store");
        store = new BaselineStore(root, Clock.fixed(T, ZoneOffset.UTC), AtomicFiles.Fault.NONE);
    }

    private StoredBaseline save(BaselineStore s, String asset) throws NoteException {
        return s.save(asset, "0.1.0", NoteFixture.FILE, "first 25 % (rows 0-30)", CHANNELS,
                k -> k.raw("model.example", "1.5 2.5"));
    }

    @Test
    void aSavedBaselineIsListedWithItsHeader() throws Exception {
        StoredBaseline b = save(store, "P-3");
        assertEquals(root.resolve("P-3").resolve("20260314-091502.baseline"), b.path());
        StoredBaseline listed = store.list().baselines().get(0);
        assertEquals(b, listed);
        assertEquals("P-3", listed.asset());
        assertEquals("20260314-091502", listed.id());
        assertEquals(T, listed.saved());
        assertEquals("0.1.0", listed.riffleVersion());
        assertEquals(NoteFixture.FILE.toString(), listed.sourceFile());
        // What GNU coreutils 9.1 sha256sum prints for the fixture (see NoteFixture.SHA256).
        assertEquals(NoteFixture.SHA256, listed.sourceSha256());
        assertEquals(CHANNELS, listed.channels());
        String text = Files.readString(b.path());
        assertTrue(text.startsWith("riffle-baseline 1\n# A healthy baseline"), text);
        assertTrue(text.contains("\nsource-size: 176072\n") && text.contains("\nmodel.example: 1.5 2.5\n"), text);
        assertTrue(text.endsWith("\nend\n"), text);
    }

    @Test
    void aSecondBaselineInTheSameSecondGetsANumberAndTheNewestIsFound() throws Exception {
        StoredBaseline first = save(store, "P-3");
        StoredBaseline second = save(store, "P-3");
        assertEquals("20260314-091502-2", second.id());
        assertEquals(List.of(first, second), store.list().baselines());
        assertEquals(second, store.find("P-3", Optional.empty()));
        assertEquals(first, store.find("P-3", Optional.of("20260314-091502")));
    }

    @Test
    void unknownAssetsAndIdsAreClearMessages() throws Exception {
        NoteException e = assertThrows(NoteException.class, () -> store.find("P-9", Optional.empty()));
        assertEquals("no stored baseline for asset 'P-9' in " + root.toAbsolutePath()
                + " (save one with: riffle baseline save LOG --asset P-9)", e.getMessage());
        save(store, "P-3");
        e = assertThrows(NoteException.class, () -> store.find("P-3", Optional.of("2020")));
        assertEquals("asset 'P-3' has no baseline '2020'; it has 20260314-091502", e.getMessage());
    }

    @Test
    void removingTheLastBaselineOfAnAssetRemovesItsFolder() throws Exception {
        StoredBaseline b = save(store, "P-3");
        assertEquals(b, store.remove("P-3", b.id()));
        assertFalse(Files.exists(b.path()));
        assertFalse(Files.exists(root.resolve("P-3")));
        assertEquals(List.of(), store.list().baselines());
    }

    @Test
    void assetNamesBecomeSafeFolderNames() {
        assertEquals("AF-2", BaselineStore.folderFor("AF-2"));
        assertTrue(BaselineStore.folderFor("Pump 3/A").matches("Pump_3_A-[0-9a-f]{8}"));
        assertTrue(BaselineStore.folderFor("..").matches("_-[0-9a-f]{8}"));
        assertFalse(BaselineStore.folderFor("P 3").equals(BaselineStore.folderFor("P_3")), "no collision");
    }

    @Test
    void aSaveInterruptedBeforeTheMoveLeavesTheStoreAsItWas() throws Exception {
        StoredBaseline kept = save(store, "P-3");
        BaselineStore crashing = new BaselineStore(root, Clock.fixed(T.plusSeconds(60), ZoneOffset.UTC),
                (temp, target) -> {
                    throw new IOException("simulated crash");
                });
        NoteException e = assertThrows(NoteException.class, () -> save(crashing, "P-3"));
        assertTrue(e.getMessage().startsWith(root.resolve("P-3").toAbsolutePath()
                + ": cannot save the baseline (simulated crash)"), e.getMessage());
        assertEquals(List.of(kept), store.list().baselines());
        try (var s = Files.list(root.resolve("P-3"))) {
            assertEquals(List.of(kept.path()), s.toList(), "no temporary file left");
        }
    }

    @Test
    void aDamagedBaselineIsListedAsAProblemAndRefused() throws Exception {
        StoredBaseline b = save(store, "P-3");
        String text = Files.readString(b.path());
        Files.writeString(b.path(), text.substring(0, text.length() - 4));
        BaselineStore.Listing l = store.list();
        assertEquals(List.of(), l.baselines());
        assertEquals(List.of(b.path() + ": cut off (no end line); the file is incomplete or damaged"), l.problems());
        NoteException e = assertThrows(NoteException.class, () -> store.open(b, CHANNELS));
        assertEquals(b.path() + ": cut off (no end line); the file is incomplete or damaged", e.getMessage());
    }

    @Test
    void anotherFormatVersionIsRefusedNeverGuessedAt() throws Exception {
        StoredBaseline b = save(store, "P-3");
        Files.writeString(b.path(), Files.readString(b.path()).replaceFirst("riffle-baseline 1", "riffle-baseline 2"));
        NoteException e = assertThrows(NoteException.class, () -> store.open(b, CHANNELS));
        assertEquals(b.path() + ": baseline format 2 (this riffle reads format 1 only); save the baseline again"
                + " from its log with this riffle", e.getMessage());
    }

    @Test
    void aBaselineForOtherChannelsIsRefused() throws Exception {
        StoredBaseline b = save(store, "P-3");
        NoteException e = assertThrows(NoteException.class, () -> store.open(b,
                List.of("suction", "discharge", "motor current", "oil temp")));
        assertEquals(b.path() + ": baseline 20260314-091502 of asset 'P-3' is for other channels: not in this"
                + " log: bearing temp; not in the baseline: oil temp; save a baseline from a log with the same"
                + " channels", e.getMessage());
        assertEquals(4, store.open(b, List.of("bearing temp", "motor current", "discharge", "suction")).all("channel")
                .size(), "order does not matter");
    }

    @Test
    void aLinkInTheStoreIsNotFollowed() throws Exception {
        StoredBaseline b = save(store, "P-3");
        Path link = root.resolve("P-3").resolve("planted.baseline");
        Files.createSymbolicLink(link, b.path());
        BaselineStore.Listing l = store.list();
        assertEquals(List.of(b), l.baselines());
        assertEquals(List.of(link + ": is not a plain file riffle wrote; not followed"), l.problems());
    }

    @Test
    void aBaselineNeedsAnAsset() {
        NoteException e = assertThrows(NoteException.class, () -> save(store, " "));
        assertEquals("a baseline needs an asset identifier (--asset ID)", e.getMessage());
    }

    @Test
    void theStoreFolderFollowsTheEnvironment() {
        Path home = Path.of("/home/tech");
        assertEquals(Path.of("/srv/b"), Folders.baselines(Map.of("RIFFLE_BASELINE_DIR", "/srv/b",
                "XDG_DATA_HOME", "/x"), home));
        assertEquals(Path.of("/x/riffle/baselines"), Folders.baselines(Map.of("XDG_DATA_HOME", "/x"), home));
        assertEquals(Path.of("/home/tech/.local/share/riffle/baselines"),
                Folders.baselines(Map.of("XDG_DATA_HOME", "relative/ignored"), home));
        assertEquals(Path.of("/home/tech/.local/state/riffle/drafts"), Folders.drafts(Map.of(), home));
        assertEquals(Path.of("/s/riffle/drafts"), Folders.drafts(Map.of("XDG_STATE_HOME", "/s"), home));
    }

    @Test
    void aSaveRemovesTemporaryFilesThatKilledSavesLeftAnHourAgoAndNothingElse() throws Exception {
        save(store, "P-3");
        Path folder = root.resolve("P-3");
        Path stale = Files.writeString(folder.resolve(".20260314-080000.baseline.0123456789ab.tmp"), "half");
        Path fresh = Files.writeString(folder.resolve(".20260314-091500.baseline.abcdef012345.tmp"), "in progress");
        Path mine = Files.writeString(folder.resolve(".notes.baseline.old.tmp"), "not riffle's name");
        java.nio.file.attribute.FileTime twoHoursAgo = java.nio.file.attribute.FileTime.from(
                Instant.now().minusSeconds(7200));
        for (Path p : List.of(stale, mine)) {
            Files.setLastModifiedTime(p, twoHoursAgo);
        }
        BaselineStore later = new BaselineStore(root, Clock.fixed(T.plusSeconds(60), ZoneOffset.UTC),
                AtomicFiles.Fault.NONE);
        save(later, "P-3");
        assertFalse(Files.exists(stale), "a killed save's leftover from two hours ago is removed");
        assertTrue(Files.exists(fresh), "a temporary file seconds old may be a save under way: kept");
        assertTrue(Files.exists(mine), "a name riffle does not make is not riffle's to remove");
        assertEquals(2, store.list().baselines().size());
    }
}
