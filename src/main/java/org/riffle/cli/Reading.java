package org.riffle.cli;

import java.io.PrintWriter;
import org.riffle.log.Recording;

/** What every command says about a log as read, before its own output. Stateless. */
final class Reading {
    private Reading() {
    }

    /**
     * Tells on {@code err}, in one line, that {@code rec} was read in reduced form (too large for the
     * memory), how, and how to read it whole; nothing for a log read whole.
     */
    static void announce(Recording rec, PrintWriter err) {
        rec.source().reduction().ifPresent(r -> {
            err.println("riffle: " + rec.source().file() + ": " + r.message());
            err.flush();
        });
    }
}
