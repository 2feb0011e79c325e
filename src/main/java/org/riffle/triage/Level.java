package org.riffle.triage;

/**
 * The three-level judgement of a window or a channel against its baseline, in plain words. Every
 * level carries a word and an ASCII mark so that nothing depends on colour.
 */
public enum Level {
    /** Consistent with the baseline. */
    STEADY("steady", " "),
    /** Departs from the baseline in some measure, not yet strongly or not sustained. */
    WATCH("watch", "?"),
    /** Departs from the baseline clearly and for a sustained stretch. */
    DEPARTED("departed", "!");

    private final String word;
    private final String mark;

    Level(String word, String mark) {
        this.word = word;
        this.mark = mark;
    }

    /** The plain word shown on screen and in the note. */
    public String word() {
        return word;
    }

    /** A one-character ASCII mark shown beside the word. */
    public String mark() {
        return mark;
    }
}
