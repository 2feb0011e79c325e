package org.riffle.note;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * The header of a stored baseline: which asset, when it was saved, from which log (name and SHA-256),
 * over which span, for which channels. What {@code riffle baseline list} shows and what a note cites
 * when a log was judged against it. Immutable.
 *
 * @param asset the asset identifier it belongs to
 * @param id its identifier within the asset (the file name without extension)
 * @param saved when it was saved
 * @param riffleVersion the riffle version that saved it
 * @param sourceFile the log it was learned from, as named then
 * @param sourceSha256 that log's SHA-256
 * @param span the baseline span of that log, in words
 * @param channels the channels it covers, in order
 * @param path where it is stored
 */
public record StoredBaseline(String asset, String id, Instant saved, String riffleVersion, String sourceFile,
                             String sourceSha256, String span, List<String> channels, Path path) {
    public StoredBaseline {
        Objects.requireNonNull(asset, "asset");
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(saved, "saved");
        Objects.requireNonNull(riffleVersion, "riffleVersion");
        Objects.requireNonNull(sourceFile, "sourceFile");
        Objects.requireNonNull(sourceSha256, "sourceSha256");
        Objects.requireNonNull(span, "span");
        Objects.requireNonNull(path, "path");
        channels = List.copyOf(channels);
    }

    /**
     * Four lines for a listing, with everything that came from input neutralised: asset, id, date and
     * riffle version; source log and span; its SHA-256; the channels.
     */
    public List<String> describe() {
        return List.of(Text.clean(asset) + "  " + id + "  saved " + saved + "  riffle " + Text.clean(riffleVersion),
                "    from " + Text.clean(sourceFile) + ", " + Text.clean(span),
                "    SHA-256 " + sourceSha256,
                "    channels: " + Text.clean(String.join(", ", channels)));
    }
}
