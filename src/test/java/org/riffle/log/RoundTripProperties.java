package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;

/**
 * Random numeric tables written by Apache Commons CSV (an outside writer) in random dialects (delimiter,
 * decimal mark, quoting, line ends, byte-order mark, encoding, units in brackets, parentheses or a units
 * row, a time column or none, missing cells) read back to the same numbers: each value is written as
 * {@link Float#toString} (the shortest decimal that identifies the float, JLS {@code Float.toString}
 * contract), so a correctly rounding reader gets the float back exactly. The fast and the general path
 * must also agree. Seeded and bounded to a few seconds.
 */
class RoundTripProperties {
    private static final String[] UNITS = {"bar", "m³/h", "°C", "mm/s", "A", "rpm", "%", "µm"};

    /** One random table and how it is written. */
    record Table(float[][] values, char delimiter, boolean decimalComma, QuoteMode quote, boolean crlf,
                 boolean bom, boolean utf8, int unitsStyle, boolean timed) {
        @Override
        public String toString() {
            return String.format("%d cols x %d rows, delimiter %s, decimal comma %b, quote %s, crlf %b, bom %b,"
                    + " utf8 %b, units %d, timed %b", values.length, values[0].length, Dialect.name(delimiter),
                    decimalComma, quote, crlf, bom, utf8, unitsStyle, timed);
        }
    }

    @Provide
    Arbitrary<Table> tables() {
        Arbitrary<Float> value = Arbitraries.oneOf(
                Arbitraries.floats().between(-1000f, 1000f).ofScale(4),
                Arbitraries.floats().between(-1e-3f, 1e-3f).ofScale(9),
                Arbitraries.floats().between(-3e7f, 3e7f),
                Arbitraries.integers().between(-5000, 5000).map(i -> i / 100f),
                Arbitraries.just(Float.NaN));
        Arbitrary<float[][]> grid = Arbitraries.integers().between(1, 5).flatMap(cols ->
                Arbitraries.integers().between(2, 30).flatMap(rows ->
                        value.array(float[].class).ofSize(rows).array(float[][].class).ofSize(cols)));
        Arbitrary<Character> delim = Arbitraries.of(',', ';', '\t');
        return Combinators.combine(grid, delim, Arbitraries.of(true, false), Arbitraries.of(QuoteMode.ALL,
                QuoteMode.MINIMAL, QuoteMode.NON_NUMERIC), Arbitraries.of(true, false), Arbitraries.of(true, false),
                Arbitraries.of(true, false), Arbitraries.integers().between(0, 3))
                .as((g, d, dc, q, crlf, bom, utf8, units) -> new Table(firstColumnFilled(g), d, dc && d != ',', q,
                        crlf, bom && utf8, utf8, units, g.length % 2 == 0));
    }

    /** The first column keeps a number in every row, so the table always has data to sniff. */
    private static float[][] firstColumnFilled(float[][] g) {
        for (int i = 0; i < g[0].length; i++) {
            if (Float.isNaN(g[0][i])) {
                g[0][i] = i;
            }
        }
        return g;
    }

    @Property(tries = 200, seed = "20260301", shrinking = ShrinkingMode.BOUNDED)
    void numbersSurviveEveryDialect(@ForAll("tables") Table t) throws IOException, LogException {
        Path file = Files.createTempFile("riffle-roundtrip", ".csv");
        try {
            Files.write(file, write(t));
            Recording r = LogReader.read(file, ReadOptions.defaults());
            Recordings.assertIdentical(r, LogReader.readAllGeneral(file, ReadOptions.defaults()), t.toString());
            assertEquals(t.values().length, r.channels().size(), t + ": channels " + r.channels());
            for (int j = 0; j < t.values().length; j++) {
                Channel c = r.channel("ch" + (j + 1)).orElseThrow();
                assertArrayEquals(t.values()[j], c.values(), t + ": " + c.name());
                assertEquals(t.unitsStyle() == 0 ? "" : UNITS[j % UNITS.length], c.unit(), t.toString());
            }
            if (t.timed()) {
                for (int i = 0; i < r.rows(); i++) {
                    assertEquals(i * 0.5, r.time().seconds(i), 1e-12, t.toString());
                }
            } else {
                assertEquals(true, r.time().isIndexed(), t.toString());
            }
        } finally {
            Files.delete(file);
        }
    }

    static byte[] write(Table t) throws IOException {
        Charset cs = t.utf8() ? StandardCharsets.UTF_8 : Charset.forName("windows-1252");
        CSVFormat f = CSVFormat.DEFAULT.builder().setDelimiter(t.delimiter()).setQuoteMode(t.quote())
                .setRecordSeparator(t.crlf() ? "\r\n" : "\n").get();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        if (t.bom()) {
            bytes.write(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        }
        int cols = t.values().length;
        try (Writer w = new OutputStreamWriter(bytes, cs); CSVPrinter p = new CSVPrinter(w, f)) {
            List<String> header = new ArrayList<>();
            List<String> units = new ArrayList<>();
            if (t.timed()) {
                header.add("time");
                units.add("");
            }
            for (int j = 0; j < cols; j++) {
                String u = UNITS[j % UNITS.length];
                header.add("ch" + (j + 1) + (t.unitsStyle() == 1 ? " [" + u + "]" : t.unitsStyle() == 2
                        ? " (" + u + ")" : ""));
                units.add(u);
            }
            p.printRecord(header);
            if (t.unitsStyle() == 3) {
                p.printRecord(units);
            }
            for (int i = 0; i < t.values()[0].length; i++) {
                List<String> row = new ArrayList<>();
                if (t.timed()) {
                    row.add(String.format("2026-03-01T08:%02d:%02d.%03dZ", i / 120, i / 2 % 60, i % 2 * 500));
                }
                for (int j = 0; j < cols; j++) {
                    float v = t.values()[j][i];
                    String s = Float.isNaN(v) ? "" : Float.toString(v);
                    row.add(t.decimalComma() ? s.replace('.', ',') : s);
                }
                p.printRecord(row);
            }
        }
        return bytes.toByteArray();
    }
}
