package org.riffle.signal;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.riffle.signal.Unit.Quantity;

/**
 * The units riffle recognises and their factors to SI. Exact factors by definition where one exists
 * (NIST Special Publication 811, 2008 edition, Appendix B): inch 0.0254 m; standard gravity
 * 9.80665 m/s²; US gallon 3.785411784 L; pound-force per square inch 6894.757293168 Pa; °F → K via
 * (t + 459.67)·5/9.
 *
 * <p>Immutable after class initialisation; thread-safe.
 */
final class UnitTable {
    private static final Map<String, double[]> SCALES = new HashMap<>();
    private static final Map<String, Quantity> KINDS = new HashMap<>();

    static {
        put(Quantity.VELOCITY, 1e-3, 0, "mm/s");
        put(Quantity.VELOCITY, 1, 0, "m/s");
        put(Quantity.VELOCITY, 0.0254, 0, "in/s", "ips");
        put(Quantity.ACCELERATION, 1, 0, "m/s2");
        put(Quantity.ACCELERATION, 1e-3, 0, "mm/s2");
        put(Quantity.ACCELERATION, 9.80665, 0, "g", "gn");
        put(Quantity.DISPLACEMENT, 1e-6, 0, "um");
        put(Quantity.DISPLACEMENT, 1e-3, 0, "mm");
        put(Quantity.DISPLACEMENT, 25.4e-6, 0, "mil", "mils");
        put(Quantity.PRESSURE, 1e5, 0, "bar");
        put(Quantity.PRESSURE, 100, 0, "mbar");
        put(Quantity.PRESSURE, 1, 0, "pa");
        put(Quantity.PRESSURE, 1e3, 0, "kpa");
        put(Quantity.PRESSURE, 1e6, 0, "mpa");
        put(Quantity.PRESSURE, 6894.757293168, 0, "psi");
        put(Quantity.TEMPERATURE, 1, 273.15, "degc");
        put(Quantity.TEMPERATURE, 5.0 / 9.0, 459.67 * 5.0 / 9.0, "degf");
        put(Quantity.TEMPERATURE, 1, 0, "k");
        put(Quantity.CURRENT, 1, 0, "a");
        put(Quantity.CURRENT, 1e-3, 0, "ma");
        put(Quantity.VOLTAGE, 1, 0, "v");
        put(Quantity.VOLTAGE, 1e-3, 0, "mv");
        put(Quantity.FLOW, 1.0 / 3600, 0, "m3/h");
        put(Quantity.FLOW, 1, 0, "m3/s");
        put(Quantity.FLOW, 1e-3, 0, "l/s");
        put(Quantity.FLOW, 1e-3 / 60, 0, "l/min");
        put(Quantity.FLOW, 3.785411784e-3 / 60, 0, "gpm");
        put(Quantity.FREQUENCY, 1, 0, "hz");
        put(Quantity.FREQUENCY, 1.0 / 60, 0, "rpm", "r/min", "1/min", "cpm");
        put(Quantity.RATIO, 0.01, 0, "%");
    }

    private UnitTable() {
    }

    private static void put(Quantity q, double scale, double offset, String... keys) {
        for (String k : keys) {
            SCALES.put(k, new double[] {scale, offset});
            KINDS.put(k, q);
        }
    }

    static Unit lookup(String text) {
        String key = normalise(text);
        Quantity q = KINDS.get(key);
        if (q == null) {
            return new Unit(text, Quantity.UNKNOWN, Double.NaN, 0);
        }
        double[] s = SCALES.get(key);
        return new Unit(text, q, s[0], s[1]);
    }

    /** Lower case, no spaces or brackets, µ/μ → u, superscripts and ^ folded, ° and ℃/℉ → deg. */
    static String normalise(String text) {
        String s = text.strip();
        if (s.length() >= 2 && (s.charAt(0) == '[' || s.charAt(0) == '(')
                && (s.endsWith("]") || s.endsWith(")"))) {
            s = s.substring(1, s.length() - 1);
        }
        s = s.replace("\u2103", "degc").replace("\u2109", "degf").replace("\u00b0", "deg")
                .replace('\u00b5', 'u').replace('\u03bc', 'u').replace('\u00b2', '2').replace('\u00b3', '3')
                .replace("^", "").replace(" ", "").replace("\u00a0", "");
        return s.toLowerCase(Locale.ROOT);
    }
}
