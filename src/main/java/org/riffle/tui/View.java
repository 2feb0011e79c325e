package org.riffle.tui;

/** The views the screen can show. The caution line heads every one of them. */
enum View {
    /** Every channel at a glance. */
    LIST,
    /** One channel: trace, trends, figures. */
    DETAIL,
    /** Every key. */
    HELP
}
