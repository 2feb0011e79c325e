package org.riffle.log;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Facts a logger writes above its table that riffle can use: a sample rate ({@code Rate: 25.6 kHz},
 * {@code Sampling rate;100;Hz}) or a sample interval ({@code Interval: 10 s}, {@code Sample interval;500;ms}).
 * Used only when the table has no time column and the user gave no rate.
 *
 * <p>Stateless and thread-safe.
 */
final class Preamble {
    private static final String NUMBER = "([0-9]+(?:[.,][0-9]+)?)";
    private static final String SEP = "\\s*[:;=,\\t ]\\s*";
    private static final Pattern RATE = Pattern.compile(".*\\b(?:sampl(?:e|ing)\\s*)?(?:rate|frequency)" + SEP
            + NUMBER + "\\s*[;,\\t ]?\\s*(hz|khz|/s|1/s)\\b.*");
    private static final Pattern INTERVAL = Pattern.compile(".*\\b(?:sampl(?:e|ing)\\s*)?(?:interval|period)" + SEP
            + NUMBER + "\\s*[;,\\t ]?\\s*(ms|s|sec|seconds|min|h)\\b.*");

    private Preamble() {
    }

    /** A rate found in a preamble line. */
    record Rate(double hz, String line) {
    }

    /** The first sample rate or interval stated in {@code lines}, or null. */
    static Rate rate(List<String> lines) {
        for (String line : lines) {
            String l = line.toLowerCase(Locale.ROOT);
            Matcher m = RATE.matcher(l);
            if (m.matches()) {
                double v = Double.parseDouble(m.group(1).replace(',', '.'));
                double hz = m.group(2).equals("khz") ? v * 1000 : v;
                if (hz > 0) {
                    return new Rate(hz, line.strip());
                }
            }
            m = INTERVAL.matcher(l);
            if (m.matches()) {
                double v = Double.parseDouble(m.group(1).replace(',', '.'));
                String u = m.group(2);
                double seconds = u.equals("ms") ? v / 1000 : u.equals("min") ? v * 60 : u.equals("h") ? v * 3600 : v;
                if (seconds > 0) {
                    return new Rate(1 / seconds, line.strip());
                }
            }
        }
        return null;
    }
}
