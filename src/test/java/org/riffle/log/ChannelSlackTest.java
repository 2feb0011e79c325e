package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A reader's channel may own a longer array than its samples (the rows were allocated from an estimate
 * of the file's size and are not copied to fit): nothing past its size is ever seen.
 */
class ChannelSlackTest {
    @TempDir
    Path dir;

    @Test
    void anAdoptedArraysTailIsNeverSeen() {
        Channel c = Channel.adopt("flow", "m3/h", new float[] {1, Float.NaN, 3, 0, 0}, 3);
        assertEquals(3, c.size());
        assertEquals(1, c.missing());
        assertArrayEquals(new float[] {1, Float.NaN, 3}, c.values());
        assertArrayEquals(new double[] {1, Double.NaN, 3}, c.toDoubles());
        assertThrows(IndexOutOfBoundsException.class, () -> c.value(3));
        assertThrows(IndexOutOfBoundsException.class, () -> c.copyTo(new double[4], 0, 4));
        assertThrows(IndexOutOfBoundsException.class,
                () -> c.ranges(new int[] {2}, new int[] {4}, new double[1], new double[1]));
        assertThrows(IllegalArgumentException.class, () -> Channel.adopt("x", "", new float[2], 3));
    }

    /**
     * A log larger than the reader's head, so that its rows are allocated from the file's size: every
     * channel and the time base hold exactly the rows written (counted here), and the file read by the
     * general path (Commons CSV for every line) agrees sample for sample.
     */
    @Test
    void aLongLogsChannelsHoldExactlyItsRows() throws IOException, LogException {
        StringBuilder b = new StringBuilder("time,level [m],pump\n");
        int rows = 12_345;
        for (int i = 0; i < rows; i++) {
            b.append("2026-03-01T00:").append(String.format("%02d:%02d", i / 60 % 60, i % 60)).append('.')
                    .append(String.format("%03d", i / 3600)).append("Z,").append(i % 97 == 0 ? "NaN" : i * 0.5)
                    .append(',').append(i % 7).append('\n');
        }
        Path log = dir.resolve("long.csv");
        Files.writeString(log, b, StandardCharsets.US_ASCII);
        assertTrue(Files.size(log) > TextReader.HEAD, "the log must be longer than the head");
        Recording fast = LogReader.read(log, ReadOptions.defaults());
        Recording general = LogReader.readAllGeneral(log, ReadOptions.defaults());
        assertEquals(rows, fast.time().size());
        for (Channel c : fast.channels()) {
            assertEquals(rows, c.size(), c.name());
            assertEquals(rows, c.values().length, c.name());
            assertArrayEquals(general.channel(c.name()).orElseThrow().values(), c.values(), c.name());
        }
        assertEquals((rows + 96) / 97, fast.channel("level").orElseThrow().missing(), "one NaN every 97 rows");
        assertEquals(general.time().spanSeconds(), fast.time().spanSeconds(), 0);
        Recording piped = LogReader.read(new ByteArrayInputStream(Files.readAllBytes(log)), "-", ReadOptions.defaults());
        assertEquals(rows, piped.channel("pump").orElseThrow().size(), "from a pipe too (no size to estimate from)");
    }
}
