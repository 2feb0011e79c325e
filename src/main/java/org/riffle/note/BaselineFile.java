package org.riffle.note;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.function.Consumer;

/**
 * The stored-baseline file, format version 1: plain UTF-8 text in riffle's {@link KeyLines} layout. A
 * header names the asset, the time of saving, the riffle version, the source log with its SHA-256 and
 * size, the baseline span and the channels; the body holds the learned model (see
 * {@link BaselineCodec}):
 *
 * <pre>
 * riffle-baseline 1
 * # A healthy baseline riffle learned for one asset; judge later logs against it with
 * #   riffle report LOG --asset AF-2 --stored-baseline
 * asset: AF-2
 * saved: 2026-03-14T09:15:02Z
 * riffle: 0.1.0
 * source: fixtures/demo/af2-process.csv
 * source-sha256: 9f86d0...
 * source-size: 1234567
 * span: first 25 % (rows 0-4320)
 * channel: fan speed
 * channel: vibration DE
 * ...body...
 * end
 * </pre>
 *
 * A different first-line version is refused, never guessed at. Stateless.
 */
final class BaselineFile {
    static final String KIND = "riffle-baseline";
    static final int VERSION = 1;
    static final int MAX_BYTES = 64 << 20;

    private BaselineFile() {
    }

    static String write(String asset, Instant saved, String riffleVersion, String source, FileDigest digest,
                        String span, List<String> channels, Consumer<KeyLines> body) {
        KeyLines b = new KeyLines(KIND, VERSION);
        body.accept(b);
        String bodyText = b.finish();
        List<KeyLines.Entry> bodyEntries;
        try {
            bodyEntries = KeyLines.parse(null, bodyText, KIND).entries();
        } catch (NoteException e) {
            throw new IllegalStateException("riffle wrote a body it cannot read: " + e.getMessage(), e);
        }
        KeyLines k = new KeyLines(KIND, VERSION)
                .comment("A healthy baseline riffle learned for one asset; judge later logs against it with")
                .comment("  riffle report LOG --asset " + asset.replaceAll("\\s", "_") + " --stored-baseline")
                .comment("Plain text for reading. The body's checksum is checked: a copy changed by hand is refused.")
                .text("asset", asset)
                .raw("saved", saved.toString())
                .text("riffle", riffleVersion)
                .text("source", source)
                .raw("source-sha256", digest.sha256())
                .raw("source-size", Long.toString(digest.sizeBytes()))
                .text("span", span);
        for (String c : channels) {
            k.text("channel", c);
        }
        k.raw("body-sha256", bodyDigest(bodyEntries));
        String head = k.finish();
        String rest = bodyText.substring(bodyText.indexOf('\n') + 1);
        return head.substring(0, head.length() - "end\n".length()) + "\n" + rest;
    }

    /** SHA-256 of the body's entries ({@code key: value} lines from the first body key on). */
    static String bodyDigest(List<KeyLines.Entry> entries) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (KeyLines.Entry e : entries) {
                md.update((e.key() + ": " + e.raw() + "\n").getBytes(StandardCharsets.UTF_8));
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /** Refuses a file whose body does not match the checksum in its header. */
    static void checkBody(Path file, KeyLines.Parsed p) throws NoteException {
        KeyLines.Entry sum = p.one(file, "body-sha256");
        List<KeyLines.Entry> all = p.entries();
        int first = all.indexOf(sum) + 1;
        if (!bodyDigest(all.subList(first, all.size())).equals(sum.raw())) {
            throw new NoteException(file, "was changed after it was saved (its body does not match the checksum"
                    + " on line " + sum.line() + "); save the baseline again from its log");
        }
    }

    /** The header of a parsed file, after checking its format version. */
    static StoredBaseline header(Path file, KeyLines.Parsed p) throws NoteException {
        if (p.version() != VERSION) {
            throw new NoteException(file, "baseline format " + p.version() + " (this riffle reads format "
                    + VERSION + " only); save the baseline again from its log with this riffle");
        }
        Instant saved = p.instant(file, "saved");
        String sha = p.one(file, "source-sha256").raw();
        if (!sha.matches("[0-9a-f]{64}")) {
            throw new NoteException(file, "line " + p.one(file, "source-sha256").line()
                    + ": not a SHA-256 digest; the file is damaged");
        }
        List<String> channels = new ArrayList<>();
        for (KeyLines.Entry e : p.all("channel")) {
            channels.add(e.text(file));
        }
        if (channels.isEmpty()) {
            throw new NoteException(file, "names no channel; the file is incomplete or damaged");
        }
        String name = file.getFileName().toString();
        String id = name.endsWith(BaselineStore.SUFFIX) ? name.substring(0, name.length()
                - BaselineStore.SUFFIX.length()) : name;
        return new StoredBaseline(p.one(file, "asset").text(file), id, saved, p.one(file, "riffle").text(file),
                p.one(file, "source").text(file), sha, p.one(file, "span").text(file), channels, file);
    }

    /** Refuses a baseline whose channels are not exactly the log's. */
    static void checkChannels(StoredBaseline b, List<String> logChannels) throws NoteException {
        List<String> missing = new ArrayList<>(b.channels());
        missing.removeAll(logChannels);
        List<String> extra = new ArrayList<>(logChannels);
        extra.removeAll(b.channels());
        if (missing.isEmpty() && extra.isEmpty()) {
            return;
        }
        StringBuilder sb = new StringBuilder("baseline ").append(b.id()).append(" of asset '")
                .append(Text.clean(b.asset())).append("' is for other channels:");
        if (!missing.isEmpty()) {
            sb.append(" not in this log: ").append(Text.clean(String.join(", ", missing))).append(';');
        }
        if (!extra.isEmpty()) {
            sb.append(" not in the baseline: ").append(Text.clean(String.join(", ", extra))).append(';');
        }
        sb.append(" save a baseline from a log with the same channels");
        throw new NoteException(b.path(), sb.toString());
    }
}
