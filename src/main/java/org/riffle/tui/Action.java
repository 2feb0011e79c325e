package org.riffle.tui;

/**
 * Everything a key can do, with the keys that do it and the words the help view shows. The one
 * table behind both the key handling ({@link KeyMap}) and the help view, so they cannot drift apart.
 * No action needs Alt or a function key above F1.
 */
enum Action {
    UP("Up, k", "previous channel (list) / previous channel (detail)"),
    DOWN("Down, j", "next channel"),
    PAGE_UP("PgUp, Ctrl-B", "one page of channels up"),
    PAGE_DOWN("PgDn, Ctrl-F", "one page of channels down"),
    FIRST("Home, g", "first channel"),
    LAST("End, G", "last channel"),
    OPEN("Enter, Right, l", "open the selected channel's detail (list)"),
    BACK("Esc, Backspace", "back to the channel list; cancels a prompt"),
    LEFT("Left, h", "move the time cursor back (detail)"),
    RIGHT("Right, l", "move the time cursor on (detail)"),
    FAR_LEFT("H, <", "pan back in time by half the view (detail)"),
    FAR_RIGHT("L, >", "pan on in time by half the view (detail)"),
    ZOOM_IN("+, =", "zoom in on the time cursor (detail)"),
    ZOOM_OUT("-", "zoom out (detail)"),
    ZOOM_ALL("0", "show the whole log (detail)"),
    NEXT_PANEL("Tab", "show the next panel of figures (detail)"),
    BASELINE("b", "mark a new baseline: press at one end, move, press at the other; recompute"),
    ASSET("a", "visit form: site, asset, point, technician, conditions, machine group, support, speed, bearing"),
    COMMENT("c", "comment on the selected channel"),
    GENERAL_COMMENT("C", "general comment for the note"),
    SAVE("s", "save the findings note and show where it went"),
    CANCEL_WORK("x", "stop the analysis still running; again: run it anew"),
    HELP("?", "this help; any key returns"),
    REDRAW("Ctrl-L", "redraw the whole screen"),
    QUIT("q", "quit (asks first when comments are unsaved)"),
    INTERRUPT("Ctrl-C", "quit at once; unsaved comments go to the draft");

    private final String keys;
    private final String meaning;

    Action(String keys, String meaning) {
        this.keys = keys;
        this.meaning = meaning;
    }

    /** The keys that do this, as the help view prints them. */
    String keys() {
        return keys;
    }

    /** What it does, in a few words. */
    String meaning() {
        return meaning;
    }
}
