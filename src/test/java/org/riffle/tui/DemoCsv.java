package org.riffle.tui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * A small invented plant log for the screen tests: a pump skid logged every 10 s for about 5.5 hours,
 * four channels; the bearing temperature drifts upwards in the last third. Seeded, so the same bytes
 * every time. Read by the placeholder reader on main (ISO timestamps, comma separated).
 */
final class DemoCsv {
    static final String[] CHANNELS = {"suction_pressure", "flow", "bearing_temp", "motor_current"};

    private DemoCsv() {
    }

    /** Writes the log to {@code file} with {@code rows} rows and returns the file. */
    static Path write(Path file, int rows) throws IOException {
        Random rnd = new Random(20260304L);
        StringBuilder sb = new StringBuilder("time," + String.join(",", CHANNELS) + "\n");
        for (int i = 0; i < rows; i++) {
            int s = i * 10;
            String t = String.format(Locale.ROOT, "2026-03-04 %02d:%02d:%02d", 6 + s / 3600, s / 60 % 60, s % 60);
            double phase = 2 * Math.PI * i / 180.0;
            double drift = i > rows * 2 / 3 ? (i - rows * 2 / 3) * 0.02 : 0;
            sb.append(t).append(',')
                    .append(String.format(Locale.ROOT, "%.3f", 2.1 + 0.05 * Math.sin(phase) + 0.01 * rnd.nextGaussian()))
                    .append(',')
                    .append(String.format(Locale.ROOT, "%.2f", 41.0 + 1.5 * Math.sin(phase / 3) + 0.3 * rnd.nextGaussian()))
                    .append(',')
                    .append(String.format(Locale.ROOT, "%.2f", 55.0 + drift + 0.2 * rnd.nextGaussian()))
                    .append(',')
                    .append(String.format(Locale.ROOT, "%.2f", 18.5 + 0.4 * Math.sin(phase * 2) + 0.1 * rnd.nextGaussian()))
                    .append('\n');
        }
        Files.writeString(file, sb.toString(), StandardCharsets.UTF_8);
        return file;
    }
}
