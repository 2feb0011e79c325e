package org.riffle.note;

import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;

/**
 * riffle's own plain, line-based file layout (drafts, stored baselines): a first line naming the kind
 * and format version, then {@code key: value} lines (values escaped with {@link Escape}), {@code #}
 * comment lines and blank lines, and a last line {@code end} that proves the file is complete.
 *
 * <p>The writer is confined to one thread; parsed entries are immutable.
 */
final class KeyLines {
    private final StringBuilder sb = new StringBuilder();

    /** Starts a file whose first line is {@code kind + " " + version}. */
    KeyLines(String kind, int version) {
        sb.append(kind).append(' ').append(version).append('\n');
    }

    /** One entry; {@code raw} must already be on one line (use {@link Escape#encode}). */
    KeyLines raw(String key, String raw) {
        if (raw.indexOf('\n') >= 0 || raw.indexOf('\r') >= 0) {
            throw new IllegalArgumentException("value of " + key + " spans lines");
        }
        sb.append(key).append(raw.isEmpty() ? ":" : ": ").append(raw).append('\n');
        return this;
    }

    /** One entry holding {@code text}, escaped. */
    KeyLines text(String key, String text) {
        return raw(key, Escape.encode(text));
    }

    /** A comment line for human readers. */
    KeyLines comment(String text) {
        sb.append("# ").append(Escape.encode(text)).append('\n');
        return this;
    }

    /** A blank line for human readers. */
    KeyLines blank() {
        sb.append('\n');
        return this;
    }

    /** The complete file, {@code end} line included. */
    String finish() {
        return sb + "end\n";
    }

    /** A parsed entry with its 1-based line number. */
    record Entry(String key, String raw, int line) {
        /** The value unescaped. */
        String text(Path file) throws NoteException {
            try {
                return Escape.decode(raw);
            } catch (IllegalArgumentException e) {
                throw new NoteException(file, "line " + line + ": " + e.getMessage() + "; the file is damaged");
            }
        }
    }

    /**
     * Parses {@code content} of {@code file}, which must start with {@code kind} and end with
     * {@code end}.
     *
     * @return the format version and the entries, in file order
     * @throws NoteException naming the file and line when it is not such a file or is cut off
     */
    static Parsed parse(Path file, String content, String kind) throws NoteException {
        String[] lines = content.split("\n", -1);
        String head = lines[0].strip();
        if (!head.startsWith(kind + " ")) {
            throw new NoteException(file, "not a " + kind + " file (first line '" + Text.clean(cut(head))
                    + "')");
        }
        int version;
        try {
            version = Integer.parseInt(head.substring(kind.length() + 1).trim());
        } catch (NumberFormatException e) {
            throw new NoteException(file, "line 1: unreadable format version '" + Text.clean(cut(head)) + "'");
        }
        List<Entry> entries = new ArrayList<>();
        boolean ended = false;
        for (int i = 1; i < lines.length; i++) {
            String line = lines[i].endsWith("\r") ? lines[i].substring(0, lines[i].length() - 1) : lines[i];
            if (ended) {
                if (!line.isEmpty()) {
                    throw new NoteException(file, "line " + (i + 1) + ": text after the end line");
                }
                continue;
            }
            if (line.equals("end")) {
                ended = true;
            } else if (!line.isEmpty() && !line.startsWith("#")) {
                int colon = line.indexOf(':');
                if (colon <= 0) {
                    throw new NoteException(file, "line " + (i + 1) + ": expected 'key: value', found '"
                            + Text.clean(cut(line)) + "'");
                }
                String value = line.substring(colon + 1);
                entries.add(new Entry(line.substring(0, colon), value.startsWith(" ") ? value.substring(1) : value,
                        i + 1));
            }
        }
        if (!ended) {
            throw new NoteException(file, "cut off (no end line); the file is incomplete or damaged");
        }
        return new Parsed(version, List.copyOf(entries));
    }

    private static String cut(String s) {
        return s.length() > 60 ? s.substring(0, 60) + "..." : s;
    }

    /** A parsed file: its format version and entries. */
    record Parsed(int version, List<Entry> entries) {
        /** The only entry named {@code key}. */
        Entry one(Path file, String key) throws NoteException {
            Entry found = null;
            for (Entry e : entries) {
                if (e.key().equals(key)) {
                    if (found != null) {
                        throw new NoteException(file, "line " + e.line() + ": '" + key + "' given twice");
                    }
                    found = e;
                }
            }
            if (found == null) {
                throw new NoteException(file, "no '" + key + "' line; the file is incomplete or damaged");
            }
            return found;
        }

        /** The only entry named {@code key}, read as an ISO-8601 instant. */
        Instant instant(Path file, String key) throws NoteException {
            Entry e = one(file, key);
            try {
                return Instant.parse(e.raw());
            } catch (DateTimeParseException ex) {
                throw new NoteException(file, "line " + e.line() + ": unreadable time '" + Text.clean(e.raw()) + "'");
            }
        }

        /** All entries named {@code key}, in file order. */
        List<Entry> all(String key) {
            return entries.stream().filter(e -> e.key().equals(key)).toList();
        }
    }
}
