package org.riffle.cli;

/** The exit statuses of every riffle command; each is documented in the manual page. */
final class ExitCode {
    /** Success. */
    static final int OK = 0;
    /** A failure of the work itself (for example a note that could not be written). */
    static final int FAILED = 1;
    /** The command line was wrong: unknown option, missing argument, bad value. */
    static final int USAGE = 2;
    /** A log (or other input file) is missing, unreadable or malformed. */
    static final int BAD_INPUT = 3;
    /** The screen was asked for but there is no terminal. */
    static final int NO_TERMINAL = 4;
    /** An internal error: a bug in riffle. */
    static final int INTERNAL = 70;
    /** Interrupted (Ctrl-C, SIGTERM, hang-up). */
    static final int INTERRUPTED = 130;

    private ExitCode() {
    }
}
