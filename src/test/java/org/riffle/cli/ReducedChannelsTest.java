package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.signal.VibrationParams;

/**
 * The channels table of a log read in reduced form: the whole-log columns (samples, missing, min, max,
 * mean) equal those of the same log read whole, and the sparkline is drawn from the block statistics;
 * every command announces the reduction on standard error in one line.
 */
class ReducedChannelsTest {
    @Test
    void wholeLogColumnsMatchAWholeRead(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("long.csv");
        StringBuilder sb = new StringBuilder("t,a,b\n");
        for (int i = 0; i < 30_000; i++) {
            // a spike in the middle of the log: outside both kept windows, so only the blocks can show it
            double a = i == 15_000 ? 99.5 : Math.sin(i / 50.0);
            sb.append(i).append(',').append(String.format(Locale.ROOT, "%.4f", a)).append(',')
                    .append(i % 10 == 0 ? "" : Integer.toString(i % 7)).append('\n');
        }
        Files.writeString(f, sb);
        Recording whole = LogReader.read(f, ReadOptions.defaults());
        Recording reduced = LogReader.read(f, ReadOptions.defaults().withMemoryBytes(100_000));
        assertTrue(reduced.source().reduction().isPresent());
        List<ChannelTable.Row> w = ChannelTable.rows(whole, 24, false, VibrationParams.defaults());
        List<ChannelTable.Row> r = ChannelTable.rows(reduced, 24, false, VibrationParams.defaults());
        for (int c = 0; c < 2; c++) {
            assertEquals(w.get(c).stats().count(), r.get(c).stats().count());
            assertEquals(w.get(c).stats().missing(), r.get(c).stats().missing());
            assertEquals(w.get(c).stats().min(), r.get(c).stats().min(), 0.0, "a sample: exact");
            assertEquals(w.get(c).stats().max(), r.get(c).stats().max(), 0.0, "a sample: exact");
            assertEquals(w.get(c).stats().mean(), r.get(c).stats().mean(), 1e-12, "sums in another order");
        }
        assertEquals(99.5, r.get(0).stats().max(), 0.0, "the spike between the windows is in the overview");
        assertTrue(r.get(0).sparkline().contains("@"), "the spike reaches the top: " + r.get(0).sparkline());
        assertEquals(w.get(0).sparkline().indexOf('@'), r.get(0).sparkline().indexOf('@'),
                "at the same place as in the whole read's sparkline");

        StringWriter err = new StringWriter();
        Reading.announce(reduced, new PrintWriter(err));
        String line = err.toString();
        assertEquals(1, line.lines().count(), line);
        assertTrue(line.startsWith("riffle: " + f + ": REDUCED to fit memory: the 30,000 rows (1 MiB of samples)"), line);
        assertTrue(line.strip().endsWith("to read it whole: java -Xmx2g -jar riffle.jar ..."), line);
        StringWriter none = new StringWriter();
        Reading.announce(whole, new PrintWriter(none));
        assertEquals("", none.toString());
    }
}
