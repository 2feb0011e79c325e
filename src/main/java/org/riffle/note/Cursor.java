package org.riffle.note;

import java.nio.file.Path;
import java.util.List;

/**
 * Reads the entries of a {@link KeyLines} file one after another, each expected by name in its
 * place; anything else is refused with the file and line. Confined to one thread.
 */
final class Cursor {
    private final Path file;
    private final List<KeyLines.Entry> entries;
    private int next;
    private KeyLines.Entry last;

    Cursor(Path file, List<KeyLines.Entry> entries) {
        this.file = file;
        this.entries = entries;
    }

    /** Moves to the first entry named {@code key}. */
    void skipTo(String key) throws NoteException {
        while (next < entries.size() && !entries.get(next).key().equals(key)) {
            next++;
        }
        if (next == entries.size()) {
            throw new NoteException(file, "no '" + key + "' line; the file is incomplete or damaged");
        }
    }

    /** The next entry's raw value, which must be named {@code key}. */
    String raw(String key) throws NoteException {
        if (next >= entries.size()) {
            throw new NoteException(file, "ends before '" + key + "'; the file is incomplete or damaged");
        }
        last = entries.get(next++);
        if (!last.key().equals(key)) {
            throw new NoteException(file, "line " + last.line() + ": expected '" + key + "', found '"
                    + Text.clean(last.key()) + "'; the file is damaged");
        }
        return last.raw();
    }

    String text(String key) throws NoteException {
        raw(key);
        return last.text(file);
    }

    int integer(String key) throws NoteException {
        return parseInt(raw(key));
    }

    long longInt(String key) throws NoteException {
        String s = raw(key);
        try {
            return Long.parseLong(s);
        } catch (NumberFormatException e) {
            throw bad("a whole number");
        }
    }

    double number(String key) throws NoteException {
        return parseDouble(raw(key));
    }

    double[] numbers(String key) throws NoteException {
        String s = raw(key).trim();
        if (s.isEmpty()) {
            return new double[0];
        }
        String[] parts = s.split(" +");
        double[] out = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            out[i] = parseDouble(parts[i]);
        }
        return out;
    }

    int parseInt(String s) throws NoteException {
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            throw bad("a whole number");
        }
    }

    private double parseDouble(String s) throws NoteException {
        if (!s.matches("-?(NaN|Infinity|\\d+(\\.\\d+)?(E-?\\d+)?)")) {
            throw bad("a number as Java writes it");
        }
        return Double.parseDouble(s);
    }

    /** Refuses the entry just read: it is not {@code what}. */
    NoteException bad(String what) {
        return new NoteException(file, "line " + last.line() + ": '" + Text.clean(last.key()) + "' is not " + what
                + "; the file is damaged");
    }

    /** Refuses anything after the last expected entry. */
    void end() throws NoteException {
        if (next < entries.size()) {
            KeyLines.Entry e = entries.get(next);
            throw new NoteException(file, "line " + e.line() + ": unexpected '" + Text.clean(e.key())
                    + "'; the file is damaged");
        }
    }
}
