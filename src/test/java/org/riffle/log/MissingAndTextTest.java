package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.riffle.log.DialectsTest.assertChannel;
import static org.riffle.log.DialectsTest.read;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Missing-value tokens and text cells: counted, kept apart, never an error. */
class MissingAndTextTest {
    private static final float NAN = Float.NaN;

    @Test
    void missingTokensBecomeNaNCountedPerChannel() throws LogException {
        Recording r = read("missing-tokens.csv");
        assertChannel(r, "flow", "", 1.5f, NAN, NAN, NAN, NAN, 2.0f);
        assertChannel(r, "temp", "", 20.0f, NAN, NAN, NAN, 20.5f, 21.0f);
        assertEquals(4, r.channel("flow").orElseThrow().missing());
        assertEquals(3, r.channel("temp").orElseThrow().missing());
        assertTrue(r.source().warnings().contains("column 'flow': 1 text cells read as missing samples (e.g. 'Bad')"),
                r.source().warnings().toString());
    }

    @Test
    void mostlyTextColumnsBecomeTextChannels() throws LogException {
        Recording r = read("text-columns.csv");
        assertChannel(r, "current", "A", 10.0f, 10.5f, 11.0f, 11.5f);
        assertEquals(List.of(new TextChannel("quality", List.of("Good", "Uncertain", "Bad")),
                new TextChannel("state", List.of("RUN"))), r.textChannels());
        assertEquals(1, r.channels().size());
    }
}
