package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.riffle.log.DialectsTest.assertChannel;
import static org.riffle.log.DialectsTest.read;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
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

    @Test
    void repeatedWordsAreCountedEachTimeAndTokensNever() throws LogException {
        // a word repeated row after row (the common state column), broken by missing-value tokens and
        // by another word: every word cell counts, no token cell does (counted by hand: Bad 4, OFF 1)
        String csv = "t,flow\n0,1.5\n1,Bad\n2,Bad\n3,NaN\n4,NaN\n5,Bad\n6,2.0\n7,OFF\n8,Bad\n9,3.0\n"
                + "10,4.0\n11,5.0\n12,6.0\n13,7.0\n14,8.0\n15,9.0\n";
        Recording r = LogReader.read(new ByteArrayInputStream(csv.getBytes(StandardCharsets.UTF_8)), "states.csv",
                ReadOptions.defaults());
        assertChannel(r, "flow", "", 1.5f, NAN, NAN, NAN, NAN, NAN, 2.0f, NAN, NAN, 3.0f, 4.0f, 5.0f, 6.0f, 7.0f,
                8.0f, 9.0f);
        assertEquals(7, r.channel("flow").orElseThrow().missing());
        assertTrue(r.source().warnings().contains("column 'flow': 5 text cells read as missing samples (e.g. 'Bad')"),
                r.source().warnings().toString());
    }
}
