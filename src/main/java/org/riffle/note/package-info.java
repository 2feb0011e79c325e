/**
 * The faces' written output and what must survive a dropped session: the plain-text findings note
 * ({@link org.riffle.note.NoteWriter} renders the technician's {@link org.riffle.note.Findings} and the
 * triage {@code Assessment}s; {@link org.riffle.note.NoteSaver} writes it atomically, never over an
 * existing file), draft autosave of typed comments ({@link org.riffle.note.DraftStore},
 * {@link org.riffle.note.Autosave}), the per-channel CSV, and the per-asset baseline store. Reads
 * {@code triage} and {@code log} values only; never the engines.
 */
package org.riffle.note;
