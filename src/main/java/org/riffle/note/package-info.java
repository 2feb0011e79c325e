/**
 * The plain-text findings note, atomic writing, draft autosave and the per-asset baseline store.
 */
package org.riffle.note;
