package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The reader decodes only the head lines the sniffer looks at. The oracle is the sniffer's own cut
 * ({@link Sniffer#joinQuoted}, which stops after its {@link Sniffer#MAX_LINES}-th content line) and its
 * layout from every line of the head: both must be what they are with the lines cut short.
 */
class HeadLinesTest {
    /**
     * A log of a preamble, a header and 700 rows, with blank and comment lines among the rows and a
     * quoted field spanning three lines that starts at content line {@code quotedAt}.
     */
    private static byte[] log(int quotedAt) {
        StringBuilder b = new StringBuilder("# logger 7\n# interval 1 s\n\ntime,flow,note\n");
        int content = 1; // the header
        for (int i = 0; i < 700; i++) {
            if (i % 97 == 5) {
                b.append("# service visit\n\n");
            }
            content++;
            String note = content == quotedAt ? "\"first\nsecond, still quoted\nthird\"" : "ok";
            b.append(i).append(',').append(1.5 + i % 7).append(',').append(note).append('\n');
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    @ParameterizedTest
    @CsvSource({"5, 0", "399, 0", "400, 0", "401, 0", "402, 0", "400, 3", "403, 3", "404, 3"})
    void cutWhereTheSnifferStopsAndSniffTheSame(int quotedAt, int skip) throws LogException {
        byte[] head = log(quotedAt);
        List<String> all = new ArrayList<>(Arrays.asList(new String(head, StandardCharsets.UTF_8).split("\n", -1)));
        all.remove(all.size() - 1); // the text after the last line break: none
        List<String> cut = TextReader.headLines("q.csv", head, 0, StandardCharsets.UTF_8, false, false, skip);

        assertTrue(cut.size() < all.size(), "the head was cut: " + cut.size() + " of " + all.size());
        assertEquals(all.subList(0, cut.size()), cut);
        assertEquals(Sniffer.joinQuoted(all, skip).size(), cut.size(), "the sniffer's own cut");
        ReadOptions opt = skip == 0 ? ReadOptions.defaults() : ReadOptions.defaults().withSkipRows(skip);
        assertEquals(describe(Sniffer.sniff("q.csv", all, opt, false)), describe(Sniffer.sniff("q.csv", cut, opt, false)));
    }

    /** A layout as text, arrays by content (a record's equals compares arrays by identity). */
    private static String describe(Layout l) {
        StringBuilder b = new StringBuilder();
        for (RecordComponent c : Layout.class.getRecordComponents()) {
            try {
                Object v = c.getAccessor().invoke(l);
                b.append(c.getName()).append('=').append(Arrays.deepToString(new Object[] {v})).append('\n');
            } catch (ReflectiveOperationException e) {
                throw new AssertionError(e);
            }
        }
        return b.toString();
    }
}
