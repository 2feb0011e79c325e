package org.riffle.note;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;

/**
 * Baselines kept between visits: one plain-text file per saved baseline, under
 * {@code ROOT/ASSET/ID.baseline}, where ROOT is {@code $RIFFLE_BASELINE_DIR}, else
 * {@code $XDG_DATA_HOME/riffle/baselines}, else {@code ~/.local/share/riffle/baselines}; ASSET is the
 * asset identifier made safe as a folder name; ID is the UTC time of saving ({@code yyyyMMdd-HHmmss},
 * numbered when taken). The layout of a file is {@link BaselineFile}'s.
 *
 * <p>Files are written atomically and never over an existing one; reading refuses links, damaged files,
 * other format versions, other assets and other channels with a message that says what to do.
 *
 * <p>Immutable and thread-safe.
 */
public final class BaselineStore {
    static final String SUFFIX = ".baseline";
    private static final DateTimeFormatter ID = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final Path root;
    private final Clock clock;
    private final AtomicFiles.Fault fault;

    BaselineStore(Path root, Clock clock, AtomicFiles.Fault fault) {
        this.root = root.toAbsolutePath().normalize();
        this.clock = Objects.requireNonNull(clock, "clock");
        this.fault = Objects.requireNonNull(fault, "fault");
    }

    /** The store this environment names (see the class comment). */
    public static BaselineStore standard(Map<String, String> env) {
        return at(Folders.baselines(env, Folders.home()));
    }

    /** The store rooted at {@code root}. */
    public static BaselineStore at(Path root) {
        return new BaselineStore(root, Clock.systemUTC(), AtomicFiles.Fault.NONE);
    }

    /** The store's folder. */
    public Path root() {
        return root;
    }

    /** What {@link #list} found: the readable baselines, and one line per file that could not be read. */
    public record Listing(List<StoredBaseline> baselines, List<String> problems) {
        public Listing {
            baselines = List.copyOf(baselines);
            problems = List.copyOf(problems);
        }
    }

    /**
     * Stores {@code model}, learned from {@code source}, as a new baseline of {@code asset}.
     *
     * @return its header as stored
     * @throws NoteException when the store cannot be written or the log read for its digest
     */
    public StoredBaseline save(String asset, BaselineModel model, Path source) throws NoteException {
        List<String> names = model.channels().stream().map(BaselineModel.ChannelModel::name).toList();
        return save(asset, NoteWriter.version(), source, model.baseline().description(), names,
                k -> BaselineCodec.write(model, k));
    }

    /**
     * The model stored as {@code b}, after checking that it is intact (its body checksum), of this
     * format version, of its asset, and for exactly the channels of {@code judged} with the same units.
     * Its span is marked as rows of another log ({@link #asStored}).
     *
     * @throws NoteException naming the file and what is wrong; nothing is ever used silently
     */
    public BaselineModel load(StoredBaseline b, Recording judged) throws NoteException {
        List<String> names = judged.channels().stream().map(Channel::name).toList();
        KeyLines.Parsed p = open(b, names);
        BaselineFile.checkBody(b.path(), p);
        BaselineModel m = BaselineCodec.read(b.path(), p);
        for (Channel c : judged.channels()) {
            String unit = m.channel(c.name()).map(BaselineModel.ChannelModel::unit).orElse(c.unit());
            if (!unit.equals(c.unit())) {
                throw new NoteException(b.path(), "baseline " + b.id() + " has channel '" + Text.clean(c.name())
                        + "' in '" + Text.clean(unit) + "' but this log has it in '" + Text.clean(c.unit())
                        + "'; save a baseline from a log with the same units");
            }
        }
        return asStored(m, b);
    }

    /**
     * {@code m} as seen from a later log: its span is rows of the log it was learned from, not of the
     * log being judged, so the span is marked as another log's and named with the stored baseline.
     */
    static BaselineModel asStored(BaselineModel m, StoredBaseline b) {
        Baseline span = m.baseline();
        String description = span.description() + " of " + Sources.fileName(b.sourceFile()) + " (stored baseline "
                + b.id() + ")";
        return new BaselineModel(m.source(), new Baseline(span.fromRow(), span.toRow(), description, false),
                m.window(), m.step(), m.quantile(), m.sustained(), m.channels(), m.rqaNorm(), m.minLine(),
                m.minVert(), m.theiler());
    }

    /**
     * Writes a new baseline file for {@code asset}: the header from the arguments, then {@code body}.
     *
     * @return its header as stored
     */
    StoredBaseline save(String asset, String riffleVersion, Path source, String span, List<String> channels,
                        Consumer<KeyLines> body) throws NoteException {
        if (asset.isBlank()) {
            throw new NoteException(null, "a baseline needs an asset identifier (--asset ID)");
        }
        FileDigest digest;
        try {
            digest = FileDigest.of(source);
        } catch (IOException e) {
            throw new NoteException(source, "cannot read the log to record its SHA-256 (" + e.getMessage() + ")", e);
        }
        java.time.Instant now = clock.instant().truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
        String text = BaselineFile.write(asset, now, riffleVersion, source.toString(), digest, span, channels, body);
        Path dir = root.resolve(folderFor(asset));
        Path first = dir.resolve(ID.format(now) + SUFFIX);
        try {
            Files.createDirectories(dir);
            AtomicFiles.sweep(dir, SUFFIX, Duration.ofHours(1));
            Path written = AtomicFiles.writeNew(i -> NoteSaver.candidate(first, i), 100,
                    text.getBytes(StandardCharsets.UTF_8), fault);
            return BaselineFile.header(written, KeyLines.parse(written, text, BaselineFile.KIND));
        } catch (FileAlreadyExistsException e) {
            throw new NoteException(first, "100 baselines saved in the same second; wait a second", e);
        } catch (IOException e) {
            throw new NoteException(dir, "cannot save the baseline (" + IoReason.of(e) + "); "
                    + (IoReason.diskFull(e) ? "free some space, or " : "") + "set " + Folders.BASELINE_ENV
                    + " or --store to a writable folder; the stored baselines are as they were", e);
        }
    }

    /** Every baseline in the store, by asset and then oldest first; unreadable files become problems. */
    public Listing list() {
        List<StoredBaseline> found = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        if (!Files.isDirectory(root)) {
            return new Listing(found, problems);
        }
        try (Stream<Path> s = Files.walk(root, 2)) {
            for (Path p : s.filter(p -> p.getFileName().toString().endsWith(SUFFIX)).sorted().toList()) {
                try {
                    found.add(BaselineFile.header(p, parse(p)));
                } catch (NoteException e) {
                    problems.add(e.getMessage());
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            problems.add(root + ": cannot list the store (" + e.getMessage() + ")");
        }
        found.sort(Comparator.comparing(StoredBaseline::asset).thenComparing(StoredBaseline::saved)
                .thenComparing(StoredBaseline::id));
        return new Listing(found, problems);
    }

    /**
     * The baseline {@code id} of {@code asset}, or its newest when {@code id} is empty.
     *
     * @throws NoteException when there is none, naming what there is
     */
    public StoredBaseline find(String asset, Optional<String> id) throws NoteException {
        List<StoredBaseline> mine = list().baselines().stream().filter(b -> b.asset().equals(asset)).toList();
        if (mine.isEmpty()) {
            throw new NoteException(null, "no stored baseline for asset '" + Text.clean(asset) + "' in " + root
                    + " (save one with: riffle baseline save LOG --asset " + Text.clean(asset) + ")");
        }
        if (id.isEmpty()) {
            return mine.get(mine.size() - 1);
        }
        return mine.stream().filter(b -> b.id().equals(id.get())).findFirst().orElseThrow(() -> new NoteException(
                null, "asset '" + Text.clean(asset) + "' has no baseline '" + Text.clean(id.get()) + "'; it has "
                + String.join(", ", mine.stream().map(StoredBaseline::id).toList())));
    }

    /** Removes the baseline {@code id} of {@code asset} (and the asset's folder when it is left empty). */
    public StoredBaseline remove(String asset, String id) throws NoteException {
        StoredBaseline b = find(asset, Optional.of(id));
        try {
            Files.delete(b.path());
            try (Stream<Path> left = Files.list(b.path().getParent())) {
                if (left.findAny().isEmpty()) {
                    Files.delete(b.path().getParent());
                }
            }
        } catch (IOException e) {
            throw new NoteException(b.path(), "cannot remove the baseline (" + e.getMessage() + ")", e);
        }
        return b;
    }

    /**
     * The parsed file of {@code b}, checked to be of this format version, of its asset, and for exactly
     * the channels {@code channels} of the log to be judged.
     */
    KeyLines.Parsed open(StoredBaseline b, List<String> channels) throws NoteException {
        KeyLines.Parsed p = parse(b.path());
        StoredBaseline again = BaselineFile.header(b.path(), p);
        if (!again.asset().equals(b.asset())) {
            throw new NoteException(b.path(), "belongs to asset '" + Text.clean(again.asset()) + "', not '"
                    + Text.clean(b.asset()) + "'");
        }
        BaselineFile.checkChannels(again, channels);
        return p;
    }

    private static KeyLines.Parsed parse(Path p) throws NoteException {
        if (Files.isSymbolicLink(p) || !Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
            throw new NoteException(p, "is not a plain file riffle wrote; not followed");
        }
        try {
            return KeyLines.parse(p, AtomicFiles.readOwn(p, BaselineFile.MAX_BYTES), BaselineFile.KIND);
        } catch (IOException e) {
            throw new NoteException(p, "cannot read the baseline (" + e.getMessage() + ")", e);
        }
    }

    /** The folder name for {@code asset}: itself when it is a safe name, else made safe plus a digest. */
    static String folderFor(String asset) {
        String safe = asset.replaceAll("[^A-Za-z0-9._-]", "_");
        if (safe.equals(asset) && !safe.startsWith(".")) {
            return safe;
        }
        String hex = DraftStore.digest(asset);
        return (safe.replaceAll("^\\.+", "_") + "-" + hex.substring(0, 8));
    }
}
