package org.riffle.tui;

import java.util.HashMap;
import java.util.Map;

/**
 * What the technician has typed: a comment per channel, a general comment, the asset facts; and
 * whether any of it is not yet in a saved note.
 *
 * <p>Confined to the UI thread.
 */
final class Remarks {
    private final Map<String, String> comments = new HashMap<>();
    private String general = "";
    private AssetFacts asset = AssetFacts.none();
    private boolean unsaved;
    private long changes;

    /** Key of channel {@code channel} of source {@code source}. */
    static String key(int source, int channel) {
        return source + ":" + channel;
    }

    String comment(int source, int channel) {
        return comments.getOrDefault(key(source, channel), "");
    }

    void comment(int source, int channel, String text) {
        String old = comment(source, channel);
        if (text.isEmpty()) {
            comments.remove(key(source, channel));
        } else {
            comments.put(key(source, channel), text);
        }
        changed(!old.equals(text));
    }

    String general() {
        return general;
    }

    void general(String text) {
        changed(!general.equals(text));
        general = text;
    }

    AssetFacts asset() {
        return asset;
    }

    void asset(AssetFacts a) {
        changed(!asset.equals(a));
        asset = a;
    }

    private void changed(boolean really) {
        if (really) {
            unsaved = true;
            changes++;
        }
    }

    /** True when something typed is not in a saved note yet. */
    boolean unsaved() {
        return unsaved;
    }

    /** Counts every change; the draft autosave compares it with the count it last wrote. */
    long changes() {
        return changes;
    }

    void saved() {
        unsaved = false;
    }
}
