package org.riffle.tui;

import org.riffle.note.Findings;
import org.riffle.note.Findings.ChannelRef;

/**
 * What the technician has entered: the note's {@link Findings} (site, asset, point, technician,
 * conditions, a comment per channel, a general comment) and the {@link MachineFacts}; and whether any
 * of it is not yet in a saved note.
 *
 * <p>Confined to the UI thread.
 */
final class Remarks {
    private Findings entries = Findings.EMPTY;
    private MachineFacts machine = MachineFacts.none();
    private Findings savedEntries = Findings.EMPTY;

    Findings entries() {
        return entries;
    }

    /** Replaces the entries (typing, or a restored draft). */
    void entries(Findings f) {
        entries = f;
    }

    String comment(ChannelRef ref) {
        return entries.comment(ref);
    }

    void comment(ChannelRef ref, String text) {
        entries = entries.withComment(ref, text);
    }

    String general() {
        return entries.general();
    }

    void general(String text) {
        entries = entries.withGeneral(text);
    }

    MachineFacts machine() {
        return machine;
    }

    void machine(MachineFacts m) {
        machine = m;
    }

    /** True when something typed is not in a saved note yet. */
    boolean unsaved() {
        return !entries.equals(savedEntries);
    }

    /** The note holding {@code f} was saved. */
    void saved(Findings f) {
        savedEntries = f;
    }
}
