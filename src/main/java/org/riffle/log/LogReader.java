package org.riffle.log;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a log file into a {@link Recording}. The entry point of the {@code log} package.
 *
 * <p>Stateless and thread-safe.
 */
public final class LogReader {
    private LogReader() {
    }

    /**
     * Reads {@code file} ({@code "-"} for standard input) as the options say, detecting the rest.
     *
     * @throws LogException when the file is missing, unreadable or not a log riffle can read
     */
    public static Recording read(Path file, ReadOptions options) throws LogException {
        if (!Files.isRegularFile(file)) {
            throw new LogException(file, Files.isDirectory(file) ? "is a directory, not a log file"
                    : "no such file");
        }
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                     .parse(in)) {
            List<String> names = parser.getHeaderNames();
            if (names.isEmpty()) {
                throw new LogException(file, "empty file");
            }
            int cols = names.size();
            List<float[]> data = new ArrayList<>();
            List<Double> times = new ArrayList<>();
            Instant origin = null;
            for (CSVRecord r : parser) {
                Instant t = Instant.from(LocalDateTime.parse(r.get(0).replace(' ', 'T'))
                        .atOffset(java.time.ZoneOffset.UTC));
                if (origin == null) {
                    origin = t;
                }
                times.add((t.toEpochMilli() - origin.toEpochMilli()) / 1000.0);
                float[] row = new float[cols - 1];
                for (int c = 1; c < cols; c++) {
                    row[c - 1] = Float.parseFloat(r.get(c));
                }
                data.add(row);
            }
            double[] secs = times.stream().mapToDouble(Double::doubleValue).toArray();
            double rate = secs.length > 1 ? (secs.length - 1) / (secs[secs.length - 1] - secs[0]) : 1;
            List<Channel> channels = new ArrayList<>();
            for (int c = 1; c < cols; c++) {
                float[] v = new float[data.size()];
                for (int i = 0; i < v.length; i++) {
                    v[i] = data.get(i)[c - 1];
                }
                channels.add(Channel.adopt(names.get(c), "", v));
            }
            SourceFacts facts = new SourceFacts(file.toString(), Files.size(file), "csv ','", "UTF-8",
                    List.of(), List.of());
            return new Recording(facts, TimeBase.adoptExplicit(secs, rate, origin), channels, List.of(),
                    List.of());
        } catch (IOException e) {
            throw new LogException(file, "cannot read: " + e.getMessage());
        } catch (DateTimeParseException | NumberFormatException e) {
            throw new LogException(file, "not a log riffle can read yet: " + e.getMessage());
        }
    }
}
