package org.riffle.note;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import java.util.TreeMap;

/**
 * The draft file, version 1: plain UTF-8 text, one {@code key: value} line per entry (see
 * {@link KeyLines}), values escaped so line breaks in comments survive word for word:
 *
 * <pre>
 * riffle-draft 1
 * # what was typed for this log; riffle offers it back when the log is opened again
 * log: /media/stick/fan-02.csv
 * saved: 2026-03-14T09:15:02Z
 * site: Northgate tunnel
 * asset: FAN-02
 * point:
 * technician:
 * conditions: 1480 r/min, damper 60 %
 * general: bearing housing warm to the touch\nre-check next visit
 * comment: fan-02.csv\tflow\tdrops after the damper change
 * end
 * </pre>
 *
 * A {@code comment} value is three escaped fields separated by a tab: log file, channel, text.
 *
 * <p>Stateless and thread-safe.
 */
final class DraftFormat {
    static final String KIND = "riffle-draft";
    static final int VERSION = 1;
    static final int MAX_BYTES = 4 << 20;

    private DraftFormat() {
    }

    static String write(Path log, Findings f, Instant saved) {
        KeyLines k = new KeyLines(KIND, VERSION)
                .comment("what was typed for this log; riffle offers it back when the log is opened again")
                .text("log", log.toAbsolutePath().normalize().toString())
                .raw("saved", saved.toString())
                .text("site", f.site())
                .text("asset", f.asset())
                .text("point", f.point())
                .text("technician", f.technician())
                .text("conditions", f.conditions())
                .text("general", f.general());
        for (Map.Entry<Findings.ChannelRef, String> e : f.comments().entrySet()) {
            k.raw("comment", Escape.encode(e.getKey().file()) + "\t" + Escape.encode(e.getKey().channel())
                    + "\t" + Escape.encode(e.getValue()));
        }
        return k.finish();
    }

    static DraftStore.Draft read(Path file, String content) throws NoteException {
        KeyLines.Parsed p = KeyLines.parse(file, content, KIND);
        if (p.version() != VERSION) {
            throw new NoteException(file, "draft format version " + p.version() + " is not the version "
                    + VERSION + " this riffle reads; open it in a text editor to copy your comments");
        }
        Instant saved = p.instant(file, "saved");
        Map<Findings.ChannelRef, String> comments = new TreeMap<>();
        for (KeyLines.Entry e : p.all("comment")) {
            String[] parts = e.raw().split("\t", -1);
            if (parts.length != 3) {
                throw new NoteException(file, "line " + e.line() + ": a comment needs log, channel and text"
                        + " separated by tabs");
            }
            String[] text = new String[3];
            for (int i = 0; i < 3; i++) {
                text[i] = new KeyLines.Entry(e.key(), parts[i], e.line()).text(file);
            }
            comments.put(new Findings.ChannelRef(text[0], text[1]), text[2]);
        }
        Findings f = new Findings(p.one(file, "site").text(file), p.one(file, "asset").text(file),
                p.one(file, "point").text(file), p.one(file, "technician").text(file),
                p.one(file, "conditions").text(file), comments, p.one(file, "general").text(file));
        return new DraftStore.Draft(f, saved, file);
    }
}
