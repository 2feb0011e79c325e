package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

/** Test helper: two recordings hold exactly the same data, bit for bit. */
final class Recordings {
    private Recordings() {
    }

    static void assertIdentical(Recording a, Recording b, String what) {
        assertEquals(a.source(), b.source(), what + ": source facts");
        assertEquals(a.rows(), b.rows(), what + ": rows");
        assertEquals(a.time().isExplicit(), b.time().isExplicit(), what + ": explicit time");
        assertEquals(a.time().isIndexed(), b.time().isIndexed(), what + ": indexed");
        assertEquals(a.time().origin(), b.time().origin(), what + ": origin");
        assertEquals(Double.doubleToLongBits(a.time().rateHz()), Double.doubleToLongBits(b.time().rateHz()),
                what + ": rate");
        for (int i = 0; i < a.rows(); i++) {
            assertEquals(Double.doubleToLongBits(a.time().seconds(i)), Double.doubleToLongBits(b.time().seconds(i)),
                    what + ": seconds of row " + i);
        }
        List<Channel> ca = a.channels();
        List<Channel> cb = b.channels();
        assertEquals(ca.size(), cb.size(), what + ": channels");
        for (int j = 0; j < ca.size(); j++) {
            assertEquals(ca.get(j).name(), cb.get(j).name(), what);
            assertEquals(ca.get(j).unit(), cb.get(j).unit(), what);
            assertArrayEquals(bits(ca.get(j).values()), bits(cb.get(j).values()), what + ": " + ca.get(j).name());
        }
        assertEquals(a.textChannels(), b.textChannels(), what + ": text channels");
        assertEquals(a.timeIssues(), b.timeIssues(), what + ": time issues");
    }

    private static int[] bits(float[] v) {
        int[] out = new int[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = Float.floatToRawIntBits(v[i]);
        }
        return out;
    }
}
